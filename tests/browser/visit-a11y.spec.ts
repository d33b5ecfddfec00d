import AxeBuilder from "@axe-core/playwright";
import { expect, test } from "@playwright/test";
import { DEMO_PASSWORD } from "./sign-in.ts";

// WCAG 2.1 A and AA rules (axe-core tags), as in the accounts screens' check.
const WCAG_TAGS = ["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"];

test.describe("accessibility of the field screens", () => {
  test("the visit's sections, its report and a P–T table pass axe", async ({ page }) => {
    // Seven screens, each with a full axe run: near a minute on a busy 2-core machine.
    test.slow();
    const signIn = await page.request.post("/api/auth/sign-in", {
      data: { email: "senior@bellbird.example", password: DEMO_PASSWORD },
    });
    expect(signIn.status()).toBe(200);
    const { visits } = (await (await page.request.get("/api/visits?status=awaiting-review")).json()) as {
      visits: { id: string; equipmentName: string }[];
    };
    const leakRepair = visits.find((visit) => visit.equipmentName === "RTU-1 packaged rooftop unit")!;
    const screens = [
      [`/visits/${leakRepair.id}`, "Charge and flow look right"],
      [`/visits/${leakRepair.id}?section=electrical`, "Isolate, lock out, prove dead"],
      [`/visits/${leakRepair.id}?section=pressure-test`, "Pressure testing with nitrogen"],
      // Awaiting review, the visit takes no new evacuation: the section shows its guidance only.
      [`/visits/${leakRepair.id}?section=evacuation`, "never a compound gauge"],
      [`/visits/${leakRepair.id}?section=refrigerant`, "balance against the nameplate"],
      [`/visits/${leakRepair.id}/report`, "Service visit report"],
      ["/tables/R454B", "Quick converter"],
    ] as const;
    for (const [path, landmark] of screens) {
      await page.goto(path);
      await expect(page.getByText(landmark).first()).toBeVisible();
      const results = await new AxeBuilder({ page }).withTags(WCAG_TAGS).analyze();
      expect(results.violations, `${path}: ${results.violations.map((violation) => violation.id).join(", ")}`).toEqual(
        [],
      );
    }
  });
});
