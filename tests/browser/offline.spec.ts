import { expect, test, type Page } from "@playwright/test";
import { DEMO_PASSWORD, signIn, signOut } from "./sign-in.ts";
import { RTU_1, startVisitOn } from "./start-visit.ts";
import { TINY_PNG } from "./tiny-png.ts";

/**
 * The installed app starts without a network: the service worker holds the shell (scripts,
 * styles, fonts) and the property tables of the refrigerants in the company's units, which the
 * app fetches once it is signed in and idle; the visits of the day and their units are kept on
 * the device. The demo company's units use R32, R404A and R407C (server/db/seed/demo-scenario.ts).
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

/** The data kept on the device (src/features/offline/device-cache.ts): each query's key and data. */
function keptQueries(page: Page): Promise<{ key: string; data: unknown }[]> {
  return page.evaluate(
    () =>
      new Promise<{ key: string; data: unknown }[]>((resolve, reject) => {
        const open = indexedDB.open("satura-device-cache", 1);
        open.onerror = () => reject(open.error);
        open.onsuccess = () => {
          const get = open.result.transaction("kept").objectStore("kept").get("queries");
          get.onsuccess = () =>
            resolve(
              ((get.result?.state.queries ?? []) as { queryKey: unknown; state: { data: unknown } }[]).map((query) => ({
                key: JSON.stringify(query.queryKey),
                data: query.state.data,
              })),
            );
        };
      }),
  );
}

const keptQueryKeys = async (page: Page) => (await keptQueries(page)).map((query) => query.key);

test("the shell and the tables of the company's refrigerants open with no network", async ({ page, context }) => {
  await signInOnToday(page);
  expect(await page.evaluate(async () => Boolean((await navigator.serviceWorker.ready).active))).toBe(true);

  // Both tables of each refrigerant: saturation (the run log's figures) and single phase (the cycle).
  const expected = TABLES_OF_THE_DEMO_UNITS.flatMap((id) => [`refrigerant-${id}-`, `single-phase-${id}-`]);
  await expect
    .poll(
      async () => {
        const held = await cachedTables(page);
        return expected.filter((prefix) => !held.some((name) => name.startsWith(prefix)));
      },
      { timeout: 30_000 },
    )
    .toEqual([]);
  await expect
    .poll(async () => (await keptQueryKeys(page)).includes(JSON.stringify(["auth", "me"])), { timeout: 10_000 })
    .toBe(true);

  await context.setOffline(true);
  await page.reload();
  // The page came from the worker, not the browser's "no internet" page, says it is offline, and
  // Today opens from the data kept on the device.
  await expect(page.getByRole("status").filter({ hasText: "Offline." })).toBeVisible();
  await expect(page.getByRole("heading", { name: "Today" })).toBeVisible();

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

test("a visit of the day opens with no network, and the finding works out as values are typed", async ({
  page,
  context,
}) => {
  await signInOnToday(page);
  const visitId = await startVisitOn(page, RTU_1, "Offline check on the roof");
  await page.getByRole("link", { name: "Today" }).first().click();
  await expect(page.getByRole("heading", { name: "Today" })).toBeVisible();

  // Kept while there is signal: the visit, its unit and its refrigerant balance.
  await expect
    .poll(
      async () => {
        const keys = await keptQueryKeys(page);
        return ["visits", "register"].every((kind) =>
          keys.includes(JSON.stringify([kind, kind === "visits" ? "detail" : "visit", visitId])),
        );
      },
      { timeout: 30_000 },
    )
    .toBe(true);
  await expect
    .poll(async () => (await cachedTables(page)).some((name) => name.startsWith("refrigerant-R407C-")), {
      timeout: 30_000,
    })
    .toBe(true);

  await context.setOffline(true);
  await page.reload();
  await expect(page.getByRole("status").filter({ hasText: "Offline." })).toBeVisible();
  await page
    .getByRole("link", { name: /RTU-1 packaged rooftop unit/ })
    .first()
    .click();
  await expect(page.getByRole("heading", { name: /RTU-1/ })).toBeVisible();

  // R407C at the demo clinic (run-log.spec.ts): suction dew 1 °C at 377 kPa, liquid bubble 38 °C
  // at 1565 kPa; lines at 13 °C and 37 °C give 12 K superheat and 1 K subcooling, on the device.
  await page.getByLabel("Suction pressure", { exact: true }).fill("377");
  await page.getByLabel("Suction line temperature", { exact: true }).fill("13");
  await page.getByLabel("Liquid pressure", { exact: true }).fill("1565");
  await page.getByLabel("Line temperature for subcooling", { exact: true }).fill("37");
  await expect(page.getByTestId("superheat")).toHaveText("12.0");
  await expect(page.getByTestId("subcooling")).toHaveText("1.0");
});

test("signing out deletes the data kept on the device; the next person keeps only their own", async ({ page }) => {
  await signInOnToday(page);
  await expect
    .poll(async () => (await keptQueryKeys(page)).some((key) => key.startsWith('["visits","detail"')), {
      timeout: 30_000,
    })
    .toBe(true);

  await signOut(page);
  await expect.poll(() => keptQueryKeys(page), { timeout: 10_000 }).toEqual([]);

  await signIn(page, "senior@bellbird.example");
  await expect(page.getByRole("heading", { name: "Today" })).toBeVisible();
  await expect
    .poll(
      async () =>
        (
          (await keptQueries(page)).find((query) => query.key === JSON.stringify(["auth", "me"]))?.data as
            { email?: string } | undefined
        )?.email,
      { timeout: 10_000 },
    )
    .toBe("senior@bellbird.example");
});

/** Signs the demo technician in from the app's start, Today, whose visits the app keeps on the device. */
async function signInOnToday(page: Page) {
  await page.goto("/");
  await signIn(page, "tech@bellbird.example");
  await expect(page.getByRole("heading", { name: "Today" })).toBeVisible();
}

/** Waits until the visit's evacuations are kept on the device too, so one can go on offline. */
async function evacuationsKeptForOffline(page: Page, visitId: string) {
  await expect
    .poll(async () => (await keptQueryKeys(page)).includes(JSON.stringify(["procedures", "evacuations", visitId])), {
      timeout: 30_000,
    })
    .toBe(true);
}

/** Waits until the visit, with what its screen needs, is kept on the device. */
async function keptForOffline(page: Page, visitId: string) {
  await page.getByRole("link", { name: "Today" }).first().click();
  await expect
    .poll(async () => (await keptQueryKeys(page)).includes(JSON.stringify(["register", "visit", visitId])), {
      timeout: 30_000,
    })
    .toBe(true);
}

/** Types a reading (gauge kPa and °C) and saves it while offline: it must be kept on the device. */
async function saveKeptReading(
  page: Page,
  values: { suction: string; suctionLine: string; liquid: string; liquidLine: string },
) {
  await page.getByLabel("Suction pressure", { exact: true }).fill(values.suction);
  await page.getByLabel("Suction line temperature", { exact: true }).fill(values.suctionLine);
  await page.getByLabel("Liquid pressure", { exact: true }).fill(values.liquid);
  await page.getByLabel("Line temperature for subcooling", { exact: true }).fill(values.liquidLine);
  await page.getByRole("button", { name: "Save reading" }).click();
  await expect(
    page.getByTestId("save-bar").getByText(/^Kept on this device \(\d\d:\d\d\) — sent when online$/),
  ).toBeVisible();
}

/** A reading of RTU-1 (R407C at the demo clinic: suction dew 1 °C, liquid bubble 38 °C, as above). */
const saveRtuReading = (page: Page, suctionLineC: string) =>
  saveKeptReading(page, { suction: "377", suctionLine: suctionLineC, liquid: "1565", liquidLine: "37" });

/** The outbox entries on the device (src/features/offline/outbox-store.ts): client id and time taken. */
function outboxEntries(page: Page): Promise<{ clientId: string; takenAt: string; state: string; path: string }[]> {
  return page.evaluate(
    () =>
      new Promise((resolve, reject) => {
        const open = indexedDB.open("satura-outbox");
        open.onerror = () => reject(open.error);
        open.onsuccess = () => {
          const all = open.result.transaction("entries").objectStore("entries").getAll();
          all.onsuccess = () =>
            resolve(all.result as { clientId: string; takenAt: string; state: string; path: string }[]);
        };
      }),
  );
}

test("readings, an adjustment, an evacuation sample and a photo saved with no network wait on the device, survive a reload, and are stored once with their times", async ({
  page,
  context,
}) => {
  await signInOnToday(page);
  const visitId = await startVisitOn(page, RTU_1, "Readings kept while offline");
  // An evacuation begun with signal takes its samples offline.
  await page.getByRole("radio", { name: "Evacuation" }).click();
  await page.getByRole("button", { name: "Start the evacuation" }).click();
  await expect(page.getByText("Pulling down")).toBeVisible();
  await keptForOffline(page, visitId);
  await evacuationsKeptForOffline(page, visitId);

  await context.setOffline(true);
  await page.goto(`/visits/${visitId}`);
  await saveRtuReading(page, "13");
  await page.getByLabel("What changed").selectOption("airflow");
  await page.getByLabel("Description").fill("Cleaned the return air filter");
  await page.getByRole("button", { name: "Log adjustment" }).click();
  await expect(
    page.getByRole("status").filter({ hasText: /^Kept on this device \(\d\d:\d\d\) — sent when online$/ }),
  ).toBeVisible();
  for (const suctionLine of ["14", "15"]) await saveRtuReading(page, suctionLine);
  const waiting = page.getByRole("region", { name: "Entries on this device" });
  await expect(waiting.getByText("Waiting to send")).toHaveCount(4);
  await expect(waiting.getByText("Airflow changed, circuit 1")).toBeVisible();

  await page.getByRole("radio", { name: "Evacuation" }).click();
  await page.getByLabel("Time from start", { exact: true }).fill("12");
  await page.getByLabel("Vacuum reading", { exact: true }).fill("2400");
  await page.getByRole("button", { name: "Add reading" }).click();
  await expect(waiting.getByText("Evacuation reading")).toBeVisible();
  // A photo of the gauges, kept on the device as a file and shown from it.
  const photos = page.getByRole("region", { name: "Photos" });
  await page
    .getByLabel("Photo from the gallery")
    .setInputFiles({ name: "gauges.png", mimeType: "image/png", buffer: TINY_PNG });
  await expect(photos.getByRole("img", { name: "Gauges photo, on this device" })).toBeVisible();
  await expect(photos.getByText("Waiting to send")).toBeVisible();
  await expect(page.getByTestId("outbox-waiting")).toHaveText("6 entries waiting to send.");
  const kept = await outboxEntries(page);
  expect(kept).toHaveLength(6);

  // Still there after a reload with no network, the photo included.
  await page.reload();
  await expect(page.getByTestId("outbox-waiting")).toHaveText("6 entries waiting to send.");
  await expect(photos.getByRole("img", { name: "Gauges photo, on this device" })).toBeVisible();

  await context.setOffline(false);
  await expect(page.getByRole("region", { name: "Entries on this device" })).toBeHidden({ timeout: 30_000 });
  await expect(page.getByTestId("outbox-waiting")).toBeHidden();
  await expect(photos.getByRole("img", { name: "Gauges photo" })).toBeVisible();
  const visit = (await (await page.request.get(`/api/visits/${visitId}`)).json()) as {
    visit: {
      readings: { takenAt: string; input: { suctionLineTempC: number } }[];
      adjustments: { at: string; description: string }[];
      photos: { kind: string; takenAt: string; url: string }[];
    };
  };
  const { readings, adjustments, photos: storedPhotos } = visit.visit;
  expect(readings).toHaveLength(3);
  expect(adjustments.map((adjustment) => adjustment.description)).toEqual(["Cleaned the return air filter"]);
  expect(storedPhotos.map((photo) => photo.kind)).toEqual(["gauges"]);
  expect((await page.request.get(storedPhotos[0]!.url)).headers()["content-type"]).toBe("image/png");
  // Each with the time it was taken on the device, not the time it reached the server.
  const storedTimes = [...readings.map((reading) => reading.takenAt), adjustments[0]!.at, storedPhotos[0]!.takenAt]
    .map(Date.parse)
    .sort();
  const keptTimes = kept.filter((entry) => !entry.path.includes("/evacuations/"));
  expect(storedTimes).toEqual(keptTimes.map((entry) => Date.parse(entry.takenAt)).sort());
  // The sample, at the minute typed on the device.
  const evacuations = (await (await page.request.get(`/api/visits/${visitId}/evacuations`)).json()) as {
    evacuations: { samples: { minutes: number; microns: number }[] }[];
  };
  expect(evacuations.evacuations[0]!.samples).toEqual([expect.objectContaining({ minutes: 12, microns: 2400 })]);
  expect(readings.map((reading) => reading.input.suctionLineTempC).sort()).toEqual([13, 14, 15]);
});

test("an entry the server refuses on arrival stays on the device with the reason; the others are stored", async ({
  page,
  context,
  playwright,
  baseURL,
}) => {
  await signInOnToday(page);
  const stays = await startVisitOn(page, RTU_1, "Stays open while offline");
  // On the split, not RTU-1: other specs read the demo's RTU-1 visit awaiting review, and this
  // one goes for review too. R32 near 5 °C evaporating and 44 °C condensing (memory, round figures).
  const closes = await startVisitOn(page, /Server cupboard wall split/, "Submitted meanwhile");
  await keptForOffline(page, stays);
  await keptForOffline(page, closes);

  await context.setOffline(true);
  await page.goto(`/visits/${stays}`);
  await saveRtuReading(page, "13");
  await page.goto(`/visits/${closes}`);
  await saveKeptReading(page, { suction: "850", suctionLine: "12", liquid: "2690", liquidLine: "40" });

  // Meanwhile, from another device, the second visit goes for review: it takes no more readings.
  const office = await playwright.request.newContext({ baseURL });
  expect(
    (
      await office.post("/api/auth/sign-in", { data: { email: "tech@bellbird.example", password: DEMO_PASSWORD } })
    ).status(),
  ).toBe(200);
  expect((await office.post(`/api/visits/${closes}/review`, { data: { action: "submit" } })).status()).toBeLessThan(
    300,
  );

  await context.setOffline(false);
  const onDevice = page.getByRole("region", { name: "Entries on this device" });
  await expect(onDevice.getByText("Refused by the server:")).toBeVisible({ timeout: 30_000 });
  await expect(page.getByText("1 entry refused by the server: see the visit.")).toBeVisible();
  const stored = (await (await office.get(`/api/visits/${stays}`)).json()) as { visit: { readings: unknown[] } };
  expect(stored.visit.readings).toHaveLength(1);
  const refused = (await (await office.get(`/api/visits/${closes}`)).json()) as { visit: { readings: unknown[] } };
  expect(refused.visit.readings).toHaveLength(0);

  // Still on the device after a reload, until the technician discards it.
  await page.reload();
  await expect(onDevice.getByText("Refused by the server:")).toBeVisible();
  await onDevice.getByRole("button", { name: "Discard" }).click();
  await expect(onDevice).toBeHidden();
  await office.dispose();
});

test("a comment, a refrigerant movement and a void wait on the device too; when the session ends they wait for the same person, never another", async ({
  page,
  context,
  playwright,
  baseURL,
}) => {
  await signInOnToday(page);
  // On the cool room, with a cylinder of its own: other specs count the rooftop unit's register
  // lines and the demo cylinders' contents.
  const cylinder = await page.request.post("/api/cylinders", {
    data: {
      label: "OFF-404A-N1",
      kind: "new",
      refrigerant: "R404A",
      waterCapacityKg: 11,
      tareKg: 6,
      initialContentsKg: 9,
    },
  });
  expect(cylinder.status()).toBe(201);
  const visitId = await startVisitOn(page, /Vaccine and stores cool room/, "Session ends in the plant room");
  // One reading stored with signal, to be voided without it. R404A near −28 °C evaporating and
  // 40 °C condensing: about 120 and 1730 kPa gauge (the engine's tables, rounded).
  const stored = await page.request.post(`/api/visits/${visitId}/readings`, {
    data: { circuit: 1, suctionPressureKPa: 120, suctionLineTempC: -22, liquidPressureKPa: 1730, liquidLineTempC: 36 },
  });
  expect(stored.status()).toBe(201);
  await page.reload();
  await page.getByText("Recorded entries (to check or void)").click();
  await expect(page.getByRole("button", { name: /^Void the reading of / })).toBeVisible();
  // The Refrigerant section opened once with signal holds the cylinders for later.
  await page.goto(`/visits/${visitId}?section=refrigerant`);
  await expect(page.getByRole("form", { name: "Log a refrigerant movement" })).toBeVisible();
  await keptForOffline(page, visitId);

  await context.setOffline(true);
  await page.goto(`/visits/${visitId}?section=refrigerant`);
  const movement = page.getByRole("form", { name: "Log a refrigerant movement" });
  await movement.getByLabel("What happened").selectOption("added-new");
  await movement.getByLabel("Mass").fill("0.30");
  await movement
    .getByLabel("Cylinder", { exact: true })
    .selectOption({ label: "OFF-404A-N1 · New (virgin) · holds 9.00 kg" });
  await movement.getByRole("button", { name: "Log movement" }).click();
  await expect(
    movement.getByText(/kept on this device \(\d\d:\d\d\); it goes in the register when the signal returns/),
  ).toBeVisible();

  await page.getByRole("radio", { name: "Run log" }).click();
  await page.getByText("Recorded entries (to check or void)").click();
  await page.getByRole("button", { name: /^Void the reading of / }).click();
  const dialog = page.getByRole("dialog", { name: /Void the reading/ });
  await dialog.getByLabel("Reason (required)").fill("Gauge still settling");
  await dialog.getByRole("button", { name: "Void the record" }).click();
  await expect(dialog).toBeHidden();
  await expect(page.getByText("Void waiting to send")).toBeVisible();

  await page.getByLabel("Add a comment").fill("Condenser coil needs a wash next visit");
  await page.getByRole("button", { name: "Post comment" }).click();
  await expect(page.getByText("Comment: “Condenser coil needs a wash next visit”")).toBeVisible();
  await expect(page.getByTestId("outbox-waiting")).toHaveText("3 entries waiting to send.");

  // The session ends while the device is offline (here: its cookie is gone). Back online, the
  // first send is refused as signed out: the app goes to the sign-in screen and keeps the entries.
  await context.clearCookies();
  await context.setOffline(false);
  await expect(page.getByRole("heading", { name: "Sign in" })).toBeVisible({ timeout: 30_000 });
  expect(await outboxEntries(page)).toHaveLength(3);

  // Someone else signs in on the device: they neither see nor send the first person's entries.
  await signIn(page, "apprentice@bellbird.example");
  // Back on the screen the session ended on, as the apprentice.
  await expect(page.getByRole("heading", { name: "Vaccine and stores cool room" })).toBeVisible();
  await expect(page.getByRole("region", { name: "Comments" }).getByText("No comments yet.")).toBeVisible();
  await expect(page.getByTestId("outbox-waiting")).toBeHidden();
  await expect(page.getByText("Void waiting to send")).toBeHidden();
  const office = await playwright.request.newContext({ baseURL });
  expect(
    (
      await office.post("/api/auth/sign-in", { data: { email: "tech@bellbird.example", password: DEMO_PASSWORD } })
    ).status(),
  ).toBe(200);
  const visitNow = async () =>
    (
      (await (await office.get(`/api/visits/${visitId}`)).json()) as {
        visit: {
          comments: { body: string }[];
          readings: { voided: unknown }[];
          adjustments: { description: string; amountKg: number | null }[];
        };
      }
    ).visit;
  expect((await visitNow()).comments).toHaveLength(0);
  expect(await outboxEntries(page)).toHaveLength(3);
  await signOut(page);

  // The same person signs in again: the entries go, each stored once.
  await signIn(page, "tech@bellbird.example");
  await expect(page.getByRole("heading", { name: "Today" })).toBeVisible();
  await expect.poll(async () => (await outboxEntries(page)).length, { timeout: 30_000 }).toBe(0);
  const visit = await visitNow();
  expect(visit.comments.map((comment) => comment.body)).toEqual(["Condenser coil needs a wash next visit"]);
  expect(visit.readings).toEqual([
    expect.objectContaining({ voided: expect.objectContaining({ reason: "Gauge still settling" }) }),
  ]);
  // The movement is also the run log's charge adjustment (one entry, one figure).
  expect(visit.adjustments.map((adjustment) => adjustment.amountKg)).toEqual([0.3]);
  // Voided again (a voided line leaves the company register's list), for the register spec's count.
  const register = (await (await office.get(`/api/visits/${visitId}/refrigerant`)).json()) as {
    movements: { id: string }[];
  };
  expect(register.movements).toHaveLength(1);
  expect(
    (
      await office.post(`/api/visits/${visitId}/voids`, {
        data: { kind: "movement", recordId: register.movements[0]!.id, reason: "Test entry, not a real charge" },
      })
    ).status(),
  ).toBe(201);
  await office.dispose();
});

test("an evacuation started with no network takes its readings on the device, judged as they are entered, and reaches the server in order", async ({
  page,
  context,
}) => {
  await signInOnToday(page);
  const visitId = await startVisitOn(page, RTU_1, "Evacuation begun offline");
  await page.goto(`/visits/${visitId}?section=evacuation`);
  await expect(page.getByRole("button", { name: "Start the evacuation" })).toBeVisible();
  await keptForOffline(page, visitId);
  await evacuationsKeptForOffline(page, visitId);

  await context.setOffline(true);
  await page.goto(`/visits/${visitId}?section=evacuation`);
  await page.getByRole("button", { name: "Start the evacuation" }).click();
  const current = page.getByRole("region", { name: /^Evacuation started/ });
  await expect(current.getByText("On this device: waiting to send, with its readings")).toBeVisible();
  // Two readings, the second under the 500-micron target: the device says it is reached at once.
  for (const [minutes, microns] of [
    ["10", "2400"],
    ["25", "450"],
  ] as const) {
    await page.getByLabel("Time from start", { exact: true }).fill(minutes);
    await page.getByLabel("Vacuum reading", { exact: true }).fill(microns);
    await page.getByRole("button", { name: "Add reading" }).click();
    await expect(current.getByText(new RegExp(`last [\\d ,]+ µm at ${minutes}\\.0 min`))).toBeVisible();
  }
  await expect(current.getByText("target reached at 25.0 min")).toBeVisible();
  await expect(current.getByRole("button", { name: "Pump valved off" })).toBeDisabled();
  await expect(page.getByTestId("outbox-waiting")).toHaveText("3 entries waiting to send.");
  const kept = await outboxEntries(page);

  // Still there after a reload with no network.
  await page.reload();
  await expect(current.getByText("target reached at 25.0 min")).toBeVisible();

  await context.setOffline(false);
  await expect(page.getByTestId("outbox-waiting")).toBeHidden({ timeout: 30_000 });
  await expect(current.getByText("On this device: waiting to send, with its readings")).toBeHidden();
  const stored = (await (await page.request.get(`/api/visits/${visitId}/evacuations`)).json()) as {
    evacuations: {
      startedAt: string;
      samples: { minutes: number; microns: number }[];
      result: { reached: { reached: boolean } };
    }[];
  };
  expect(stored.evacuations).toHaveLength(1);
  const [evacuation] = stored.evacuations;
  expect(evacuation!.samples.map(({ minutes, microns }) => [minutes, microns])).toEqual([
    [10, 2400],
    [25, 450],
  ]);
  expect(evacuation!.result.reached.reached).toBe(true);
  // Started at the time the device kept, not when it reached the server.
  const started = kept.find((entry) => entry.path.endsWith("/evacuations"))!;
  expect(Date.parse(evacuation!.startedAt)).toBe(Date.parse(started.takenAt));
});
