// Its page.evaluate callbacks run in Chromium, so they are checked against the DOM.
/// <reference lib="dom" />
/// <reference lib="dom.iterable" />
/**
 * `npm run bench:web`: what the browser downloads, and how soon the run log answers on a phone.
 * The npm script builds the client first (`vite build`); this starts the production server on an
 * in-memory database with the demo company (BENCH_WEB_PORT, default 3214) and opens pages in
 * Debian's Chromium (CHROMIUM_PATH), each in a fresh context (empty cache):
 *
 * - first-load JS of each screen a technician or a reviewer opens first (sign-in, Today, jobs,
 *   equipment, the run log and the report of the demo visit — the quarterly check on the
 *   server-cupboard split — and the review queue): every script the browser asked for until
 *   the page was ready (what fetched after that, until the network is idle, is shown apart), sized as the built files compress with gzip and
 *   brotli (node:zlib, level 9 and 11), with the number of files and how many refrigerant tables
 *   were among them; and the stylesheets and fonts beside them;
 * - the run log on a throttled phone profile (CDP: CPU 4× slower, "Slow 4G" ≈ 400 ms RTT,
 *   1.6 Mbit/s down, 0.75 Mbit/s up): milliseconds from navigation to interactive, that is the
 *   first reading field enabled and the finding shown (median of RUNS); on a first load (empty
 *   cache, on a new browser profile on disk) and when the same phone opens it again (scripts from
 *   the service worker's precache, compiled code kept by the profile);
 *   and the first load of the logger's visit of 10,000 readings when the large data set is there
 *   (BENCH_WEB_DIR, default data/large: `npm run data:large`).
 *
 * Targets beside each figure. Figures only, never a pass/fail test; the machine is shared, so
 * timings are noisy. `bench/web/run-log-timeline.ts` shows where one throttled load spends its time.
 */
import { existsSync, readFileSync } from "node:fs";
import { loadavg } from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { brotliCompressSync, constants, gzipSync } from "node:zlib";
import type { Browser, BrowserContext, Page } from "playwright-core";
import { LONG_VISIT_REASON } from "../../scripts/grow-demo-data.ts";
import { launchBrowser, launchProfile, signedInContext, startServer } from "../browser/launch.ts";
import {
  CPU_SLOWDOWN,
  PHONE_VIEWPORT,
  SLOW_4G,
  findDemoVisit,
  findVisitByReason,
  runLogInteractiveAt,
  stampRunLogInteractive,
  throttle,
} from "./profile.ts";

const RUNS = Number(process.env.BENCH_WEB_RUNS ?? 3);
const DIST = fileURLToPath(new URL("../../dist", import.meta.url));
/** Targets in kB compressed (issue 16), with one refrigerant's table on the run log. */
const TARGETS_KB: Record<string, number> = { "sign-in": 120, "run log": 250 };
const INTERACTIVE_TARGET_MS = 3000;
const LOGGER_TARGET_MS = 5000;

interface Sizes {
  files: string[];
  raw: number;
  gzip: number;
  brotli: number;
}

/** The built files behind the URLs, compressed as a server would send them. */
function sizesOf(urls: string[]): Sizes {
  const files = [...new Set(urls.map((url) => decodeURIComponent(new URL(url).pathname)))];
  let raw = 0;
  let gzip = 0;
  let brotli = 0;
  for (const file of files) {
    const body = readFileSync(path.join(DIST, file));
    raw += body.length;
    gzip += gzipSync(body, { level: 9 }).length;
    brotli += brotliCompressSync(body, { params: { [constants.BROTLI_PARAM_QUALITY]: 11 } }).length;
  }
  return { files, raw, gzip, brotli };
}

/**
 * Records every script, stylesheet and font the page fetches; scripts asked for once the screen
 * is ready (`ready` set) are kept apart: those are the idle-time fetches — the refrigerant tables
 * of the company's units and the day's data kept for offline use (decision 027), the toast
 * library — which no screen waits for.
 */
function recordAssets(page: Page): {
  scripts: string[];
  afterReady: string[];
  styles: string[];
  fonts: string[];
  ready: boolean;
} {
  const assets = {
    scripts: [] as string[],
    afterReady: [] as string[],
    styles: [] as string[],
    fonts: [] as string[],
    ready: false,
  };
  page.on("request", (request) => {
    const type = request.resourceType();
    if (type === "script") (assets.ready ? assets.afterReady : assets.scripts).push(request.url());
    else if (type === "stylesheet") assets.styles.push(request.url());
    else if (type === "font") assets.fonts.push(request.url());
  });
  return assets;
}

const kb = (bytes: number) => `${(bytes / 1024).toFixed(1)} KB`;
const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)]!;
const load = () =>
  loadavg()
    .map((value) => value.toFixed(1))
    .join(" ");

/** Opens `url` in a new page of `context` on the throttled phone; ms from navigation to interactive. */
async function throttledRunLog(context: BrowserContext, url: string): Promise<number> {
  const page = await context.newPage();
  await throttle(context, page);
  await page.addInitScript(stampRunLogInteractive);
  await page.goto(url, { waitUntil: "commit" });
  const interactiveAt = await runLogInteractiveAt(context, page);
  await page.close();
  return interactiveAt;
}

/**
 * The run log of the large data set's logger visit (10,000 readings), first load on the throttled
 * phone, on a server of its own over BENCH_WEB_DIR (default data/large, as `bench:api`); skipped,
 * saying how to build it, when there is none.
 */
async function timeLoggerVisit(browser: Browser, summary: (times: number[]) => string): Promise<void> {
  const dir = process.env.BENCH_WEB_DIR ?? "data/large";
  if (!existsSync(dir)) {
    console.log(
      `  logger's visit (10,000 readings): no data set at ${dir}; build it with  npm run data:large -- --dir ${dir}`,
    );
    return;
  }
  const large = await startServer(Number(process.env.BENCH_WEB_PORT ?? 3214) + 1, dir);
  try {
    const signedIn = await signedInContext(browser, large.base, { viewport: PHONE_VIEWPORT });
    const logger = await findVisitByReason(signedIn, large.base, LONG_VISIT_REASON);
    const state = await signedIn.storageState();
    await signedIn.close();
    const times: number[] = [];
    for (let run = 0; run < RUNS; run++) {
      const context = await browser.newContext({ viewport: PHONE_VIEWPORT, storageState: state });
      times.push(await throttledRunLog(context, `${large.base}/visits/${logger}`));
      await context.close();
    }
    console.log(
      `  logger's visit (10,000 readings, ${dir}), first load: ${summary(times)}   target < ${LOGGER_TARGET_MS} ms; load average ${load()}`,
    );
  } finally {
    large.stop();
  }
}

const server = await startServer(Number(process.env.BENCH_WEB_PORT ?? 3214));
try {
  const browser = await launchBrowser();
  const signedIn = await signedInContext(browser, server.base, { viewport: PHONE_VIEWPORT });
  const demoVisit = await findDemoVisit(signedIn, server.base);
  const state = await signedIn.storageState();
  await signedIn.close();

  const heading = (page: Page) => page.getByRole("heading", { level: 1 }).first().waitFor({ timeout: 60_000 });
  const pages: { name: string; path: string; signedIn: boolean; ready: (page: Page) => Promise<unknown> }[] = [
    { name: "sign-in", path: "/sign-in", signedIn: false, ready: (page) => page.getByLabel("E-mail").waitFor() },
    { name: "today", path: "/", signedIn: true, ready: heading },
    { name: "jobs", path: "/jobs", signedIn: true, ready: heading },
    { name: "equipment", path: "/equipment", signedIn: true, ready: heading },
    {
      name: "run log",
      path: `/visits/${demoVisit}`,
      signedIn: true,
      ready: (page) => runLogInteractiveAt(page.context(), page, 60_000),
    },
    { name: "review", path: "/jobs?status=awaiting-review", signedIn: true, ready: heading },
    { name: "report", path: `/visits/${demoVisit}/report`, signedIn: true, ready: heading },
  ];

  console.log(`first-load JS (built files, compressed; fresh cache) — ${server.base}; load average ${load()}`);
  for (const target of pages) {
    const context = await browser.newContext({
      viewport: PHONE_VIEWPORT,
      ...(target.signedIn ? { storageState: state } : {}),
    });
    const page = await context.newPage();
    const assets = recordAssets(page);
    await page.addInitScript(stampRunLogInteractive); // the run log's readiness (other screens never stamp)
    await page.goto(`${server.base}${target.path}`);
    await target.ready(page);
    assets.ready = true;
    await page.waitForLoadState("networkidle");
    const sizes = sizesOf(assets.scripts);
    const idle = sizesOf(assets.afterReady.filter((url) => !assets.scripts.includes(url)));
    const css = sizesOf(assets.styles);
    const tables = sizes.files
      .filter((file) => /\/refrigerant-R[^/]*$/.test(file))
      .map((file) => path.basename(file).replace(/-[\w-]{8}\.js$/, ""));
    const singlePhase = sizes.files.filter((file) => /\/single-phase-/.test(file)).length;
    const limit = TARGETS_KB[target.name];
    console.log(
      `  ${target.name.padEnd(9)} gzip ${kb(sizes.gzip).padStart(9)}  brotli ${kb(sizes.brotli).padStart(9)}  raw ${kb(sizes.raw).padStart(9)}  ${String(sizes.files.length).padStart(3)} files` +
        `  tables: ${tables.length === 0 ? "none" : tables.join(", ")}${singlePhase ? ` (+${singlePhase} single-phase)` : ""}` +
        `  css ${kb(css.gzip)} gzip, ${new Set(assets.fonts).size} fonts` +
        (limit ? `   target < ${limit} KB compressed` : ""),
    );
    if (idle.files.length > 0) {
      const idleTables = idle.files.filter((file) => /\/(refrigerant|single-phase)-/.test(file)).length;
      console.log(
        `  ${"".padEnd(9)} then, when idle: brotli ${kb(idle.brotli)} in ${idle.files.length} files (${idleTables} tables kept for offline use)`,
      );
    }
    if (process.env.BENCH_WEB_LIST)
      for (const file of [
        ...sizes.files,
        ...css.files,
        ...new Set(assets.fonts),
        ...idle.files.map((file) => `${file} (idle)`),
      ])
        console.log(`      ${file}`);
    await context.close();
  }

  // BENCH_WEB_RUNS=0: sizes only, no timed runs (and no median of nothing).
  if (RUNS > 0)
    console.log(
      `run log of the demo visit on a throttled phone (CPU ${CPU_SLOWDOWN}× slower, Slow 4G: ${SLOW_4G.latency} ms RTT, 1.6/0.75 Mbit/s), ${RUNS} runs`,
    );
  const runLog = `${server.base}/visits/${demoVisit}`;
  const firstTimes: number[] = [];
  const repeatTimes: number[] = [];
  for (let run = 0; run < RUNS; run++) {
    // A new phone each run: a browser profile on disk of its own, as a phone keeps (launchProfile).
    const phone = await launchProfile({ viewport: PHONE_VIEWPORT, cookies: state.cookies });
    try {
      firstTimes.push(await throttledRunLog(phone.context, runLog));
      // The same phone opening the run log again: the service worker installed by the first load
      // (decision 027) serves every script and font, the refrigerant's table comes from its cache
      // and the visit kept on the device is there; the API still goes over the slow link.
      const warm = await phone.context.newPage();
      await warm.goto(runLog);
      await warm.evaluate(() => navigator.serviceWorker.ready.then(() => true));
      await warm.waitForLoadState("networkidle");
      await warm.close();
      repeatTimes.push(await throttledRunLog(phone.context, runLog));
    } finally {
      await phone.close();
    }
  }
  const summary = (times: number[]) =>
    `median ${median(times).toFixed(0)} ms (runs: ${times.map((time) => time.toFixed(0)).join(", ")})`;
  if (RUNS > 0) {
    console.log(`  interactive, first load: ${summary(firstTimes)}   target < ${INTERACTIVE_TARGET_MS} ms`);
    console.log(
      `  interactive, opened again (scripts from the service worker, data kept on the device): ${summary(repeatTimes)}; load average ${load()}`,
    );
    await timeLoggerVisit(browser, summary);
  }
  await browser.close();
} finally {
  server.stop();
}
