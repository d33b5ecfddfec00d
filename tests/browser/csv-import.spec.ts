import { expect, test } from "@playwright/test";
import { signInAndStartVisit } from "./start-visit.ts";

/**
 * R407C gauge pressures (kPa) at the demo clinic (100.308 kPa at 85 m, ISO 2533): dew 6 °C and
 * bubble 42 °C, as in run-log.spec.ts (Playwright's loader cannot import the JSON tables).
 */
const SUCTION_DEW_6 = "465";
const LIQUID_BUBBLE_42 = "1736";

/** A logger's export: a time column, the four pressures and temperatures, and a probe it names its own way. */
const LOG = [
  "Time,Suction pressure kPa,Suction temp C,Liquid pressure kPa,Liquid temp C,Probe 7",
  ...[0, 1, 2, 3].map((minute) => `00:0${minute},${SUCTION_DEW_6},12,${LIQUID_BUBBLE_42},37,31`),
].join("\n");

test("a logged series is mapped in the browser and sent once, with its mapping, to import", async ({ page }) => {
  const visitId = await signInAndStartVisit(page, "Logger data from the weekend");
  const imports: string[] = [];
  page.on("request", (request) => {
    if (request.url().endsWith("/readings/import")) imports.push(request.method());
  });
  await page.getByText("Import a logged series (CSV)").first().click();
  await page
    .getByLabel("CSV file")
    .first()
    .setInputFiles({ name: "log.csv", mimeType: "text/csv", buffer: Buffer.from(LOG) });

  const column = (header: string) => page.getByRole("combobox", { name: new RegExp(`^${header}`) });
  await expect(column("Time")).toHaveValue("takenAt");
  await expect(column("Suction pressure kPa")).toHaveValue("suctionPressureKPa");
  await expect(column("Probe 7")).toHaveValue("ignore");
  await column("Probe 7").selectOption("outdoorAirDryBulbC");
  expect(imports).toHaveLength(0);

  await page.getByRole("button", { name: "Import all rows" }).click();
  await expect(page.getByText("4 reading(s) imported into circuit 1")).toBeVisible();
  expect(imports).toEqual(["POST"]);
  // The column mapped by hand went with the file: its figures are the readings' outdoor air.
  const visit = (await (await page.request.get(`/api/visits/${visitId}`)).json()) as {
    visit: { readings: { input: { outdoorAirDryBulbC?: number } }[] };
  };
  expect(visit.visit.readings.map((reading) => reading.input.outdoorAirDryBulbC)).toEqual([31, 31, 31, 31]);
});
