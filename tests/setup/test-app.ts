import type { Express } from "express";
import { createApp } from "@server/app.ts";
import type { DatabaseHandle } from "@server/db/client.ts";
import { readEnv } from "@server/env.ts";
import { createLogger } from "@server/logger.ts";
import { createTestDatabase } from "./test-database.ts";

export interface TestApp {
  app: Express;
  database: DatabaseHandle;
  close: () => Promise<void>;
}

/** The real app in-process over a fresh database, as the server builds it. */
export async function createTestApp(): Promise<TestApp> {
  const database = await createTestDatabase();
  const env = readEnv({ NODE_ENV: "test", DATA_DIR: "memory://" });
  const app = createApp({ db: database.db, env, logger: createLogger(env) });
  return { app, database, close: database.close };
}
