import { eq, sql } from "drizzle-orm";
import { diagnose } from "@shared/engine/index.ts";
import type { DiagnosisInput } from "@shared/schemas/diagnosis.ts";
import { insertReadings, type NewReading } from "@server/db/visits.ts";
import { users } from "@server/db/schema.ts";
import { writeToVisit } from "@server/visits/write-to-visit.ts";
import { BELLBIRD, signedIn } from "./demo-accounts.ts";
import { demoUnitIds, openVisit } from "./demo-units.ts";
import type { TestApp } from "./test-app.ts";

type Agent = Awaited<ReturnType<typeof signedIn>>;

/** Starts a visit on the demo company's R407C rooftop unit (RTU-1) as `agent`; its id. */
export async function startRooftopVisit(agent: Agent, reason: string): Promise<string> {
  return openVisit(agent, (await demoUnitIds(agent)).rooftop, reason);
}

/**
 * Moves the visit's start back to `startedAt`, as if it had been opened then: readings sent with
 * a device time are refused before the visit's start (README decision 026), so a test that logs
 * readings in the past starts its visit before them.
 */
export async function startVisitAt(testApp: TestApp, visitId: string, startedAt: Date): Promise<void> {
  await testApp.database.db.execute(
    sql`update visits set started_at = ${startedAt.toISOString()} where id = ${visitId}`,
  );
}

/**
 * Long run logs without a request per reading: `row` builds a reading of `visitId` judged by the
 * engine (diagnose) as the demo technician's, `store` writes rows under the visit's lock,
 * bumping its revision as every save does.
 */
export async function readingStore(testApp: TestApp, visitId: string) {
  const db = testApp.database.db;
  const [user] = await db.select().from(users).where(eq(users.email, BELLBIRD.technician));
  const organisationId = (
    await db.execute<{ organisation_id: string }>(sql`select organisation_id from visits where id = ${visitId}`)
  ).rows[0]!.organisation_id;
  return {
    row: (input: DiagnosisInput, takenAt: Date, circuit = 1): NewReading => ({
      id: crypto.randomUUID(),
      organisationId,
      visitId,
      circuit,
      takenAt,
      note: null,
      input,
      result: diagnose(input),
      recordedBy: user!.id,
    }),
    store: (rows: NewReading[]) =>
      writeToVisit(db, organisationId, visitId, (tx) => insertReadings(tx, rows, new Map())),
  };
}
