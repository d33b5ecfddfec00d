// @vitest-environment jsdom
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { act, cleanup, render as renderElement, screen } from "@testing-library/react";
import type { ReactElement } from "react";
import { afterEach, describe, expect, it } from "vitest";
import { offerUpdate } from "@/features/offline/app-update.ts";
import { DeferredConnectionBanners, wantConnectionBanners } from "@/features/offline/deferred-connection-banners.tsx";

/** No one is signed in here, so there is no outbox to count. */
const render = (element: ReactElement) =>
  renderElement(<QueryClientProvider client={new QueryClient()}>{element}</QueryClientProvider>);

function setOnline(online: boolean) {
  Object.defineProperty(navigator, "onLine", { configurable: true, get: () => online });
  act(() => void window.dispatchEvent(new Event(online ? "online" : "offline")));
}

// In the order of a page's life: the module keeps whether the signed-in frame asked for them.
describe("DeferredConnectionBanners", () => {
  afterEach(() => {
    cleanup();
    setOnline(true);
    act(() => offerUpdate(null));
  });

  it("fetches nothing on a public screen with signal", () => {
    const { container } = render(<DeferredConnectionBanners />);
    expect(container.innerHTML).toBe("");
  });

  it("says the device is offline as soon as it is", async () => {
    render(<DeferredConnectionBanners />);
    setOnline(false);
    expect((await screen.findByRole("status")).textContent).toContain("Offline.");
  });

  it("offers a waiting version", async () => {
    render(<DeferredConnectionBanners />);
    act(() => offerUpdate({ apply: () => Promise.resolve() }));
    expect(await screen.findByText("A new version of Satura is ready.")).toBeTruthy();
  });

  it("in the signed-in frame, says nothing while there is nothing to say and tells when the signal goes", async () => {
    render(<DeferredConnectionBanners />);
    act(() => wantConnectionBanners());
    setOnline(false);
    expect((await screen.findByRole("status")).textContent).toContain("Offline.");
    setOnline(true);
    expect(screen.queryByRole("status")).toBeNull();
  });
});
