import { expect, test } from "@playwright/test";
import { signIn } from "./sign-in.ts";

/** The visit report on a phone: charts shrink to the screen, nothing pushes the page sideways. */
test.describe("visit report on a phone", () => {
  test.use({ viewport: { width: 390, height: 844 } });

  test("fits 390 px without horizontal scroll", async ({ page }) => {
    await page.goto("/jobs");
    await signIn(page, "tech@bellbird.example");
    await expect(page.getByRole("heading", { name: "Jobs" })).toBeVisible();
    const { visits } = (await (await page.request.get("/api/visits")).json()) as {
      visits: { id: string; readingCount: number }[];
    };
    const withReadings = visits.find((visit) => visit.readingCount > 0)!;
    await page.goto(`/visits/${withReadings.id}/report`);
    const report = page.getByRole("article", { name: "Visit report" });
    await expect(report.getByRole("heading", { name: "Circuit 1" })).toBeVisible();
    await expect(report.getByTestId("trend-chart").or(report.locator(".recharts-wrapper")).first()).toBeVisible();
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
  });
});
