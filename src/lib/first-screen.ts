import type { QueryClient } from "@tanstack/react-query";
import { useSyncExternalStore } from "react";
import { whenIdle } from "./when-idle.ts";

/** The part of React Router's data router this needs: its state, and word of each change. */
interface RouterState {
  initialized: boolean;
  navigation: { state: string };
}
interface WatchedRouter {
  state: RouterState;
  subscribe: (listener: (state: RouterState) => void) => () => void;
}

/**
 * The longest the first screen is waited for. A screen that polls, or a request that hangs on a
 * bad connection, must not keep the deferred work (the service worker, the panels below the
 * first screenful) away for good.
 */
const FIRST_SCREEN_LIMIT_MS = 15_000;

/**
 * Settled unless `watchFirstScreen` was called: a screen rendered on its own (a unit test) has no
 * first load to wait for, and shows its deferred panels at once.
 */
let settled = true;
const listeners = new Set<() => void>();

function settle(): void {
  if (settled) return;
  settled = true;
  for (const listener of listeners) listener();
}

/**
 * Watches the app's first screen until it is drawn with its data: the router has its screen's
 * scripts and loaders, no query is fetching (the screen's own requests, the refrigerant tables
 * the run log's finding waits for), and then the browser is idle. Work that the first screen does
 * not need waits for this (`afterFirstScreen`, `useFirstScreenSettled`), so that on a slow phone
 * link it never takes bandwidth from what the technician is waiting for. Called once, by main.tsx.
 */
export function watchFirstScreen(router: WatchedRouter, queryClient: QueryClient): void {
  settled = false;
  let cancelIdle: (() => void) | null = null;
  const quiet = () =>
    router.state.initialized && router.state.navigation.state === "idle" && queryClient.isFetching() === 0;
  const check = () => {
    if (settled || cancelIdle || !quiet()) return;
    // Idle once more, then quiet still: the screen has been drawn and its effects (a table the
    // finding needs) have started their requests, or there were none.
    cancelIdle = whenIdle(() => {
      cancelIdle = null;
      if (quiet()) finish();
    }, 2000);
  };
  const stopRouter = router.subscribe(check);
  const stopQueries = queryClient.getQueryCache().subscribe(check);
  const limit = setTimeout(() => finish(), FIRST_SCREEN_LIMIT_MS);
  function finish() {
    stopRouter();
    stopQueries();
    clearTimeout(limit);
    cancelIdle?.();
    settle();
  }
  check();
}

/** Runs `work` once the first screen has settled (at once if it already has). */
export function afterFirstScreen(work: () => void): void {
  if (settled) {
    work();
    return;
  }
  const listener = () => {
    listeners.delete(listener);
    work();
  };
  listeners.add(listener);
}

/**
 * Runs `work` once the first screen has settled and the browser is then idle (or after
 * `timeoutMs` at the latest): for work kept for later (offline use, the toast library), which
 * must never share a slow link with the screen the technician is waiting for.
 *
 * @returns a function that cancels it if it has not run yet
 */
export function whenIdleAfterFirstScreen(work: () => void, timeoutMs: number): () => void {
  let cancelled = false;
  let cancelIdle: (() => void) | null = null;
  afterFirstScreen(() => {
    if (!cancelled) cancelIdle = whenIdle(work, timeoutMs);
  });
  return () => {
    cancelled = true;
    cancelIdle?.();
  };
}

function subscribe(listener: () => void) {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

/** Whether the first screen has settled: true from then on, for the rest of the page's life. */
export function useFirstScreenSettled(): boolean {
  return useSyncExternalStore(subscribe, () => settled);
}
