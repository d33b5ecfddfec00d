/**
 * What the in-process API benches (import, visit poll) share: the real app on an in-memory
 * database seeded with the demo company, listening on a free port with the demo technician signed
 * in, and a logger's CSV file for the demo's R407C rooftop unit. One set-up, so both benches start
 * the same app the same way and their figures compare.
 */
import { createServer } from "node:http";
import type { AddressInfo } from "node:net";
import { createApp } from "../server/app.ts";
import { openDatabase } from "../server/db/client.ts";
import { demoSite } from "../server/db/seed/demo-scenario.ts";
import { seedDemoData } from "../server/db/seed/seed-demo.ts";
import { readEnv } from "../server/env.ts";
import { closeCsvImportPool } from "../server/import/csv-import-pool.ts";
import { createLogger } from "../server/logger.ts";
import { createMailer } from "../server/mail/mailer.ts";
import { createLocalPhotoStore } from "../server/photos/local-photo-store.ts";
import { atmosphericPressureAtAltitude, saturationPressure } from "../shared/engine/index.ts";

export interface DemoApp {
  /** The API's root URL, `http://127.0.0.1:<port>/api`. */
  base: string;
  /** The signed-in technician's session cookie. */
  cookie: string;
  /** Stops the server, the import workers, the mailer and the database. */
  close: () => Promise<void>;
}

export async function startDemoApp(): Promise<DemoApp> {
  const env = readEnv({ NODE_ENV: "test", DATA_DIR: "memory://", LOG_LEVEL: "silent", DEMO_DATA: "false" });
  const database = await openDatabase(env.DATA_DIR);
  await seedDemoData(database.db);
  const logger = createLogger(env);
  const mailer = createMailer({ env, db: database.db, logger });
  const server = createServer(
    createApp({ db: database.db, env, logger, mailer, photoStore: createLocalPhotoStore(env.UPLOADS_DIR) }),
  );
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}/api`;
  const close = async () => {
    await new Promise<void>((resolve) => server.close(() => resolve()));
    await closeCsvImportPool();
    await mailer.close();
    await database.close();
  };
  try {
    const signIn = await fetch(`${base}/auth/sign-in`, {
      method: "POST",
      headers: { "Content-Type": "application/json" },
      body: JSON.stringify({ email: "tech@bellbird.example", password: "bellbird-demo-2026" }),
    });
    const cookie = signIn.headers
      .getSetCookie()
      .map((header) => header.split(";")[0])
      .join("; ");
    return { base, cookie, close };
  } catch (error) {
    await close();
    throw error;
  }
}

const atmosphere = atmosphericPressureAtAltitude(demoSite.altitudeM);

/** The gauge pressure, kPa as the logger writes it, of R407C saturated at `temperatureC` on the demo site. */
export const demoGauge = (temperatureC: number, point: "bubble" | "dew") =>
  (saturationPressure("R407C", temperatureC, point) - atmosphere).toFixed(1);

/** A logger's file of the rooftop unit running steadily, one row a second from `offsetSeconds` past 20:00 UTC. */
export function loggerFile(rows: number, offsetSeconds = 0): string {
  const lines = ["Time,Suction pressure kPa,Suction temp C,Liquid pressure kPa,Liquid temp C,Outdoor C"];
  for (let second = 0; second < rows; second++) {
    const at = new Date(Date.UTC(2026, 10, 30, 20, 0, offsetSeconds + second)).toISOString();
    lines.push(
      `${at},${demoGauge(6, "dew")},${(12 + (second % 50) / 100).toFixed(2)},${demoGauge(42, "bubble")},37,31`,
    );
  }
  return lines.join("\n");
}

/** The import's form for a whole file on circuit 1, in the demo's day (Sydney summer time). */
export function importForm(text: string): FormData {
  const form = new FormData();
  form.append("circuit", "1");
  form.append("dayStart", "2026-12-01T00:00:00+11:00");
  form.append("mode", "all");
  form.append("file", new Blob([text], { type: "text/csv" }), "week.csv");
  return form;
}

/** Opens a visit on a unit through the API. @returns the visit's id */
export async function createVisit(app: DemoApp, equipmentId: string, reason: string): Promise<string> {
  const response = await fetch(`${app.base}/visits`, {
    method: "POST",
    headers: { cookie: app.cookie, "Content-Type": "application/json" },
    body: JSON.stringify({ equipmentId, reason }),
  });
  const created = (await response.json()) as { visit: { id: string } };
  return created.visit.id;
}
