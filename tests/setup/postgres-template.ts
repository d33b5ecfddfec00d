/**
 * Vitest global setup: with TEST_DATABASE_URL, migrates a fresh template database once, before any
 * worker starts, and drops it after the run. Without it (PGlite), does nothing.
 */
import { openPostgres } from "@server/db/postgres-client.ts";
import { databaseUrl, dropDatabase, onServer } from "../../scripts/local-servers/postgres-admin.ts";
import { TEMPLATE_DATABASE, testServerUrl } from "./postgres-test-server.ts";

export async function setup(): Promise<void> {
  const serverUrl = testServerUrl();
  if (!serverUrl) return;
  // Always from scratch: a template left by an older run may predate a migration.
  await dropDatabase(serverUrl, TEMPLATE_DATABASE);
  await onServer(serverUrl, `create database ${TEMPLATE_DATABASE}`);
  const handle = await openPostgres({ connectionString: databaseUrl(serverUrl, TEMPLATE_DATABASE), poolSize: 1 });
  await handle.close();
}

export async function teardown(): Promise<void> {
  const serverUrl = testServerUrl();
  if (serverUrl) await dropDatabase(serverUrl, TEMPLATE_DATABASE);
}
