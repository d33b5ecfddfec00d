import { expect, test } from "@playwright/test";
import { signIn } from "./sign-in.ts";

/**
 * The built-in case "wattle-lane-rtu1-c2-oily-flare" (data/casebook/built-in-cases.json): R407C
 * TXV, suction 393 kPa g → dew 2.0 °C, liquid 1605 kPa g → bubble 39.0 °C, suction line 17 °C
 * (superheat 15.0 K), liquid line 38 °C (subcooling 1.0 K), undercharged. The engine tests
 * prove those stored answers; Playwright's loader cannot import the JSON, so they are written here.
 */
const CASE_TITLE = "Wattle Lane RTU-1, circuit 2: waiting room warm, oily flare";

test.describe("casebook", () => {
  test("an apprentice attempts a case, gets one value wrong and sees the working", async ({ page }) => {
    await page.goto("/casebook");
    await signIn(page, "apprentice@bellbird.example");
    await expect(page.getByRole("heading", { name: "Casebook", level: 1 })).toBeVisible();
    await expect(page.getByText("No attempts yet")).toBeVisible();
    // Apprentices practise; only seniors and owners write cases.
    await expect(page.getByRole("link", { name: "New case" })).toHaveCount(0);

    await page.getByRole("link", { name: new RegExp(CASE_TITLE) }).click();
    await expect(page.getByRole("heading", { name: CASE_TITLE })).toBeVisible();
    await expect(page.getByTestId("reading-suctionPressureKPa")).toContainText("393");
    await expect(page.getByText("Author's preview")).toHaveCount(0);

    await page.getByLabel("Evaporating saturation temperature").fill("2.2"); // within ±0.5 K of 2.0
    await page.getByLabel("Condensing saturation temperature").fill("39");
    // The classic mistake: the bubble point at suction (about 6 K of glide lower) gives about 21 K.
    await page.getByLabel("Superheat").fill("20");
    await page.getByLabel("Subcooling").fill("1");
    await page.getByLabel("Charge state").selectOption({ label: "Undercharged" });
    await page.getByLabel("Your reasoning, in one line").fill("Almost no subcooling on a TXV and the valve wide open");
    await page.getByRole("button", { name: "Check my answers" }).click();

    const result = page.getByTestId("attempt-result");
    await expect(result.getByRole("heading", { name: "4 of 5 right" })).toBeVisible();
    await expect(page.getByTestId("mark-superheatK")).toContainText("not right");
    await expect(page.getByTestId("mark-superheatK")).toContainText("correct 15.0 K");
    await expect(page.getByTestId("mark-evaporatingTempC")).toContainText("right");
    await expect(page.getByTestId("mark-chargeState")).toContainText("right");

    const working = page.getByRole("list", { name: "Worked solution" });
    await expect(
      working.getByRole("heading", { name: "Evaporating temperature: suction pressure, dew column" }),
    ).toBeVisible();
    await expect(working).toContainText("zeotropic blend");
    await expect(working.getByRole("heading", { name: "Subcooling target" })).toBeVisible();
    await expect(working).toContainText("maker's target subcooling");
    await expect(page.getByRole("region", { name: "Caution: Liquid refrigerant" })).toBeVisible();
    await expect(page.getByRole("region", { name: "Caution: Pressure testing with nitrogen" })).toBeVisible();

    // The attempt counts towards progress by state and refrigerant.
    await page.getByRole("link", { name: "Casebook" }).first().click();
    const progress = page.getByRole("region", { name: "Your progress" });
    await expect(progress).toContainText("0 of 1 attempts all right");
    await expect(progress.getByRole("table", { name: "By refrigerant" })).toContainText("R407C");
  });
});
