import { expect, test } from "@playwright/test";
import { signIn, signOut } from "./sign-in.ts";
import { signInAndStartVisit } from "./start-visit.ts";

/**
 * Records are corrected, never lost (issue 13): a mistyped nitrogen test is voided with a
 * reason and stays on the visit struck through; the submitted visit takes nothing more until a
 * senior reopens it with a reason; the audit trail names each step; the report leaves the void out.
 */
test.describe("corrections", () => {
  test("a technician voids a mistyped pressure test; a senior reopens the submitted visit", async ({ page }) => {
    await signInAndStartVisit(page, "Nitrogen test after brazing the suction line");
    const visitUrl = page.url();

    await page.getByRole("radio", { name: "Pressure test" }).click();
    await page.getByLabel("Start pressure", { exact: true }).fill("3500");
    await page.getByLabel("Start temperature", { exact: true }).fill("20");
    await page.getByLabel("End pressure", { exact: true }).fill("330");
    await page.getByLabel("End temperature", { exact: true }).fill("20");
    await page.getByLabel("Hold time", { exact: true }).fill("30");
    await page.getByRole("button", { name: "Save pressure test" }).click();
    await expect(page.getByRole("article", { name: "Pressure test" })).toContainText("Fail");

    // Void it from the keyboard: the dialog asks why and keeps the focus inside it.
    await page.getByRole("button", { name: /^Void the pressure test of/ }).focus();
    await page.keyboard.press("Enter");
    const dialog = page.getByRole("dialog", { name: /Void the pressure test of/ });
    await expect(dialog).toBeVisible();
    await page.keyboard.press("Tab");
    await expect(dialog.getByRole("button", { name: "Void the record" })).toBeVisible();
    await dialog.getByRole("button", { name: "Void the record" }).click();
    await expect(dialog.getByRole("alert")).toContainText("Say why this record is void");
    await dialog.getByLabel("Reason (required)").fill("Typed 3500 for 350 kPa");
    await dialog.getByRole("button", { name: "Void the record" }).click();
    await expect(dialog).toBeHidden();
    await expect(page.getByTestId("void-note")).toContainText("Void: Typed 3500 for 350 kPa — Sam Toko");
    await expect(page.getByRole("button", { name: /^Void the pressure test of/ })).toHaveCount(0);

    await page.getByRole("button", { name: "Submit for review" }).click();
    // The checklist comes first; its warnings are read and confirmed.
    await page
      .getByTestId("submit-checklist")
      .getByRole("button", { name: /^Confirm and submit/ })
      .click();
    await expect(page.getByTestId("visit-closed")).toContainText(
      "awaiting review: nothing more can be recorded or voided",
    );
    await expect(page.getByRole("button", { name: "Save pressure test" })).toHaveCount(0);
    await signOut(page);

    await page.goto(visitUrl);
    await signIn(page, "senior@bellbird.example");
    await page.getByRole("button", { name: "Reopen the visit" }).click();
    await expect(page.getByRole("alert")).toContainText("Say why the visit is reopened");
    await page.getByLabel("Reason for reopening (required)").fill("Retest at 350 kPa still to record");
    await page.getByRole("button", { name: "Reopen the visit" }).click();
    await expect(page.getByRole("heading", { name: /Review/ })).toContainText("Open");
    await expect(page.getByTestId("visit-closed")).toHaveCount(0);
    const trail = page.getByRole("region", { name: "Audit trail" });
    await expect(trail.getByTestId("audit-event")).toHaveCount(4);
    await expect(trail).toContainText("Voided — Pressure test: 3500 to 330 kPa gauge over 30 min");
    await expect(trail).toContainText("Reason: Typed 3500 for 350 kPa");
    await expect(trail).toContainText("Reopened");
    await expect(trail).toContainText("Reason: Retest at 350 kPa still to record");

    await page.getByRole("link", { name: "Visit report" }).click();
    const report = page.getByRole("article", { name: "Visit report" });
    await expect(report.getByRole("region", { name: "Nitrogen pressure test" })).toContainText("None recorded.");
    await expect(report.getByRole("region", { name: "Audit trail" })).toContainText("Typed 3500 for 350 kPa");
  });

  test("a stale save of the company limits is refused and offers to reload, keeping what was typed in view", async ({
    page,
  }) => {
    await page.goto("/company-limits");
    await signIn(page, "owner@bellbird.example");
    await expect(page.getByRole("heading", { name: "Company limits" })).toBeVisible();
    const { version } = (await (await page.request.get("/api/organisation/settings")).json()) as { version: number };
    await page.getByLabel("Evacuation target").fill("300");
    // Another owner's save lands first.
    const other = await page.request.patch("/api/organisation/settings", {
      headers: { "If-Match": `"${version}"` },
      data: { pressureTestAllowedDropKPa: 7 },
    });
    expect(other.status()).toBe(200);
    await page.getByRole("button", { name: "Save limits" }).click();
    const notice = page.getByRole("alert").filter({ hasText: "A newer version of the company limits was saved" });
    await expect(notice).toContainText("Evacuation target (µm)");
    await expect(notice).toContainText("300");
    await notice.getByRole("button", { name: "Reload the latest version" }).click();
    await expect(
      page.getByLabel("Allowed pressure drop in a nitrogen test (after temperature correction)"),
    ).toHaveValue("7");
    await page.getByLabel("Evacuation target").fill("300");
    await page.getByRole("button", { name: "Save limits" }).click();
    await expect(page.getByText("Saved: new procedures on every visit use these limits")).toBeVisible();
    const saved = (await (await page.request.get("/api/organisation/settings")).json()) as {
      settings: object;
      version: number;
    };
    expect(saved.settings).toEqual({ evacuationTargetMicrons: 300, pressureTestAllowedDropKPa: 7 });
    // Back to Satura's defaults for the tests that follow on this server.
    const reset = await page.request.patch("/api/organisation/settings", {
      headers: { "If-Match": `"${saved.version}"` },
      data: { evacuationTargetMicrons: null, pressureTestAllowedDropKPa: null },
    });
    expect(reset.status()).toBe(200);
  });
});
