import { expect, type Page } from "@playwright/test";
import { signIn } from "./sign-in.ts";

/** The demo's R407C rooftop unit (server/db/seed/demo-scenario.ts), where most visit specs work. */
export const RTU_1 = /RTU-1 packaged rooftop unit/;

/** How long to wait for the visit's page; the default suits most specs. */
type Wait = { timeout: number } | undefined;

/**
 * Starts a visit on a unit of the equipment list as a technician does: open the unit, give a
 * reason, start, and wait for the visit's page. Every spec that needs a fresh visit goes this
 * one way, so a change to the form changes one place.
 * @returns the visit's id
 */
export async function startVisitOn(page: Page, unit: RegExp, reason: string, wait?: Wait): Promise<string> {
  await page.goto("/equipment");
  return startVisitFromList(page, unit, reason, wait);
}

/**
 * Opens the app signed out, signs the demo technician in and starts a visit on `unit` (RTU-1
 * unless said): the opening of most visit specs.
 * @returns the visit's id
 */
export async function signInAndStartVisit(
  page: Page,
  reason: string,
  options: { unit?: RegExp; wait?: Wait } = {},
): Promise<string> {
  await page.goto("/equipment");
  await signIn(page, "tech@bellbird.example");
  return startVisitFromList(page, options.unit ?? RTU_1, reason, options.wait);
}

async function startVisitFromList(page: Page, unit: RegExp, reason: string, wait: Wait): Promise<string> {
  await page.getByRole("link", { name: unit }).first().click();
  await page.getByLabel("Reason for the visit").fill(reason);
  await page.getByRole("button", { name: "Start the visit" }).click();
  await expect(page).toHaveURL(/\/visits\/[0-9a-f-]{36}$/, wait);
  return new URL(page.url()).pathname.split("/").pop()!;
}
