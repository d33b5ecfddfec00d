import AxeBuilder from "@axe-core/playwright";
import { expect, test } from "@playwright/test";
import { signIn } from "./sign-in.ts";

// WCAG 2.1 A and AA rules as axe-core implements them.
const WCAG_TAGS = ["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"];

test.describe("equipment", () => {
  test("a technician finds the demo units, opens the R407C rooftop unit and starts a visit", async ({ page }) => {
    await page.goto("/");
    await signIn(page, "tech@bellbird.example");
    await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Equipment" }).click();
    await expect(page).toHaveURL(/\/equipment$/);
    await expect(page.getByRole("heading", { name: "Equipment" })).toBeVisible();

    // The three invented units of the demo scenario (PRODUCT.md "Demo scenario").
    const table = page.getByRole("table");
    for (const name of ["RTU-1 packaged rooftop unit", "Server cupboard wall split", "Vaccine and stores cool room"]) {
      await expect(table.getByRole("link", { name })).toBeVisible();
    }
    // R32 is class A2L under ISO 817 / ASHRAE 34.
    await expect(table.getByRole("row", { name: /Server cupboard wall split/ })).toContainText("A2L");

    expect((await new AxeBuilder({ page }).withTags(WCAG_TAGS).analyze()).violations).toEqual([]);

    await page.getByLabel("Find a unit").fill("407C");
    await expect(table.getByRole("link")).toHaveCount(1);
    await table.getByRole("link", { name: "RTU-1 packaged rooftop unit" }).click();

    await expect(page.getByRole("heading", { name: "RTU-1 packaged rooftop unit" })).toBeVisible();
    await expect(page.getByRole("heading", { name: "Nameplate" })).toBeVisible();
    await expect(page.getByText("R407C").first()).toBeVisible();

    expect((await new AxeBuilder({ page }).withTags(WCAG_TAGS).analyze()).violations).toEqual([]);

    await page.getByLabel("Reason for the visit").fill("Quarterly service before summer");
    await page.getByRole("button", { name: "Start the visit" }).click();
    await expect(page).toHaveURL(/\/visits\/[0-9a-f-]{36}$/);
  });

  test("on a phone the units are cards, and the form says what is missing", async ({ page }) => {
    await page.setViewportSize({ width: 390, height: 844 });
    await page.goto("/equipment");
    await signIn(page, "tech@bellbird.example");
    const cards = page.getByRole("list", { name: "Equipment" });
    await expect(cards.getByRole("link")).toHaveCount(3);
    await expect(page.getByRole("table")).toBeHidden();
    // Nothing on the page is wider than the phone.
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);

    await page.getByRole("link", { name: "Add equipment" }).click();
    await page.getByRole("button", { name: "Save unit" }).click();
    await expect(page.getByText("⚠ Give the unit a name")).toBeVisible();
    // The first field with a problem takes the focus, so a keyboard or screen reader lands on it.
    await expect(page.getByLabel("Site", { exact: true })).toBeFocused();
    expect((await new AxeBuilder({ page }).withTags(WCAG_TAGS).analyze()).violations).toEqual([]);
  });
});
