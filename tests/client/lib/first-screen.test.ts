// @vitest-environment jsdom
import { QueryClient } from "@tanstack/react-query";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { afterFirstScreen, watchFirstScreen } from "@/lib/first-screen.ts";

interface State {
  initialized: boolean;
  navigation: { state: string };
}

/** The two things watchFirstScreen reads from React Router's data router. */
function fakeRouter(state: State) {
  const listeners = new Set<(state: State) => void>();
  const router = {
    state,
    subscribe(listener: (state: State) => void) {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
    set(next: State) {
      router.state = next;
      for (const listener of listeners) listener(next);
    },
  };
  return router;
}

describe("watchFirstScreen", () => {
  beforeEach(() => {
    vi.useFakeTimers();
  });
  afterEach(() => {
    vi.useRealTimers();
  });

  it("holds deferred work until the screen's scripts, loaders and queries are done, then runs it when idle", async () => {
    const router = fakeRouter({ initialized: false, navigation: { state: "idle" } });
    const queryClient = new QueryClient();
    watchFirstScreen(router, queryClient);
    const work = vi.fn();
    afterFirstScreen(work);

    await vi.advanceTimersByTimeAsync(5000);
    expect(work).not.toHaveBeenCalled();

    // The screen is drawn, and one of its effects asks for a table.
    let answer: (value: string) => void = () => undefined;
    void queryClient.fetchQuery({
      queryKey: ["table"],
      queryFn: () => new Promise<string>((resolve) => (answer = resolve)),
    });
    router.set({ initialized: true, navigation: { state: "idle" } });
    await vi.advanceTimersByTimeAsync(5000);
    expect(work).not.toHaveBeenCalled();

    answer("R32");
    await vi.advanceTimersByTimeAsync(5000);
    expect(work).toHaveBeenCalledOnce();

    // From then on, at once.
    const later = vi.fn();
    afterFirstScreen(later);
    expect(later).toHaveBeenCalledOnce();
  });

  it("gives up waiting for a screen that never goes quiet", async () => {
    const router = fakeRouter({ initialized: true, navigation: { state: "idle" } });
    const queryClient = new QueryClient();
    void queryClient.fetchQuery({ queryKey: ["hangs"], queryFn: () => new Promise<never>(() => undefined) });
    watchFirstScreen(router, queryClient);
    const work = vi.fn();
    afterFirstScreen(work);

    await vi.advanceTimersByTimeAsync(14_000);
    expect(work).not.toHaveBeenCalled();
    await vi.advanceTimersByTimeAsync(2000);
    expect(work).toHaveBeenCalledOnce();
  });
});
