/**
 * Seeded pseudo-random numbers (mulberry32): the same seed always gives the same sequence, so
 * a generated case is reproducible from its seed and the engine stays free of hidden
 * randomness. Not for anything secret.
 *
 * Units: none. Range: seed any integer (taken modulo 2³²); each call returns a number in [0, 1).
 * Source: T. Ettinger's mulberry32, public domain (https://gist.github.com/tommyettinger/46a874533244883189143505d203312c).
 *
 * @throws {TypeError} when the seed is not a finite number
 * @example const random = seededRandom(7); random() // 0.0117047… (the same every time)
 */
export function seededRandom(seed: number): () => number {
  if (!Number.isFinite(seed)) throw new TypeError("seededRandom requires a finite seed");
  let state = Math.trunc(seed) >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let mixed = state;
    mixed = Math.imul(mixed ^ (mixed >>> 15), mixed | 1);
    mixed ^= mixed + Math.imul(mixed ^ (mixed >>> 7), mixed | 61);
    return ((mixed ^ (mixed >>> 14)) >>> 0) / 4294967296;
  };
}
