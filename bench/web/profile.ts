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
 * Runs in the page: true once the first reading field is enabled and the finding is shown, and
 * stamps that moment (`window.interactiveAt`, ms from navigation) the first time.
 */
export function runLogInteractive(): boolean {
  const label = [...document.querySelectorAll("label")].find((candidate) =>
    candidate.textContent?.trim().startsWith("Suction pressure"),
  );
  const field = label?.control as HTMLInputElement | null | undefined;
  const finding = document.querySelector("[data-testid=charge-state]")?.textContent?.trim();
  const ready = Boolean(field && !field.disabled && finding);
  const stamped = window as unknown as { interactiveAt?: number };
  if (ready) stamped.interactiveAt ??= performance.now();
  return ready;
}
