import { expect, test } from "@playwright/test";
import { signInAndStartVisit } from "./start-visit.ts";

test.describe("standing-pressure check", () => {
  test("a technician on a phone reads the standing pressure, sees the verdict as they type, and records it", async ({
    page,
  }) => {
    await page.setViewportSize({ width: 390, height: 844 });
    await signInAndStartVisit(page, "High head pressure after a compressor change", {
      unit: /Server cupboard wall split/,
    });

    await page.getByRole("radio", { name: "Standing pressure" }).click();
    await expect(page.getByRole("region", { name: "Caution: Pressure", exact: true })).toBeVisible();
    await expect(
      page.getByText("until the air leaving the coil is the same temperature as the air entering it"),
    ).toBeVisible();

    // R32 at 25 °C saturates at about 1589 kPa g at the clinic's 85 m (engine tables, ISO 2533
    // atmosphere): 1600 kPa g is 0.2 K over, within the ±1 K allowance; 1850 kPa g is 5.5 K over,
    // beyond the 3 K (5 °F) limit for non-condensables [S31].
    await page.getByLabel("Equalised temperature", { exact: true }).fill("25");
    await page.getByLabel("Standing pressure", { exact: true }).fill("1600");
    const preview = page.getByTestId("standing-preview");
    await expect(preview).toContainText("Preview: No air shown");
    await expect(preview.getByTestId("standing-expected")).toHaveText("1589 kPa g");
    await page.getByLabel("Standing pressure", { exact: true }).fill("1850");
    await expect(preview).toContainText("Preview: Non-condensables");
    await expect(preview.getByTestId("standing-excess")).toHaveText("+5.5 K");

    await page.getByRole("button", { name: "Save standing-pressure check" }).click();
    const saved = page.getByRole("article", { name: "Standing-pressure check" });
    await expect(saved).toContainText("Standing pressure — R32");
    await expect(saved).toContainText("Non-condensables");
    await expect(saved).toContainText("Recover, evacuate and recharge by weight");
    await expect(saved).toContainText("[S31]");
    await expect(page.getByLabel("Standing pressure", { exact: true })).toHaveValue("");

    await page.getByRole("link", { name: "Visit report" }).click();
    const report = page
      .getByRole("article", { name: "Visit report" })
      .getByRole("region", { name: "Standing pressure" });
    await expect(report.getByRole("article", { name: "Standing-pressure check" })).toContainText("Non-condensables");
  });
});
