import { expect, type Page } from "@playwright/test";

/** The demo password of every Bellbird person (server/db/seed/demo-scenario.ts). */
export const DEMO_PASSWORD = "bellbird-demo-2026";

/** Fills the sign-in form on the current page (the app redirects there without a session). */
export async function signIn(page: Page, email: string, password = DEMO_PASSWORD) {
  await expect(page.getByRole("heading", { name: "Sign in" })).toBeVisible();
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password", { exact: true }).fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
}

export async function signOut(page: Page) {
  await page.getByRole("button", { name: "Sign out" }).click();
  await expect(page.getByRole("heading", { name: "Sign in" })).toBeVisible();
}
