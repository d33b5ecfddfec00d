/**
 * Runs `work` once the browser is idle (or after `timeoutMs` at the latest), so that keeping
 * things for offline use never competes with the screen's own requests and drawing.
 *
 * @returns a function that cancels it if it has not run yet
 */
export function whenIdle(work: () => void, timeoutMs: number): () => void {
  if ("requestIdleCallback" in window) {
    const handle = requestIdleCallback(work, { timeout: timeoutMs });
    return () => cancelIdleCallback(handle);
  }
  const handle = setTimeout(work, Math.min(timeoutMs, 3000));
  return () => clearTimeout(handle);
}
