/**
 * The bench's one HTTP load client: autocannon, closed loop (`connections` keep-alive sockets,
 * each sending its next request as soon as the last answer arrives) for a fixed time. Every
 * latency is kept from autocannon's response events, so the percentiles are exact (its own
 * histogram reports p97.5, not the p95 the targets name). Both the GET routes and saving a
 * reading (bench/api/save-reading.ts) go through it. autocannon drops the requests still in flight
 * when its time is up, so a route slower than the run would show no answer at all: such a route
 * is measured again with one request per connection, each awaited.
 */
import autocannon from "autocannon";

export interface LoadRequest {
  method?: "GET" | "POST";
  path: string;
  headers?: Record<string, string>;
  body?: string;
}

export interface LoadResult {
  requests: number;
  /** Answers outside `expectStatus`, by status (0: the connection failed or timed out). */
  unexpected: Record<number, number>;
  p50: number;
  p95: number;
  p99: number;
  max: number;
  perSecond: number;
  /** Mean response size in bytes as sent, headers included (compressed if the server compressed it). */
  meanBytes: number;
}

export interface LoadOptions {
  origin: string;
  connections: number;
  seconds: number;
  /** At most this many requests in all (slow routes end sooner). */
  maxRequests?: number;
  /** The next request to send; called once per request, so each can go somewhere else. */
  next: (index: number) => LoadRequest;
  expectStatus?: readonly number[];
}

function percentile(sorted: readonly number[], fraction: number): number {
  if (sorted.length === 0) return Number.NaN;
  return sorted[Math.min(sorted.length - 1, Math.ceil(fraction * sorted.length) - 1)]!;
}

export async function runLoad(options: LoadOptions): Promise<LoadResult> {
  return summarise(await runRaw(options));
}

/**
 * The same load spread over several app servers, as a load balancer would: the connections
 * split evenly between `origins` (each server's share runs at once), one result over all answers.
 */
export async function runLoadAcross(
  origins: readonly string[],
  options: Omit<LoadOptions, "origin">,
): Promise<LoadResult> {
  const shares = origins.map((origin, index) => ({
    ...options,
    origin,
    connections:
      Math.floor(options.connections / origins.length) + (index < options.connections % origins.length ? 1 : 0),
    maxRequests: options.maxRequests && Math.ceil(options.maxRequests / origins.length),
  }));
  const runs = await Promise.all(shares.filter((share) => share.connections > 0).map(runRaw));
  return summarise({
    latencies: runs.flatMap((run) => run.latencies),
    unexpected: runs.reduce<Record<number, number>>((all, run) => {
      for (const [status, count] of Object.entries(run.unexpected))
        all[Number(status)] = (all[Number(status)] ?? 0) + count;
      return all;
    }, {}),
    bytes: runs.reduce((sum, run) => sum + run.bytes, 0),
    elapsed: Math.max(...runs.map((run) => run.elapsed)),
  });
}

interface RawRun {
  latencies: number[];
  unexpected: Record<number, number>;
  bytes: number;
  /** Seconds the run took. */
  elapsed: number;
}

async function runRaw(options: LoadOptions): Promise<RawRun> {
  const timed = await runOnce(options, { duration: options.seconds });
  // Slower than the run itself: one awaited request per connection instead.
  return timed.latencies.length > 0 ? timed : runOnce(options, { amount: options.connections });
}

function summarise({ latencies, unexpected, bytes, elapsed }: RawRun): LoadResult {
  const sorted = [...latencies].sort((a, b) => a - b);
  return {
    requests: sorted.length,
    unexpected,
    p50: percentile(sorted, 0.5),
    p95: percentile(sorted, 0.95),
    p99: percentile(sorted, 0.99),
    max: sorted.at(-1) ?? Number.NaN,
    perSecond: sorted.length / elapsed,
    meanBytes: sorted.length ? bytes / sorted.length : 0,
  };
}

async function runOnce(
  { origin, connections, maxRequests, next, expectStatus = [200] }: LoadOptions,
  length: { duration: number } | { amount: number },
): Promise<RawRun> {
  const latencies: number[] = [];
  const unexpected: Record<number, number> = {};
  let issued = 0;
  let bytes = 0;
  const instance = autocannon({
    url: origin,
    connections,
    ...length,
    // autocannon refuses fewer than one request a connection.
    ...(maxRequests && "duration" in length ? { maxOverallRequests: Math.max(maxRequests, connections) } : {}),
    // The slowest route measured (a whole visit of 10,000 readings) once took 17 s.
    timeout: 60,
    // A browser's encoding, so the sizes are what a phone downloads.
    headers: { "accept-encoding": "gzip" },
    requests: [
      {
        setupRequest: (request) => {
          const load = next(issued++);
          return {
            ...request,
            method: load.method ?? "GET",
            path: load.path,
            headers: {
              ...request.headers,
              ...(load.body ? { "content-type": "application/json" } : {}),
              ...load.headers,
            },
            body: load.body ?? Buffer.alloc(0),
          };
        },
      },
    ],
  });
  instance.on("response", (_client, status, responseBytes, responseTime) => {
    latencies.push(responseTime);
    bytes += responseBytes;
    if (!expectStatus.includes(status)) unexpected[status] = (unexpected[status] ?? 0) + 1;
  });
  const result = await instance;
  // Timeouts are counted among the errors too.
  const failed = result.errors;
  if (failed > 0) unexpected[0] = failed;
  const elapsed = (result.finish.getTime() - result.start.getTime()) / 1000;
  return { latencies, unexpected, bytes, elapsed };
}
