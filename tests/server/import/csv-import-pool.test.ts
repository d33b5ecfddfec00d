import { execFile } from "node:child_process";
import { fileURLToPath } from "node:url";
import { promisify } from "node:util";
import { describe, expect, it } from "vitest";
import { workerExecArgv } from "../../../server/import/csv-import-pool.ts";

const run = promisify(execFile);
const here = (file: string) => fileURLToPath(new URL(file, import.meta.url));

describe("the CSV import thread's Node options", () => {
  it("drops the server's preloaded modules, in either spelling, and keeps every other option", () => {
    expect(
      workerExecArgv([
        "--import",
        "tsx",
        "--import=./probe.ts",
        "--enable-source-maps",
        "-r",
        "dotenv/config",
        "--require=x.cjs",
        "--loader",
        "l.mjs",
        "--experimental-loader=m.mjs",
        "--max-old-space-size=512",
      ]),
    ).toEqual(["--enable-source-maps", "--max-old-space-size=512"]);
    expect(workerExecArgv([])).toEqual([]);
  });

  // Before the options were filtered, the thread inherited `--import <a .ts file>`, could not
  // load it, and its start-up error was an unhandled 'error' event that ended the server.
  it(
    "starts and judges a file in a server whose process preloads a TypeScript module",
    { timeout: 60_000 },
    async () => {
      const { stdout } = await run(
        process.execPath,
        ["--import", "tsx", "--import", here("./preloaded-probe.ts"), here("./judge-under-preload.ts")],
        { cwd: here("../../..") },
      );
      const answer = JSON.parse(stdout.trim().split("\n").at(-1)!) as unknown;
      // The headers as the thread read them: proof it started and judged the file.
      expect(answer).toEqual({ answered: "preview", headers: ["time", "suction pressure"], rowCount: 0 });
    },
  );
});
