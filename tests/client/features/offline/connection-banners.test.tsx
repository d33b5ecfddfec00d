// @vitest-environment jsdom
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { act, cleanup, fireEvent, render as renderElement, screen } from "@testing-library/react";
import type { ReactElement } from "react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { offerUpdate } from "@/features/offline/app-update.ts";
import { ConnectionBanners } from "@/features/offline/connection-banners.tsx";

/** No one is signed in here, so there is no outbox to count. */
const render = (element: ReactElement) =>
  renderElement(<QueryClientProvider client={new QueryClient()}>{element}</QueryClientProvider>);

function setOnline(online: boolean) {
  Object.defineProperty(navigator, "onLine", { configurable: true, get: () => online });
  act(() => void window.dispatchEvent(new Event(online ? "online" : "offline")));
}

describe("ConnectionBanners", () => {
  afterEach(() => {
    cleanup();
    setOnline(true);
    act(() => offerUpdate(null));
  });

  it("shows nothing while online with no update waiting", () => {
    const { container } = render(<ConnectionBanners />);
    expect(container.textContent).toBe("");
  });

  it("says the device is offline while it is, and goes when the network returns", () => {
    render(<ConnectionBanners />);
    setOnline(false);
    expect(screen.getByRole("status").textContent).toContain("Offline.");
    setOnline(true);
    expect(screen.queryByRole("status")).toBeNull();
  });

  it("offers a waiting version, applies it on Reload now, and can be put off", () => {
    const apply = vi.fn(() => Promise.resolve());
    const { unmount } = render(<ConnectionBanners />);
    act(() => offerUpdate({ apply }));
    expect(screen.getByText("A new version of Satura is ready.")).toBeTruthy();
    fireEvent.click(screen.getByRole("button", { name: "Reload now" }));
    expect(apply).toHaveBeenCalledOnce();
    expect(screen.getByRole("button", { name: "Reloading…" })).toHaveProperty("disabled", true);
    unmount();

    render(<ConnectionBanners />);
    fireEvent.click(screen.getByRole("button", { name: "Later" }));
    expect(screen.queryByText("A new version of Satura is ready.")).toBeNull();
  });
});
