/**
 * Minimum-area enclosing rectangle by rotating calipers: the optimal rectangle has a side collinear with a hull edge.
 * Source: H. Freeman, R. Shapira, "Determining the minimum-area encasing rectangle for an arbitrary closed curve",
 * CACM 18(7) 1975; G. Toussaint, "Solving geometric problems with the rotating calipers", MELECON 1983.
 */

export interface MinAreaRect {
  /** rotation (radians, counter-clockwise) that makes the rectangle axis-aligned */
  angle: number;
  /** extents after that rotation */
  width: number;
  height: number;
  area: number;
}

/**
 * @param xy    #P×2 coordinates
 * @param hull  counter-clockwise hull indices (from convexHull)
 */
export function minAreaRect(xy: Float64Array, hull: Uint32Array): MinAreaRect {
  const h = hull.length;
  if (h === 0) return { angle: 0, width: 0, height: 0, area: 0 };
  if (h < 3) {
    const dx = xy[2 * hull[h - 1]] - xy[2 * hull[0]], dy = xy[2 * hull[h - 1] + 1] - xy[2 * hull[0] + 1];
    return { angle: -Math.atan2(dy, dx), width: Math.hypot(dx, dy), height: 0, area: 0 };
  }
  const X = (i: number): number => xy[2 * hull[i % h]];
  const Y = (i: number): number => xy[2 * hull[i % h] + 1];
  let best: MinAreaRect = { angle: 0, width: Infinity, height: Infinity, area: Infinity };
  // caliper pointers: farthest along e (right), farthest along the inward normal (top), least along e (left)
  let right = 0, top = 0, left = 0;
  for (let i = 0; i < h; i++) {
    let ex = X(i + 1) - X(i), ey = Y(i + 1) - Y(i);
    const el = Math.hypot(ex, ey);
    if (el === 0) continue;
    ex /= el;
    ey /= el;
    const nx = -ey, ny = ex;
    const pe = (j: number): number => X(j) * ex + Y(j) * ey;
    const pn = (j: number): number => X(j) * nx + Y(j) * ny;
    if (right < i + 1) right = i + 1;
    let guard = 0;
    while (pe(right + 1) >= pe(right) && guard++ < h) right++;
    if (top < right) top = right;
    guard = 0;
    while (pn(top + 1) >= pn(top) && guard++ < h) top++;
    if (left < top) left = top;
    guard = 0;
    while (pe(left + 1) <= pe(left) && guard++ < h) left++;
    const width = pe(right) - pe(left);
    const height = pn(top) - pn(i);
    const area = width * height;
    if (area < best.area - 1e-12 * Math.abs(area)) best = { angle: -Math.atan2(ey, ex), width, height, area };
  }
  return best;
}
