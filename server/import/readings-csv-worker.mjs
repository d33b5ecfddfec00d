/**
 * Entry of the CSV import's worker thread (piscina). The server runs TypeScript through tsx,
 * but a worker thread starts without the parent's loader hooks, so it registers tsx's ESM
 * loader itself before importing the TypeScript module that does the work.
 */
import { Piscina } from "piscina";
import { register } from "tsx/esm/api";

register();
const { judgeReadingsCsv } = await import("./readings-csv.ts");

/** Judges the file and hands the rows' buffer to the server's thread without copying it. */
export default function judge(task) {
  const outcome = judgeReadingsCsv(task);
  const buffer = outcome.slices?.[0]?.buffer;
  return buffer ? Piscina.move({ [Piscina.transferableSymbol]: buffer, [Piscina.valueSymbol]: outcome }) : outcome;
}
