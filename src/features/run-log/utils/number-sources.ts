/**
 * Numbers the sources behind a printed finding for a reference list: each distinct source
 * string once, in the order it is first cited, so the evidence lines carry short markers
 * ("[2]") and the full citations are printed once at the end instead of beside every line.
 *
 * @returns `list`: the distinct sources in order (entry i is note i + 1); `numbers`: the
 *   1-based note number of each input, in input order
 * @example numberSources(["A", "B", "A"]) // { list: ["A", "B"], numbers: [1, 2, 1] }
 */
export function numberSources(sources: readonly string[]): { list: string[]; numbers: number[] } {
  const list: string[] = [];
  const numbers = sources.map((source) => {
    const key = source.trim();
    const known = list.indexOf(key);
    if (known >= 0) return known + 1;
    list.push(key);
    return list.length;
  });
  return { list, numbers };
}
