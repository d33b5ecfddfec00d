/** A record's time of day, as the void dialog and the lists name it (e.g. "10:42"). */
export const recordTime = (iso: string) => new Date(iso).toLocaleTimeString(undefined, { timeStyle: "short" });
