import { expect, test } from "@playwright/test";
import { signInAndStartVisit } from "./start-visit.ts";

/**
 * One charge entry, one number, on a phone: "refrigerant added 0.45 kg" logged on the run log
 * with its cylinder is the register's movement (the record names the cylinder, TRADE.md §6
 * record fields), and the Refrigerant section and the report show the same 0.45 kg. The demo's
 * BM-407C-N3 is a new R407C cylinder holding 10 kg (server/db/seed/demo-scenario.ts).
 */
test.describe("charge entry", () => {
  test.use({ viewport: { width: 390, height: 844 } });

  test("a charge adjustment logged on the run log is the register line, with the same figure in the report", async ({
    page,
  }) => {
    // Three pages and a void on one phone-sized session: more than the default budget on a busy machine.
    test.slow();
    // The first visit page of a fresh server loads its property tables: wait for it, however slow the machine.
    await signInAndStartVisit(page, "Short of charge on circuit 1", { wait: { timeout: 30_000 } });
    const visitUrl = page.url();

    const form = page.getByRole("form", { name: "Log an adjustment" });
    await form.getByLabel("What changed").selectOption("charge-added");
    await form.getByLabel("Description").fill("Topped up as liquid at the suction port");
    await form.getByLabel("Amount (kg)").fill("0.45");
    // Without a cylinder the register could not record it: the form says so before sending.
    await form.getByRole("button", { name: "Log adjustment" }).click();
    await expect(form.getByText("Choose the cylinder it came from or went into")).toBeVisible();
    await form.getByLabel("From cylinder").selectOption({ label: "BM-407C-N3 · New (virgin) · 10.00 kg in it" });
    await expect(form.getByText("Goes in the register as: added, new refrigerant")).toBeVisible();
    await expect(form.getByTestId("adjustment-cylinder-after")).toContainText("BM-407C-N3 will hold 9.55 kg");
    await form.getByRole("button", { name: "Log adjustment" }).click();
    await expect(page.getByRole("list", { name: "Latest readings and adjustments" })).toContainText(
      "Topped up as liquid",
    );

    // The Refrigerant section: the same 0.45 kg, once, from the new cylinder.
    await page.getByRole("radio", { name: "Refrigerant" }).click();
    const logged = page.getByRole("list", { name: "Refrigerant logged on this visit" }).getByRole("listitem");
    await expect(logged).toHaveCount(1);
    await expect(logged.first()).toContainText("0.45 kg added, new refrigerant");
    await expect(logged.first()).toContainText("cylinder BM-407C-N3");
    await expect(page.getByTestId("balance-1")).toContainText("0.45 kg");
    await expect(page.getByTestId("run-log-check")).toContainText(
      "Run log and register agree: 0.45 kg into the system, 0.00 kg out of it",
    );

    // The report: the adjustment and the register line carry the one figure, and say they agree.
    await page.goto(`${visitUrl}/report`);
    const report = page.getByRole("article", { name: "Visit report" });
    const adjustments = report.getByRole("region", { name: "Adjustments and work done" });
    await expect(adjustments).toContainText("Topped up as liquid at the suction port");
    await expect(adjustments).toContainText("0.45 kg");
    const refrigerant = report.getByRole("region", { name: "Refrigerant" });
    await expect(refrigerant).toContainText("Added, new refrigerant (circuit 1): 0.45 kg · cylinder BM-407C-N3");
    await expect(refrigerant.getByTestId("run-log-check")).toContainText(
      "Run log and register agree: 0.45 kg into the system",
    );
    await expect(refrigerant).not.toContainText("differ");
    await page.screenshot({ path: "test-results/charge-entry-report-390.png", fullPage: true });

    // Voided on the Refrigerant section, the run-log entry goes with it and the cylinder gets its 0.45 kg back.
    await page.goto(visitUrl);
    await page.getByRole("radio", { name: "Refrigerant" }).click();
    await page
      .getByRole("button", { name: /^Void the movement “0.45 kg added, new refrigerant” and its run-log entry/ })
      .click();
    const dialog = page.getByRole("dialog", { name: /Void the movement/ });
    await dialog.getByLabel("Reason (required)").fill("Weighed on the wrong scale");
    await dialog.getByRole("button", { name: "Void the record" }).click();
    await expect(dialog).toBeHidden();
    await expect(page.getByTestId("run-log-check")).not.toContainText("0.45 kg");
    await page.getByRole("radio", { name: "Run log" }).click();
    await page.getByRole("form", { name: "Log an adjustment" }).getByLabel("What changed").selectOption("charge-added");
    await expect(page.getByRole("form", { name: "Log an adjustment" }).getByLabel("From cylinder")).toContainText(
      "BM-407C-N3 · New (virgin) · 10.00 kg in it",
    );
    // Its run-log entry is voided too: no standing reading or adjustment is left for the timeline strip.
    await expect(page.getByRole("list", { name: "Latest readings and adjustments" })).toHaveCount(0);
  });
});
