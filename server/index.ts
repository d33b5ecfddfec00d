/**
 * Satura's server entry: reads the environment, opens and migrates the embedded
 * database, loads the demo company when the database is empty, and listens.
 */
import type { Server } from "node:http";
import { loadAllRefrigerants } from "@shared/engine/index.ts";
import { createApp } from "./app.ts";
import { openDatabase } from "./db/client.ts";
import { deleteExpiredSessions } from "./db/expired-sessions.ts";
import { analyzeChangedTables, analyzeTables } from "./db/planner-statistics.ts";
import { deleteEndedCounters } from "./db/rate-limit-counters.ts";
import { discardStagedReadings } from "./db/visits.ts";
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

const database = await openDatabase(env.DATA_DIR);
// A CSV import cut off by a stop leaves staged rows that never became readings: clear them.
await discardStagedReadings(database.db);
if (env.DEMO_DATA && (await seedDemoData(database.db))) {
  logger.info("demo data loaded (Bellbird Mechanical)");
}
const upgraded = await upgradeStoredDiagnoses(database.db);
if (upgraded > 0) logger.info(`${upgraded} stored reading(s) re-diagnosed in the current result format`);
// PGlite has no autovacuum, so the planner's statistics are gathered here after migrations (and
// any seed or upgrade), then every few minutes for the tables that changed enough since (see
// analyzeChangedTables); a failure only leaves older estimates, so it is logged.
const logStatisticsFailure = (error: unknown) =>
  logger.error({ err: error }, "could not refresh the planner's statistics");
await analyzeTables(database.db).catch(logStatisticsFailure);
/** Often enough that a day's readings never wait long for fresh estimates; a quiet check is one small query. */
const STATISTICS_CHECK_INTERVAL_MS = 10 * 60 * 1000;
const statisticsTimer = setInterval(
  () => void analyzeChangedTables(database.db).catch(logStatisticsFailure),
  STATISTICS_CHECK_INTERVAL_MS,
);
statisticsTimer.unref();

let clientMiddleware;
let closeVite: (() => Promise<void>) | undefined;
if (env.NODE_ENV === "development") {
  // One port in development: Vite serves the client with hot reload beside the API.
  const { createServer } = await import("vite");
  const vite = await createServer({ server: { middlewareMode: true }, appType: "spa" });
  clientMiddleware = vite.middlewares;
  closeVite = () => vite.close();
}

// Real SMTP from SMTP_HOST, else a fake SMTP server inside this process (development, tests).
const mailer = await createMailer({ env, db: database.db, logger });
if (mailer.fakeSmtp) logger.info(`fake SMTP server on ${mailer.fakeSmtp.host}:${mailer.fakeSmtp.port}`);

// Photos in a local folder or a bucket (PHOTO_STORE). A store not ready yet is reported, not fatal,
// and never holds up listening: the bucket may come up after the app, and readiness says so meanwhile.
const photoStore = await createPhotoStore(env.photoStore);
void photoStore.check().then(
  () => logger.info(`photos kept in ${photoStore.description}`),
  (error: unknown) => logger.warn({ err: error }, "the photo store is not ready"),
);

const app = createApp({ db: database.db, env, logger, mailer, photoStore, clientMiddleware });
const server: Server = app.listen(env.PORT, env.HOST, () => {
  const address = server.address();
  const port = typeof address === "object" && address ? address.port : env.PORT;
  logger.info(`Satura listening on http://localhost:${port}`);
});

// Expired sessions and ended throttle counters are purged at start and hourly; unref so the
// timer never holds the process.
const SESSION_PURGE_INTERVAL_MS = 60 * 60 * 1000;
const purgeSessions = () =>
  Promise.all([deleteExpiredSessions(database.db), deleteEndedCounters(database.db)])
    .then(([count]) => count > 0 && logger.info({ count }, "expired sessions deleted"))
    .catch((error: unknown) => logger.error({ err: error }, "could not delete expired sessions or throttle counters"));
void purgeSessions();
const purgeTimer = setInterval(() => void purgeSessions(), SESSION_PURGE_INTERVAL_MS);
purgeTimer.unref();

let stopping = false;
async function shutdown(signal: string) {
  if (stopping) return;
  stopping = true;
  logger.info({ signal }, "shutting down");
  // Stop taking requests, let those in flight finish, then close the database so
  // PGlite flushes its files; a hard exit after 10 s if something hangs.
  const timer = setTimeout(() => process.exit(1), 10_000);
  timer.unref();
  // No refresh or purge may start on a database being closed.
  clearInterval(statisticsTimer);
  clearInterval(purgeTimer);
  await new Promise<void>((resolve) => server.close(() => resolve()));
  await closeVite?.();
  await closeCsvImportPool();
  await mailer.close();
  await database.close();
  process.exit(0);
}
process.on("SIGTERM", () => void shutdown("SIGTERM"));
process.on("SIGINT", () => void shutdown("SIGINT"));
