const formatter = new Intl.DateTimeFormat("en-AU", {
  day: "numeric",
  month: "short",
  year: "numeric",
  hour: "2-digit",
  minute: "2-digit",
});

/** "3 Dec 2026, 09:41" in the viewer's own time zone. */
export function formatTakenAt(iso: string): string {
  return formatter.format(new Date(iso));
}
