/**
 * Index i of the interval [values[i], values[i+1]] holding `x`, by binary search.
 *
 * @param values strictly increasing axis with at least two entries
 * @param x query inside [values[0], values[last]] (the caller checks the range)
 * @returns i in 0 … values.length − 2
 * @throws never (out-of-range queries are clamped to the end intervals)
 * @example findInterval(Float64Array.of(0, 1, 2), 1.5) // 1
 */
export function findInterval(values: Float64Array, x: number): number {
  let low = 0;
  let high = values.length - 2;
  while (low < high) {
    const middle = (low + high + 1) >> 1; // low < middle ≤ high ≤ length − 2: a row
    if (values[middle]! <= x) low = middle;
    else high = middle - 1;
  }
  return low;
}
