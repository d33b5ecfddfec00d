/**
 * Planner statistics for the embedded PostgreSQL. PGlite runs no autovacuum, so nothing ever
 * runs ANALYZE on its own: the planner then guesses table sizes from page counts and default
 * selectivities (it once estimated 65 readings where there were 19 938 and chose its joins
 * accordingly). The server refreshes them after migrations at start-up, after the demo seed and
 * a CSV import (bulk writes), and every few minutes for the tables that changed enough
 * (analyzeChangedTables, PostgreSQL docs, "Updating Planner Statistics",
 * routine-vacuuming.html#VACUUM-FOR-STATISTICS).
 */
import { getTableColumns, getTableName, is, sql, type SQL } from "drizzle-orm";
import { PgTable } from "drizzle-orm/pg-core";
import type { Database } from "./client.ts";
import * as schema from "./schema.ts";

const ALL_TABLES: readonly PgTable[] = Object.values<unknown>(schema).filter((value): value is PgTable =>
  is(value, PgTable),
);

const JSON_TYPES = new Set(["json", "jsonb"]);

/**
 * `table (columns…)` without its JSON columns. Nothing is ever filtered or joined on a stored
 * input or result, yet sampling and sorting them is nearly all of ANALYZE's work: on 28 000
 * readings 3–5 s with them, 0.3 s without (on a loaded 2-core machine), during which the single
 * PGlite connection answers nobody. Row counts (pg_class.reltuples) are gathered either way.
 */
function analyzeTarget(table: PgTable): SQL {
  // By SQL type, so a custom jsonb column (a reading's packed result, server/db/stored-result.ts) is left out too.
  const columns = Object.values(getTableColumns(table)).filter((column) => !JSON_TYPES.has(column.getSQLType()));
  if (columns.length === 0) return sql`${table}`;
  return sql`${table} (${sql.join(
    columns.map((column) => sql.identifier(column.name)),
    sql`, `,
  )})`;
}

/**
 * Runs ANALYZE on the given tables (every table of the schema by default) in one statement.
 *
 * @throws the database's error; callers decide whether a failed refresh matters (it never loses data)
 */
export async function analyzeTables(db: Database, tables: readonly PgTable[] = ALL_TABLES): Promise<void> {
  if (tables.length === 0) return;
  await db.execute(sql`ANALYZE ${sql.join(tables.map(analyzeTarget), sql`, `)}`);
}

/**
 * When a table's statistics are stale: autovacuum's default rule, more rows changed since the last
 * ANALYZE than 50 plus 10 % of the table (PostgreSQL docs, "The Autovacuum Daemon",
 * routine-vacuuming.html#AUTOVACUUM: autovacuum_analyze_threshold 50,
 * autovacuum_analyze_scale_factor 0.1). PGlite keeps the counts (pg_stat_user_tables) but runs no
 * autovacuum to act on them.
 */
export const ANALYZE_THRESHOLD_ROWS = 50;
export const ANALYZE_SCALE_FACTOR = 0.1;

/**
 * Runs ANALYZE on the tables whose statistics are stale, and only those, so a periodic refresh
 * costs one small query while the data is quiet and holds the single connection only for the
 * tables that grew. "Changed" is rows added or removed: the live-row count against the planner's
 * (n_live_tup against reltuples), since n_mod_since_analyze is never reset by an ANALYZE with a
 * column list, which is how analyzeTables leaves out the JSON columns (PostgreSQL's analyze.c
 * reports the reset only for a whole-table ANALYZE). Counts reach pg_stat_user_tables about a
 * second after a write.
 *
 * @returns the names of the tables analysed
 * @throws the database's error, as analyzeTables
 */
export async function analyzeChangedTables(db: Database): Promise<string[]> {
  const { rows } = await db.execute<{ relname: string }>(sql`
    select s.relname from pg_stat_user_tables s join pg_class c on c.oid = s.relid
    where s.schemaname = 'public'
      and abs(s.n_live_tup - greatest(c.reltuples, 0)) > ${ANALYZE_THRESHOLD_ROWS} + ${ANALYZE_SCALE_FACTOR} * greatest(c.reltuples, 0)`);
  const stale = new Set(rows.map((row) => row.relname));
  const tables = ALL_TABLES.filter((table) => stale.has(getTableName(table)));
  await analyzeTables(db, tables);
  return tables.map((table) => getTableName(table));
}
