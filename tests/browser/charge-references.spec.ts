import AxeBuilder from "@axe-core/playwright";
import { expect, test } from "@playwright/test";
import { signIn } from "./sign-in.ts";

// WCAG 2.1 A and AA rules as axe-core implements them.
const WCAG_TAGS = ["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"];

test.describe("charge reference points", () => {
  test("on a phone a senior reads circuit 1's reference point and can set one from a reading by keyboard", async ({
    page,
  }) => {
    await page.setViewportSize({ width: 390, height: 844 });
    await page.goto("/equipment");
    await signIn(page, "senior@bellbird.example");
    await page
      .getByRole("link", { name: /RTU-1 packaged rooftop unit/ })
      .first()
      .click();
    await expect(page.getByRole("heading", { name: "Charge reference points" })).toBeVisible();

    // The demo: circuit 1 settled after yesterday's weigh-in; circuit 2 has none yet.
    const first = page.getByRole("article", { name: "Circuit 1 reference point" });
    await expect(first).toContainText("Settled after a weigh-in");
    await expect(first).toContainText("by Sam Toko");
    await expect(first.getByText("Earlier reference points (1)")).toBeVisible();
    await expect(page.getByRole("article", { name: "Circuit 2 reference point" })).toContainText(
      "No reference point yet",
    );
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    // This panel only: the nameplate's circuit table scrolls sideways on a phone without a focus stop (a separate finding).
    const panel = new AxeBuilder({ page })
      .include('section[aria-labelledby="charge-reference-heading"]')
      .withTags(WCAG_TAGS);
    expect((await panel.analyze()).violations).toEqual([]);

    const second = page.getByRole("article", { name: "Circuit 2 reference point" });
    await second.getByRole("button", { name: "Set from a reading…" }).focus();
    await page.keyboard.press("Enter");
    const dialog = page.getByRole("dialog", { name: "Set circuit 2’s reference point" });
    await expect(dialog).toBeVisible();
    // The repair visit three weeks ago logged circuit 2.
    const repair = await dialog
      .getByLabel("Visit")
      .locator("option", { hasText: "Circuit 2 trips on high pressure" })
      .getAttribute("value");
    await dialog.getByLabel("Visit").selectOption(repair!);
    await expect(dialog.getByLabel("Reading")).toBeVisible();
    await dialog.getByLabel("Reading").selectOption({ index: 1 });
    await dialog.getByRole("button", { name: "Set the reference point" }).click();
    await expect(dialog).toBeHidden();
    await expect(second).toContainText("Set by a senior");
    await expect(second).toContainText("by Priya Raman");
  });
});
