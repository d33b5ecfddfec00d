/**
 * `npm run bench:api [-- --dir data/large --seconds 5 --only <name> --cpu-prof <folder>]`: the API
 * at the size of a busy company (issue 16). Starts the real server on the large data set in a
 * child process, signs the demo people in, and measures each GET route a screen calls and saving a
 * reading (bench/api/save-reading.ts), closed-loop through autocannon (bench/api/load.ts) at 1
 * connection (lists also at 10, saving at 10 and 50), then the list routes and saving again on a
 * demo-size database: their ratio shows whether a route's time grows with the rows behind it.
 * Prints the data set, the server's memory idle and under load, what a stored reading costs, and
 * each figure beside its target; a streamed answer (the register's CSV export) also its time to
 * first byte (bench/api/first-byte.ts). Timings on a shared machine are noisy: compare runs, not digits.
 * `--cpu-prof` writes the servers' CPU profiles there (open them in Chrome's DevTools).
 * `--postgres` instead compares saving on PGlite with PostgreSQL behind one and two app servers
 * (bench/api/save-on-postgres.ts), on a throwaway PostgreSQL server it starts and removes.
 *
 * Saving writes readings into the data set: point `--dir` at a copy to keep the original as built.
 */
import { spawnSync } from "node:child_process";
import { existsSync } from "node:fs";
import { cpus, loadavg } from "node:os";
import { resolve } from "node:path";
import { parseArgs } from "node:util";
import { readDataSet, type DataSet } from "./data-set.ts";
import { measureFirstByte, type FirstByteResult } from "./first-byte.ts";
import { runLoad, type LoadResult } from "./load.ts";
import { ROUTES, type BenchRoute, type Person } from "./routes.ts";
import { comparePostgres } from "./save-on-postgres.ts";
import { measureSaving, openVisitsForSaving, type SaveLevel } from "./save-reading.ts";
import { startServer, type BenchServer } from "./server-process.ts";

/** Targets of issue 16. */
const ROUTE_P95_MS = 100;
const SAVE_P95_MS = 50;
const SAVE_TARGET_CONNECTIONS = 50;
/** A list "independent of the number of rows": at most this many times its demo-size median. */
const LIST_RATIO = 2;

const { values } = parseArgs({
  options: {
    dir: { type: "string", default: "data/large" },
    seconds: { type: "string", default: "5" },
    // Repeatable: routes whose name contains any of them (`--only "jobs list" --only "equipment list"`).
    only: { type: "string", multiple: true },
    "skip-demo": { type: "boolean", default: false },
    "cpu-prof": { type: "string" },
    // Saving on PGlite against PostgreSQL behind one and two app servers (bench/api/save-on-postgres.ts).
    postgres: { type: "boolean", default: false },
  },
});
const seconds = Number(values.seconds);

if (values.postgres) {
  if (process.env.TEST_DATABASE_URL) {
    await comparePostgres(seconds);
  } else {
    // A throwaway PostgreSQL server for the run: the same script the tests' PostgreSQL pass uses.
    const run = spawnSync(
      process.execPath,
      ["--import", "tsx", "scripts/with-postgres.ts", process.execPath, "--import", "tsx", ...process.argv.slice(1)],
      { stdio: "inherit", env: { ...process.env, REQUIRE_POSTGRES: "1" } },
    );
    process.exitCode = run.status ?? 1;
  }
  process.exit();
}

const REBUILD = `npm run data:large -- --dir ${values.dir}`;

if (!existsSync(values.dir)) {
  console.error(
    `No data set at ${values.dir}. Build it first (2,000 units, 20,000 visits, one visit of 10,000 readings; a few minutes):\n  ${REBUILD}`,
  );
  process.exit(1);
}

const EMAILS: Record<Person, string> = {
  tech: "tech@bellbird.example",
  senior: "senior@bellbird.example",
  owner: "owner@bellbird.example",
};
const ms = (value: number) => (Number.isFinite(value) ? value.toFixed(value < 10 ? 1 : 0) : "–");
const mb = (bytes: number) => `${(bytes / 1_048_576).toFixed(0)} MB`;
const nameSelected = (name: string) => !values.only || values.only.some((part) => name.includes(part));
const selected = (route: BenchRoute) => nameSelected(route.name);
const SAVE_ROUTE = "save a reading (POST readings)";
const savingSelected = nameSelected(SAVE_ROUTE);
const nodeArgs = values["cpu-prof"] ? ["--cpu-prof", "--cpu-prof-dir", resolve(values["cpu-prof"])] : [];
/** Requests, one at a time, timing a streamed route's first byte. */
const FIRST_BYTE_REQUESTS = 20;
/** Open visits the saves of the demo-size database spread over. */
const DEMO_OPEN_VISITS = 12;

interface Row {
  name: string;
  connections: number;
  result: LoadResult;
  target: string;
  pass: boolean | null;
  /** A streamed route's time to first byte beside its whole answer, at 1 connection. */
  firstByte?: FirstByteResult;
}

async function sessions(server: BenchServer): Promise<Record<Person, string>> {
  return {
    tech: await server.signIn(EMAILS.tech),
    senior: await server.signIn(EMAILS.senior),
    owner: await server.signIn(EMAILS.owner),
  };
}

/** The ETag of a first answer, for the conditional form of a route. */
async function etagOf(server: BenchServer, path: string, cookie: string): Promise<string | undefined> {
  const response = await fetch(`${server.origin}${path}`, { headers: { cookie } });
  await response.arrayBuffer();
  return response.headers.get("etag") ?? undefined;
}

/** Peak resident set while `work` runs, sampled each half second. */
async function withPeakMemory<T>(
  server: BenchServer,
  work: () => Promise<T>,
): Promise<{ value: T; peak: NodeJS.MemoryUsage }> {
  let peak = await server.memory();
  let running = true;
  const sampler = (async () => {
    while (running) {
      await new Promise((resolve) => setTimeout(resolve, 500));
      const now = await server.memory().catch(() => peak);
      if (now.rss > peak.rss) peak = now;
    }
  })();
  const value = await work();
  running = false;
  await sampler;
  return { value, peak };
}

async function measureRoutes(
  server: BenchServer,
  dataSet: DataSet | undefined,
  routes: readonly BenchRoute[],
  levels: (route: BenchRoute) => readonly number[],
): Promise<Row[]> {
  const cookies = await sessions(server);
  const rows: Row[] = [];
  for (const route of routes) {
    const path = route.path(
      dataSet?.ids ?? { equipmentId: "", loggedEquipmentId: "", visitId: "", longVisitId: "", cylinderId: "" },
    );
    const headers: Record<string, string> = { cookie: cookies[route.as] };
    if (route.conditional) {
      const etag = await etagOf(server, path, cookies[route.as]);
      if (etag) headers["if-none-match"] = etag;
    }
    for (const connections of levels(route)) {
      const result = await runLoad({
        origin: server.origin,
        connections,
        seconds,
        maxRequests: 5_000,
        next: () => ({ path, headers }),
        expectStatus: route.conditional ? [304] : [200],
      });
      const firstByte =
        route.streamed && connections === 1
          ? await measureFirstByte(`${server.origin}${path}`, headers, FIRST_BYTE_REQUESTS)
          : undefined;
      // A streamed download (every line of a period) is judged by when it starts: its whole
      // time grows with the lines by design, and is printed beside the first byte.
      const pass =
        connections !== 1 ? null : firstByte ? firstByte.firstByteP95 < ROUTE_P95_MS : result.p95 < ROUTE_P95_MS;
      const target =
        connections !== 1 ? "" : firstByte ? `first byte p95 < ${ROUTE_P95_MS} ms` : `p95 < ${ROUTE_P95_MS} ms`;
      rows.push({ name: route.name, connections, result, target, pass, firstByte });
      process.stdout.write(".");
    }
  }
  return rows;
}

async function saveRows(
  server: BenchServer,
  openVisits: () => Promise<string[]>,
  cookie: string,
): Promise<{ rows: Row[]; levels: SaveLevel[] }> {
  const levels = await measureSaving(server, cookie, await openVisits(), seconds);
  const rows = levels.map(({ connections, result }): Row => {
    const targeted = connections === SAVE_TARGET_CONNECTIONS;
    return {
      name: SAVE_ROUTE,
      connections,
      result,
      target: targeted ? `p95 < ${SAVE_P95_MS} ms` : "",
      pass: targeted ? result.p95 < SAVE_P95_MS : null,
    };
  });
  process.stdout.write(".");
  return { rows, levels };
}

function printRows(rows: readonly Row[]) {
  const header = [
    "route",
    "conn",
    "requests",
    "p50 ms",
    "p95 ms",
    "p99 ms",
    "max ms",
    "req/s",
    "body KB",
    "target",
    "",
  ];
  const lines = rows.map((row) => {
    const unexpected = Object.entries(row.result.unexpected)
      .map(([status, n]) => `${n}×${status}`)
      .join(" ");
    return [
      row.name,
      String(row.connections),
      String(row.result.requests),
      ms(row.result.p50),
      ms(row.result.p95),
      ms(row.result.p99),
      ms(row.result.max),
      row.result.perSecond.toFixed(1),
      (row.result.meanBytes / 1024).toFixed(1),
      row.target,
      (row.pass === null ? "" : row.pass ? "pass" : "MISS") + (unexpected ? ` (unexpected: ${unexpected})` : ""),
    ];
  });
  const widths = header.map((title, column) => Math.max(title.length, ...lines.map((line) => line[column]!.length)));
  const format = (cells: string[]) =>
    cells
      .map((cell, column) =>
        column === 0 || column >= 9 ? cell.padEnd(widths[column]!) : cell.padStart(widths[column]!),
      )
      .join("  ");
  console.log(format(header));
  for (const line of lines) console.log(format(line));
}

/** Streamed routes: when the first bytes arrive, beside the whole answer (the table's times). */
function printFirstBytes(rows: readonly Row[]) {
  const streamed = rows.filter((row) => row.firstByte);
  if (streamed.length === 0) return;
  console.log(
    `\nStreamed answers, ${FIRST_BYTE_REQUESTS} requests one at a time: first byte of the body vs the whole answer (p50 / p95 ms):`,
  );
  for (const { name, firstByte } of streamed) {
    console.log(
      `  ${name.padEnd(30)} headers ${ms(firstByte!.headersP50).padStart(5)}   first byte ${ms(firstByte!.firstByteP50).padStart(5)} / ${ms(firstByte!.firstByteP95).padStart(5)}   whole ${ms(firstByte!.wholeP50).padStart(5)} / ${ms(firstByte!.wholeP95).padStart(5)}`,
    );
  }
}

function printMemory(label: string, memory: NodeJS.MemoryUsage) {
  console.log(
    `  ${label.padEnd(34)} rss ${mb(memory.rss).padStart(7)}  heap used ${mb(memory.heapUsed).padStart(7)} of ${mb(memory.heapTotal).padStart(7)}  external (PGlite's WebAssembly memory, buffers) ${mb(memory.external).padStart(7)}  array buffers ${mb(memory.arrayBuffers).padStart(7)}`,
  );
}

console.log(`Reading the data set at ${values.dir}…`);
const dataSet = await readDataSet(values.dir);
console.log(`Data set ${values.dir} (rebuild: rm -rf ${values.dir} && ${REBUILD}):`);
console.log(
  "  " +
    Object.entries(dataSet.counts)
      .map(([table, n]) => `${table} ${n.toLocaleString("en")}`)
      .join(", ") +
    `; database ${mb(dataSet.databaseBytes)}`,
);
const cost = dataSet.readingCost;
console.log(
  `  a stored reading: ${cost.totalPerReading.toFixed(0)} B on disk (heap ${cost.heapPerReading.toFixed(0)}, TOAST ${cost.toastPerReading.toFixed(0)}, indexes ${cost.indexesPerReading.toFixed(0)}); ` +
    `its result column ${cost.resultStored.toFixed(0)} B stored (${cost.resultText.toFixed(0)} B as JSON text), its input ${cost.inputStored.toFixed(0)} B`,
);
if (cost.packedResults > 0) {
  console.log(
    `  ${cost.packedResults.toLocaleString("en")} of the readings' results are stored packed (decision 030): ${cost.packedResultStored.toFixed(0)} B each`,
  );
}

/** Saving at each level on both databases, with the server's CPU per save: the figure that bounds one process. */
function printSaving(large: readonly SaveLevel[], demo: readonly SaveLevel[]) {
  if (large.length === 0) return;
  console.log(
    `\nSaving a reading (${SAVE_ROUTE}), large data set vs demo size; target p95 < ${SAVE_P95_MS} ms at ${SAVE_TARGET_CONNECTIONS} connections:`,
  );
  console.log(
    "  conn   large: p50 / p95 / p99 ms    saves/s  server CPU/save   demo: p50 / p95 / p99 ms    saves/s  server CPU/save   p95 large/demo",
  );
  for (const level of large) {
    const other = demo.find((candidate) => candidate.connections === level.connections);
    const figures = (one: SaveLevel) =>
      `${[one.result.p50, one.result.p95, one.result.p99].map((value) => ms(value).padStart(5)).join(" / ")}   ${one.result.perSecond.toFixed(0).padStart(7)}  ${one.serverCpuMs.toFixed(2).padStart(10)} ms`;
    const verdict =
      level.connections === SAVE_TARGET_CONNECTIONS ? (level.result.p95 < SAVE_P95_MS ? "  pass" : "  MISS") : "";
    console.log(
      `  ${String(level.connections).padStart(4)}   ${figures(level)}      ${other ? `${figures(other)}     ×${(level.result.p95 / other.result.p95).toFixed(1)}` : "–"}${verdict}`,
    );
  }
}

const large = await startServer(values.dir, {}, nodeArgs);
let rows: Row[] = [];
let largeSaves: SaveLevel[] = [];
let demoSaves: SaveLevel[] = [];
const memoryRows: [string, NodeJS.MemoryUsage][] = [];
try {
  memoryRows.push(["idle after start", await large.memory()]);
  const routes = ROUTES.filter(selected);
  const { value: routeRows, peak: routePeak } = await withPeakMemory(large, () =>
    measureRoutes(large, dataSet, routes, (route) => route.connections),
  );
  rows = routeRows;
  memoryRows.push(["peak under the GET routes", routePeak]);
  if (savingSelected && dataSet.openReadingVisits.length > 0) {
    const cookie = await large.signIn(EMAILS.tech);
    const { value: saved, peak: savePeak } = await withPeakMemory(large, () =>
      saveRows(large, async () => dataSet.openReadingVisits, cookie),
    );
    rows.push(...saved.rows);
    largeSaves = saved.levels;
    memoryRows.push(["peak while saving readings", savePeak]);
  }
  await new Promise((resolve) => setTimeout(resolve, 2_000));
  memoryRows.push(["idle after the load", await large.memory()]);
} finally {
  await large.stop();
}

let ratios: { name: string; demo: number; large: number }[] = [];
if (!values["skip-demo"]) {
  const demo = await startServer("memory://", {}, nodeArgs);
  try {
    const lists = ROUTES.filter((route) => route.list && selected(route));
    const demoRows = await measureRoutes(demo, undefined, lists, () => [1]);
    // A streamed route's figure is its first byte (see measureRoutes); the others', the whole answer.
    const figure = (row: Row) => row.firstByte?.firstByteP50 ?? row.result.p50;
    ratios = demoRows.map((row) => ({
      name: row.name,
      demo: figure(row),
      large: figure(rows.find((candidate) => candidate.name === row.name && candidate.connections === 1)!),
    }));
    if (savingSelected) {
      const cookie = await demo.signIn(EMAILS.tech);
      demoSaves = (await saveRows(demo, () => openVisitsForSaving(demo, cookie, DEMO_OPEN_VISITS), cookie)).levels;
    }
  } finally {
    await demo.stop();
  }
}

console.log("\n\nLatency at the large data set (closed loop, each level for " + `${seconds} s or 5,000 requests):`);
console.log(
  `load average ${loadavg()
    .map((value) => value.toFixed(1))
    .join(" ")} on ${cpus().length} cores (other jobs included)`,
);
printRows(rows);
printFirstBytes(rows);
printSaving(largeSaves, demoSaves);
if (ratios.length > 0) {
  console.log(
    `\nLists at the demo size vs the large data set (p50 at 1 connection, a streamed answer's first byte; target: at most ${LIST_RATIO}× the demo's):`,
  );
  for (const ratio of ratios) {
    const times = ratio.large / ratio.demo;
    console.log(
      `  ${ratio.name.padEnd(30)} demo ${ms(ratio.demo).padStart(6)} ms   large ${ms(ratio.large).padStart(6)} ms   ×${times.toFixed(1).padStart(6)}   ${times <= LIST_RATIO ? "pass" : "MISS"}`,
    );
  }
}
console.log("\nServer memory (one process: Node heap plus PGlite's WebAssembly memory):");
for (const [label, memory] of memoryRows) printMemory(label, memory);
