import { formatTime } from "@shared/format/date-time.ts";
/** A record's time of day, as the void dialog and the lists name it (e.g. "10:42"). */
export const recordTime = (iso: string) => formatTime(iso);
