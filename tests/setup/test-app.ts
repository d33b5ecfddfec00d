import type { Express } from "express";
import type { DestinationStream } from "pino";
import { createApp } from "@server/app.ts";
import type { AuthLimits } from "@server/auth/rate-limits.ts";
import type { DatabaseHandle } from "@server/db/client.ts";
import { readEnv } from "@server/env.ts";
import { createLogger } from "@server/logger.ts";
import { createMailer, type Mailer } from "@server/mail/mailer.ts";
import type { ReadinessCheck } from "@server/routes/readiness.ts";
import type { FakeSmtp } from "@server/mail/fake-smtp.ts";
import { createTestDatabase } from "./test-database.ts";

export interface TestApp {
  app: Express;
  database: DatabaseHandle;
  mailer: Mailer;
  /** The in-process SMTP server that receives every message the app sends. */
  smtp: FakeSmtp;
  close: () => Promise<void>;
}

export interface TestAppOptions {
  /** Extra environment variables, e.g. { OUTBOX_ENABLED: "false" }. */
  env?: Record<string, string>;
  authLimits?: Partial<AuthLimits>;
  /** Where log lines go (at LOG_LEVEL, default info); without it the test app logs nothing. */
  logDestination?: DestinationStream;
  /** What GET /api/ready asks, in place of the database alone. */
  readinessChecks?: (database: DatabaseHandle) => ReadinessCheck[];
  /** Whether the app is stopping (GET /api/ready answers 503). */
  isShuttingDown?: () => boolean;
}

/** The real app in-process over a fresh database, as the server builds it, with a fake SMTP server. */
export async function createTestApp(options: TestAppOptions = {}): Promise<TestApp> {
  const database = await createTestDatabase();
  const env = readEnv({
    NODE_ENV: "test",
    DATA_DIR: "memory://",
    APP_URL: "http://satura.test",
    LOG_LEVEL: options.logDestination ? "info" : "silent",
    ...options.env,
  });
  const logger = createLogger(env, options.logDestination);
  const mailer = await createMailer({ env, db: database.db, logger });
  const app = createApp({
    db: database.db,
    env,
    logger,
    mailer,
    authLimits: options.authLimits,
    // As the server decides it: the run on PostgreSQL goes through every session look-up.
    cacheSessions: database.kind === "pglite",
    readinessChecks: options.readinessChecks?.(database),
    isShuttingDown: options.isShuttingDown,
  });
  return {
    app,
    database,
    mailer,
    smtp: mailer.fakeSmtp!,
    close: async () => {
      await mailer.close();
      await database.close();
    },
  };
}
