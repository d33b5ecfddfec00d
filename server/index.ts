/**
 * Satura's server entry: reads the environment, opens and migrates the database (embedded
 * PGlite, or PostgreSQL at DATABASE_URL), loads the demo company when the database is empty,
 * and listens.
 */
import type { Server } from "node:http";
import { loadAllRefrigerants } from "@shared/engine/index.ts";
import { createApp } from "./app.ts";
import { ifLockFree, LOCK_KEYS, withLock } from "./db/advisory-locks.ts";
import { oncePerInterval } from "./db/periodic-jobs.ts";
import { openConfiguredDatabase } from "./db/open-configured-database.ts";
import { deleteExpiredSessions } from "./db/expired-sessions.ts";
import { analyzeChangedTables, analyzeTables } from "./db/planner-statistics.ts";
import { deleteEndedCounters } from "./db/rate-limit-counters.ts";
import { discardStagedReadings, discardStagedReadingsBefore } from "./db/visits.ts";
import { closeCsvImportPool } from "./import/csv-import-pool.ts";
import { seedDemoData } from "./db/seed/seed-demo.ts";
import { upgradeStoredDiagnoses } from "./db/upgrade-stored-diagnoses.ts";
import { readEnv } from "./env.ts";
import { createMailer } from "./mail/mailer.ts";
import { createPhotoStore } from "./photos/create-photo-store.ts";
import { createLogger } from "./logger.ts";

const env = readEnv();
const logger = createLogger(env);
// Every refrigerant's saturation table, before anything judges a reading: the server's lookups
// stay synchronous (the browser loads one refrigerant per screen instead).
await loadAllRefrigerants();

const database = await openConfiguredDatabase(env);
// Only the kind: DATABASE_URL may hold a password.
logger.info(
  database.kind === "postgres" ? "database: PostgreSQL (DATABASE_URL)" : `database: PGlite in ${env.DATA_DIR}`,
);
// Servers starting together take turns here, so the demo is seeded once and nothing is upgraded twice.
await withLock(database.db, LOCK_KEYS.startUp, async (db) => {
  // A CSV import cut off by a stop leaves staged rows that never became readings. PGlite is this
  // process alone, so every staged row is abandoned; another PostgreSQL client may be importing
  // now, so there the hourly purge clears them by age instead.
  if (database.kind === "pglite") await discardStagedReadings(db);
  if (env.DEMO_DATA && (await seedDemoData(db))) {
    logger.info("demo data loaded (Bellbird Mechanical)");
  }
  const upgraded = await upgradeStoredDiagnoses(db);
  if (upgraded > 0) logger.info(`${upgraded} stored reading(s) re-diagnosed in the current result format`);
});
// PGlite has no autovacuum, so the planner's statistics are gathered here after migrations (and
// any seed or upgrade), then every few minutes for the tables that changed enough since (see
// analyzeChangedTables); a failure only leaves older estimates, so it is logged. PostgreSQL's
// autovacuum analyses changed tables by the same rule on its own, so there only the start-up
// refresh runs (cheap, and it covers a seed made moments ago), once across starting servers.
const logStatisticsFailure = (error: unknown) =>
  logger.error({ err: error }, "could not refresh the planner's statistics");
await ifLockFree(database.db, LOCK_KEYS.statistics, (db) => analyzeTables(db)).catch(logStatisticsFailure);
/** Often enough that a day's readings never wait long for fresh estimates; a quiet check is one small query. */
const STATISTICS_CHECK_INTERVAL_MS = 10 * 60 * 1000;
const statisticsTimer =
  database.kind === "pglite"
    ? setInterval(
        () =>
          void ifLockFree(database.db, LOCK_KEYS.statistics, (db) => analyzeChangedTables(db)).catch(
            logStatisticsFailure,
          ),
        STATISTICS_CHECK_INTERVAL_MS,
      )
    : undefined;
statisticsTimer?.unref();

let clientMiddleware;
let closeVite: (() => Promise<void>) | undefined;
if (env.NODE_ENV === "development") {
  // One port in development: Vite serves the client with hot reload beside the API.
  const { createServer } = await import("vite");
  const vite = await createServer({ server: { middlewareMode: true }, appType: "spa" });
  clientMiddleware = vite.middlewares;
  closeVite = () => vite.close();
}

// Real SMTP from SMTP_HOST, else mail is composed and caught in this process (Outbox, MAIL_DROP_DIR).
const mailer = createMailer({ env, db: database.db, logger });
if (!env.SMTP_HOST)
  logger.info(
    `no SMTP_HOST: e-mail is caught, never delivered${env.MAIL_DROP_DIR ? `, and written to ${env.MAIL_DROP_DIR}` : ""}`,
  );

// Photos in a local folder or a bucket (PHOTO_STORE). A store not ready yet is reported, not fatal,
// and never holds up listening: the bucket may come up after the app, and readiness says so meanwhile.
const photoStore = await createPhotoStore(env.photoStore);
void photoStore.check().then(
  () => logger.info(`photos kept in ${photoStore.description}`),
  (error: unknown) => logger.warn({ err: error }, "the photo store is not ready"),
);

let stopping = false;
const app = createApp({
  db: database.db,
  env,
  logger,
  mailer,
  photoStore,
  clientMiddleware,
  // Other app servers may share a PostgreSQL; this process's memory is not the whole picture then.
  cacheSessions: database.kind === "pglite",
  isShuttingDown: () => stopping,
});
const server: Server = app.listen(env.PORT, env.HOST, () => {
  const address = server.address();
  const port = typeof address === "object" && address ? address.port : env.PORT;
  logger.info(`Satura listening on http://localhost:${port}`);
});

// Expired sessions and ended throttle counters are purged at start and hourly; unref so the
// timer never holds the process. On a shared PostgreSQL the purge runs once an hour across all
// app servers: the first whose timer fires in the hour does it, the others skip (periodic-jobs.ts).
const SESSION_PURGE_INTERVAL_MS = 60 * 60 * 1000;
/** An import stages its rows for seconds to minutes; rows an hour old belong to one cut off by a stop. */
const ABANDONED_IMPORT_AGE_MS = 60 * 60 * 1000;
const purgeSessions = () =>
  oncePerInterval(database.db, LOCK_KEYS.purge, SESSION_PURGE_INTERVAL_MS, async (db) => {
    const count = await deleteExpiredSessions(db);
    await deleteEndedCounters(db);
    if (database.kind === "postgres")
      await discardStagedReadingsBefore(db, new Date(Date.now() - ABANDONED_IMPORT_AGE_MS));
    return count;
  })
    .then((count) => count && logger.info({ count }, "expired sessions deleted"))
    .catch((error: unknown) =>
      logger.error({ err: error }, "could not purge expired sessions, throttle counters or abandoned imports"),
    );
void purgeSessions();
const purgeTimer = setInterval(() => void purgeSessions(), SESSION_PURGE_INTERVAL_MS);
purgeTimer.unref();

async function shutdown(signal: string) {
  if (stopping) return;
  stopping = true; // GET /api/ready now answers 503
  logger.info({ signal }, "shutting down");
  // Answer on while a load balancer notices the 503 (SHUTDOWN_DRAIN_MS), then stop taking
  // requests, let those in flight finish, then close the database: PGlite flushes its files, the
  // PostgreSQL pool closes its connections. A hard exit 10 s after the drain if something hangs.
  await new Promise((resolve) => setTimeout(resolve, env.SHUTDOWN_DRAIN_MS));
  const timer = setTimeout(() => process.exit(1), 10_000);
  timer.unref();
  // No refresh or purge may start on a database being closed.
  clearInterval(statisticsTimer);
  clearInterval(purgeTimer);
  await new Promise<void>((resolve) => server.close(() => resolve()));
  await closeVite?.();
  await closeCsvImportPool();
  await mailer.close();
  photoStore.close();
  await database.close();
  process.exit(0);
}
process.on("SIGTERM", () => void shutdown("SIGTERM"));
process.on("SIGINT", () => void shutdown("SIGINT"));
