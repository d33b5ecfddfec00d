import type { Env } from "../env.ts";
import { openDatabase, type DatabaseHandle } from "./client.ts";
import { openPostgres } from "./postgres-client.ts";

/** The database the environment names: PostgreSQL at DATABASE_URL, else PGlite in DATA_DIR. */
export function openConfiguredDatabase(
  env: Pick<Env, "DATABASE_URL" | "DATABASE_POOL_SIZE" | "DATA_DIR">,
): Promise<DatabaseHandle> {
  return env.DATABASE_URL
    ? openPostgres({ connectionString: env.DATABASE_URL, poolSize: env.DATABASE_POOL_SIZE })
    : openDatabase(env.DATA_DIR);
}
