import AxeBuilder from "@axe-core/playwright";
import { expect, test } from "@playwright/test";
import { DEMO_PASSWORD } from "./sign-in.ts";

// WCAG 2.1 A and AA rules (axe-core tags), as in the other accessibility checks.
const WCAG_TAGS = ["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"];

/** The demo visit awaiting review (RTU-1, R407C, readings on circuit 1; server/db/seed). */
async function demoVisit(page: import("@playwright/test").Page, email: string): Promise<string> {
  const signIn = await page.request.post("/api/auth/sign-in", { data: { email, password: DEMO_PASSWORD } });
  expect(signIn.status()).toBe(200);
  const { visits } = (await (await page.request.get("/api/visits?status=awaiting-review")).json()) as {
    visits: { id: string; equipmentName: string }[];
  };
  return visits.find((visit) => visit.equipmentName === "RTU-1 packaged rooftop unit")!.id;
}

/** The diagram waits for its refrigerant's table and the chart's chunk: allow for a busy machine. */
const DRAWN = { timeout: 20_000 };

test.describe("measured cycle on the pressure–enthalpy diagram", () => {
  test.describe.configure({ timeout: 120_000 });
  test("is folded on a phone, draws the reading's cycle with its states table when opened, and passes axe", async ({
    page,
  }) => {
    await page.setViewportSize({ width: 390, height: 844 });
    const visitId = await demoVisit(page, "senior@bellbird.example");
    await page.goto(`/visits/${visitId}`);
    const panel = page.getByTestId("measured-cycle").first();
    await expect(panel.locator(":scope > summary")).toHaveText("Measured cycle (pressure–enthalpy)");
    await expect(page.getByTestId("ph-diagram")).toHaveCount(0);
    await panel.locator(":scope > summary").click();
    await expect(panel.getByTestId("ph-diagram")).toBeVisible(DRAWN);
    await expect(panel.getByRole("list", { name: "Key to the diagram" })).toContainText("Saturated vapour (dew)");
    const states = panel.getByRole("table");
    await expect(states.getByRole("rowheader", { name: "1 Suction (compressor inlet)" })).toBeVisible();
    await expect(states.getByRole("rowheader", { name: "4 Evaporator inlet" })).toBeVisible();
    await expect(states).toContainText("two-phase");
    await expect(panel.getByText("Refrigerating effect (1 − 4)")).toBeVisible();
    const results = await new AxeBuilder({ page })
      .include("[data-testid=measured-cycle]")
      .withTags(WCAG_TAGS)
      .analyze();
    expect(results.violations, results.violations.map((violation) => violation.id).join(", ")).toEqual([]);
  });

  test("is drawn under each circuit in the visit report", async ({ page }) => {
    const visitId = await demoVisit(page, "senior@bellbird.example");
    await page.goto(`/visits/${visitId}/report`);
    const section = page.getByRole("region", { name: "Measured cycle" }).first();
    await expect(section.getByTestId("ph-diagram")).toBeVisible(DRAWN);
    await expect(section.getByRole("table")).toContainText("Discharge (compressor outlet)");
  });

  test("a casebook case asks the refrigerating effect and discharge superheat off the diagram", async ({ page }) => {
    await demoVisit(page, "apprentice@bellbird.example");
    await page.goto("/casebook/cases/wattle-lane-rtu1-c1-cycle-on-the-chart");
    const diagram = page.getByRole("region", { name: "Measured cycle" });
    await expect(diagram.getByTestId("ph-diagram")).toBeVisible(DRAWN);
    // the question hides the enthalpies: they are read off the chart
    await expect(diagram.getByRole("columnheader", { name: /Enthalpy/ })).toHaveCount(0);
    await page.getByLabel("Evaporating saturation temperature").fill("7");
    await page.getByLabel("Condensing saturation temperature").fill("45");
    await page.getByLabel("Superheat", { exact: true }).fill("6");
    await page.getByLabel("Subcooling").fill("5");
    // stored answers (data/casebook/built-in-cases.json): 158.343 kJ/kg and 23.312 K
    await page.getByLabel("Refrigerating effect (h₁ − h₄)").fill("160");
    await page.getByLabel("Discharge superheat").fill("23");
    await page.getByLabel("Charge state").selectOption({ label: "Charge and flow look right" });
    await page.getByLabel("Your reasoning, in one line").fill("Both on target; a healthy cycle on the chart");
    await page.getByRole("button", { name: "Check my answers" }).click();
    await expect(
      page.getByTestId("attempt-result").getByRole("heading", { name: "All right — 7 of 7 right" }),
    ).toBeVisible(DRAWN);
    await expect(page.getByTestId("mark-refrigeratingEffectKJPerKg")).toContainText("correct 158.3 kJ/kg");
    // after the attempt the full working: the enthalpies appear
    await expect(
      page.getByRole("region", { name: "Measured cycle" }).getByRole("columnheader", { name: /Enthalpy/ }),
    ).toBeVisible(DRAWN);
  });
});
