/**
 * The PostgreSQL side of the tests, used when TEST_DATABASE_URL names a server (see
 * scripts/with-postgres.ts): each test database is a copy of one migrated template, which the
 * global setup builds once per run, so no test waits for migrations and workers never race.
 */
import pg from "pg";

/** The migrated template every test database is copied from. */
export const TEMPLATE_DATABASE = "satura_template";

export const testServerUrl = (): string | undefined => process.env.TEST_DATABASE_URL || undefined;

/** The server's address with another database name in place of the one it names. */
export function databaseUrl(serverUrl: string, database: string): string {
  const url = new URL(serverUrl);
  url.pathname = `/${database}`;
  return url.toString();
}

/** Runs one statement on the server's maintenance database (CREATE and DROP DATABASE cannot run in a pool's transaction). */
export async function onServer(serverUrl: string, statement: string): Promise<void> {
  const client = new pg.Client({ connectionString: serverUrl });
  await client.connect();
  try {
    await client.query(statement);
  } finally {
    await client.end();
  }
}

/** Drops a database even if a connection was left open on it (PostgreSQL 13 and later). */
export const dropDatabase = (serverUrl: string, database: string) =>
  onServer(serverUrl, `drop database if exists ${database} with (force)`);
