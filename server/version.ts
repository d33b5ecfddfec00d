import { readFileSync } from "node:fs";

/** The app version from package.json, read once; reported by /api/health. */
export const appVersion: string = (
  JSON.parse(readFileSync(new URL("../package.json", import.meta.url), "utf8")) as { version: string }
).version;
