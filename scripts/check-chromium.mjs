// Fails the browser tests early, with the fix, when no Chromium is installed.
import { existsSync } from "node:fs";
import { CHROMIUM_PATH } from "./chromium-path.mjs";

if (!existsSync(CHROMIUM_PATH)) {
  console.error(
    [
      `Browser tests need Chromium, and none was found at ${CHROMIUM_PATH}.`,
      "On Debian or Ubuntu install it with:  sudo apt-get update && sudo apt-get install -y chromium",
      "or point CHROMIUM_PATH at another Chromium or Chrome binary.",
      "(Playwright's own browser download is not used.)",
    ].join("\n"),
  );
  process.exit(1);
}
