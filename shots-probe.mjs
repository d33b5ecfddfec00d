import { chromium } from "playwright-core";
const base = "http://127.0.0.1:3211";
const browser = await chromium.launch({ executablePath: "/usr/bin/chromium", args: ["--no-sandbox", "--disable-gpu", "--disable-background-networking"] });
async function session(email, viewport) {
  const context = await browser.newContext({ viewport });
  const page = await context.newPage();
  await page.goto(`${base}/sign-in`);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password", { exact: true }).fill("bellbird-demo-2026");
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
  return page;
}
const tech = await session("tech@bellbird.example", { width: 390, height: 844 });
// A new visit on the rooftop unit.
const equipment = await (await tech.request.get(`${base}/api/equipment`)).json();
const rooftop = equipment.equipment.find((u) => u.refrigerant === "R407C");
const visit = (await (await tech.request.post(`${base}/api/visits`, { data: { equipmentId: rooftop.id, reason: "Screens check" } })).json()).visit;
for (const [i, sl] of [[0, 13], [1, 12.5]]) {
  await tech.request.post(`${base}/api/visits/${visit.id}/readings`, { data: { circuit: 1, suctionPressureKPa: 377, suctionLineTempC: sl, liquidPressureKPa: 1565, liquidLineTempC: 37, runMinutes: 20 + i } });
}
await tech.request.post(`${base}/api/visits/${visit.id}/pressure-tests`, { data: { startGaugeKPa: 3500, startTempC: 20, endGaugeKPa: 330, endTempC: 20, holdMinutes: 30, ratedKPa: 1700, section: "low-side" } });
await tech.goto(`${base}/visits/${visit.id}`);
await tech.getByTestId("atmosphere-line").waitFor();
await tech.screenshot({ path: "/tmp/p13b/shots/runlog-390.png", fullPage: true });
// Recorded entries and a void through the dialog, by keyboard.
await tech.getByText("Recorded entries (to check or void)").click();
await tech.getByRole("button", { name: /^Void the reading of/ }).first().click();
await tech.screenshot({ path: "/tmp/p13b/shots/void-dialog-390.png" });
await tech.keyboard.type("Probe slipped off the line");
await tech.getByRole("button", { name: "Void the record" }).click();
await tech.getByTestId("void-note").first().waitFor();
await tech.getByText("Recorded entries (to check or void)").scrollIntoViewIfNeeded();
await tech.screenshot({ path: "/tmp/p13b/shots/entries-voided-390.png", fullPage: true });
await tech.goto(`${base}/visits/${visit.id}?section=pressure-test`);
await tech.getByRole("button", { name: /Void the pressure test/ }).click();
await tech.getByLabel("Reason (required)").fill("Typed 3500 for 350 kPa");
await tech.getByRole("button", { name: "Void the record" }).click();
await tech.getByTestId("void-note").first().waitFor();
await tech.screenshot({ path: "/tmp/p13b/shots/pressure-voided-390.png", fullPage: true });
await tech.getByRole("button", { name: "Submit for review" }).click();
await tech.getByTestId("visit-closed").waitFor();
await tech.screenshot({ path: "/tmp/p13b/shots/closed-390.png", fullPage: true });
const senior = await session("senior@bellbird.example", { width: 1024, height: 768 });
await senior.goto(`${base}/visits/${visit.id}`);
await senior.getByTestId("visit-closed").waitFor();
await senior.screenshot({ path: "/tmp/p13b/shots/senior-closed-1024.png", fullPage: true });
await senior.getByLabel("Reason for reopening (required)").fill("Readings on circuit 2 still to take");
await senior.getByRole("button", { name: "Reopen the visit" }).click();
await senior.getByText("Reopened").first().waitFor();
await senior.screenshot({ path: "/tmp/p13b/shots/senior-reopened-1024.png", fullPage: true });
await senior.goto(`${base}/visits/${visit.id}/report`);
await senior.getByRole("heading", { name: "Audit trail" }).waitFor();
await senior.screenshot({ path: "/tmp/p13b/shots/report-1024.png", fullPage: true });
// Company limits: a stale save.
const owner = await session("owner@bellbird.example", { width: 1024, height: 768 });
await owner.goto(`${base}/company-limits`);
await owner.getByLabel("Evacuation target").fill("300");
// Someone else saves meanwhile (version 1 → 2).
await owner.request.patch(`${base}/api/organisation/settings`, { headers: { "If-Match": '"1"' }, data: { pressureTestAllowedDropKPa: 7 } });
await owner.getByRole("button", { name: "Save limits" }).click();
await owner.getByRole("button", { name: /Reload the latest version/ }).waitFor();
await owner.screenshot({ path: "/tmp/p13b/shots/limits-stale-1024.png", fullPage: true });
await owner.setViewportSize({ width: 390, height: 844 });
await owner.screenshot({ path: "/tmp/p13b/shots/limits-stale-390.png", fullPage: true });
await owner.getByRole("button", { name: /Reload the latest version/ }).click();
await owner.waitForTimeout(800);
await owner.screenshot({ path: "/tmp/p13b/shots/limits-reloaded-390.png", fullPage: true });
await tech.setViewportSize({ width: 1024, height: 768 });
await tech.goto(`${base}/visits/${visit.id}`);
await tech.getByTestId("atmosphere-line").waitFor();
await tech.screenshot({ path: "/tmp/p13b/shots/runlog-1024.png", fullPage: true });
console.log(visit.id);
await browser.close();
