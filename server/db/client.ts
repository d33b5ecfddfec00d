import { mkdirSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { PGlite } from "@electric-sql/pglite";
import { drizzle, type PgliteDatabase } from "drizzle-orm/pglite";
import { migrate } from "drizzle-orm/pglite/migrator";
import * as schema from "./schema.ts";

export type Database = PgliteDatabase<typeof schema>;

export interface DatabaseHandle {
  db: Database;
  client: PGlite;
  close: () => Promise<void>;
}

export const migrationsFolder = fileURLToPath(new URL("../../drizzle", import.meta.url));

const MEMORY = "memory://";

/**
 * Opens the embedded PostgreSQL (PGlite) at `dataDir`, or in memory for "memory://",
 * and applies every migration in drizzle/ that has not run yet.
 */
export async function openDatabase(dataDir: string): Promise<DatabaseHandle> {
  // PGlite does not create parent folders and then fails with a misleading
  // "CREATE SCHEMA" error (STACK.md gotcha 5), so make the folder first.
  if (dataDir !== MEMORY) mkdirSync(dataDir, { recursive: true });
  const client = await PGlite.create(dataDir === MEMORY ? undefined : dataDir);
  return attachDatabase(client);
}

/** Wraps an open PGlite in Drizzle and brings its schema up to date. */
export async function attachDatabase(client: PGlite): Promise<DatabaseHandle> {
  const db = drizzle({ client, schema });
  await migrate(db, { migrationsFolder });
  return { db, client, close: () => client.close() };
}
