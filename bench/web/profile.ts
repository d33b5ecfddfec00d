// Its page.evaluate callbacks run in Chromium, so they are checked against the DOM.
/// <reference lib="dom" />
/// <reference lib="dom.iterable" />
/**
 * The phone the web benches measure on and the page they wait for, in one place for
 * `first-load.ts` and `run-log-timeline.ts`.
 */
import type { BrowserContext, Page } from "playwright-core";

/** Chrome DevTools' "Slow 4G" as the issue states it; throughput in bytes per second. */
export const SLOW_4G = {
  offline: false,
  latency: 400,
  downloadThroughput: (1.6e6 / 8) * 0.9,
  uploadThroughput: (0.75e6 / 8) * 0.9,
};
export const CPU_SLOWDOWN = 4;
export const PHONE_VIEWPORT = { width: 412, height: 915 };

/** The demo visit the run-log figures are taken on: the quarterly check on the server-cupboard split. */
export const DEMO_VISIT_REASON = "Quarterly check of the server cupboard split";

/** Slows the page's CPU and network as a mid-range phone on a poor connection (CDP). */
export async function throttle(context: BrowserContext, page: Page): Promise<void> {
  const cdp = await context.newCDPSession(page);
  await cdp.send("Network.enable");
  await cdp.send("Network.emulateNetworkConditions", SLOW_4G);
  await cdp.send("Emulation.setCPUThrottlingRate", { rate: CPU_SLOWDOWN });
}

/**
 * The id of the visit given for `reason`, found through the jobs list's search with the context's
 * session (a data set of 20,000 visits holds it far past the list's first page).
 */
export async function findVisitByReason(context: BrowserContext, base: string, reason: string): Promise<string> {
  const response = await context.request.get(`${base}/api/visits?q=${encodeURIComponent(reason)}`);
  const { visits } = (await response.json()) as { visits: { id: string; reason: string | null }[] };
  const found = visits.find((visit) => visit.reason === reason);
  if (found) return found.id;
  throw new Error(`the visit "${reason}" is missing`);
}

/** The id of the demo visit, read through the API with the context's session. */
export const findDemoVisit = (context: BrowserContext, base: string): Promise<string> =>
  findVisitByReason(context, base, DEMO_VISIT_REASON);

/**
 * An init script (`page.addInitScript`): watches the page's DOM from its first script and stamps
 * `window.interactiveAt` (ms from navigation) when the first reading field is enabled and the
 * finding is shown. The page is watched from inside so that the harness runs nothing in it
 * until then: Playwright's `waitForFunction` and `evaluate` first inject Playwright's own script
 * into the page, and on the 4× slower CPU compiling it held the main thread for 0.25–0.35 s just
 * as the entry chunk was ready to run.
 */
export function stampRunLogInteractive(): void {
  const stamped = window as unknown as { interactiveAt?: number };
  const observer = new MutationObserver(() => {
    const label = [...document.querySelectorAll("label")].find((candidate) =>
      candidate.textContent?.trim().startsWith("Suction pressure"),
    );
    const field = label?.control as HTMLInputElement | null | undefined;
    const finding = document.querySelector("[data-testid=charge-state]")?.textContent?.trim();
    if (!field || field.disabled || !finding) return;
    stamped.interactiveAt = performance.now();
    observer.disconnect();
  });
  observer.observe(document, { subtree: true, childList: true, attributes: true, characterData: true });
}

/**
 * Waits for the stamp of `stampRunLogInteractive` through the DevTools protocol's own evaluation,
 * which injects nothing into the page; the stamp in ms from navigation.
 */
export async function runLogInteractiveAt(context: BrowserContext, page: Page, timeoutMs = 120_000): Promise<number> {
  const cdp = await context.newCDPSession(page);
  const deadline = Date.now() + timeoutMs;
  try {
    for (;;) {
      const { result } = (await cdp.send("Runtime.evaluate", {
        expression: "window.interactiveAt ?? null",
        returnByValue: true,
      })) as { result: { value: unknown } };
      if (typeof result.value === "number") return result.value;
      if (Date.now() > deadline) throw new Error(`the run log was not interactive after ${timeoutMs} ms`);
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
  } finally {
    await cdp.detach();
  }
}
