/**
 * Entry of the CSV import's worker thread (piscina). The server runs TypeScript through tsx,
 * but a worker thread starts without the parent's loader hooks, so it registers tsx's ESM
 * loader itself before importing the TypeScript module that does the work.
 */
import { Piscina } from "piscina";
import { register } from "tsx/esm/api";

register();
const { judgeReadingsCsv } = await import("./readings-csv.ts");
const { prepareRefrigerant } = await import("../diagnosis/diagnose-on-server.ts");

/**
 * Judges the file (with the refrigerant's single-phase table loaded, as every stored reading is
 * judged) and hands the rows' buffer to the server's thread without copying it.
 */
export default async function judge(task) {
  await prepareRefrigerant(task.context.unit.refrigerant);
  const outcome = judgeReadingsCsv(task);
  const buffer = outcome.slices?.[0]?.buffer;
  return buffer ? Piscina.move({ [Piscina.transferableSymbol]: buffer, [Piscina.valueSymbol]: outcome }) : outcome;
}
