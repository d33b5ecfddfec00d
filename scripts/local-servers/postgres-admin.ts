/**
 * Making and dropping databases on a PostgreSQL server, for the tests (a copy of the migrated
 * template per test), the two-server test and the bench (a database per run). Scripts' side,
 * not the app's: the app never creates databases.
 */
import pg from "pg";

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
