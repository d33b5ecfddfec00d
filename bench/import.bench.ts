/**
 * CSV import benchmark (issue 13, item 6): how long a 5 000-row logger file takes to judge and
 * store, and how long a health check waits meanwhile. Target: /api/health answers in under
 * 100 ms while an import runs (before the worker pool and the sliced storing, a health check
 * waited 9.9 s). The real app on an in-memory database, over HTTP; figures only.
 */
import type { Application } from "../shared/schemas/diagnosis.ts";
import { demoSite } from "../server/db/seed/demo-scenario.ts";
import { judgeReadingsCsv } from "../server/import/readings-csv.ts";
import { registerBench } from "./bench-registry.ts";
import { createVisit, importForm, loggerFile, startDemoApp } from "./demo-app.ts";

const ROWS = 5000;
const HEALTH_TARGET_MS = 100;

const percentile = (sorted: number[], fraction: number) =>
  sorted[Math.min(sorted.length - 1, Math.floor(fraction * sorted.length))] ?? NaN;
const ms = (value: number) => `${value.toFixed(0).padStart(6)} ms`;

registerBench("CSV import (5 000 rows) and /api/health meanwhile", async () => {
  const app = await startDemoApp();
  const { base, cookie } = app;

  try {
    const equipment = (await (await fetch(`${base}/equipment`, { headers: { cookie } })).json()) as {
      equipment: {
        id: string;
        refrigerant: string;
        compressorRlaA: number | null;
        application: Application;
        circuits: never[];
      }[];
    };
    const rooftop = equipment.equipment.find((unit) => unit.refrigerant === "R407C")!;
    const text = loggerFile(ROWS);

    // What judging on the server's own thread would cost every other request.
    const inline = performance.now();
    judgeReadingsCsv({
      text,
      context: {
        unit: rooftop,
        nameplate: rooftop.circuits[0]!,
        site: { altitudeM: demoSite.altitudeM },
        charge: { chargeKg: 4.2, chargeReference: null },
      },
      dayStart: "2026-12-01T00:00:00Z",
      keepRows: true,
    });
    console.log(`judging ${ROWS} rows on one thread (now in the worker)     ${ms(performance.now() - inline)}`);

    const importOnce = async (label: string) => {
      const visitId = await createVisit(app, rooftop.id, "Bench import");
      const form = importForm(text);
      const waits: number[] = [];
      let running = true;
      const started = performance.now();
      const done = fetch(`${base}/visits/${visitId}/readings/import`, {
        method: "POST",
        headers: { cookie },
        body: form,
      }).then(async (response) => {
        running = false;
        return { status: response.status, body: (await response.json()) as { stored?: number } };
      });
      while (running) {
        const sent = performance.now();
        await (await fetch(`${base}/health`)).arrayBuffer();
        if (running) waits.push(performance.now() - sent);
        await new Promise((resolve) => setTimeout(resolve, 10));
      }
      const outcome = await done;
      const total = performance.now() - started;
      waits.sort((a, b) => a - b);
      console.log(
        `${label.padEnd(20)} ${outcome.status} stored ${outcome.body.stored} in ${ms(total)}; /api/health × ${waits.length}: median ${ms(percentile(waits, 0.5))}, p95 ${ms(percentile(waits, 0.95))}, max ${ms(waits.at(-1) ?? NaN)} (target < ${HEALTH_TARGET_MS} ms)`,
      );
    };
    await importOnce("first (starts worker)");
    await importOnce("second (warm)");

    const header = Array.from({ length: 190_000 }, (_, index) => `c${index % 10}`).join(",");
    const form = new FormData();
    form.append("circuit", "1");
    form.append("dayStart", "2026-12-01T00:00:00+11:00");
    form.append("file", new Blob([`${header}\n1,2`], { type: "text/csv" }), "wide.csv");
    const visits = (await (await fetch(`${base}/visits`, { headers: { cookie } })).json()) as {
      visits: { id: string }[];
    };
    const refusedAt = performance.now();
    const refused = await fetch(`${base}/visits/${visits.visits[0]!.id}/readings/import`, {
      method: "POST",
      headers: { cookie },
      body: form,
    });
    console.log(
      `1.9 MB header of 190 000 columns: ${refused.status} in ${ms(performance.now() - refusedAt)} (was 5.4 s)`,
    );
  } finally {
    await app.close();
  }
});
