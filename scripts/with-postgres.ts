/**
 * Runs a command against a throwaway PostgreSQL server: makes a cluster in a temporary folder,
 * starts it on a free local port, runs the command with TEST_DATABASE_URL pointing at it, then
 * stops the server and deletes the folder, also when the command fails or is interrupted.
 *
 *   tsx scripts/with-postgres.ts vitest run tests/server
 *
 * Without PostgreSQL's binaries (Debian's `postgresql` package) it says so and exits 0, so a
 * machine without them still runs the rest of `npm test`; REQUIRE_POSTGRES=1 (CI) makes that a failure.
 */
import { spawn, spawnSync } from "node:child_process";
import { chownSync, existsSync, mkdtempSync, readdirSync, rmSync } from "node:fs";
import { tmpdir, userInfo } from "node:os";
import { join } from "node:path";
import { freePort } from "./local-servers/free-port.ts";

const POSTGRES_ROOT = "/usr/lib/postgresql";

/** The newest installed server's bin folder, e.g. /usr/lib/postgresql/15/bin. */
function findBinaries(): string | undefined {
  if (!existsSync(POSTGRES_ROOT)) return undefined;
  const versions = readdirSync(POSTGRES_ROOT)
    .filter((version) => existsSync(join(POSTGRES_ROOT, version, "bin", "initdb")))
    .sort((a, b) => Number(b) - Number(a));
  return versions[0] ? join(POSTGRES_ROOT, versions[0], "bin") : undefined;
}

// PostgreSQL refuses to run as root, so as root the server runs as the `postgres` user the package creates.
const asRoot = userInfo().uid === 0;

/** Runs one PostgreSQL program to completion, as `postgres` when we are root; throws with its output on failure. */
function runPostgresTool(binaries: string, tool: string, args: string[]): void {
  const program = join(binaries, tool);
  const result = asRoot
    ? spawnSync("runuser", ["-u", "postgres", "--", program, ...args], { encoding: "utf8" })
    : spawnSync(program, args, { encoding: "utf8" });
  if (result.status !== 0) {
    throw new Error(`${tool} failed (${result.status ?? result.signal}):\n${result.stdout}${result.stderr}`);
  }
}

const command = process.argv.slice(2);
if (command.length === 0) {
  console.error("usage: tsx scripts/with-postgres.ts <command> [args…]");
  process.exit(2);
}

const binaries = findBinaries();
if (!binaries) {
  const required = process.env.REQUIRE_POSTGRES === "1";
  console.log(
    `PostgreSQL run ${required ? "FAILED" : "skipped"}: no PostgreSQL server binaries under ${POSTGRES_ROOT}/*/bin ` +
      "(install Debian's `postgresql` package to run the server tests on PostgreSQL too).",
  );
  process.exit(required ? 1 : 0);
}

const folder = mkdtempSync(join(tmpdir(), "satura-postgres-"));
const dataDir = join(folder, "data");
let started = false;

function cleanUp(): void {
  if (started) {
    try {
      runPostgresTool(binaries!, "pg_ctl", ["-D", dataDir, "-m", "immediate", "-w", "stop"]);
    } catch (error) {
      console.error(String(error));
    }
    started = false;
  }
  rmSync(folder, { recursive: true, force: true });
}

let exitCode = 1;
try {
  if (asRoot) chownSync(folder, ...postgresIds());
  // Trust on a loopback-only server in a private folder: nothing reaches it from outside.
  runPostgresTool(binaries, "initdb", ["-D", dataDir, "-U", "postgres", "-A", "trust", "-E", "UTF8", "--no-sync"]);
  const port = await freePort();
  // Durability settings off: the cluster is deleted after the run, and tests wait less for disk.
  const serverOptions = [
    `-p ${port}`,
    `-k ${folder}`,
    "-c listen_addresses=127.0.0.1",
    "-c fsync=off",
    "-c synchronous_commit=off",
    "-c full_page_writes=off",
    "-c max_connections=200",
    // The tests of the planner's statistics check what the server's own ANALYZE does; autovacuum
    // would analyse tables at moments of its choosing and blur that.
    "-c autovacuum=off",
  ].join(" ");
  runPostgresTool(binaries, "pg_ctl", [
    "-D",
    dataDir,
    "-l",
    join(folder, "server.log"),
    "-o",
    serverOptions,
    "-w",
    "start",
  ]);
  started = true;
  const url = `postgres://postgres@127.0.0.1:${port}/postgres`;
  console.log(`PostgreSQL ${binaries.split("/").at(-2)} for this run on 127.0.0.1:${port}`);

  const child = spawn(command[0]!, command.slice(1), {
    stdio: "inherit",
    env: { ...process.env, TEST_DATABASE_URL: url },
  });
  // Ctrl-C reaches the child too (same process group); wait for it, then clean up.
  for (const signal of ["SIGINT", "SIGTERM"] as const) process.on(signal, () => child.kill(signal));
  exitCode = await new Promise<number>((resolve) => {
    child.once("error", (error) => {
      console.error(`could not run ${command[0]}: ${error.message}`);
      resolve(1);
    });
    child.once("exit", (code, signal) => resolve(code ?? (signal ? 1 : 0)));
  });
} catch (error) {
  console.error(error instanceof Error ? error.message : error);
} finally {
  cleanUp();
}
process.exit(exitCode);

/** Uid and gid of the `postgres` user, which must own the cluster's folder. */
function postgresIds(): [number, number] {
  const result = spawnSync("id", ["-u", "postgres"], { encoding: "utf8" });
  const group = spawnSync("id", ["-g", "postgres"], { encoding: "utf8" });
  if (result.status !== 0 || group.status !== 0) throw new Error("running as root, but there is no `postgres` user");
  return [Number(result.stdout.trim()), Number(group.stdout.trim())];
}
