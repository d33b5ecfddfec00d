import { expect, test } from "@playwright/test";
import { formatDateTime } from "../../shared/format/date-time.ts";
import { signInAndStartVisit } from "./start-visit.ts";
import { TINY_PNG } from "./tiny-png.ts";

/**
 * Small things that matter on a roof, on a 390 × 844 phone: dates written one way on the visit
 * and its report ("2 Dec 2026, 14:05", never 12/2/26, even in a US-English browser), the photo
 * panel's camera and gallery buttons, and a focus ring that goes round a field's unit.
 * The browser runs in Sydney's zone: screens write times in the viewer's zone.
 */
const ZONE = "Australia/Sydney";
const NUMERIC_DATE = /\b\d{1,2}\/\d{1,2}\/\d{2,4}\b/;

// Waits, not assertions about speed: the test machine is shared and sometimes slow to answer.
const SLOW = { timeout: 20_000 };
const slowExpect = expect.configure(SLOW);

test.describe("on the roof, at 390 × 844", () => {
  test.describe.configure({ timeout: 120_000 });
  test.use({ viewport: { width: 390, height: 844 }, timezoneId: ZONE, locale: "en-US" });

  test("dates read one way, photos come from camera or gallery, the focus ring wraps the unit", async ({ page }) => {
    const visitId = await signInAndStartVisit(page, "Checking the date format", { wait: SLOW });
    const { visit } = (await (await page.request.get(`/api/visits/${visitId}`)).json()) as {
      visit: { startedAt: string };
    };
    const started = formatDateTime(visit.startedAt, ZONE);
    expect(started).toMatch(/^\d{1,2} (Jan|Feb|Mar|Apr|May|Jun|Jul|Aug|Sep|Oct|Nov|Dec) \d{4}, [0-2]\d:[0-5]\d$/);

    // The visit page: "started 2 Dec 2026, 14:05".
    const header = page.locator("main header").first();
    await slowExpect(header).toContainText(`started ${started}`);
    await expect(header).not.toHaveText(NUMERIC_DATE);

    // A focused run-log field: the ring is drawn on the frame that holds digits and unit.
    const field = page.getByLabel("Suction line temperature", { exact: true });
    await field.focus();
    const ring = await field.evaluate((input) => {
      const frame = input.closest("[data-unit-frame]")!;
      const unit = frame.querySelector("span")!;
      const frameBox = frame.getBoundingClientRect();
      const unitBox = unit.getBoundingClientRect();
      return {
        frame: getComputedStyle(frame).outlineStyle,
        frameWidth: getComputedStyle(frame).outlineWidth,
        input: getComputedStyle(input).outlineStyle,
        unitInside: unitBox.left >= frameBox.left && unitBox.right <= frameBox.right,
      };
    });
    expect(ring).toEqual({ frame: "solid", frameWidth: "3px", input: "none", unitInside: true });
    // The field takes negatives: a ± button of at least 48 px flips the sign.
    await field.fill("4");
    const sign = field.locator("xpath=../..").getByRole("button", { name: "Change sign (plus or minus)" });
    const signBox = (await sign.boundingBox())!;
    expect(Math.min(signBox.width, signBox.height)).toBeGreaterThanOrEqual(48);
    await sign.click();
    await expect(field).toHaveValue("-4");
    await expect(field).toBeFocused();
    await field.fill("");

    // Photos: two ways in, both 48 px, the camera one asking for the rear camera.
    const photos = page.getByRole("region", { name: "Photos" });
    const take = photos.getByRole("button", { name: "Take photo" });
    const gallery = photos.getByRole("button", { name: "Choose from gallery" });
    for (const button of [take, gallery]) expect((await button.boundingBox())!.height).toBeGreaterThanOrEqual(48);
    await expect(page.locator("#photo-camera")).toHaveAttribute("capture", "environment");
    await expect(page.locator("#photo-gallery")).not.toHaveAttribute("capture");
    // Keyboard only: Tab reaches the gallery button and Enter opens the file chooser.
    await take.focus();
    await page.keyboard.press("Tab");
    await expect(gallery).toBeFocused();
    const chooser = page.waitForEvent("filechooser");
    await page.keyboard.press("Enter");
    await (await chooser).setFiles({ name: "gauges.png", mimeType: "image/png", buffer: TINY_PNG });
    await slowExpect(photos.getByRole("img")).toHaveCount(1);

    // The report: same date, same words.
    await page.goto(`/visits/${visitId}/report`);
    const report = page.getByRole("article", { name: "Visit report" });
    await slowExpect(report).toContainText(`Started ${started} (${ZONE} time)`);
    await expect(report).not.toHaveText(NUMERIC_DATE);
  });
});
