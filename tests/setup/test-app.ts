import type { Express } from "express";
import type { DestinationStream } from "pino";
import { createApp } from "@server/app.ts";
import type { AuthLimits } from "@server/auth/rate-limits.ts";
import type { DatabaseHandle } from "@server/db/client.ts";
import { readEnv } from "@server/env.ts";
import { createLogger } from "@server/logger.ts";
import { createMailer, type Mailer } from "@server/mail/mailer.ts";
import type { ReadinessCheck } from "@server/routes/readiness.ts";
import { createPhotoStore } from "@server/photos/create-photo-store.ts";
import type { PhotoStore } from "@server/photos/photo-store.ts";
import { createMailbox, type Mailbox } from "./mailbox.ts";
import { startS3TestStore } from "./photo-stores.ts";
import { createTestDatabase } from "./test-database.ts";

export interface TestApp {
  app: Express;
  database: DatabaseHandle;
  mailer: Mailer;
  /** Every message the app sends, caught by nodemailer's stream transport. */
  mailbox: Mailbox;
  /** Where this app keeps photos: UPLOADS_DIR, or the bucket PHOTO_STORE=s3 names. */
  photoStore: PhotoStore;
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

/** The real app in-process over a fresh database, as the server builds it, with a mailbox for what it sends. */
export async function createTestApp(options: TestAppOptions = {}): Promise<TestApp> {
  const database = await createTestDatabase();
  // TEST_PHOTO_STORE=s3 runs every test that does not pick a store with photos in a bucket of an
  // in-process s3rver: the whole server suite on the other store, unchanged.
  const bucket =
    process.env.TEST_PHOTO_STORE === "s3" && !options.env?.PHOTO_STORE ? await startS3TestStore() : undefined;
  const env = readEnv({
    NODE_ENV: "test",
    DATA_DIR: "memory://",
    APP_URL: "http://satura.test",
    LOG_LEVEL: options.logDestination ? "info" : "silent",
    ...bucket?.env,
    ...options.env,
  });
  const logger = createLogger(env, options.logDestination);
  const mailbox = createMailbox();
  const mailer = createMailer({ env, db: database.db, logger, onCaught: mailbox.receive });
  const photoStore = await createPhotoStore(env.photoStore);
  const app = createApp({
    db: database.db,
    env,
    logger,
    mailer,
    photoStore,
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
    mailbox,
    photoStore,
    close: async () => {
      photoStore.close();
      await mailer.close();
      await database.close();
      await bucket?.close();
    },
  };
}
