/**
 * Ordinary least-squares slope of y against x (NIST/SEMATECH e-Handbook of Statistical
 * Methods §4.1.4.1, linear least squares). Used for rates of change along a run log.
 *
 * Units: y-unit per x-unit (K per minute in the trend).
 *
 * @throws {RangeError} when fewer than two points or all x are equal
 * @example leastSquaresSlope([0, 1, 2], [10, 9, 8]) // -1
 */
export function leastSquaresSlope(x: readonly number[], y: readonly number[]): number {
  if (x.length !== y.length || x.length < 2)
    throw new RangeError("leastSquaresSlope requires two or more paired points");
  // Hot path (the trend's rates): x and y have the same length (checked above), so index reads both.
  let meanX = 0;
  let meanY = 0;
  for (let index = 0; index < x.length; index += 1) {
    meanX += x[index]!;
    meanY += y[index]!;
  }
  meanX /= x.length;
  meanY /= y.length;
  let covariance = 0;
  let varianceX = 0;
  for (let index = 0; index < x.length; index += 1) {
    const dx = x[index]! - meanX;
    covariance += dx * (y[index]! - meanY);
    varianceX += dx * dx;
  }
  if (varianceX === 0) throw new RangeError("leastSquaresSlope requires at least two distinct x values");
  return covariance / varianceX;
}
