// Its page.evaluate callbacks run in Chromium, so they are checked against the DOM.
/// <reference lib="dom" />
/// <reference lib="dom.iterable" />
/**
 * `npm run bench:diagram`: how long the pressure–enthalpy diagram takes to draw in a real
 * browser. Builds nothing itself (the npm script runs `vite build` first); starts the production
 * server on an in-memory database (BENCH_PORT, default 3229), signs in as the demo technician in
 * Debian's Chromium (CHROMIUM_PATH), logs two readings on RTU-1 (R407C) and opens the run log.
 * The diagram marks its own drawing time: from its first render to the first frame in which its
 * lines are in the document (`data-draw-ms`; it includes whatever else the page renders in the
 * meantime). The run-log panel is folded and unfolded to draw it again. Figures only,
 * never a pass/fail test.
 */
import { launchBrowser, startServer } from "./browser/launch.ts";

const DRAWS = 15;

const summary = (label: string, values: number[]) => {
  const sorted = [...values].sort((a, b) => a - b);
  const median = sorted[Math.floor(sorted.length / 2)]!;
  console.log(
    `${label.padEnd(44)} median ${median.toFixed(1).padStart(6)} ms   best ${sorted[0]!.toFixed(1).padStart(6)} ms   worst ${sorted.at(-1)!.toFixed(1).padStart(6)} ms   (${values.length} draws)`,
  );
};

const server = await startServer(Number(process.env.BENCH_PORT ?? 3229));
const BASE = server.base;
try {
  const browser = await launchBrowser();
  const page = await browser.newPage({ viewport: { width: 1280, height: 1000 } });
  await page.goto(`${BASE}/equipment`);
  await page.getByLabel("E-mail").fill("tech@bellbird.example");
  await page.getByLabel("Password", { exact: true }).fill("bellbird-demo-2026");
  await page.getByRole("button", { name: "Sign in" }).click();
  await page
    .getByRole("link", { name: /RTU-1 packaged rooftop unit/ })
    .first()
    .waitFor();
  const headers = { Origin: BASE };
  const equipment = (await (await page.request.get(`${BASE}/api/equipment`)).json()) as {
    equipment: { id: string; name: string }[];
  };
  const rtu = equipment.equipment.find((unit) => /RTU-1/.test(unit.name))!;
  const visit = (await (
    await page.request.post(`${BASE}/api/visits`, { headers, data: { equipmentId: rtu.id, reason: "Diagram bench" } })
  ).json()) as { visit: { id: string } };
  for (const [suction, liquid, suctionLine, liquidLine] of [
    [376, 1564, 13, 37],
    [446, 1734, 12, 38],
  ] as const) {
    const response = await page.request.post(`${BASE}/api/visits/${visit.visit.id}/readings`, {
      headers,
      data: {
        circuit: 1,
        suctionPressureKPa: suction,
        suctionLineTempC: suctionLine,
        liquidPressureKPa: liquid,
        liquidLineTempC: liquidLine,
        dischargeLineTempC: 92,
      },
    });
    if (!response.ok()) throw new Error(`reading refused: ${response.status()} ${await response.text()}`);
  }

  const draws: number[] = [];

  const opens: number[] = [];
  await page.goto(`${BASE}/visits/${visit.visit.id}`);
  const diagram = page.getByTestId("ph-diagram").first();
  await diagram.and(page.locator("[data-draw-ms]")).waitFor({ timeout: 30_000 });
  const first = Number(await diagram.getAttribute("data-draw-ms"));
  const summaryLocator = page.getByTestId("measured-cycle").first().locator(":scope > summary");
  for (let draw = 0; draw < DRAWS; draw++) {
    await summaryLocator.click(); // fold
    await page.getByTestId("ph-diagram").first().waitFor({ state: "detached" });
    const clickedAt = await page.evaluate(() => {
      const at = performance.now();
      document.querySelector<HTMLElement>("[data-testid=measured-cycle] > summary")!.click();
      return at;
    });
    await page.locator("[data-testid=ph-diagram][data-draw-ms]").first().waitFor();
    draws.push(Number(await page.getByTestId("ph-diagram").first().getAttribute("data-draw-ms")));

    const drawnAt = await page.evaluate(() => performance.getEntriesByName("ph-diagram-drawn").at(-1)!.startTime);
    opens.push(drawnAt - clickedAt);
  }
  const report: number[] = [];

  for (let draw = 0; draw < 5; draw++) {
    await page.goto(`${BASE}/visits/${visit.visit.id}/report`);
    await page.locator("[data-testid=ph-diagram][data-draw-ms]").first().waitFor({ timeout: 30_000 });
    report.push(Number(await page.getByTestId("ph-diagram").first().getAttribute("data-draw-ms")));
  }
  console.log(`\n== pressure–enthalpy diagram in Chromium (${browser.version()}) ==`);
  console.log(`${"first draw on the run log (lazy chunk loaded)".padEnd(44)} ${first.toFixed(1).padStart(6)} ms`);
  summary("run log: render → drawn", draws);
  summary("run log: unfold click → drawn", opens);
  summary("report page: render → drawn (whole page)", report);
  await browser.close();
} finally {
  server.stop();
}
