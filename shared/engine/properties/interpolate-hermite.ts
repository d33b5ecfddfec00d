/**
 * Cubic Hermite interpolation on one interval: the cubic through (x0, y0) and
 * (x1, y1) with slopes dy/dx = m0 and m1 at the ends. With exact slopes (here
 * dp/dT from Clausius–Clapeyron or the published pL/pV equations) the
 * error falls with the fourth power of the step.
 * Source: https://en.wikipedia.org/wiki/Cubic_Hermite_spline
 *
 * @param x query (normally between x0 and x1; any x evaluates the cubic)
 * @returns the interpolated y
 * @throws never
 * @example interpolateHermite(0, 0, 1, 1, 1, 1, 0.5) // 0.5
 */
export function interpolateHermite(
  x0: number,
  y0: number,
  m0: number,
  x1: number,
  y1: number,
  m1: number,
  x: number,
): number {
  const width = x1 - x0;
  const fraction = (x - x0) / width;
  const fraction2 = fraction * fraction;
  const fraction3 = fraction2 * fraction;
  return (
    (2 * fraction3 - 3 * fraction2 + 1) * y0 +
    (fraction3 - 2 * fraction2 + fraction) * width * m0 +
    (-2 * fraction3 + 3 * fraction2) * y1 +
    (fraction3 - fraction2) * width * m1
  );
}
