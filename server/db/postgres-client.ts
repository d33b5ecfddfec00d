/**
 * The PostgreSQL server path (DATABASE_URL): node-postgres with a connection pool, migrated from
 * the same drizzle/ folder as PGlite.
 */
import pg from "pg";
import { drizzle } from "drizzle-orm/node-postgres";
import { migrate } from "drizzle-orm/node-postgres/migrator";
import { LOCK_KEYS } from "./advisory-locks.ts";
import { migrationsFolder, type DatabaseHandle } from "./client.ts";
import * as schema from "./schema.ts";

/**
 * node-postgres answers bigint (count(*), sum of integers) as a string, PGlite as a number when it
 * fits: the same query must give the same value on both, so bigints within Number's safe range
 * become numbers here too. The setting is process-wide in pg, which is what we want.
 */
pg.types.setTypeParser(pg.types.builtins.INT8, (value) => {
  const whole = BigInt(value);
  return whole >= BigInt(Number.MIN_SAFE_INTEGER) && whole <= BigInt(Number.MAX_SAFE_INTEGER) ? Number(whole) : value;
});

export interface PostgresOptions {
  connectionString: string;
  /** Most connections this process opens at once. */
  poolSize: number;
}

/** Connects a pool to PostgreSQL and applies every migration not yet run, once across servers. */
export async function openPostgres({ connectionString, poolSize }: PostgresOptions): Promise<DatabaseHandle> {
  const pool = new pg.Pool({ connectionString, max: poolSize });
  // An idle connection the server drops (restart, network) must not crash the process; the pool
  // replaces it on the next checkout.
  pool.on("error", () => {});
  try {
    await migrateOnce(pool);
  } catch (error) {
    await pool.end();
    throw error;
  }
  return {
    kind: "postgres",
    db: drizzle({ client: pool, schema }),
    query: async <Row>(text: string, params?: unknown[]) => (await pool.query(text, params)).rows as Row[],
    withQueryLog: (logQuery) => drizzle({ client: pool, schema, logger: { logQuery } }),
    close: () => pool.end(),
  };
}

/**
 * Migrates on one dedicated connection that holds a session advisory lock: app servers starting
 * together wait for the first, then find nothing left to apply. A session lock is tied to its
 * connection, so the lock and the migration must share it.
 */
async function migrateOnce(pool: pg.Pool): Promise<void> {
  const connection = await pool.connect();
  try {
    await connection.query("select pg_advisory_lock($1)", [LOCK_KEYS.migrations]);
    try {
      await migrate(drizzle({ client: connection, schema }), { migrationsFolder });
    } finally {
      await connection.query("select pg_advisory_unlock($1)", [LOCK_KEYS.migrations]);
    }
  } finally {
    connection.release();
  }
}
