import { mkdirSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { PGlite } from "@electric-sql/pglite";
import { pg_trgm } from "@electric-sql/pglite/contrib/pg_trgm";
import type { Assume } from "drizzle-orm";
import type { PgDatabase, PgQueryResultHKT } from "drizzle-orm/pg-core";
import { drizzle } from "drizzle-orm/pglite";
import { migrate } from "drizzle-orm/pglite/migrator";
import * as schema from "./schema.ts";

/**
 * What a raw `db.execute` answers, on either driver: PGlite's Results and node-postgres'
 * QueryResult both carry the rows as `rows`, and nothing here reads more than that.
 */
export interface QueryResultHKT extends PgQueryResultHKT {
  type: QueryRows<Assume<this["row"], Record<string, unknown>>>;
}

export interface QueryRows<Row> {
  rows: Row[];
}

/**
 * What queries run on: the database or a transaction on it, embedded (PGlite) or a PostgreSQL
 * server (node-postgres). Every query function takes this, so a caller can run several of them in
 * one transaction (e.g. under a visit's row lock).
 */
export type Database = PgDatabase<QueryResultHKT, typeof schema>;

/** An open database, whichever kind: the Drizzle handle, plain SQL for tests and scripts, and close. */
export interface DatabaseHandle {
  kind: "pglite" | "postgres";
  db: Database;
  /** One SQL statement with $1… parameters, answering its rows. */
  query: <Row = Record<string, unknown>>(text: string, params?: unknown[]) => Promise<Row[]>;
  /** Another Drizzle handle on the same connection that reports each query it sends (tests read plans). */
  withQueryLog: (logQuery: QueryLog) => Database;
  close: () => Promise<void>;
}

export type QueryLog = (query: string, params: unknown[]) => void;

export const migrationsFolder = fileURLToPath(new URL("../../drizzle", import.meta.url));

const MEMORY = "memory://";

/**
 * The PostgreSQL extensions the migrations use, which PGlite loads only when asked: pg_trgm for
 * the lists' trigram search indexes (migration list_search). Pass these to every PGlite.create.
 */
export const PGLITE_EXTENSIONS = { pg_trgm };

/**
 * Opens the embedded PostgreSQL (PGlite) at `dataDir`, or in memory for "memory://",
 * and applies every migration in drizzle/ that has not run yet.
 */
export async function openDatabase(dataDir: string): Promise<DatabaseHandle> {
  // PGlite does not create parent folders and then fails with a misleading
  // "CREATE SCHEMA" error (STACK.md gotcha 5), so make the folder first.
  if (dataDir !== MEMORY) mkdirSync(dataDir, { recursive: true });
  const client = await PGlite.create(dataDir === MEMORY ? undefined : dataDir, { extensions: PGLITE_EXTENSIONS });
  return attachDatabase(client);
}

/** Wraps an open PGlite in Drizzle and brings its schema up to date. */
export async function attachDatabase(client: PGlite): Promise<DatabaseHandle> {
  const db = drizzle({ client, schema });
  await migrate(db, { migrationsFolder });
  return {
    kind: "pglite",
    db,
    query: async <Row>(text: string, params?: unknown[]) => (await client.query<Row>(text, params)).rows,
    withQueryLog: (logQuery) => drizzle({ client, schema, logger: { logQuery } }),
    close: () => client.close(),
  };
}
