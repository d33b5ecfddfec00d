/**
 * Saving a reading under concurrent users (issue 16): POST /api/visits/:id/readings on the real
 * app (server/app.ts) over an in-memory PGlite with the demo company, from three signed-in demo
 * people on visits of their own on different units, each posting realistic readings in a closed
 * loop (a connection sends its next request when the previous one has answered, as autocannon
 * does). Prints p50/p95/p99 and requests per second at 1, 10 and 50 connections. Target: p95
 * under 50 ms at 50 connections. Figures only; never part of the tests.
 *
 * Run on its own: `npx tsx bench/api/save-reading.ts [seconds per level] [levels, e.g. 1,10,50]`, or call
 * `benchSaveReading()` from the API bench harness.
 */
import { Agent, createServer, request } from "node:http";
import type { AddressInfo } from "node:net";
import { cpus, loadavg } from "node:os";
import { pathToFileURL } from "node:url";
import { createApp } from "../../server/app.ts";
import { openDatabase } from "../../server/db/client.ts";
import { demoSite } from "../../server/db/seed/demo-scenario.ts";
import { seedDemoData } from "../../server/db/seed/seed-demo.ts";
import { readEnv } from "../../server/env.ts";
import { createLogger } from "../../server/logger.ts";
import { createMailer } from "../../server/mail/mailer.ts";
import { atmosphericPressureAtAltitude, saturationPressure } from "../../shared/engine/index.ts";

const PASSWORD = "bellbird-demo-2026";
const PEOPLE = ["tech@bellbird.example", "senior@bellbird.example", "owner@bellbird.example"];

export interface SaveReadingLevel {
  connections: number;
  requests: number;
  /** Answers other than 201. */
  failures: number;
  requestsPerSecond: number;
  p50Ms: number;
  p95Ms: number;
  p99Ms: number;
  maxMs: number;
  /**
   * Process CPU (server and this client together) per request: steadier than the latencies on a
   * shared machine, where they mostly measure the other jobs.
   */
  cpuMsPerRequest: number;
}

export interface SaveReadingOptions {
  connectionLevels?: number[];
  /** Seconds each level runs, after a short warm-up. */
  seconds?: number;
  /** Print a table (default true). */
  print?: boolean;
  /** Called as each measured level starts, after the warm-up (for a profiler). */
  onLevelStart?: (connections: number) => void;
}

interface Unit {
  id: string;
  name: string;
  refrigerant: string;
  circuits: { number: number }[];
}

/** One signed-in person posting to one circuit of one open visit. */
interface Poster {
  cookie: string;
  path: string;
  refrigerant: string;
  circuit: number;
}

const atmosphere = atmosphericPressureAtAltitude(demoSite.altitudeM);
const gauge = (refrigerant: string, temperatureC: number, point: "bubble" | "dew") =>
  Math.round((saturationPressure(refrigerant, temperatureC, point) - atmosphere) * 10) / 10;

/** A run-log reading as the phone sends it, drifting a little from one to the next. */
function readingBody(poster: Poster, sequence: number): string {
  const drift = (sequence % 20) / 20;
  return JSON.stringify({
    circuit: poster.circuit,
    takenAt: new Date(Date.UTC(2026, 11, 2, 8, 0, 0) + sequence * 2000).toISOString(),
    suctionPressureKPa: gauge(poster.refrigerant, 5 + drift, "dew"),
    suctionLineTempC: 11.5 + drift,
    liquidPressureKPa: gauge(poster.refrigerant, 42 - drift, "bubble"),
    liquidLineTempC: 37 - drift / 2,
    dischargeLineTempC: 82 + drift,
    returnAirDryBulbC: 25,
    returnAirWetBulbC: 18,
    supplyAirDryBulbC: 14 + drift,
    outdoorAirDryBulbC: 31,
    compressorAmps: 9.5 + drift,
    runMinutes: 10 + Math.floor(sequence / 30),
  });
}

interface Answer {
  status: number;
  body: string;
  headers: Record<string, string | string[] | undefined>;
}

function send(
  agent: Agent,
  base: URL,
  method: string,
  path: string,
  headers: Record<string, string>,
  body?: string,
): Promise<Answer> {
  return new Promise((resolve, reject) => {
    const req = request(
      {
        agent,
        host: base.hostname,
        port: base.port,
        method,
        path,
        headers: {
          ...headers,
          ...(body ? { "content-type": "application/json", "content-length": String(Buffer.byteLength(body)) } : {}),
        },
      },
      (res) => {
        const chunks: Buffer[] = [];
        res.on("data", (chunk: Buffer) => chunks.push(chunk));
        res.on("end", () =>
          resolve({ status: res.statusCode ?? 0, body: Buffer.concat(chunks).toString("utf8"), headers: res.headers }),
        );
        res.on("error", reject);
      },
    );
    req.on("error", reject);
    req.end(body);
  });
}

const percentile = (sorted: number[], fraction: number) =>
  sorted[Math.min(sorted.length - 1, Math.ceil(fraction * sorted.length) - 1)] ?? NaN;

/**
 * `connections` closed loops for `seconds`, each on its own keep-alive socket, spread over the
 * posters; every answer's time from request to its last byte.
 */
async function closedLoop(
  base: URL,
  posters: Poster[],
  connections: number,
  seconds: number,
  sequence: { next: number },
): Promise<SaveReadingLevel> {
  const latencies: number[] = [];
  let failures = 0;
  const until = performance.now() + seconds * 1000;
  const started = performance.now();
  const cpu = process.cpuUsage();
  await Promise.all(
    Array.from({ length: connections }, async (_, index) => {
      const agent = new Agent({ keepAlive: true, maxSockets: 1 });
      const poster = posters[index % posters.length]!;
      while (performance.now() < until) {
        const body = readingBody(poster, sequence.next++);
        const start = performance.now();
        const answer = await send(
          agent,
          base,
          "POST",
          poster.path,
          { cookie: poster.cookie, origin: base.origin },
          body,
        );
        latencies.push(performance.now() - start);
        if (answer.status !== 201) {
          failures++;
          if (failures <= 3) console.error(`  ${answer.status} ${answer.body.slice(0, 200)}`);
        }
      }
      agent.destroy();
    }),
  );
  const elapsed = (performance.now() - started) / 1000;
  const used = process.cpuUsage(cpu);
  latencies.sort((a, b) => a - b);
  return {
    connections,
    requests: latencies.length,
    failures,
    requestsPerSecond: latencies.length / elapsed,
    p50Ms: percentile(latencies, 0.5),
    p95Ms: percentile(latencies, 0.95),
    p99Ms: percentile(latencies, 0.99),
    maxMs: latencies.at(-1) ?? NaN,
    cpuMsPerRequest: (used.user + used.system) / 1000 / latencies.length,
  };
}

export async function benchSaveReading({
  connectionLevels = [1, 10, 50],
  seconds = 10,
  print = true,
  onLevelStart,
}: SaveReadingOptions = {}): Promise<SaveReadingLevel[]> {
  const env = readEnv({
    NODE_ENV: "test",
    DATA_DIR: "memory://",
    LOG_LEVEL: "silent",
    DEMO_DATA: "false",
    APP_URL: "http://127.0.0.1",
  });
  const database = await openDatabase(env.DATA_DIR);
  await seedDemoData(database.db);
  const logger = createLogger(env);
  const mailer = await createMailer({ env, db: database.db, logger });
  const server = createServer(createApp({ db: database.db, env, logger, mailer }));
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  const base = new URL(`http://127.0.0.1:${(server.address() as AddressInfo).port}`);
  const setupAgent = new Agent({ keepAlive: true });

  try {
    // Each person signs in once (a correct password never counts towards the sign-in throttle).
    const cookies: string[] = [];
    for (const email of PEOPLE) {
      const answer = await send(
        setupAgent,
        base,
        "POST",
        "/api/auth/sign-in",
        { origin: base.origin },
        JSON.stringify({ email, password: PASSWORD }),
      );
      if (answer.status !== 200) throw new Error(`sign-in as ${email}: ${answer.status} ${answer.body}`);
      const setCookie = answer.headers["set-cookie"];
      cookies.push(
        (Array.isArray(setCookie) ? setCookie : [setCookie ?? ""]).map((header) => header.split(";")[0]).join("; "),
      );
    }
    const units = (
      JSON.parse((await send(setupAgent, base, "GET", "/api/equipment", { cookie: cookies[0]! })).body) as {
        equipment: Unit[];
      }
    ).equipment;

    // Every person opens a visit on every unit and posts to each of its circuits: 3 people ×
    // (rooftop 2 circuits + split + cool room) = 12 run logs, as a busy morning would have.
    const posters: Poster[] = [];
    for (const cookie of cookies) {
      for (const unit of units) {
        const answer = await send(
          setupAgent,
          base,
          "POST",
          "/api/visits",
          { cookie, origin: base.origin },
          JSON.stringify({ equipmentId: unit.id, reason: "Load test: quarterly check" }),
        );
        if (answer.status !== 201) throw new Error(`open a visit on ${unit.name}: ${answer.status} ${answer.body}`);
        const visitId = (JSON.parse(answer.body) as { visit: { id: string } }).visit.id;
        for (const circuit of unit.circuits)
          posters.push({
            cookie,
            path: `/api/visits/${visitId}/readings`,
            refrigerant: unit.refrigerant,
            circuit: circuit.number,
          });
      }
    }

    const sequence = { next: 0 };
    await closedLoop(base, posters, 4, 2, sequence); // warm-up: JIT, tables, planner
    const levels: SaveReadingLevel[] = [];
    for (const connections of connectionLevels) {
      onLevelStart?.(connections);
      levels.push(await closedLoop(base, posters, connections, seconds, sequence));
    }

    if (print) {
      console.log(
        `POST /api/visits/:id/readings — demo company (${PEOPLE.length} people, ${posters.length} run logs on ${units.length} units), in-memory PGlite, ${seconds} s per level`,
      );
      console.log(
        `load average ${loadavg()
          .map((value) => value.toFixed(1))
          .join(" ")} on ${cpus().length} cores`,
      );
      console.log("connections   requests  failures    req/s     p50      p95      p99      max   CPU/req");
      for (const level of levels) {
        const ms = (value: number) => `${value.toFixed(1).padStart(7)}`;
        console.log(
          `${String(level.connections).padStart(11)} ${String(level.requests).padStart(10)} ${String(level.failures).padStart(9)} ${level.requestsPerSecond.toFixed(0).padStart(8)} ${ms(level.p50Ms)}  ${ms(level.p95Ms)}  ${ms(level.p99Ms)}  ${ms(level.maxMs)}  ${ms(level.cpuMsPerRequest)}`,
        );
      }
      console.log("(ms; target: p95 under 50 ms at 50 connections)");
    }
    return levels;
  } finally {
    setupAgent.destroy();
    await new Promise<void>((resolve) => server.close(() => resolve()));
    await mailer.close();
    await database.close();
  }
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? "").href) {
  const seconds = Number(process.argv[2] ?? 10);
  const connectionLevels = process.argv[3]?.split(",").map(Number);
  await benchSaveReading({ seconds, connectionLevels });
}
