/**
 * What the bench runs on: row counts, the records it names (the long visit, an ordinary visit, a
 * unit, a cylinder, open visits to save readings to) and what a stored reading costs on disk.
 * Read with the project's own database code before the server opens the folder (PGlite takes
 * one process at a time, STACK.md gotcha 6).
 */
import { openDatabase } from "../../server/db/client.ts";
import { LONG_VISIT_REASON } from "../../scripts/grow-demo-data.ts";
import type { BenchIds } from "./routes.ts";

export interface ReadingCost {
  readings: number;
  /** pg_total_relation_size / rows: table, its TOAST and its indexes. */
  totalPerReading: number;
  heapPerReading: number;
  toastPerReading: number;
  indexesPerReading: number;
  /** Mean stored (compressed) size of each JSON column, pg_column_size. */
  resultStored: number;
  inputStored: number;
  /** Mean size of the result column as JSON text, before the database's compression (a packed result's is its envelope). */
  resultText: number;
  /** Readings whose result is stored packed (server/db/stored-result.ts, README decision 030), and their mean stored result. */
  packedResults: number;
  packedResultStored: number;
}

export interface DataSet {
  counts: Record<string, number>;
  ids: BenchIds;
  openReadingVisits: string[];
  readingCost: ReadingCost;
  databaseBytes: number;
}

export async function readDataSet(dataDir: string): Promise<DataSet> {
  const handle = await openDatabase(dataDir);
  try {
    const one = async <T>(query: string) => (await handle.query<T>(query))[0]!;
    const counts: Record<string, number> = {};
    for (const table of [
      "equipment",
      "visits",
      "readings",
      "refrigerant_movements",
      "cylinders",
      "visit_events",
      "customers",
      "sites",
    ]) {
      counts[table] = (await one<{ n: number }>(`select count(*)::int as n from ${table}`)).n;
    }
    const long = await handle.query<{ id: string }>(`select id from visits where reason = $1`, [LONG_VISIT_REASON]);
    const busiest = await one<{ id: string }>(
      `select visit_id as id from readings group by visit_id order by count(*) desc limit 1`,
    );
    const longVisitId = long[0]?.id ?? busiest.id;
    const ordinary = await one<{ id: string }>(
      `select v.id from visits v where v.status = 'signed-off' and exists (select 1 from readings r where r.visit_id = v.id) order by v.started_at desc limit 1`,
    );
    const logged = await one<{ id: string }>(`select equipment_id as id from visits where id = '${longVisitId}'`);
    const unit = await one<{ id: string }>(
      `select equipment_id as id from visits group by equipment_id order by count(*) desc limit 1`,
    );
    const cylinder = await one<{ id: string }>(
      `select cylinder_id as id from refrigerant_movements where cylinder_id is not null group by cylinder_id order by count(*) desc limit 1`,
    );
    const open = await handle.query<{ id: string }>(
      `select v.id from visits v join equipment e on e.id = v.equipment_id where v.status = 'open' and e.refrigerant = 'R407C' and v.id <> $1 order by v.started_at desc`,
      [longVisitId],
    );
    const cost = await one<{
      heap: string;
      toast: string;
      indexes: string;
      total: string;
      result_stored: string;
      input_stored: string;
      result_text: string;
      packed: string;
      packed_stored: string | null;
    }>(`
      select pg_relation_size('readings') as heap,
             coalesce(pg_total_relation_size(nullif(c.reltoastrelid, 0)), 0) as toast,
             pg_indexes_size('readings') as indexes,
             pg_total_relation_size('readings') as total,
             (select avg(pg_column_size(result)) from readings) as result_stored,
             (select avg(pg_column_size(input)) from readings) as input_stored,
             (select avg(octet_length(result::text)) from (select result from readings limit 2000) sample) as result_text,
             (select count(*) from readings where result ? 'packed') as packed,
             (select avg(pg_column_size(result)) from readings where result ? 'packed') as packed_stored
      from pg_class c where c.oid = 'readings'::regclass`);
    const rows = counts.readings!;
    const per = (value: string) => Number(value) / rows;
    const database = await one<{ bytes: string }>(`select pg_database_size(current_database()) as bytes`);
    return {
      counts,
      ids: {
        equipmentId: unit.id,
        loggedEquipmentId: logged.id,
        visitId: ordinary.id,
        longVisitId,
        cylinderId: cylinder.id,
      },
      openReadingVisits: open.map((row) => row.id),
      readingCost: {
        readings: rows,
        totalPerReading: per(cost.total),
        heapPerReading: per(cost.heap),
        toastPerReading: per(cost.toast),
        indexesPerReading: per(cost.indexes),
        resultStored: Number(cost.result_stored),
        inputStored: Number(cost.input_stored),
        resultText: Number(cost.result_text),
        packedResults: Number(cost.packed),
        packedResultStored: Number(cost.packed_stored ?? 0),
      },
      databaseBytes: Number(database.bytes),
    };
  } finally {
    await handle.close();
  }
}
