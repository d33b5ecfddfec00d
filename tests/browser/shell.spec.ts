import { expect, test } from "@playwright/test";
import { signIn } from "./sign-in.ts";

test.describe("app shell", () => {
  test("loads, navigates, and keeps Sunlight mode across a reload", async ({ page }) => {
    await page.goto("/");
    await signIn(page, "tech@bellbird.example");
    await expect(page).toHaveURL(/\/$/);
    await expect(page.getByRole("heading", { name: "Today" })).toBeVisible();
    await expect(page.getByText(/Server connected/)).toBeVisible();
    await expect(page.getByRole("region", { name: "Visits in progress" })).toBeVisible();

    await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Safety" }).click();
    await expect(page).toHaveURL(/\/safety$/);
    await expect(page.getByRole("heading", { name: "Safety on the job" })).toBeVisible();

    const toggle = page.getByRole("switch", { name: /Sunlight/ });
    await expect(toggle).toHaveAttribute("aria-checked", "false");
    await toggle.click();
    await expect(toggle).toHaveAttribute("aria-checked", "true");
    await expect(page.locator("html")).toHaveAttribute("data-theme", "sunlight");

    await page.reload();
    await expect(page.locator("html")).toHaveAttribute("data-theme", "sunlight");
    await expect(page.getByRole("switch", { name: /Sunlight/ })).toHaveAttribute("aria-checked", "true");
    // Sunlight mode really changes what is drawn: white page, larger type.
    const look = await page.evaluate(() => ({
      background: getComputedStyle(document.body).backgroundColor,
      fontSize: getComputedStyle(document.documentElement).fontSize,
    }));
    expect(look.background).toBe("rgb(255, 255, 255)");
    expect(look.fontSize).toBe("19px");
  });

  test("shows a not-found page for an unknown address", async ({ page }) => {
    // Without a session the app asks to sign in first, then comes back to the address asked for.
    await page.goto("/no/such/screen");
    await expect(page).toHaveURL(/\/sign-in\?next=%2Fno%2Fsuch%2Fscreen$/);
    await signIn(page, "senior@bellbird.example");
    await expect(page).toHaveURL(/\/no\/such\/screen$/);
    await expect(page.getByRole("heading", { name: "Page not found" })).toBeVisible();
    await page.getByRole("link", { name: "Back to Today" }).click();
    await expect(page.getByRole("heading", { name: "Today" })).toBeVisible();
  });
});
