import { expect, test } from "@playwright/test";
import { DEMO_PASSWORD } from "./sign-in.ts";
import { signInAndStartVisit } from "./start-visit.ts";

/**
 * A visit open on one device shows what another person records on it within the page's refresh
 * (LIVE_REFRESH_MS, 4 s), through the revision-based poll: 304 while nothing changes, then a delta.
 */
test("a reading saved from another session appears on the open visit within the refresh", async ({
  page,
  playwright,
  baseURL,
}) => {
  const visitId = await signInAndStartVisit(page, "Second technician on the roof");
  await page.getByText("Recorded entries (to check or void)").click();
  await expect(page.getByText("Nothing recorded on this circuit yet.")).toBeVisible();

  // Polls while nothing changes are answered 304, with no body.
  const quiet = await page.waitForResponse((response) => response.url().includes(`/api/visits/${visitId}?since=`));
  expect(quiet.status()).toBe(304);

  // The senior, on another device, records a reading over the API.
  const other = await playwright.request.newContext({ baseURL });
  try {
    expect(
      (
        await other.post("/api/auth/sign-in", { data: { email: "senior@bellbird.example", password: DEMO_PASSWORD } })
      ).ok(),
    ).toBe(true);
    const saved = await other.post(`/api/visits/${visitId}/readings`, {
      data: { circuit: 1, suctionPressureKPa: 465, suctionLineTempC: 12, liquidPressureKPa: 1736, liquidLineTempC: 37 },
    });
    expect(saved.status()).toBe(201);
  } finally {
    await other.dispose();
  }

  const entries = page.getByRole("list", { name: "Entries on circuit 1, newest first" });
  await expect(entries).toContainText("Priya Raman", { timeout: 10_000 });
  await expect(page.getByRole("list", { name: "Latest readings and adjustments" }).getByRole("listitem")).toHaveCount(
    1,
  );
});
