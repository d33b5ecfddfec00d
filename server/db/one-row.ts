/**
 * The row a statement always returns: an `insert … returning` of one value, a `count(*)`, an
 * update of a row the same transaction holds. Destructuring (`const [row] = …`) types it as
 * possibly missing; this says it cannot be, and fails loudly, naming the statement, if a
 * broken assumption ever makes it so (instead of an `undefined` read far from the cause).
 * Where a missing row is a normal answer (a lookup by id), the caller checks it instead.
 * @throws Error `<what> returned no row` when `rows` is empty
 */
export function oneRow<Row>(rows: readonly Row[], what: string): Row {
  const [row] = rows;
  if (row === undefined) throw new Error(`${what} returned no row`);
  return row;
}
