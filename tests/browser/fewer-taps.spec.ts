import { expect, test, type Locator, type Page } from "@playwright/test";
import { DEMO_PASSWORD, signIn } from "./sign-in.ts";

/**
 * Gauge pressures (kPa, against the demo clinic's 100.308 kPa at 85 m, ISO 2533) that put each
 * demo refrigerant at a round saturation temperature, so that a 6 K superheat and a 5 K
 * subcooling are typed. From Satura's tables; they agree with the NIST Chemistry WebBook to the
 * kPa a gauge shows: R32 1.107 MPa at 10 °C and 2.478 MPa at 40 °C (difluoromethane); R407C as
 * in run-log.spec.ts (checked against Lemmon 2003 in tests/engine/properties). Playwright's
 * loader cannot import the JSON tables, so the figures are written here.
 */
const ROUND: Record<string, { suctionKPa: string; suctionLineC: string; liquidKPa: string; liquidLineC: string }> = {
  // dew 10 °C + 6 K; bubble 40 °C − 5 K
  R32: { suctionKPa: "1007", suctionLineC: "16", liquidKPa: "2378", liquidLineC: "35" },
  // dew 6 °C + 6 K; bubble 42 °C − 5 K
  R407C: { suctionKPa: "465", suctionLineC: "12", liquidKPa: "1736", liquidLineC: "37" },
};

/**
 * Counts taps the honest way: every tap goes through `tap()`, and the page itself counts each
 * pointerdown it receives (kept in sessionStorage, so a full page load does not reset it). The
 * two must agree, so no click can slip past the count. Typing and Enter/Tab are not taps.
 */
async function tapCounter(page: Page) {
  await page.addInitScript(() => {
    window.addEventListener(
      "pointerdown",
      () => sessionStorage.setItem("taps", String(Number(sessionStorage.getItem("taps") ?? "0") + 1)),
      true,
    );
  });
  let taps = 0;
  return {
    async tap(target: Locator) {
      taps += 1;
      await target.click();
    },
    async count() {
      const counted = Number(await page.evaluate(() => sessionStorage.getItem("taps") ?? "0"));
      expect(counted, "taps seen by the page match the taps made").toBe(taps);
      return taps;
    },
  };
}

/** The visit page's chunk and data can take a while on a busy machine; a wait, not a measured time. */
const PAGE_LOAD = { timeout: 30_000 };

/** Select what the field holds (a carried-forward value) and type over it, by keyboard. */
async function typeOver(page: Page, value: string) {
  await page.keyboard.press("ControlOrMeta+a");
  await page.keyboard.type(value);
}

for (const [device, viewport] of [
  ["phone", { width: 390, height: 844 }],
  ["tablet", { width: 1024, height: 768 }],
] as const) {
  test.describe(`fewer taps on a ${device} (${viewport.width}×${viewport.height})`, () => {
    test.use({ viewport });
    test.slow();

    test("a returning technician goes from the sign-in page to a saved finding in 5 taps or fewer", async ({
      page,
    }) => {
      const { tap, count } = await tapCounter(page);
      await page.goto("/");
      await expect(page.getByRole("heading", { name: "Sign in" })).toBeVisible();

      // Tap 1: the e-mail field. Tab to the password, Enter signs in.
      await tap(page.getByLabel("E-mail"));
      await page.keyboard.type("tech@bellbird.example");
      await page.keyboard.press("Tab");
      await expect(page.getByLabel("Password", { exact: true })).toBeFocused();
      await page.keyboard.type(DEMO_PASSWORD);
      await page.keyboard.press("Enter");

      // Tap 2: Resume, straight into the run log of the visit in progress.
      await expect(page.getByRole("heading", { name: "Today" })).toBeVisible(PAGE_LOAD);
      await tap(page.getByTestId("resume-visit"));
      await expect(page).toHaveURL(/\/visits\/[0-9a-f-]{36}$/, PAGE_LOAD);
      await expect(page.getByRole("form", { name: /New reading/ })).toBeVisible(PAGE_LOAD);
      // The visit's header names the unit's refrigerant: "Customer · Site · R32 · started …".
      const header = await page
        .locator("header")
        .filter({ has: page.getByRole("heading", { level: 1 }) })
        .innerText();
      const refrigerant = /· (R\w+) ·/.exec(header)?.[1] ?? "";
      const values = ROUND[refrigerant];
      expect(values, `round figures for ${refrigerant}`).toBeDefined();

      // Tap 3: the first reading field; Enter (the keypad's "next") walks the rest.
      await tap(page.getByLabel("Suction pressure", { exact: true }));
      await typeOver(page, values!.suctionKPa);
      await page.keyboard.press("Enter");
      await expect(page.getByLabel("Suction line temperature", { exact: true })).toBeFocused();
      await typeOver(page, values!.suctionLineC);
      await page.keyboard.press("Enter");
      await expect(page.getByLabel("Discharge pressure (optional)", { exact: true })).toBeFocused();
      await page.keyboard.press("Enter");
      await page.keyboard.press("Enter"); // discharge line temperature: kept as carried forward
      await expect(page.getByLabel("Liquid pressure", { exact: true })).toBeFocused();
      await typeOver(page, values!.liquidKPa);
      await page.keyboard.press("Enter");
      await typeOver(page, values!.liquidLineC);
      await expect(page.getByTestId("superheat")).toHaveText("6.0");
      await expect(page.getByTestId("subcooling")).toHaveText("5.0");

      // Tap 4: save. The finding is on the record.
      await tap(page.getByRole("button", { name: "Save reading" }));
      await expect(page.getByText(/Saved at/)).toBeVisible();
      await expect(page.getByTestId("charge-state")).not.toBeEmpty();
      expect(await count()).toBeLessThanOrEqual(5);
    });
  });
}

test.describe("start from Today without a reason", () => {
  test.use({ viewport: { width: 390, height: 844 } });
  // Several pages and a dozen requests each: give them room on a shared, busy machine.
  test.slow();

  test("starts a visit from Today's search with no reason; submitting asks for it and shows the checklist", async ({
    page,
  }) => {
    await page.goto("/");
    await signIn(page, "tech@bellbird.example");
    await expect(page.getByRole("heading", { name: "Today" })).toBeVisible(PAGE_LOAD);

    // The equipment list's own search: a customer's name finds its units, a unit's name narrows it.
    await page.getByLabel("Find the unit by its name, site or customer").fill("wattle lane");
    await expect(page.getByRole("list", { name: "Units found" })).toContainText("RTU-1");
    await expect(page.getByRole("list", { name: "Units found" })).toContainText("Server cupboard wall split");
    // A unit with a visit in progress (the demo's open check on the split) offers that visit, not a second one.
    await expect(
      page.getByRole("link", { name: "Continue the visit in progress on Server cupboard wall split" }),
    ).toBeVisible();
    await page.getByLabel("Find the unit by its name, site or customer").fill("cool room");
    await expect(page.getByRole("list", { name: "Units found" }).getByRole("listitem")).toHaveCount(1);
    await page.getByRole("button", { name: /^Start a visit on Vaccine and stores cool room/ }).click();

    await expect(page).toHaveURL(/\/visits\/[0-9a-f-]{36}$/, PAGE_LOAD);
    const visitUrl = page.url();
    await expect(page.getByRole("form", { name: /New reading/ })).toBeVisible(PAGE_LOAD);

    // Something done, but no reading on the circuit yet.
    await page.getByLabel("What changed").selectOption("airflow");
    await page.getByLabel("Description").fill("Cleared ice off the evaporator coil");
    await page.getByRole("button", { name: "Log adjustment" }).click();
    await expect(page.getByRole("list", { name: "Latest readings and adjustments" })).toContainText(
      "Cleared ice off the evaporator coil",
    );

    // Back on Today, this visit is the one to resume, and says its reason is still to come.
    await page.goto("/");
    await expect(page.getByTestId("resume-visit")).toContainText("Vaccine and stores cool room");
    await expect(page.getByTestId("resume-visit")).toContainText("No reason given yet");
    await page.getByTestId("resume-visit").click();
    await expect(page).toHaveURL(visitUrl);

    await page.getByRole("button", { name: "Submit for review" }).click();
    const checklist = page.getByTestId("submit-checklist");
    await expect(checklist.getByRole("list", { name: "Warnings" })).toContainText("Circuit 1 has no readings");
    // The reason is required: confirming without it is refused and the visit stays open.
    await checklist.getByRole("button", { name: /Confirm and submit/ }).click();
    await expect(checklist.getByRole("alert")).toContainText("Give the reason for the visit first");
    await expect(page.getByRole("heading", { name: /Review/ })).toContainText("Open");

    await checklist.getByLabel("Reason for the visit (required)").fill("Waiting room warm in the afternoons");
    await checklist.getByRole("button", { name: "Confirm and submit anyway" }).click();
    await expect(page.getByRole("heading", { name: /Review/ })).toContainText("Awaiting review");
    await expect(page.getByText("Reason: Waiting room warm in the afternoons", { exact: false })).toBeVisible();
  });

  test("e-mailing a report before sign-off warns that it is unsigned and needs a tick", async ({ page }) => {
    await page.goto("/");
    await signIn(page, "tech@bellbird.example");
    await page.getByTestId("resume-visit").click();
    await expect(page).toHaveURL(/\/visits\/[0-9a-f-]{36}$/, PAGE_LOAD);
    await page.getByRole("link", { name: "Visit report" }).click();
    const form = page.getByRole("form", { name: "Send the report" });
    await expect(form.getByTestId("unsigned-report-warning")).toContainText(
      "the customer will get an unsigned report",
      PAGE_LOAD,
    );
    await form.getByLabel("Send the report to").fill("facilities@wattlelane.example");
    await form.getByRole("button", { name: "Send unsigned report" }).click();
    await expect(form.getByRole("alert")).toContainText("Tick the box to send a report that is not signed off");
    await expect(form.getByText(/sent to/)).toHaveCount(0);
    await form.getByLabel("Send it unsigned anyway").check();
    await form.getByRole("button", { name: "Send unsigned report" }).click();
    await expect(form.getByText("Unsigned report sent to facilities@wattlelane.example")).toBeVisible();
  });
});
