/**
 * Starts the real server (server/index.ts) in a child process for the bench, on a free port and a
 * given data folder, signs the demo people in, and reads its memory through bench/api/memory-probe.ts.
 */
import { spawn, type ChildProcess } from "node:child_process";
import { fileURLToPath } from "node:url";
import { freePort } from "../../scripts/local-servers/free-port.ts";
import { SESSION_COOKIE_NAME } from "../../server/auth/lucia.ts";

export const DEMO_PASSWORD = "bellbird-demo-2026";
const root = fileURLToPath(new URL("../..", import.meta.url));

export interface BenchServer {
  origin: string;
  /** Its APP_URL: the Origin its writes must carry (servers behind one balancer share it). */
  appUrl: string;
  child: ChildProcess;
  /** Resident set, V8 heap and ArrayBuffers (PGlite's WebAssembly memory), in bytes. */
  memory: () => Promise<NodeJS.MemoryUsage>;
  /** The server process's CPU time so far (user and system, µs): its cost per request, apart from the client's. */
  cpu: () => Promise<NodeJS.CpuUsage>;
  signIn: (email: string) => Promise<string>;
  stop: () => Promise<void>;
}

async function waitForHealth(origin: string, child: ChildProcess, timeoutMs: number) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`the server stopped with code ${child.exitCode} before answering`);
    try {
      if ((await fetch(`${origin}/api/health`)).ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  throw new Error(`the server did not answer /api/health within ${timeoutMs / 1000} s`);
}

/**
 * `dataDir`: a PGlite folder, or "memory://" for a fresh demo-size database. `nodeArgs`: more
 * options for the server's node (e.g. `--cpu-prof`, to see where a route's time goes).
 */
export async function startServer(
  dataDir: string,
  extraEnv: Record<string, string> = {},
  nodeArgs: readonly string[] = [],
): Promise<BenchServer> {
  const port = await freePort();
  const origin = `http://127.0.0.1:${port}`;
  const appUrl = extraEnv.APP_URL ?? origin;
  const child = spawn(
    process.execPath,
    [...nodeArgs, "--import", "tsx", "--import", "./bench/api/memory-probe.ts", "server/index.ts"],
    {
      cwd: root,
      env: {
        ...process.env,
        NODE_ENV: "production",
        HOST: "127.0.0.1",
        PORT: String(port),
        APP_URL: appUrl,
        DATA_DIR: dataDir,
        DEMO_DATA: "true",
        LOG_LEVEL: "fatal",
        COOKIE_SECURE: "false",
        ...extraEnv,
      },
      stdio: ["ignore", "inherit", "inherit", "ipc"],
    },
  );
  await waitForHealth(origin, child, 120_000);

  // Answers are told apart by their key (two questions of one kind at once both take the first answer).
  const ask = <T>(kind: "memory" | "cpu") =>
    new Promise<T>((resolve, reject) => {
      const listener = (message: Record<string, T>) => {
        if (!(kind in message)) return;
        clearTimeout(timer);
        child.off("message", listener);
        resolve(message[kind]!);
      };
      const timer = setTimeout(() => {
        child.off("message", listener);
        reject(new Error(`the server did not report its ${kind}`));
      }, 5_000);
      child.on("message", listener);
      child.send(kind);
    });
  const memory = () => ask<NodeJS.MemoryUsage>("memory");
  const cpu = () => ask<NodeJS.CpuUsage>("cpu");

  const signIn = async (email: string) => {
    const response = await fetch(`${origin}/api/auth/sign-in`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: appUrl },
      body: JSON.stringify({ email, password: DEMO_PASSWORD }),
    });
    if (!response.ok) throw new Error(`sign-in as ${email} answered ${response.status}`);
    const cookie = response.headers.getSetCookie().find((value) => value.startsWith(`${SESSION_COOKIE_NAME}=`));
    if (!cookie) throw new Error(`sign-in as ${email} set no session cookie`);
    return cookie.split(";")[0]!;
  };

  const stop = () =>
    new Promise<void>((resolve) => {
      if (child.exitCode !== null) return resolve();
      child.once("exit", () => resolve());
      child.kill("SIGTERM");
    });

  return { origin, appUrl, child, memory, cpu, signIn, stop };
}
