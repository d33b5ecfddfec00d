/**
 * Tiny benchmark registry: each bench module calls registerBench when imported, and
 * bench/index.ts runs them in import order. No timing assertions; figures only.
 */
export interface BenchModule {
  name: string;
  run: () => void | Promise<void>;
}

const modules: BenchModule[] = [];

export function registerBench(name: string, run: BenchModule["run"]): void {
  modules.push({ name, run });
}

export async function runRegisteredBenches(): Promise<void> {
  for (const module of modules) {
    console.log(`\n== ${module.name} ==`);
    await module.run();
  }
}

/**
 * Nanoseconds per call of `body(i)` over `iterations` calls, best of `repeats` runs
 * after a warm-up. `body` returns a number that is accumulated so the JIT cannot drop it.
 */
export function nanosecondsPerCall(body: (i: number) => number, iterations: number, repeats = 5): number {
  let sink = 0;
  for (let i = 0; i < Math.min(iterations, 20_000); i++) sink += body(i);
  let best = Infinity;
  for (let r = 0; r < repeats; r++) {
    const start = process.hrtime.bigint();
    for (let i = 0; i < iterations; i++) sink += body(i);
    const elapsed = Number(process.hrtime.bigint() - start);
    best = Math.min(best, elapsed / iterations);
  }
  if (sink === 42.4242) console.log("");
  return best;
}

/** Deterministic pseudo-random sequence in [0, 1) (a linear congruential generator), so runs compare like for like. */
export function pseudoRandomSequence(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 2 ** 32;
  };
}

/** One line of a lookup bench: ns per table lookup, and the direct solve with the ratio when measured. */
export function reportLookup(label: string, tableNs: number, directNs?: number, labelWidth = 44): void {
  const direct =
    directNs === undefined
      ? ""
      : `   direct EOS ${(directNs / 1000).toFixed(1).padStart(8)} µs   ratio ${Math.round(directNs / tableNs)
          .toLocaleString("en")
          .padStart(8)}×`;
  console.log(`${label.padEnd(labelWidth)} table ${tableNs.toFixed(0).padStart(5)} ns${direct}`);
}
