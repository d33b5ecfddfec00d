import { expect, test, type Page } from "@playwright/test";
import { signIn, signOut } from "./sign-in.ts";
import { signInAndStartVisit } from "./start-visit.ts";

/**
 * R407C gauge pressures (kPa) at which it saturates at the given temperature, from Satura's
 * table (saturationPressure, checked against the Lemmon 2003 equations in tests/engine/properties),
 * against the demo clinic's atmosphere: 100.308 kPa at its 85 m altitude (ISO 2533), the figure
 * the run log and the server both use. Playwright's loader cannot import the JSON tables, so
 * the values are written here, rounded to the kPa a gauge shows.
 */
const R407C_GAUGE: Record<string, string> = {
  "dew 1": "377",
  "bubble 38": "1565",
  "dew 5": "447",
  "bubble 42": "1736",
  "dew 6": "465",
};
const gauge = (temperatureC: number, point: "bubble" | "dew") => R407C_GAUGE[`${point} ${temperatureC}`]!;

async function fill(page: Page, label: string, value: string) {
  await page.getByLabel(label, { exact: true }).fill(value);
}

test.describe("run log and review", () => {
  test("a technician logs readings and an adjustment; a senior comments and signs off; the report shows it all", async ({
    page,
  }) => {
    await signInAndStartVisit(page, "Waiting room warm in the afternoons");
    const visitUrl = page.url();

    // The run log says which atmosphere the gauges read against: the site's, as the server uses.
    await expect(page.getByTestId("atmosphere-line")).toHaveText(
      "Gauge pressures against 100.3 kPa absolute: site altitude 85 m.",
    );
    // Reading 1: short of charge — suction dew 1 °C, suction line 13 °C (12 K superheat), liquid bubble 38 °C, line 37 °C.
    await fill(page, "Suction pressure", gauge(1, "dew"));
    await fill(page, "Suction line temperature", "13");
    await fill(page, "Discharge line temperature", "96");
    await fill(page, "Liquid pressure", gauge(38, "bubble"));
    await fill(page, "Line temperature for subcooling", "37");
    await fill(page, "Return air dry bulb", "25");
    await fill(page, "Return air wet bulb", "18");
    await fill(page, "Supply air dry bulb", "15");
    await fill(page, "Outdoor air (condenser inlet, shade)", "32");
    await fill(page, "Running since start or last change", "20");
    // Live, before saving: superheat from the dew point, subcooling from the bubble point.
    await expect(page.getByTestId("superheat")).toHaveText("12.0");
    await expect(page.getByTestId("subcooling")).toHaveText("1.0");
    await expect(page.getByTestId("charge-state")).toHaveText("Undercharged");
    // The evidence starts folded: one tap on "Why: N points" opens it.
    await page
      .getByTestId("evidence")
      .getByText(/^Why: \d+ points?$/)
      .click();
    await expect(page.getByRole("list", { name: "Evidence" })).toContainText("Superheat");
    await page.getByRole("button", { name: "Save reading" }).click();
    await expect(page.getByText(/Saved at/)).toBeVisible();

    // The adjustment, then two readings as the circuit recovers: only what moved is retyped.
    await page.getByLabel("What changed").selectOption("charge-added");
    await page.getByLabel("Description").fill("Added 0.4 kg liquid through the suction port");
    await page.getByLabel("Amount (kg)").fill("0.4");
    // What the cylinder holds depends on the specs before this one (they share the server): pick it by name.
    const cylinder = page.getByLabel("From cylinder");
    await cylinder.selectOption((await cylinder.locator("option", { hasText: "BM-407C-N3" }).getAttribute("value"))!);
    await page.getByRole("button", { name: "Log adjustment" }).click();
    await expect(page.getByRole("list", { name: "Latest readings and adjustments" })).toContainText("Added 0.4 kg");

    await fill(page, "Suction pressure", gauge(5, "dew"));
    await fill(page, "Suction line temperature", "12");
    await fill(page, "Liquid pressure", gauge(42, "bubble"));
    await fill(page, "Line temperature for subcooling", "38");
    await fill(page, "Running since start or last change", "12");
    await page.getByRole("button", { name: "Save reading" }).click();
    await expect(
      page.getByRole("list", { name: "Latest readings and adjustments" }).getByText("SH", { exact: false }),
    ).toHaveCount(2);

    await fill(page, "Suction pressure", gauge(6, "dew"));
    await fill(page, "Line temperature for subcooling", "37");
    await fill(page, "Running since start or last change", "18");
    await expect(page.getByTestId("superheat")).toHaveText("6.0");
    await expect(page.getByTestId("subcooling")).toHaveText("5.0");
    await expect(page.getByTestId("charge-state")).toHaveText("Charge and flow look right");
    await page.getByRole("button", { name: "Save reading" }).click();
    await expect(
      page.getByRole("list", { name: "Latest readings and adjustments" }).getByText("SH", { exact: false }),
    ).toHaveCount(3);

    await page.getByRole("button", { name: "Open trend chart" }).click();
    await expect(page.getByTestId("trend-chart").getByRole("application")).toBeVisible();
    await expect(page.getByTestId("trend-chart").locator(".recharts-line")).toHaveCount(4);
    await expect(page.getByTestId("trend-chart")).toContainText("Added 0.4 kg");
    await expect(page.getByTestId("settled-indicator")).toBeVisible();

    await page.getByRole("button", { name: "Submit for review" }).click();
    // The checklist comes first; its warnings are read and confirmed.
    await page
      .getByTestId("submit-checklist")
      .getByRole("button", { name: /^Confirm and submit/ })
      .click();
    await expect(page.getByRole("heading", { name: /Review/ })).toContainText("Awaiting review");
    await signOut(page);

    // The senior reviews remotely: comments on the visit and signs it off.
    await page.goto(visitUrl);
    await signIn(page, "senior@bellbird.example");
    await expect(page).toHaveURL(visitUrl);
    await page.getByLabel("Add a comment").fill("Charge looks right now; note the weighed 0.4 kg in the register.");
    await page.getByRole("button", { name: "Post comment" }).click();
    await expect(page.getByRole("region", { name: "Comments" })).toContainText("weighed 0.4 kg");
    await page.getByLabel("Note or reason").fill("Checked remotely");
    await page.getByRole("button", { name: "Sign off" }).click();
    await expect(page.getByRole("heading", { name: /Review/ })).toContainText("Signed off");
    await expect(page.getByText(/Signed off by Priya Raman/)).toBeVisible();

    // The senior turns the settled reading into a draft casebook case, without the customer.
    await page.getByLabel("Reading", { exact: true }).selectOption({ index: 2 });
    await page.getByRole("button", { name: "Make a casebook case" }).click();
    await expect(page).toHaveURL(/\/casebook\/cases\/[^/]+\/edit$/);
    await expect(page.locator("main")).not.toContainText("Wattle Lane");
    await page.goto(visitUrl);

    // The report renders with the readings, the adjustment and the sign-off.
    await page.getByRole("link", { name: "Visit report" }).click();
    const report = page.getByRole("article", { name: "Visit report" });
    await expect(report.getByRole("heading", { name: "Circuit 1" })).toBeVisible();
    await expect(report.locator("table").first().locator("tbody tr")).toHaveCount(3);
    await expect(report).toContainText("Added 0.4 kg liquid through the suction port");
    await expect(report).toContainText("Signed off by Priya Raman");
    await page.getByLabel("Send the report to").fill("facilities@wattlelane.example");
    await page.getByRole("button", { name: "Send report" }).click();
    await expect(page.getByText("Report sent to facilities@wattlelane.example")).toBeVisible();
  });
});
