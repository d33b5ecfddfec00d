/**
 * What the browser benches share: the production server on a database of their choosing,
 * started in a child process of its own group (so one signal stops it and its tsx loader), and
 * Debian's Chromium (CHROMIUM_PATH) with the flags the browser tests use. The client must be
 * built first (`vite build`, which the npm scripts run).
 */
import { spawn, type ChildProcess } from "node:child_process";
import { mkdtemp, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { chromium, type Browser, type BrowserContext, type Cookie } from "playwright-core";
import { CHROMIUM_PATH } from "../../scripts/chromium-path.mjs";

export interface BenchServer {
  base: string;
  /** Stops the server's whole process group. */
  stop: () => void;
}

/**
 * Starts `server/index.ts` in production mode on `port` and waits until `/api/health` answers.
 * `dataDir` defaults to an in-memory database, which the server fills with the demo company.
 */
export async function startServer(port: number, dataDir = "memory://"): Promise<BenchServer> {
  const base = `http://127.0.0.1:${port}`;
  const child: ChildProcess = spawn("npx", ["tsx", "server/index.ts"], {
    env: {
      ...process.env,
      NODE_ENV: "production",
      DATA_DIR: dataDir,
      PORT: String(port),
      LOG_LEVEL: "warn",
      APP_URL: base,
    },
    stdio: "ignore",
    detached: true,
  });
  const stop = () => {
    if (child.pid && child.exitCode === null) process.kill(-child.pid, "SIGTERM");
  };
  try {
    await waitForHealth(base);
  } catch (error) {
    stop();
    throw error;
  }
  return { base, stop };
}

async function waitForHealth(base: string): Promise<void> {
  // A large data directory takes a while to open and analyse; two minutes is plenty for the demo.
  for (let attempt = 0; attempt < 480; attempt++) {
    try {
      if ((await fetch(`${base}/api/health`)).ok) return;
    } catch {
      // not up yet
    }
    await new Promise((resolve) => setTimeout(resolve, 500));
  }
  throw new Error(`the server did not start on ${base}`);
}

const CHROMIUM_ARGS = ["--headless", "--no-sandbox", "--disable-gpu"];

/** Headless Chromium, without a sandbox (the benches run as root in a container). */
export function launchBrowser(): Promise<Browser> {
  return chromium.launch({ executablePath: CHROMIUM_PATH, args: CHROMIUM_ARGS });
}

/**
 * A browser with a new profile on disk of its own, as a phone's browser keeps one, holding
 * `cookies`; closing it deletes the profile. A context of `launchBrowser` keeps everything in
 * memory, and there Chromium keeps no compiled code for scripts from a service worker's cache:
 * each opening compiled them again, where a phone, from its second opening, runs them compiled.
 */
export async function launchProfile(options: {
  viewport: { width: number; height: number };
  cookies: Cookie[];
}): Promise<{ context: BrowserContext; close: () => Promise<void> }> {
  const dir = await mkdtemp(path.join(tmpdir(), "satura-bench-profile-"));
  const context = await chromium.launchPersistentContext(dir, {
    executablePath: CHROMIUM_PATH,
    args: CHROMIUM_ARGS,
    viewport: options.viewport,
  });
  await context.addCookies(options.cookies);
  return {
    context,
    close: async () => {
      await context.close();
      await rm(dir, { recursive: true, force: true });
    },
  };
}

/** The demo technician; every demo person shares the password. */
export const DEMO_TECHNICIAN = { email: "tech@bellbird.example", password: "bellbird-demo-2026" };

/** A context whose cookie jar holds a session of `person` (signed in through the API, not the form). */
export async function signedInContext(
  browser: Browser,
  base: string,
  options: Parameters<Browser["newContext"]>[0] = {},
  person = DEMO_TECHNICIAN,
): Promise<BrowserContext> {
  const context = await browser.newContext(options);
  const response = await context.request.post(`${base}/api/auth/sign-in`, { data: person, headers: { Origin: base } });
  if (!response.ok()) throw new Error(`sign-in refused: ${response.status()}`);
  return context;
}
