/**
 * Convex hull of 2D points, Andrew's monotone chain. Source: A. M. Andrew, "Another efficient algorithm for convex
 * hulls in two dimensions", Information Processing Letters 9 (1979) 216–219.
 */

/**
 * @param xy       #P×2 coordinates
 * @param indices  optional subset of point indices (default all)
 * @returns        hull point indices, counter-clockwise, no repeated first point, collinear points dropped
 */
export function convexHull(xy: Float64Array, indices?: ArrayLike<number>): Uint32Array {
  const n = indices ? indices.length : xy.length / 2;
  const idx = new Uint32Array(n);
  for (let i = 0; i < n; i++) idx[i] = indices ? indices[i] : i;
  idx.sort((a, b) => xy[2 * a] - xy[2 * b] || xy[2 * a + 1] - xy[2 * b + 1]);
  if (n < 3) return idx;
  const hull = new Uint32Array(2 * n);
  let k = 0;
  const cross = (o: number, a: number, b: number): number =>
    (xy[2 * a] - xy[2 * o]) * (xy[2 * b + 1] - xy[2 * o + 1]) - (xy[2 * a + 1] - xy[2 * o + 1]) * (xy[2 * b] - xy[2 * o]);
  for (let i = 0; i < n; i++) {
    while (k >= 2 && cross(hull[k - 2], hull[k - 1], idx[i]) <= 0) k--;
    hull[k++] = idx[i];
  }
  for (let i = n - 2, t = k + 1; i >= 0; i--) {
    while (k >= t && cross(hull[k - 2], hull[k - 1], idx[i]) <= 0) k--;
    hull[k++] = idx[i];
  }
  return hull.slice(0, k - 1);
}
