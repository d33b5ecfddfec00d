/**
 * How `server/db/stored-result-dictionary-1.txt` was made (README decision 030). Stored results
 * are compressed with a preset dictionary (server/db/stored-result.ts), text that a result is
 * likely to repeat: the JSON of the engine's results for some of the worked cases
 * (tests/fixtures/diagnosis-cases), chosen one at a time as the result that makes all the worked
 * cases' results pack smallest, the first chosen last (where zlib reaches it most cheaply), as
 * many whole results as fit in 32 KiB (zlib's window: earlier bytes are never used).
 *
 * A dictionary is part of the stored readings' format: every reading packed with it needs it,
 * byte for byte, to be read again. So it is written once and never rewritten: this script
 * refuses to replace an existing file, and tests/server/stored-result.test.ts pins its hash.
 * When the engine's wording has drifted far enough that results compress poorly, build the next
 * version (`--version 2`), teach server/db/stored-result.ts to pack with it and keep reading
 * every older one.
 *
 *   npx tsx scripts/build-stored-result-dictionary.ts --version 2
 */
import { existsSync, readFileSync, writeFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { parseArgs } from "node:util";
import { deflateSync } from "node:zlib";
import { loadAllRefrigerants } from "@shared/engine/index.ts";
import { DiagnosisCaseFileSchema } from "../tests/fixtures/diagnosis-cases/diagnosis-case-schema.ts";
import { diagnoseReading } from "../server/diagnosis/diagnose-on-server.ts";

/** zlib's window: a dictionary longer than this only adds cost. */
const WINDOW_BYTES = 32 * 1024;

const { values } = parseArgs({ options: { version: { type: "string" } } });
if (!values.version || !/^\d+$/.test(values.version))
  throw new Error("--version <n> is required (the next unused dictionary number)");
const target = fileURLToPath(new URL(`../server/db/stored-result-dictionary-${values.version}.txt`, import.meta.url));
if (existsSync(target))
  throw new Error(`${target} exists: a dictionary is never rewritten (readings stored with it need it byte for byte)`);

await loadAllRefrigerants();
const casesFile = fileURLToPath(new URL("../tests/fixtures/diagnosis-cases/cases.json", import.meta.url));
const { cases } = DiagnosisCaseFileSchema.parse(JSON.parse(readFileSync(casesFile, "utf8")));
const results: string[] = [];
for (const worked of cases) results.push(JSON.stringify(await diagnoseReading(worked.input)));
const packedSize = (dictionary: Buffer) =>
  results.reduce((total, text) => total + deflateSync(text, { dictionary }).length, 0);
// Greedy: each step adds the result that makes every worked case's result smallest, placed in
// front of those already chosen (the first chosen, the most useful, stays nearest the end).
const chosen: string[] = [];
const dictionaryOf = (texts: readonly string[]) => Buffer.from(texts.join("\n"), "utf8");
for (;;) {
  let best: { text: string; size: number } | undefined;
  for (const text of results) {
    if (chosen.includes(text) || dictionaryOf([text, ...chosen]).length > WINDOW_BYTES) continue;
    const size = packedSize(dictionaryOf([text, ...chosen]));
    if (!best || size < best.size) best = { text, size };
  }
  if (!best) break;
  chosen.unshift(best.text);
}
const dictionary = dictionaryOf(chosen);
writeFileSync(target, dictionary);
console.log(
  `${target}: ${dictionary.length} bytes, ${chosen.length} results; the worked cases' results pack to ${(packedSize(dictionary) / results.length).toFixed(0)} B on average`,
);
