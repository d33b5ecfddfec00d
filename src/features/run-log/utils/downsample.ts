/**
 * Largest-Triangle-Three-Buckets downsampling (Steinarsson, "Downsampling Time Series for
 * Visual Representation", University of Iceland, 2013): keeps the first and last points and,
 * from each bucket between, the point that makes the largest triangle with its neighbours,
 * so peaks and dips survive while the chart draws a few hundred points instead of thousands.
 *
 * @param points sorted by x
 * @param threshold how many points to keep (≥ 3); fewer input points are returned as they are
 * @param y which value of a point to preserve the shape of
 */
export function downsample<T extends { x: number }>(
  points: readonly T[],
  threshold: number,
  y: (point: T) => number | null,
): T[] {
  if (threshold < 3 || points.length <= threshold) return [...points];
  const valueOf = (point: T) => y(point) ?? 0;
  const sampled: T[] = [points[0]!];
  const bucketSize = (points.length - 2) / (threshold - 2);
  let previous = 0;
  for (let bucket = 0; bucket < threshold - 2; bucket++) {
    // Average of the next bucket: the third corner of the triangle.
    const nextStart = Math.floor((bucket + 1) * bucketSize) + 1;
    const nextEnd = Math.min(Math.floor((bucket + 2) * bucketSize) + 1, points.length);
    let averageX = 0;
    let averageY = 0;
    for (let index = nextStart; index < nextEnd; index++) {
      averageX += points[index]!.x;
      averageY += valueOf(points[index]!);
    }
    const nextCount = Math.max(nextEnd - nextStart, 1);
    averageX /= nextCount;
    averageY /= nextCount;

    const start = Math.floor(bucket * bucketSize) + 1;
    const end = Math.floor((bucket + 1) * bucketSize) + 1;
    const anchor = points[previous]!;
    let bestArea = -1;
    let best = start;
    for (let index = start; index < end; index++) {
      const candidate = points[index]!;
      const area = Math.abs(
        (anchor.x - averageX) * (valueOf(candidate) - valueOf(anchor)) -
          (anchor.x - candidate.x) * (averageY - valueOf(anchor)),
      );
      if (area > bestArea) {
        bestArea = area;
        best = index;
      }
    }
    sampled.push(points[best]!);
    previous = best;
  }
  sampled.push(points[points.length - 1]!);
  return sampled;
}
