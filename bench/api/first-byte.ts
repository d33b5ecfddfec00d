/**
 * Time to first byte of a streamed answer (the register's CSV export writes its lines as they are
 * read): autocannon (bench/api/load.ts) times a whole answer only. Requests one at a time, as a
 * browser's download does, each with a browser's encoding; "first byte" is when the first piece of
 * the body arrives (the headers alone can leave before any line is ready), "whole" when the last does.
 */
export interface FirstByteResult {
  requests: number;
  headersP50: number;
  firstByteP50: number;
  firstByteP95: number;
  wholeP50: number;
  wholeP95: number;
}

function percentile(sorted: readonly number[], fraction: number): number {
  if (sorted.length === 0) return Number.NaN;
  return sorted[Math.min(sorted.length - 1, Math.ceil(fraction * sorted.length) - 1)]!;
}

export async function measureFirstByte(
  url: string,
  headers: Record<string, string>,
  requests: number,
): Promise<FirstByteResult> {
  const heads: number[] = [];
  const firsts: number[] = [];
  const wholes: number[] = [];
  for (let index = 0; index < requests; index++) {
    const started = performance.now();
    const response = await fetch(url, { headers: { ...headers, "accept-encoding": "gzip" } });
    heads.push(performance.now() - started);
    const reader = response.body!.getReader();
    let first = true;
    for (let chunk = await reader.read(); !chunk.done; chunk = await reader.read()) {
      if (first && chunk.value.byteLength > 0) {
        firsts.push(performance.now() - started);
        first = false;
      }
    }
    wholes.push(performance.now() - started);
  }
  const sorted = (values: number[]) => values.sort((a, b) => a - b);
  const [headsSorted, firstsSorted, wholesSorted] = [sorted(heads), sorted(firsts), sorted(wholes)];
  return {
    requests,
    headersP50: percentile(headsSorted, 0.5),
    firstByteP50: percentile(firstsSorted, 0.5),
    firstByteP95: percentile(firstsSorted, 0.95),
    wholeP50: percentile(wholesSorted, 0.5),
    wholeP95: percentile(wholesSorted, 0.95),
  };
}
