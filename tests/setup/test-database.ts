import { PGlite } from "@electric-sql/pglite";
import { attachDatabase, PGLITE_EXTENSIONS, type DatabaseHandle } from "@server/db/client.ts";

// A fresh in-memory PGlite takes ~3 s (WASM initdb) plus migrations, so each test worker
// migrates one template once and every test opens a copy of its dump (~0.5 s).
let template: Promise<File | Blob> | undefined;

async function migratedTemplate(): Promise<File | Blob> {
  const { client, close } = await attachDatabase(await PGlite.create({ extensions: PGLITE_EXTENSIONS }));
  const dump = await client.dumpDataDir("none");
  await close();
  return dump;
}

/** A migrated, empty database of its own for one test file or test. */
export async function createTestDatabase(): Promise<DatabaseHandle> {
  template ??= migratedTemplate();
  const client = await PGlite.create({ loadDataDir: await template, extensions: PGLITE_EXTENSIONS });
  return attachDatabase(client);
}
