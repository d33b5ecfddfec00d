/**
 * A closed-loop HTTP load generator, as autocannon runs one: `connections` keep-alive sockets,
 * each sending its next request as soon as the last answer arrives, for a fixed time. It keeps
 * every latency, so the percentiles are exact (autocannon reports p97.5, not p95, which the
 * targets name). Responses are read to the end, as a browser would.
 */
import { Agent, request } from "node:http";
import { performance } from "node:perf_hooks";

export interface LoadRequest {
  method?: "GET" | "POST";
  path: string;
  headers?: Record<string, string>;
  body?: string;
}

export interface LoadResult {
  requests: number;
  /** Answers outside `expectStatus`, by status (0: the connection failed). */
  unexpected: Record<number, number>;
  p50: number;
  p95: number;
  p99: number;
  max: number;
  perSecond: number;
  /** Mean body size in bytes, as sent (compressed if the server compressed it). */
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

function send(agent: Agent, origin: string, load: LoadRequest): Promise<{ status: number; bytes: number }> {
  const url = new URL(load.path, origin);
  return new Promise((resolve) => {
    const outgoing = request(
      url,
      { agent, method: load.method ?? "GET", headers: { "accept-encoding": "gzip", ...(load.body ? { "content-type": "application/json", "content-length": String(Buffer.byteLength(load.body)) } : {}), ...load.headers } },
      (response) => {
        let bytes = 0;
        response.on("data", (chunk: Buffer) => (bytes += chunk.length));
        response.on("end", () => resolve({ status: response.statusCode ?? 0, bytes }));
        response.on("error", () => resolve({ status: 0, bytes }));
      },
    );
    outgoing.on("error", () => resolve({ status: 0, bytes: 0 }));
    outgoing.end(load.body);
  });
}

export async function runLoad({ origin, connections, seconds, maxRequests = Number.POSITIVE_INFINITY, next, expectStatus = [200] }: LoadOptions): Promise<LoadResult> {
  const agent = new Agent({ keepAlive: true, maxSockets: connections });
  const latencies: number[] = [];
  const unexpected: Record<number, number> = {};
  let issued = 0;
  let bytes = 0;
  const started = performance.now();
  const deadline = started + seconds * 1000;
  const worker = async () => {
    while (performance.now() < deadline && issued < maxRequests) {
      const load = next(issued++);
      const sent = performance.now();
      const answer = await send(agent, origin, load);
      latencies.push(performance.now() - sent);
      bytes += answer.bytes;
      if (!expectStatus.includes(answer.status)) unexpected[answer.status] = (unexpected[answer.status] ?? 0) + 1;
    }
  };
  await Promise.all(Array.from({ length: connections }, worker));
  const elapsed = (performance.now() - started) / 1000;
  agent.destroy();
  const sorted = latencies.sort((a, b) => a - b);
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
