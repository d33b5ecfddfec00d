import AxeBuilder from "@axe-core/playwright";
import { expect, test } from "@playwright/test";
import { signIn } from "./sign-in.ts";

// WCAG 2.1 A and AA rules as axe-core implements them.
const WCAG_TAGS = ["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"];

test.describe("account screens accessibility", () => {
  test("sign-in, sign-up and forgot-password pass axe, with errors shown", async ({ page }) => {
    for (const path of ["/sign-in", "/sign-up", "/forgot-password"]) {
      await page.goto(path);
      await page.getByRole("button").last().waitFor();
      // Submit empty so the field messages are on screen too.
      await page.locator("form button[type=submit]").click();
      await expect(page.getByText(/^⚠/).first()).toBeVisible();
      const results = await new AxeBuilder({ page }).withTags(WCAG_TAGS).analyze();
      expect(results.violations, `${path}: ${results.violations.map((v) => v.id).join(", ")}`).toEqual([]);
    }
  });

  test("members and profile pass axe for an owner", async ({ page }) => {
    await page.goto("/members");
    await signIn(page, "owner@bellbird.example");
    await expect(page.getByRole("heading", { name: "Members" })).toBeVisible();
    await expect(page.getByRole("cell", { name: "Sam Toko", exact: true })).toBeVisible();
    let results = await new AxeBuilder({ page }).withTags(WCAG_TAGS).analyze();
    expect(results.violations, results.violations.map((v) => v.id).join(", ")).toEqual([]);

    await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Profile" }).click();
    await expect(page.getByLabel("Your name")).toHaveValue("Dana Whitlock");
    results = await new AxeBuilder({ page }).withTags(WCAG_TAGS).analyze();
    expect(results.violations, results.violations.map((v) => v.id).join(", ")).toEqual([]);
  });
});
