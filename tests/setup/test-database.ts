import { PGlite } from "@electric-sql/pglite";
import { attachDatabase, PGLITE_EXTENSIONS, type DatabaseHandle } from "@server/db/client.ts";
import { openPostgres } from "@server/db/postgres-client.ts";
import { databaseUrl, dropDatabase, onServer } from "../../scripts/local-servers/postgres-admin.ts";
import { TEMPLATE_DATABASE, testServerUrl } from "./postgres-test-server.ts";

/** Which database the tests run on: PGlite, or the PostgreSQL server at TEST_DATABASE_URL. */
export const testDatabaseKind: DatabaseHandle["kind"] = testServerUrl() ? "postgres" : "pglite";

/** Connections per test database: a test app's requests overlap only a little. */
const TEST_POOL_SIZE = 4;

// A fresh in-memory PGlite takes ~3 s (WASM initdb) plus migrations, so each test worker
// migrates one template once and every test opens a copy of its dump (~0.5 s).
let template: Promise<File | Blob> | undefined;

async function migratedTemplate(): Promise<File | Blob> {
  const client = await PGlite.create({ extensions: PGLITE_EXTENSIONS });
  const { close } = await attachDatabase(client);
  const dump = await client.dumpDataDir("none");
  await close();
  return dump;
}

let databasesMade = 0;

/** A database name no other worker or test of this run uses. */
const nextDatabaseName = () => `satura_test_${process.pid}_${++databasesMade}`;

/** Opens a PostgreSQL database made by `create`, and drops it on close. */
async function postgresDatabase(serverUrl: string, create: (name: string) => string): Promise<DatabaseHandle> {
  const name = nextDatabaseName();
  await onServer(serverUrl, create(name));
  const handle = await openPostgres({ connectionString: databaseUrl(serverUrl, name), poolSize: TEST_POOL_SIZE });
  return {
    ...handle,
    close: async () => {
      await handle.close();
      await dropDatabase(serverUrl, name);
    },
  };
}

/** A migrated, empty database of its own for one test file or test. */
export async function createTestDatabase(): Promise<DatabaseHandle> {
  const serverUrl = testServerUrl();
  // A copy of the template migrated by the global setup (tests/setup/postgres-template.ts).
  if (serverUrl) return postgresDatabase(serverUrl, (name) => `create database ${name} template ${TEMPLATE_DATABASE}`);
  template ??= migratedTemplate();
  const client = await PGlite.create({ loadDataDir: await template, extensions: PGLITE_EXTENSIONS });
  return attachDatabase(client);
}

/**
 * An empty database with nothing migrated, for the tests of migrating itself: `open` connects
 * and applies the migrations, as a starting server does, and may be called more than once
 * (on PostgreSQL, several at once, as servers starting together).
 */
export async function createEmptyDatabase(): Promise<{
  open: () => Promise<DatabaseHandle>;
  close: () => Promise<void>;
}> {
  const serverUrl = testServerUrl();
  if (!serverUrl) {
    const client = await PGlite.create({ extensions: PGLITE_EXTENSIONS });
    return { open: () => attachDatabase(client), close: () => client.close() };
  }
  const name = nextDatabaseName();
  await onServer(serverUrl, `create database ${name}`);
  const opened: DatabaseHandle[] = [];
  return {
    open: async () => {
      const handle = await openPostgres({ connectionString: databaseUrl(serverUrl, name), poolSize: TEST_POOL_SIZE });
      opened.push(handle);
      return handle;
    },
    close: async () => {
      await Promise.all(opened.map((handle) => handle.close()));
      await dropDatabase(serverUrl, name);
    },
  };
}
