import AxeBuilder from "@axe-core/playwright";
import { expect, test, type Page } from "@playwright/test";
import { DEMO_PASSWORD } from "./sign-in.ts";

// WCAG 2.1 A and AA rules (axe-core tags), as in the other accessibility checks.
const WCAG_TAGS = ["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"];

/** Built-in cases asking the charge to add (issue 14; data/casebook/built-in-cases.json). */
const REFERENCE_CASE = "banksia-dental-txv-how-much-to-add";
const NO_ESTIMATE_CASE = "wattle-lane-cool-room-how-much-to-add";

/** Signs the demo apprentice in through the API; the page shares the cookie. */
async function asApprentice(page: Page) {
  const signIn = await page.request.post("/api/auth/sign-in", {
    data: { email: "apprentice@bellbird.example", password: DEMO_PASSWORD },
  });
  expect(signIn.status()).toBe(200);
}

/** Fills the usual five answers and the reasoning; the charge to add is left to each test. */
async function usualAnswers(page: Page, answers: [string, string, string, string], state: string, reasoning: string) {
  await page.getByLabel("Evaporating saturation temperature").fill(answers[0]);
  await page.getByLabel("Condensing saturation temperature").fill(answers[1]);
  await page.getByLabel("Superheat", { exact: true }).fill(answers[2]);
  await page.getByLabel("Subcooling", { exact: true }).fill(answers[3]);
  await page.getByLabel("Charge state").selectOption({ label: state });
  await page.getByLabel("Your reasoning, in one line").fill(reasoning);
}

test.describe("casebook: the charge to add", () => {
  test.describe.configure({ timeout: 120_000 });

  test("on a phone, asks the charge to add without showing the range, marks it within the estimate's range and shows the plan", async ({
    page,
  }) => {
    await page.setViewportSize({ width: 390, height: 844 });
    await asApprentice(page);
    await page.goto(`/casebook/cases/${REFERENCE_CASE}`);
    await expect(page.getByTestId("charge-reference")).toContainText("6.2");
    await expect(page.getByTestId("reading-chargeKg")).toContainText("3.2");
    // the rule is stated, the range (Li & Braun 2009 estimate 0.55 kg, 0.30–0.80) is not shown before answering
    const form = page.getByRole("form", { name: "Your working" });
    await expect(form).toContainText("right when it lies within the range of the engine's estimate");
    await expect(page.locator("body")).not.toContainText("0.80");
    await expect(page.locator("body")).not.toContainText("0.55");

    await usualAnswers(
      page,
      ["5", "41", "12", "2"],
      "Undercharged",
      "2 K against its own 6.2 K: about half a kilo short",
    );
    // keyboard: type the amount and submit with Enter from the field
    await page.getByLabel("Charge to add").fill("0.7");
    await page.getByLabel("Charge to add").press("Enter");

    const result = page.getByTestId("attempt-result");
    await expect(result.getByRole("heading", { name: "All right — 6 of 6 right" })).toBeVisible({ timeout: 20_000 });
    await expect(page.getByTestId("mark-chargeToAddKg")).toContainText("yours +0.70 kg · estimate +0.55 kg");
    await expect(page.getByTestId("mark-chargeToAddKg")).toContainText("right from +0.30 kg to +0.80 kg");
    const estimate = page.getByTestId("charge-to-add-result");
    await expect(estimate).toContainText("Add about 0.55 kg (range 0.30–0.80 kg)");
    await expect(estimate).toContainText("own reference point");
    // the charging plan (common practice: charge in steps, liquid for a blend)
    await expect(page.getByTestId("charge-to-add-plan")).toContainText("in 2 steps of 0.3 kg as liquid");

    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    const results = await new AxeBuilder({ page })
      .include("[data-testid=attempt-result]")
      .include("[data-testid=charge-to-add-result]")
      .withTags(WCAG_TAGS)
      .analyze();
    expect(results.violations, results.violations.map((violation) => violation.id).join(", ")).toEqual([]);
  });

  test("marks a blank right when the engine gives no estimate, and says why", async ({ page }) => {
    await asApprentice(page);
    await page.goto(`/casebook/cases/${NO_ESTIMATE_CASE}`);
    await usualAnswers(page, ["-14", "34", "11", "0.5"], "Undercharged", "Receiver: subcooling cannot say how much");
    await page.getByRole("button", { name: "Check my answers" }).click();
    await expect(page.getByTestId("mark-chargeToAddKg")).toContainText("Charge to add: right", { timeout: 20_000 });
    await expect(page.getByTestId("mark-chargeToAddKg")).toContainText("yours blank · estimate none");
    await expect(page.getByTestId("charge-to-add-result")).toContainText("receiver");
  });

  test("a senior's own case asks the charge to add once the circuit's correct charge is given", async ({ page }) => {
    await page.setViewportSize({ width: 390, height: 844 });
    const signIn = await page.request.post("/api/auth/sign-in", {
      data: { email: "senior@bellbird.example", password: DEMO_PASSWORD },
    });
    expect(signIn.status()).toBe(200);
    await page.goto("/casebook/new");
    await page.getByLabel("Suction pressure (low side)").fill("833");
    await page.getByLabel("Suction line temperature").fill("17");
    await page.getByLabel("Liquid pressure (high side)").fill("2390");
    await page.getByLabel("Liquid line temperature").fill("39");
    await page.getByLabel(/^Target subcooling/).fill("6");
    await page.getByLabel(/^Outdoor air/).fill("33");
    const preview = page.getByRole("complementary", { name: "Preview: the answers" });
    await expect(preview).toContainText("No charge-to-add question: Enter the circuit's correct charge");
    await page.getByLabel(/^Correct charge/).fill("2.8");
    // generic coefficients (Li & Braun 2009 defaults): no reference point in an authored case
    await expect(preview).toContainText("Apprentices are also asked the charge to add, right from +");
    await expect(preview).toContainText("generic coefficients, a wide range");
    await expect(preview.getByTestId("preview-charge-to-add")).toContainText("+");
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
  });
});
