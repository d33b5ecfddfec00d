// @vitest-environment jsdom
import { QueryClient, QueryClientProvider, useSuspenseQuery } from "@tanstack/react-query";
import { fireEvent, render, screen } from "@testing-library/react";
import { MemoryRouter } from "react-router-dom";
import { describe, expect, it, vi } from "vitest";
import { ScreenBoundary } from "@/components/errors/screen-boundary.tsx";
import { ScreenFailed } from "@/components/errors/screen-failed.tsx";

function Visit() {
  const { data } = useSuspenseQuery<string>({ queryKey: ["visit"], queryFn: answers.next });
  return <p>{data}</p>;
}

// The first fetch fails as a dropped connection does; the one asked for by "Try again" answers.
const answers = {
  calls: 0,
  next: () => {
    answers.calls += 1;
    return answers.calls === 1
      ? Promise.reject(new Error("No connection to the Satura server"))
      : Promise.resolve("Circuit 1");
  },
};

describe("ScreenFailed", () => {
  it("says what failed in the screen's words, asks again on Try again and shows the screen", async () => {
    // React reports the error its boundary caught on the console: expected here, not a bug.
    vi.spyOn(console, "error").mockImplementation(() => undefined);
    const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
    render(
      <QueryClientProvider client={client}>
        <MemoryRouter>
          <ScreenBoundary
            pending={<p>Loading the visit…</p>}
            failed={(error, retry) => (
              <ScreenFailed
                title="This visit could not be opened"
                error={error}
                retry={retry}
                back={{ to: "/jobs", label: "Back to jobs" }}
              />
            )}
          >
            <Visit />
          </ScreenBoundary>
        </MemoryRouter>
      </QueryClientProvider>,
    );
    const alert = await screen.findByRole("alert");
    expect(alert.textContent).toContain("This visit could not be opened");
    expect(alert.textContent).toContain("No connection to the Satura server");
    expect(screen.getByRole("link", { name: "Back to jobs" }).getAttribute("href")).toBe("/jobs");
    fireEvent.click(screen.getByRole("button", { name: "Try again" }));
    expect(await screen.findByText("Circuit 1")).toBeTruthy();
    expect(answers.calls).toBe(2);
  });
});
