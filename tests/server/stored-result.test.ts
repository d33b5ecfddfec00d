/**
 * A reading's result is stored packed (server/db/stored-result.ts, README decision 030): its JSON
 * text compressed with a preset dictionary, beside the fields SQL reads. What is read back must
 * be the very result the engine gave (decision 004), whichever way it was packed, and a result
 * stored before packing must still read as it is.
 */
import { createHash } from "node:crypto";
import { readFileSync } from "node:fs";
import { eq, sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { readings } from "@server/db/schema.ts";
import { packResult, RESULT_FIELDS_READ_IN_SQL, unpackResult } from "@server/db/stored-result.ts";
import { diagnoseReading } from "@server/diagnosis/diagnose-on-server.ts";
import type { DiagnosisResult } from "@shared/schemas/diagnosis.ts";
import rawCases from "../fixtures/diagnosis-cases/cases.json" with { type: "json" };
import { DiagnosisCaseFileSchema } from "../fixtures/diagnosis-cases/diagnosis-case-schema.ts";
import { BELLBIRD, seedBellbird, signedIn } from "../setup/demo-accounts.ts";
import { readingStore, startRooftopVisit } from "../setup/stored-readings.ts";
import { createTestApp, type TestApp } from "../setup/test-app.ts";

/** Dictionary 1 as it was first written: readings packed with it need these bytes to be read. */
const DICTIONARY_1_SHA256 = "22528188a7ad12ebaf02c873575a1bc0accfcce0cdfa13b68207102011428bd7";

const cases = DiagnosisCaseFileSchema.parse(rawCases).cases;
/** What a result reads back as through JSON (undefined fields dropped), as jsonb always gave it. */
const asStored = (result: DiagnosisResult) => JSON.parse(JSON.stringify(result)) as DiagnosisResult;
/** The packed form as the database hands it back: parsed from its JSON text. */
const throughJsonb = (result: DiagnosisResult) => JSON.parse(JSON.stringify(packResult(result))) as unknown;

describe("packed results", () => {
  let results: DiagnosisResult[];

  beforeAll(async () => {
    results = await Promise.all(cases.map((worked) => diagnoseReading(worked.input)));
  });

  it("reads back the very result the engine gave, for every worked case", () => {
    for (const result of results) expect(unpackResult(throughJsonb(result))).toEqual(asStored(result));
  });

  it("stores a fraction of the result's JSON", () => {
    for (const result of results)
      expect(JSON.stringify(packResult(result)).length).toBeLessThan(JSON.stringify(result).length / 4);
  });

  it("carries the fields SQL reads, equal to the result's, and no field the result lacks", () => {
    for (const result of results) {
      const packed = throughJsonb(result) as Record<string, unknown>;
      for (const field of RESULT_FIELDS_READ_IN_SQL) expect(packed[field]).toEqual(asStored(result)[field]);
    }
    // A result of an older engine, without chargeDeviation: the upgrade at start-up finds it by that key.
    const { chargeDeviation: _dropped, ...older } = results[0]!;
    expect(throughJsonb(older as DiagnosisResult)).not.toHaveProperty("chargeDeviation");
  });

  it("reads a result stored before results were packed as it is", () => {
    expect(unpackResult(asStored(results[2]!))).toEqual(asStored(results[2]!));
    expect(unpackResult(JSON.stringify(results[2]))).toEqual(asStored(results[2]!));
  });

  it("names the dictionary it was packed with, and refuses one it does not know", () => {
    const packed = throughJsonb(results[0]!) as { packedWith: number };
    expect(packed.packedWith).toBe(1);
    expect(() => unpackResult({ ...packed, packedWith: 999 })).toThrow(/dictionary 999/);
  });

  it("keeps dictionary 1 byte for byte (a dictionary is never edited: add the next one)", () => {
    const bytes = readFileSync(new URL("../../server/db/stored-result-dictionary-1.txt", import.meta.url));
    expect(createHash("sha256").update(bytes).digest("hex")).toBe(DICTIONARY_1_SHA256);
  });
});

describe("packed results in the readings table", () => {
  let testApp: TestApp;

  beforeAll(async () => {
    testApp = await createTestApp();
    await seedBellbird(testApp);
  });
  afterAll(() => testApp.close());

  it("stores a saved reading's result packed and small, and reads it back whole", async () => {
    const technician = await signedIn(testApp.app, BELLBIRD.technician);
    const visitId = await startRooftopVisit(technician, "Stored result check");
    const saved = await technician.post(`/api/visits/${visitId}/readings`).send({
      circuit: 1,
      suctionPressureKPa: 468,
      suctionLineTempC: 12.1,
      liquidPressureKPa: 1685,
      liquidLineTempC: 37,
    });
    expect(saved.status).toBe(201);
    const { id, result } = saved.body.reading as { id: string; result: DiagnosisResult };

    const { rows } = await testApp.database.db.execute<{ packed: boolean; bytes: number }>(
      sql`select result ? 'packed' as packed, pg_column_size(result) as bytes from readings where id = ${id}`,
    );
    expect(rows[0]!.packed).toBe(true);
    expect(rows[0]!.bytes).toBeLessThan(JSON.stringify(result).length / 2);
    const [stored] = await testApp.database.db
      .select({ result: readings.result })
      .from(readings)
      .where(eq(readings.id, id));
    expect(stored!.result).toEqual(result);
  });

  it("reads a plain result, as stored before packing, beside packed ones", async () => {
    const technician = await signedIn(testApp.app, BELLBIRD.technician);
    const visitId = await startRooftopVisit(technician, "Older stored result");
    const store = await readingStore(testApp, visitId);
    const row = store.row(
      {
        refrigerant: "R407C",
        meteringDevice: "txv",
        suctionPressureKPa: 468,
        suctionLineTempC: 12.1,
        liquidPressureKPa: 1685,
        liquidLineTempC: 37,
      },
      new Date(),
    );
    await store.store([row]);
    // As every reading was stored before decision 030: the result's JSON itself.
    await testApp.database.db.execute(
      sql`update readings set result = ${JSON.stringify(row.result)}::jsonb where id = ${row.id}`,
    );
    const [stored] = await testApp.database.db
      .select({ result: readings.result, superheatK: readings.superheatK })
      .from(readings)
      .where(eq(readings.id, row.id));
    expect(stored!.result).toEqual(asStored(row.result));
    expect(stored!.superheatK).toBe(row.result.superheatK);
  });
});
