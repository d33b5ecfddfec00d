import { defineConfig } from "@playwright/test";
import { CHROMIUM_PATH } from "./scripts/chromium-path.mjs";
import { MAIL_DROP_DIR } from "./tests/browser/mail-drop.ts";

// PLAYWRIGHT_PORT lets two checkouts run their browser tests side by side.
const PORT = Number(process.env.PLAYWRIGHT_PORT ?? 3100);

// Browser tests drive Debian's Chromium (Playwright cannot download its own browsers
// here) against the production build served by the real server on an in-memory database.
export default defineConfig({
  testDir: "tests/browser",
  fullyParallel: false,
  workers: 1,
  retries: process.env.CI ? 1 : 0,
  timeout: 60_000,
  reporter: process.env.CI ? [["list"]] : [["list"]],
  use: {
    baseURL: `http://127.0.0.1:${PORT}`,
    trace: "retain-on-failure",
    screenshot: "only-on-failure",
    // The app's service worker answers requests before page.route sees them, so specs that
    // intercept the network run without it; the offline specs turn it on.
    serviceWorkers: "block",
    launchOptions: {
      executablePath: CHROMIUM_PATH,
      args: [
        "--headless",
        "--no-sandbox",
        "--disable-gpu",
        "--disable-quic",
        "--no-first-run",
        "--disable-background-networking",
        "--disable-component-update",
        "--disable-sync",
      ],
    },
  },
  webServer: {
    // OUTBOX_ENABLED: the invitation test sees the caught mail on the Outbox page; the invitee
    // reads it from MAIL_DROP_DIR, emptied at each start, since the Outbox hides others' links.
    command: `rm -rf ${MAIL_DROP_DIR} && NODE_ENV=production DATA_DIR=memory:// PORT=${PORT} LOG_LEVEL=warn OUTBOX_ENABLED=true MAIL_DROP_DIR=${MAIL_DROP_DIR} npx tsx server/index.ts`,
    url: `http://127.0.0.1:${PORT}/api/health`,
    reuseExistingServer: false,
    timeout: 120_000,
    stdout: "ignore",
    stderr: "pipe",
  },
});
