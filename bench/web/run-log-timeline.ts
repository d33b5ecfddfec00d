// Its page.evaluate callbacks run in Chromium, so they are checked against the DOM.
/// <reference lib="dom" />
/// <reference lib="dom.iterable" />
/**
 * `npx tsx bench/web/run-log-timeline.ts [path]`: where the run log's first load spends its time on
 * the throttled phone profile of `bench:web` — each request's start and end from navigation, the
 * main thread's long tasks (over 50 ms, as the Long Tasks API counts them) and the moment the page
 * became interactive. A tool for finding waterfalls and main-thread work, not a benchmark; the
 * client must be built first. Opens the demo visit's run log unless given another path.
 */
import { DEMO_VISIT_REASON, findDemoVisit, runLogInteractiveAt, stampRunLogInteractive, throttle } from "./profile.ts";
import { launchBrowser, signedInContext, startServer } from "../browser/launch.ts";

const server = await startServer(Number(process.env.BENCH_WEB_PORT ?? 3214));
try {
  const browser = await launchBrowser();
  const context = await signedInContext(browser, server.base, { viewport: { width: 412, height: 915 } });
  const target = process.argv[2] ?? `/visits/${await findDemoVisit(context, server.base)}`;
  const page = await context.newPage();
  await throttle(context, page);
  await page.addInitScript(stampRunLogInteractive);
  await page.addInitScript(() => {
    const store = window as unknown as { longTasks: { start: number; duration: number }[] };
    store.longTasks = [];
    new PerformanceObserver((list) => {
      for (const entry of list.getEntries()) store.longTasks.push({ start: entry.startTime, duration: entry.duration });
    }).observe({ type: "longtask", buffered: true });
  });
  // The CPU profile: self time per function, to find the main thread's work on first render.
  const profiler = await context.newCDPSession(page);
  await profiler.send("Profiler.enable");
  await profiler.send("Profiler.setSamplingInterval", { interval: 500 });
  await profiler.send("Profiler.start");
  await page.goto(`${server.base}${target}`, { waitUntil: "commit" });
  await runLogInteractiveAt(context, page);
  const { profile } = await profiler.send("Profiler.stop");
  const { requests, longTasks, interactiveAt, elements, hiddenElements } = await page.evaluate(() => ({
    requests: (performance.getEntriesByType("resource") as PerformanceResourceTiming[]).map((entry) => ({
      name: entry.name.replace(location.origin, ""),
      start: entry.startTime,
      end: entry.responseEnd,
      bytes: entry.encodedBodySize,
    })),
    longTasks: (window as unknown as { longTasks: { start: number; duration: number }[] }).longTasks,
    interactiveAt: (window as unknown as { interactiveAt: number }).interactiveAt,
    elements: document.querySelectorAll("*").length,
    hiddenElements: document.querySelectorAll("details:not([open]) *").length,
  }));
  console.log(
    `${target} (${DEMO_VISIT_REASON}): interactive at ${interactiveAt.toFixed(0)} ms; ${elements} elements, ${hiddenElements} of them in closed folds`,
  );
  console.log("requests (ms from navigation: start → end, bytes on the wire):");
  for (const request of requests.sort((a, b) => a.start - b.start)) {
    console.log(
      `  ${request.start.toFixed(0).padStart(6)} → ${request.end.toFixed(0).padStart(6)}  ${String(request.bytes).padStart(8)}  ${request.name}`,
    );
  }
  const busy = longTasks.reduce((sum, task) => sum + task.duration, 0);
  console.log(`long tasks: ${longTasks.length}, ${busy.toFixed(0)} ms in all`);
  for (const task of longTasks)
    console.log(`  at ${task.start.toFixed(0).padStart(6)}  ${task.duration.toFixed(0).padStart(5)} ms`);
  const selfTime = new Map<string, number>();
  const intervals = profile.timeDeltas ?? [];
  const nodeById = new Map(profile.nodes.map((node) => [node.id, node]));
  (profile.samples ?? []).forEach((id, index) => {
    const frame = nodeById.get(id)!.callFrame;
    const where = `${frame.functionName || "(anonymous)"} ${frame.url.replace(/^.*\//, "")}:${frame.lineNumber + 1}:${frame.columnNumber + 1}`;
    selfTime.set(where, (selfTime.get(where) ?? 0) + (intervals[index] ?? 0) / 1000);
  });
  console.log("CPU self time by function (top 25, ms; the page's CPU is throttled):");
  for (const [where, ms] of [...selfTime].sort((a, b) => b[1] - a[1]).slice(0, 25))
    console.log(`  ${ms.toFixed(0).padStart(6)}  ${where}`);
  await browser.close();
} finally {
  server.stop();
}
