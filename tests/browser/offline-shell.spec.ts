import { expect, test, type Page } from "@playwright/test";
import { signIn } from "./sign-in.ts";

/**
 * The installed app starts without a network: the service worker holds the shell (scripts,
 * styles, fonts) and the property tables of the refrigerants in the company's units, which the
 * app fetches once it is signed in and idle. The demo company's units use R32, R404A and R407C
 * (server/db/seed/demo-scenario.ts).
 */
test.use({ serviceWorkers: "allow", viewport: { width: 390, height: 844 } });

const TABLES_OF_THE_DEMO_UNITS = ["R32", "R404A", "R407C"];

/** The file names in the worker's table cache, e.g. "refrigerant-R32-DlsBzkk6.js". */
function cachedTables(page: Page): Promise<string[]> {
  return page.evaluate(async () => {
    const cache = await caches.open("satura-refrigerant-tables");
    return (await cache.keys()).map((request) => new URL(request.url).pathname.split("/").pop()!);
  });
}

test("the shell and the tables of the company's refrigerants open with no network", async ({ page, context }) => {
  await page.goto("/");
  await signIn(page, "tech@bellbird.example");
  await expect(page.getByRole("heading", { name: "Today" })).toBeVisible();
  expect(await page.evaluate(async () => Boolean((await navigator.serviceWorker.ready).active))).toBe(true);

  // Both tables of each refrigerant: saturation (the run log's figures) and single phase (the cycle).
  const expected = TABLES_OF_THE_DEMO_UNITS.flatMap((id) => [`refrigerant-${id}-`, `single-phase-${id}-`]);
  await expect
    .poll(async () => {
      const held = await cachedTables(page);
      return expected.filter((prefix) => !held.some((name) => name.startsWith(prefix)));
    }, { timeout: 30_000 })
    .toEqual([]);

  await context.setOffline(true);
  await page.reload();
  // The page came from the worker, not the browser's "no internet" page, and says it is offline.
  await expect(page.getByRole("status").filter({ hasText: "Offline." })).toBeVisible();
  await expect(page.getByRole("button", { name: "Reload" })).toBeVisible();

  // Every cached table is served with no network, through the worker.
  const tables = await cachedTables(page);
  const statuses = await page.evaluate(
    (names) => Promise.all(names.map(async (name) => (await fetch(`/assets/${name}`)).status)),
    tables,
  );
  expect(statuses.every((status) => status === 200)).toBe(true);

  await context.setOffline(false);
  await expect(page.getByRole("status").filter({ hasText: "Offline." })).toBeHidden();
});
