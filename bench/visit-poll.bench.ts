/**
 * The open visit's refresh (issue 16): the visit page polls GET /api/visits/:id every 4 s. With
 * 10 000 readings the whole visit is tens of MB; a poll that names the revision it holds should
 * cost the visit's row (304) or only what changed (a delta). The real app on an in-memory
 * database, over HTTP, gzip as a browser asks; figures only.
 *
 * Data set: the demo company, plus one visit on its R407C rooftop unit with 10 000 readings
 * stored through the app's own CSV import (two files of 5 000, one reading a second).
 * Rebuild: `npm run bench` (this module builds it every run).
 */
import { registerBench } from "./bench-registry.ts";
import { createVisit, demoGauge, importForm, loggerFile, startDemoApp } from "./demo-app.ts";

const FILES = 2;
const ROWS_PER_FILE = 5000;
const SAMPLES = 20;
const POLL_TARGET_MS = 100;

const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)] ?? NaN;
const p95 = (values: number[]) =>
  [...values].sort((a, b) => a - b)[Math.min(values.length - 1, Math.floor(values.length * 0.95))] ?? NaN;
const ms = (value: number) => `${value.toFixed(1).padStart(7)} ms`;
const kb = (bytes: number) => `${(bytes / 1024).toFixed(1).padStart(8)} KB`;

registerBench("Open visit refresh (10 000 readings): whole, 304, delta", async () => {
  const app = await startDemoApp();
  const { base, cookie } = app;
  try {
    const units = (await (await fetch(`${base}/equipment`, { headers: { cookie } })).json()) as {
      equipment: { id: string; refrigerant: string }[];
    };
    const rooftop = units.equipment.find((unit) => unit.refrigerant === "R407C")!;
    const visitUrl = `${base}/visits/${await createVisit(app, rooftop.id, "Week of logger data")}`;
    for (let file = 0; file < FILES; file++) {
      const form = importForm(loggerFile(ROWS_PER_FILE, file * ROWS_PER_FILE));
      const stored = await fetch(`${visitUrl}/readings/import`, { method: "POST", headers: { cookie }, body: form });
      if (stored.status !== 201) throw new Error(`import answered ${stored.status}`);
    }
    console.log(
      `data set: demo company + 1 visit with ${FILES * ROWS_PER_FILE} readings (CSV import through the app; rebuilt by this bench)`,
    );

    // Asked with gzip as a browser does; Node's fetch decodes it, so sizes are of the JSON itself.
    const timed = async (url: string, headers: Record<string, string> = {}) => {
      const started = performance.now();
      const response = await fetch(url, { headers: { cookie, "Accept-Encoding": "gzip", ...headers } });
      const body = await response.arrayBuffer();
      return {
        ms: performance.now() - started,
        status: response.status,
        bytes: body.byteLength,
        etag: response.headers.get("etag"),
        body,
      };
    };
    const series = async (
      label: string,
      run: () => Promise<{ ms: number; status: number; bytes: number }>,
      samples = SAMPLES,
    ) => {
      const times: number[] = [];
      let last = { status: 0, bytes: 0 };
      for (let sample = 0; sample < samples; sample++) {
        const outcome = await run();
        times.push(outcome.ms);
        last = outcome;
      }
      console.log(
        `${label.padEnd(44)} ${last.status}  median ${ms(median(times))}  p95 ${ms(p95(times))}  body ${kb(last.bytes)} (decoded)  target < ${POLL_TARGET_MS} ms`,
      );
    };

    const whole = await timed(visitUrl);
    const { visit } = JSON.parse(new TextDecoder().decode(whole.body)) as { visit: { revision: string } };
    // Seconds each: a few samples say enough.
    await series("whole visit (first load)", () => timed(visitUrl), 3);
    await series("poll, nothing new (If-None-Match → 304)", () =>
      timed(`${visitUrl}?since=${encodeURIComponent(visit.revision)}`, { "If-None-Match": whole.etag! }),
    );
    const reading = await fetch(`${visitUrl}/readings`, {
      method: "POST",
      headers: { cookie, "Content-Type": "application/json" },
      body: JSON.stringify({
        circuit: 1,
        suctionPressureKPa: Number(demoGauge(6, "dew")),
        suctionLineTempC: 12,
        liquidPressureKPa: Number(demoGauge(42, "bubble")),
        liquidLineTempC: 37,
      }),
    });
    if (reading.status !== 201) throw new Error(`reading answered ${reading.status}`);
    await series("poll after one new reading (delta)", () =>
      timed(`${visitUrl}?since=${encodeURIComponent(visit.revision)}`, { "If-None-Match": whole.etag! }),
    );
  } finally {
    await app.close();
  }
});
