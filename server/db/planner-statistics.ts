/**
 * Planner statistics for the embedded PostgreSQL. PGlite runs no autovacuum, so nothing ever
 * runs ANALYZE on its own: the planner then guesses table sizes from page counts and default
 * selectivities (it once estimated 65 readings where there were 19 938 and chose its joins
 * accordingly). The server refreshes them after migrations at start-up, after the demo seed and
 * a CSV import (bulk writes), and hourly (PostgreSQL docs, "Updating Planner Statistics",
 * routine-vacuuming.html#VACUUM-FOR-STATISTICS).
 */
import { getTableColumns, is, sql, type SQL } from "drizzle-orm";
import { PgTable } from "drizzle-orm/pg-core";
import type { Database } from "./client.ts";
import * as schema from "./schema.ts";

const ALL_TABLES: readonly PgTable[] = Object.values<unknown>(schema).filter((value): value is PgTable => is(value, PgTable));

/**
 * `table (columns…)` without its JSON columns. Nothing is ever filtered or joined on a stored
 * input or result, yet sampling and sorting them is nearly all of ANALYZE's work: on 28 000
 * readings 3–5 s with them, 0.3 s without (on a loaded 2-core machine), during which the single
 * PGlite connection answers nobody. Row counts (pg_class.reltuples) are gathered either way.
 */
function analyzeTarget(table: PgTable): SQL {
  const columns = Object.values(getTableColumns(table)).filter((column) => column.columnType !== "PgJsonb" && column.columnType !== "PgJson");
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
