/**
 * Saving readings on the embedded database against a PostgreSQL server behind one and two app
 * servers (issue 20; docs/deploy.md): the demo company on each, the same load (bench/api/
 * save-reading.ts) at 1, 10 and 50 connections, p50/p95/p99 and saves a second for each.
 *
 * Needs TEST_DATABASE_URL, a PostgreSQL server this may create a database on;
 * `npm run bench:api -- --postgres` starts a throwaway one (scripts/with-postgres.ts) and runs this.
 */
import { databaseUrl, dropDatabase, onServer } from "../../scripts/local-servers/postgres-admin.ts";
import { measureSaving, openVisitsForSaving, type SaveLevel } from "./save-reading.ts";
import { startServer, type BenchServer } from "./server-process.ts";

const TECHNICIAN = "tech@bellbird.example";
/** Open visits the saves spread over, as on the demo-size PGlite run of bench/api/index.ts. */
const OPEN_VISITS = 12;
/** The public address both app servers share behind their (imagined) load balancer. */
const SHARED_APP_URL = "http://satura.bench.test";

interface Setup {
  name: string;
  levels: SaveLevel[];
}

async function measure(servers: BenchServer[], seconds: number): Promise<SaveLevel[]> {
  const cookie = await servers[0]!.signIn(TECHNICIAN);
  const visits = await openVisitsForSaving(servers[0]!, cookie, OPEN_VISITS);
  return measureSaving(servers, cookie, visits, seconds);
}

async function withServers<T>(starts: (() => Promise<BenchServer>)[], work: (servers: BenchServer[]) => Promise<T>) {
  const servers: BenchServer[] = [];
  try {
    // One after the other: the first migrates and loads the demo company, the next finds both done.
    for (const start of starts) servers.push(await start());
    return await work(servers);
  } finally {
    await Promise.all(servers.map((server) => server.stop()));
  }
}

export async function comparePostgres(seconds: number): Promise<void> {
  const serverUrl = process.env.TEST_DATABASE_URL;
  if (!serverUrl) throw new Error("TEST_DATABASE_URL is not set: run through `npm run bench:api -- --postgres`");
  const database = `satura_bench_${process.pid}`;
  const onPostgres = { DATABASE_URL: databaseUrl(serverUrl, database), APP_URL: SHARED_APP_URL };

  const setups: Setup[] = [];
  setups.push({
    name: "PGlite, one app server",
    levels: await withServers([() => startServer("memory://")], (servers) => measure(servers, seconds)),
  });
  process.stdout.write(".");
  for (const count of [1, 2]) {
    await dropDatabase(serverUrl, database);
    await onServer(serverUrl, `create database ${database}`);
    const starts = Array.from({ length: count }, () => () => startServer("memory://", onPostgres));
    setups.push({
      name: `PostgreSQL, ${count === 1 ? "one app server" : "two app servers"}`,
      levels: await withServers(starts, (servers) => measure(servers, seconds)),
    });
    process.stdout.write(".");
  }
  await dropDatabase(serverUrl, database);

  const ms = (value: number) => (Number.isFinite(value) ? value.toFixed(value < 10 ? 1 : 0) : "–");
  console.log(
    `\n\nSaving a reading on the demo company, PGlite against PostgreSQL (closed loop, each level for ${seconds} s; connections spread evenly over the app servers):`,
  );
  console.log("  setup                          conn   p50 / p95 / p99 ms    saves/s   app CPU/save   unexpected");
  for (const setup of setups) {
    for (const { connections, result, serverCpuMs } of setup.levels) {
      const unexpected = Object.entries(result.unexpected)
        .map(([status, n]) => `${n}×${status}`)
        .join(" ");
      console.log(
        `  ${setup.name.padEnd(30)} ${String(connections).padStart(4)}   ${[result.p50, result.p95, result.p99].map((value) => ms(value).padStart(5)).join(" / ")}   ${result.perSecond.toFixed(0).padStart(7)}   ${serverCpuMs.toFixed(2).padStart(8)} ms   ${unexpected}`,
      );
    }
  }
  console.log(
    "  (app CPU: the app servers' own, summed; PostgreSQL's work runs in its own processes and is not in it.)",
  );
}
