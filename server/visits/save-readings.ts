/**
 * Saving run-log readings with group commit. The embedded database answers one statement at a
 * time, so a save's cost is its number of statements: fifteen each (session, visit, unit, site,
 * charge record, lock, insert, names, crew, calibration checks, begin, commit) held fifty
 * technicians to about a hundred saves a second, each waiting seconds behind the others.
 *
 * Saves that arrive while a batch is being written wait for the next one, which also waits for the
 * saves still on their way in while they keep coming (MAX_GATHER_MS at most); each batch is one
 * transaction of a fixed number of statements whatever its size: the visits' rows locked in id
 * order and checked (README decision 012), the units' nameplates, sites and charge records read
 * once, every reading judged, one insert, one crew insert, one check for a weigh-in awaiting its
 * reference. A save arriving alone is written at once, as before.
 *
 * Each save keeps its own answer: a closed visit (409), another company's visit (404), a wrong
 * circuit, bad values or a device time out of bounds (400) refuse that save only, inside the batch.
 * A save naming a client id the visit already holds (README decision 026) is answered with the
 * reading stored first, before the visit's status is checked, and stores nothing; two saves with
 * one client id in one batch store one reading and both get it. Should the transaction
 * itself fail, its saves are written again one by one, so one save's failure never loses or fails
 * the others.
 */
import { randomUUID } from "node:crypto";
import { performance } from "node:perf_hooks";
import type { z, ZodSafeParseResult } from "zod";
import type { DiagnosisInput } from "@shared/schemas/diagnosis.ts";
import type { Reading, ReadingBodySchema } from "@shared/schemas/visits.ts";
import { circuitsAwaitingWeighInReference } from "../db/charge-references.ts";
import type { Database } from "../db/client.ts";
import type { People } from "../db/people.ts";
import { unitsForReadings } from "../db/reading-contexts.ts";
import { insertReadings, joinCrews, readingsByClientId, toReading, type NewReading } from "../db/visits.ts";
import { peopleById } from "../db/people.ts";
import type { StoredEntry } from "../db/store-once.ts";
import { diagnoseReading } from "../diagnosis/diagnose-on-server.ts";
import { HttpError, notFound } from "../http/http-error.ts";
import { requireWritableVisit } from "../http/require-writable-visit.ts";
import { calibrateAfterWeighIn } from "./calibrate-after-weigh-in.ts";
import { requireDeviceTime } from "./device-entry.ts";
import { readingInput } from "./reading-input.ts";
import { bumpVisitRevisions, lockVisits } from "./write-to-visit.ts";

/** One save as the route hands it over: who, which visit, and the body as parsed at the boundary. */
export interface ReadingSave {
  organisationId: string;
  visitId: string;
  user: { id: string; name: string };
  /** The body's parse: a refusal is answered after the visit's own checks, as before (404, 409, then 400). */
  body: ZodSafeParseResult<z.infer<typeof ReadingBodySchema>>;
  /** Called when the save is answered with a reading an earlier send of its client id stored. */
  onReplayed?: () => void;
}

interface Pending {
  save: ReadingSave;
  /** When the save arrived: its time when the body gives none, so readings keep their order. */
  arrivedAt: Date;
  resolve: (stored: StoredEntry<Reading>) => void;
  reject: (error: unknown) => void;
}

/** Enough to take a full room of technicians in one transaction; more wait for the next. */
const MAX_BATCH = 200;

/**
 * How long a batch may wait for saves still on their way through the request pipeline (body,
 * session, parse). A batch waits only while saves keep arriving: it starts after the first turn
 * of the event loop that brought none (so a lone save waits one turn, as before), when it is
 * full, or after this long. Without it, fifty technicians' saves went in batches of one to four:
 * a batch's statements run in one turn, so the saves that came meanwhile were still being read
 * when the next batch started, and each batch costs the same statements whatever its size.
 */
const MAX_GATHER_MS = 10;

export interface ReadingSaverOptions {
  /** The longest a batch waits for saves still arriving (MAX_GATHER_MS unless a test needs another). */
  maxGatherMs?: number;
}

/** @returns save(), which resolves to the stored reading or rejects with that save's own refusal. */
export function createReadingSaver(
  db: Database,
  { maxGatherMs = MAX_GATHER_MS }: ReadingSaverOptions = {},
): (save: ReadingSave) => Promise<Reading> {
  const queue: Pending[] = [];
  let writing = false;
  let lastArrival = 0;

  /** Waits a turn at a time while saves keep arriving, then writes a batch. */
  function gather(since: number, seen: number): void {
    setImmediate(() => {
      if (queue.length > seen && queue.length < MAX_BATCH && performance.now() - since < maxGatherMs)
        return gather(since, queue.length);
      // Nothing waits on the batch: writeBatch answers each save's own promise, failures included.
      void write();
    });
  }

  async function write(): Promise<void> {
    try {
      await writeBatch(db, queue.splice(0, MAX_BATCH));
    } finally {
      // Saves that came while this batch was written start the next one.
      if (queue.length > 0) gather(performance.now(), queue.length);
      else writing = false;
    }
  }

  return (save) =>
    new Promise<Reading>((resolve, reject) => {
      // A millisecond apart at least: readings without a time of their own, stored in one
      // transaction, still sort in the order they arrived (the run log orders by time).
      lastArrival = Math.max(Date.now(), lastArrival + 1);
      const answer = ({ entry, replayed }: StoredEntry<Reading>) => {
        if (replayed) save.onReplayed?.();
        resolve(entry);
      };
      queue.push({ save, arrivedAt: new Date(lastArrival), resolve: answer, reject });
      if (writing) return;
      writing = true;
      gather(performance.now(), queue.length);
    });
}

type Outcome = { stored: StoredEntry<Reading> } | { error: unknown };

/** Writes a batch, then answers each save; one by one if the batch's transaction failed. */
async function writeBatch(db: Database, batch: Pending[]): Promise<void> {
  let outcomes: Outcome[];
  try {
    outcomes = await db.transaction((tx) => saveTogether(tx, batch));
  } catch (error) {
    if (batch.length === 1) {
      outcomes = [{ error }];
    } else {
      outcomes = [];
      for (const pending of batch) {
        try {
          outcomes.push(...(await db.transaction((tx) => saveTogether(tx, [pending]))));
        } catch (alone) {
          outcomes.push({ error: alone });
        }
      }
    }
  }
  batch.forEach((pending, index) => {
    const outcome = outcomes[index] ?? { error: new Error("writeBatch requires one outcome per save") };
    if ("stored" in outcome) pending.resolve(outcome.stored);
    else pending.reject(outcome.error);
  });
}

/**
 * One transaction for the whole batch; a save's refusal is its outcome, not a thrown error, so it
 * rolls back nothing of the others. Outcomes are in the batch's order.
 */
async function saveTogether(tx: Database, batch: Pending[]): Promise<Outcome[]> {
  const organisationIds = [...new Set(batch.map(({ save }) => save.organisationId))];
  const locked = new Map(
    (await lockVisits(tx, [...new Set(batch.map(({ save }) => save.visitId))])).map((visit) => [visit.id, visit]),
  );
  const units = await unitsForReadings(tx, organisationIds, [
    ...new Set([...locked.values()].map((visit) => visit.equipmentId)),
  ]);

  // Readings the visits already hold under a client id a save names: those saves are repeats.
  const held = await readingsByClientId(
    tx,
    batch.flatMap(({ save }) =>
      save.body.success ? [{ visitId: save.visitId, clientId: save.body.data.clientId }] : [],
    ),
  );
  const heldByKey = new Map(held.map((row) => [`${row.visitId}:${row.clientId}`, row]));
  const heldPeople = await peopleById(
    tx,
    held.flatMap((row) => [row.recordedBy, row.voidedBy]),
  );

  const outcomes: Outcome[] = [];
  const rows: { index: number; row: NewReading }[] = [];
  /** Saves repeating a client id an earlier save of this batch stores: the index of that save. */
  const sameAs = new Map<number, number>();
  const claimed = new Map<string, number>();
  for (const [index, { save, arrivedAt }] of batch.entries()) {
    try {
      const visit = locked.get(save.visitId);
      if (!visit || visit.organisationId !== save.organisationId) throw notFound("Visit");
      const clientId = save.body.success ? save.body.data.clientId : undefined;
      const key = clientId ? `${visit.id}:${clientId}` : undefined;
      const first = key ? heldByKey.get(key) : undefined;
      if (first) {
        outcomes.push({ stored: { entry: toReading(first, heldPeople), replayed: true } });
        continue;
      }
      const earlier = key ? claimed.get(key) : undefined;
      if (earlier !== undefined) {
        sameAs.set(index, earlier);
        outcomes.push({ error: undefined }); // replaced by the earlier save's reading once stored
        continue;
      }
      requireWritableVisit(visit.status);
      if (!save.body.success) throw save.body.error;
      const { circuit, takenAt, note, clientId: _clientId, ...measured } = save.body.data;
      requireDeviceTime("takenAt", takenAt, visit);
      const unit = units.get(visit.equipmentId);
      if (!unit || unit.organisationId !== save.organisationId) throw notFound("Equipment");
      const context = unit.context(circuit);
      if (!context)
        throw new HttpError(400, "Some fields need attention", {
          circuit: `${unit.name} has ${unit.circuits.length} circuit(s)`,
        });
      const parsed = readingInput(measured, context);
      if (!parsed.success) throw parsed.error;
      const input: DiagnosisInput = parsed.data;
      const result = await diagnoseReading(input);
      rows.push({
        index,
        row: {
          id: randomUUID(),
          organisationId: save.organisationId,
          visitId: visit.id,
          circuit,
          takenAt: takenAt ? new Date(takenAt) : arrivedAt,
          note: note || null,
          input,
          result,
          recordedBy: save.user.id,
          clientId: clientId ?? null,
        },
      });
      if (key) claimed.set(key, index);
      outcomes.push({ error: undefined }); // replaced by the reading once stored
    } catch (error) {
      outcomes.push({ error });
    }
  }
  if (rows.length === 0) return outcomes;

  const people: People = new Map(batch.map(({ save }) => [save.user.id, save.user]));
  await bumpVisitRevisions(tx, [...new Set(rows.map(({ row }) => row.visitId))]);
  const stored = await insertReadings(
    tx,
    rows.map(({ row }) => row),
    people,
  );
  rows.forEach(({ index }, position) => {
    const entry = stored[position];
    // Thrown inside the transaction: the batch rolls back and each save is tried alone.
    if (!entry) throw new Error("insertReadings returned fewer readings than it was given");
    outcomes[index] = { stored: entry };
  });
  for (const [index, earlier] of sameAs) {
    const outcome = outcomes[earlier];
    if (outcome)
      outcomes[index] = "stored" in outcome ? { stored: { entry: outcome.stored.entry, replayed: true } } : outcome;
  }
  // Whoever records something on a visit is on its crew.
  const crew = new Map(
    rows.map(({ row }) => [`${row.visitId}:${row.recordedBy}`, { visitId: row.visitId, userId: row.recordedBy }]),
  );
  await joinCrews(tx, [...crew.values()]);

  // After a full weigh-in, the first settled window becomes the circuit's reference point; the
  // cheap check first, so the run log is read only where a weigh-in still awaits its reference.
  const awaiting = await circuitsAwaitingWeighInReference(tx, organisationIds, [
    ...new Set(rows.map(({ row }) => row.visitId)),
  ]);
  for (const { visitId, circuit } of awaiting) {
    const last = rows.findLast(({ row }) => row.visitId === visitId && row.circuit === circuit)?.row;
    if (!last) continue;
    await calibrateAfterWeighIn(tx, last.organisationId, {
      visitId,
      equipmentId: locked.get(visitId)!.equipmentId,
      circuit,
      actorId: last.recordedBy,
    });
  }
  return outcomes;
}
