/**
 * `npm run bench:web`: what the browser downloads, and how soon the run log answers on a phone.
 * The npm script builds the client first (`vite build`); this starts the production server on an
 * in-memory database with the demo company (BENCH_WEB_PORT, default 3214) and opens pages in
 * Debian's Chromium (CHROMIUM_PATH), each in a fresh context (empty cache):
 *
 * - first-load JS of the sign-in page, Today and the run log of the demo visit (the quarterly
 *   check on the server-cupboard split, R410A): every script the browser fetched until the page was
 *   ready and the network idle, sized as the built files compress with gzip and brotli (node:zlib,
 *   level 9 and 11), with the number of files and how many refrigerant tables were among them;
 * - the run log on a throttled phone profile (CDP: CPU 4× slower, "Slow 4G" ≈ 400 ms RTT,
 *   1.6 Mbit/s down, 0.75 Mbit/s up): milliseconds from navigation to interactive, that is the
 *   first reading field enabled and the finding shown (median of RUNS).
 *
 * Targets beside each figure. Figures only, never a pass/fail test; the machine is shared, so
 * timings are noisy.
 */
import { spawn } from "node:child_process";
import { readFileSync } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { brotliCompressSync, constants, gzipSync } from "node:zlib";
import { chromium, type Browser, type BrowserContext, type Page } from "playwright-core";
import { CHROMIUM_PATH } from "../../scripts/chromium-path.mjs";

const PORT = Number(process.env.BENCH_WEB_PORT ?? 3214);
const BASE = `http://127.0.0.1:${PORT}`;
const RUNS = Number(process.env.BENCH_WEB_RUNS ?? 3);
const DIST = fileURLToPath(new URL("../../dist", import.meta.url));
const DEMO = { email: "tech@bellbird.example", password: "bellbird-demo-2026" };
const DEMO_VISIT_REASON = "Quarterly check of the server cupboard split";
/** Chrome DevTools' "Slow 4G" as the issue states it; throughput in bytes per second. */
const SLOW_4G = { offline: false, latency: 400, downloadThroughput: (1.6e6 / 8) * 0.9, uploadThroughput: (0.75e6 / 8) * 0.9 };
const CPU_SLOWDOWN = 4;
const TARGETS_KB = { "sign-in": 120, today: null, "run log": 250 } as const;
const INTERACTIVE_TARGET_MS = 3000;

const server = spawn("npx", ["tsx", "server/index.ts"], {
  env: { ...process.env, NODE_ENV: "production", DATA_DIR: "memory://", PORT: String(PORT), LOG_LEVEL: "warn", APP_URL: BASE },
  stdio: "ignore",
  detached: true,
});

async function waitForServer(): Promise<void> {
  for (let attempt = 0; attempt < 240; attempt++) {
    try {
      if ((await fetch(`${BASE}/api/health`)).ok) return;
    } catch {
      // not up yet
    }
    await new Promise((resolve) => setTimeout(resolve, 500));
  }
  throw new Error(`the server did not start on ${BASE}`);
}

interface Sizes {
  files: string[];
  raw: number;
  gzip: number;
  brotli: number;
}

/** The built files behind the script URLs, compressed as a server would send them. */
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

/** Records every script the page fetches. */
function recordScripts(page: Page): string[] {
  const urls: string[] = [];
  page.on("request", (request) => {
    if (request.resourceType() === "script") urls.push(request.url());
  });
  return urls;
}

async function signedInContext(browser: Browser): Promise<BrowserContext> {
  const context = await browser.newContext({ viewport: { width: 412, height: 915 } });
  const response = await context.request.post(`${BASE}/api/auth/sign-in`, { data: DEMO, headers: { Origin: BASE } });
  if (!response.ok()) throw new Error(`sign-in refused: ${response.status()}`);
  return context;
}

/** True once the first reading field is enabled and the finding is shown; stamps the moment. */
function runLogInteractive(): boolean {
  const label = [...document.querySelectorAll("label")].find((candidate) => candidate.textContent?.trim().startsWith("Suction pressure"));
  const field = label?.control as HTMLInputElement | null | undefined;
  const finding = document.querySelector("[data-testid=charge-state]")?.textContent?.trim();
  const ready = Boolean(field && !field.disabled && finding);
  const stamped = window as unknown as { interactiveAt?: number };
  if (ready) stamped.interactiveAt ??= performance.now();
  return ready;
}

const kb = (bytes: number) => `${(bytes / 1024).toFixed(1)} KB`;
const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)]!;

try {
  await waitForServer();
  const browser = await chromium.launch({ executablePath: CHROMIUM_PATH, args: ["--headless", "--no-sandbox", "--disable-gpu"] });
  const signedIn = await signedInContext(browser);
  const visits = (await (await signedIn.request.get(`${BASE}/api/visits`)).json()) as { visits: { id: string; reason: string | null }[] };
  const demoVisit = visits.visits.find((visit) => visit.reason === DEMO_VISIT_REASON);
  if (!demoVisit) throw new Error(`the demo visit "${DEMO_VISIT_REASON}" is missing`);
  const runLogPath = `/visits/${demoVisit.id}`;
  const state = await signedIn.storageState();
  await signedIn.close();

  const pages: { name: keyof typeof TARGETS_KB; path: string; signedIn: boolean; ready: (page: Page) => Promise<unknown> }[] = [
    { name: "sign-in", path: "/sign-in", signedIn: false, ready: (page) => page.getByLabel("E-mail").waitFor() },
    { name: "today", path: "/", signedIn: true, ready: (page) => page.getByRole("heading", { level: 1 }).first().waitFor() },
    { name: "run log", path: runLogPath, signedIn: true, ready: (page) => page.waitForFunction(runLogInteractive, undefined, { polling: 50, timeout: 60_000 }) },
  ];

  console.log(`first-load JS (built files, compressed; fresh cache) — ${BASE}`);
  for (const target of pages) {
    const context = await browser.newContext({ viewport: { width: 412, height: 915 }, ...(target.signedIn ? { storageState: state } : {}) });
    const page = await context.newPage();
    const scripts = recordScripts(page);
    await page.goto(`${BASE}${target.path}`);
    await target.ready(page);
    await page.waitForLoadState("networkidle");
    const sizes = sizesOf(scripts);
    const tables = sizes.files.filter((file) => /\/refrigerant-R[^/]*$/.test(file)).map((file) => path.basename(file).replace(/-[\w-]{8}\.js$/, ""));
    const singlePhase = sizes.files.filter((file) => /\/single-phase-/.test(file)).length;
    const limit = TARGETS_KB[target.name];
    console.log(
      `  ${target.name.padEnd(8)} gzip ${kb(sizes.gzip).padStart(9)}  brotli ${kb(sizes.brotli).padStart(9)}  raw ${kb(sizes.raw).padStart(9)}  ${String(sizes.files.length).padStart(3)} files` +
        `  tables: ${tables.length === 0 ? "none" : tables.join(", ")}${singlePhase ? ` (+${singlePhase} single-phase)` : ""}` +
        (limit ? `   target < ${limit} KB compressed` : ""),
    );
    if (process.env.BENCH_WEB_LIST) for (const file of sizes.files) console.log(`      ${file}`);
    await context.close();
  }

  console.log(`run log of the demo visit on a throttled phone (CPU ${CPU_SLOWDOWN}× slower, Slow 4G: ${SLOW_4G.latency} ms RTT, 1.6/0.75 Mbit/s), ${RUNS} runs`);
  const times: number[] = [];
  for (let run = 0; run < RUNS; run++) {
    const context = await browser.newContext({ viewport: { width: 412, height: 915 }, storageState: state });
    const page = await context.newPage();
    const cdp = await context.newCDPSession(page);
    await cdp.send("Network.enable");
    await cdp.send("Network.emulateNetworkConditions", SLOW_4G);
    await cdp.send("Emulation.setCPUThrottlingRate", { rate: CPU_SLOWDOWN });
    await page.goto(`${BASE}${runLogPath}`, { waitUntil: "commit" });
    await page.waitForFunction(runLogInteractive, undefined, { polling: 50, timeout: 120_000 });
    times.push(await page.evaluate(() => (window as unknown as { interactiveAt: number }).interactiveAt));
    await context.close();
  }
  console.log(
    `  interactive: median ${median(times).toFixed(0)} ms (runs: ${times.map((time) => time.toFixed(0)).join(", ")})   target < ${INTERACTIVE_TARGET_MS} ms`,
  );
  await browser.close();
} finally {
  if (server.pid) process.kill(-server.pid, "SIGTERM");
}
