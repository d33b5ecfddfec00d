/**
 * Entry of the CSV import's worker thread (piscina). The server runs TypeScript through tsx,
 * but a worker thread starts without the parent's loader hooks, so it registers tsx's ESM
 * loader itself before importing the TypeScript module that does the work.
 */
import { register } from "tsx/esm/api";

register();
const { judgeReadingsCsv } = await import("./readings-csv.ts");

export default judgeReadingsCsv;
