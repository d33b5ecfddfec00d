/**
 * Builds Intl's date and time data while the first screen's scripts and data are on their way:
 * the first date formatter a page makes costs ≈ 0.25 s on a slow phone's CPU, every later one a
 * few milliseconds, and a visit's screen writes dates in its first render
 * (shared/format/date-time.ts keeps the formatters). Called once the page has asked for its
 * scripts and data; it runs in the next task, before their answers can arrive. An idle callback
 * came later, just as the visit's answer did, and held up the requests that follow it.
 */
export function warmDateFormat(): void {
  setTimeout(() => void new Intl.DateTimeFormat("en-GB", { hour: "2-digit", hourCycle: "h23" }).format(0), 0);
}
