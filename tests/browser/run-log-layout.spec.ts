import { expect, test, type Page } from "@playwright/test";
import { DEMO_PASSWORD } from "./sign-in.ts";
import { signInAndStartVisit } from "./start-visit.ts";

/**
 * R407C gauge pressures (kPa) at the demo clinic's 100.308 kPa atmosphere, as in run-log.spec.ts
 * (Satura's table, checked against the Lemmon 2003 equations in tests/engine/properties):
 * 447 kPa ≈ 5 °C dew, 1736 kPa ≈ 42 °C bubble.
 */
const SUCTION_DEW_5C = "447";
const LIQUID_BUBBLE_42C = "1736";
/** Pages and charts load lazily; allow for a machine shared with other builds. */
const LOADED = { timeout: 20_000 };

async function startVisit(page: Page, reason: string) {
  await signInAndStartVisit(page, reason, { wait: LOADED });
  await expect(page.getByLabel("Suction pressure", { exact: true })).toBeVisible(LOADED);
}

async function enterReading(page: Page) {
  const fill = (label: string, value: string) => page.getByLabel(label, { exact: true }).fill(value);
  await fill("Suction pressure", SUCTION_DEW_5C);
  await fill("Suction line temperature", "11");
  await fill("Liquid pressure", LIQUID_BUBBLE_42C);
  await fill("Line temperature for subcooling", "37");
  await fill("Running since start or last change", "20");
  // 6 K superheat, 5 K subcooling (the values above): the finding is ready.
  await expect(page.getByTestId("superheat")).toHaveText("6.0");
  await expect(page.getByTestId("subcooling")).toHaveText("5.0");
}

/** The demo visit awaiting review (RTU-1, R407C, a settled run with two adjustments; server/db/seed). */
async function demoVisitId(page: Page): Promise<string> {
  const response = await page.request.post("/api/auth/sign-in", {
    data: { email: "senior@bellbird.example", password: DEMO_PASSWORD },
  });
  expect(response.status()).toBe(200);
  const { visits } = (await (await page.request.get("/api/visits?status=awaiting-review")).json()) as {
    visits: { id: string; equipmentName: string }[];
  };
  return visits.find((visit) => visit.equipmentName === "RTU-1 packaged rooftop unit")!.id;
}

test.describe("run log layout", () => {
  test.describe("on a phone (390 × 844)", () => {
    test.use({ viewport: { width: 390, height: 844 } });

    test("a focused field's derived values stay above the save bar; evidence is folded and opens on a tap", async ({
      page,
    }) => {
      await startVisit(page, "Layout on a phone");
      await enterReading(page);

      // The last field of the liquid card: its saturation and subcooling sit below it, on the derived line.
      await page.evaluate(() => window.scrollTo(0, 0));
      await page.getByLabel("Line temperature for subcooling", { exact: true }).focus();
      const saveBar = page.getByTestId("save-bar");
      for (const testId of ["condensing-temp", "subcooling"]) {
        await expect(async () => {
          const derived = (await page.getByTestId(testId).boundingBox())!;
          const bar = (await saveBar.boundingBox())!;
          expect(derived.y + derived.height).toBeLessThanOrEqual(bar.y);
          expect(derived.y).toBeGreaterThanOrEqual(0);
        }).toPass();
      }
      // Still one column: the live line rides in the save bar.
      await expect(page.getByTestId("live-line")).toBeVisible();

      // Evidence folded by default; a tap on "Why: N points" opens it.
      const evidence = page.getByTestId("evidence");
      await expect(evidence).not.toHaveAttribute("open");
      await expect(page.getByRole("list", { name: "Evidence" })).toBeHidden();
      await evidence.getByText(/^Why: \d+ points?$/).click();
      const list = page.getByRole("list", { name: "Evidence" });
      await expect(list).toBeVisible();
      await expect(list).toContainText("Superheat");

      // Each line's source sits behind its own small disclosure, reachable from the keyboard.
      const firstLine = list.getByRole("listitem").first();
      const source = firstLine.locator("details");
      await expect(source).not.toHaveAttribute("open");
      await source.locator("summary").focus();
      await page.keyboard.press("Enter");
      await expect(source).toHaveAttribute("open");
      await expect(source.locator("p")).toBeVisible();
    });
  });

  test.describe("on a tablet (1024 × 768)", () => {
    test.use({ viewport: { width: 1024, height: 768 } });

    test("the finding stands beside the fields and stays in view while the last fields are typed", async ({ page }) => {
      await startVisit(page, "Layout on a tablet");
      await enterReading(page);

      const form = page.getByRole("form", { name: "New reading, circuit 1" });
      const finding = page.getByRole("region", { name: "Finding" });
      const formBox = (await form.boundingBox())!;
      const findingBox = (await finding.boundingBox())!;
      // Side by side: the finding to the right of the fields, both starting within one screen.
      expect(findingBox.x).toBeGreaterThanOrEqual(formBox.x + formBox.width);
      expect(findingBox.y).toBeLessThan(768);
      // The width is used: the two columns together span most of the content area (rail 224 px).
      expect(findingBox.x + findingBox.width - formBox.x).toBeGreaterThan(600);
      // Beside the finding the fields column is narrow: every typed value still shows whole.
      const clipped = await form
        .locator("input[data-reading-field]")
        .evaluateAll((inputs) =>
          (inputs as HTMLInputElement[])
            .filter((input) => input.value !== "" && input.scrollWidth > input.clientWidth)
            .map((input) => input.name),
        );
      expect(clipped).toEqual([]);

      for (const label of ["Line temperature for subcooling", "Running since start or last change"]) {
        await page.getByLabel(label, { exact: true }).focus();
        await expect(page.getByLabel(label, { exact: true })).toBeInViewport();
        await expect(page.getByTestId("charge-state")).toBeInViewport();
        await expect(page.getByTestId("charge-state")).toHaveText("Charge and flow look right");
      }
    });

    test("the report numbers the finding's sources once, with [n] markers on the evidence lines", async ({ page }) => {
      const visitId = await demoVisitId(page);
      await page.goto(`/visits/${visitId}/report`);
      const report = page.getByRole("article", { name: "Visit report" });
      await expect(report.getByRole("heading", { name: "Circuit 1" })).toBeVisible(LOADED);
      const finding = report.getByRole("region", { name: "Finding" }).first();
      const sources = finding.getByRole("list", { name: "Sources" });
      await expect(sources).toBeVisible();
      const count = await sources.getByRole("listitem").count();
      expect(count).toBeGreaterThan(0);
      await expect(sources.getByRole("listitem").first()).toContainText("[1]");
      // The evidence is printed open, without inline citations; its markers point into the list.
      const evidence = finding.getByRole("list", { name: "Evidence" });
      await expect(evidence).toBeVisible();
      await expect(evidence).not.toContainText("[S");
      const markers = await finding.locator("sup a").allTextContents();
      expect(markers.length).toBeGreaterThanOrEqual(count);
      expect(new Set(markers).size).toBe(count);
      for (const marker of markers) expect(Number(marker.replace(/[[\]]/g, ""))).toBeLessThanOrEqual(count);
    });

    test("the trend chart shades the target bands, marks the settled reading and reads in clock times", async ({
      page,
    }) => {
      const visitId = await demoVisitId(page);
      await page.goto(`/visits/${visitId}`);
      await page.getByRole("button", { name: "Open trend chart" }).click(LOADED);
      const chart = page.getByTestId("trend-chart");
      await expect(chart.locator(".recharts-line")).toHaveCount(4, LOADED);
      // Superheat and subcooling bands, from the latest reading's targets (the verdict's own bands).
      await expect(chart.locator(".recharts-reference-area")).toHaveCount(2);
      await expect(chart.getByTestId("trend-key")).toContainText(/Superheat target [\d.]+–[\d.]+ K/);
      await expect(chart.getByTestId("trend-key")).toContainText(/Settled at \d{2}:\d{2}/);
      await expect(chart.getByText(/✓ (last )?settled/)).toBeVisible();
      // Recharts draws all tick labels in one layer; the time axis's are those without a unit (K, °C).
      const labels = await chart.locator(".recharts-cartesian-axis-tick-value").allTextContents();
      const ticks = labels.filter((label) => !/K|°/.test(label));
      expect(ticks.length).toBeGreaterThanOrEqual(2);
      for (const tick of ticks) expect(tick).toMatch(/^\d{2}:\d{2}$/);
      // Round clock times: every tick on a whole multiple of the same step.
      const minutes = ticks.map((tick) => Number(tick.slice(0, 2)) * 60 + Number(tick.slice(3)));
      const step = minutes[1]! - minutes[0]!;
      for (const minute of minutes) expect(minute % step).toBe(0);
    });
  });
});
