/**
 * Small planar polygon helpers for the pattern writers. Polygons are flat arrays [x0, y0, x1, y1, …] (not closed).
 */

/** Signed area (shoelace formula), positive for counter-clockwise. */
export function polygonSignedArea(xy: Float64Array): number {
  const n = xy.length / 2;
  let a = 0;
  for (let i = 0, j = n - 1; i < n; j = i++) a += xy[2 * j] * xy[2 * i + 1] - xy[2 * i] * xy[2 * j + 1];
  return a / 2;
}

/** Perimeter of the closed polygon. */
export function polygonPerimeter(xy: Float64Array): number {
  const n = xy.length / 2;
  let s = 0;
  for (let i = 0, j = n - 1; i < n; j = i++) s += Math.hypot(xy[2 * i] - xy[2 * j], xy[2 * i + 1] - xy[2 * j + 1]);
  return s;
}

/** Even-odd point-in-polygon test. */
export function pointInPolygon(xy: Float64Array, x: number, y: number): boolean {
  const n = xy.length / 2;
  let inside = false;
  for (let i = 0, j = n - 1; i < n; j = i++) {
    const xi = xy[2 * i], yi = xy[2 * i + 1], xj = xy[2 * j], yj = xy[2 * j + 1];
    if (yi > y !== yj > y && x < ((xj - xi) * (y - yi)) / (yj - yi) + xi) inside = !inside;
  }
  return inside;
}

/** Distance from (x, y) to the polygon's boundary. */
export function distanceToBoundary(xy: Float64Array, x: number, y: number): number {
  const n = xy.length / 2;
  let best = Infinity;
  for (let i = 0, j = n - 1; i < n; j = i++) {
    const ax = xy[2 * j], ay = xy[2 * j + 1], bx = xy[2 * i], by = xy[2 * i + 1];
    const dx = bx - ax, dy = by - ay;
    const len2 = dx * dx + dy * dy;
    let t = len2 > 0 ? ((x - ax) * dx + (y - ay) * dy) / len2 : 0;
    t = t < 0 ? 0 : t > 1 ? 1 : t;
    const d = Math.hypot(ax + t * dx - x, ay + t * dy - y);
    if (d < best) best = d;
  }
  return best;
}

export interface Box {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

export function polygonBox(xy: Float64Array): Box {
  let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity;
  for (let i = 0; i < xy.length; i += 2) {
    if (xy[i] < minX) minX = xy[i];
    if (xy[i] > maxX) maxX = xy[i];
    if (xy[i + 1] < minY) minY = xy[i + 1];
    if (xy[i + 1] > maxY) maxY = xy[i + 1];
  }
  return { minX, minY, maxX, maxY };
}

/**
 * An interior point far from the boundary (where the piece label goes) and its distance to the boundary:
 * a coarse grid search followed by two finer grids around the best cell, in the spirit of a pole-of-inaccessibility
 * search. Falls back to the first vertex for degenerate polygons.
 */
export function labelPoint(xy: Float64Array): { x: number; y: number; clearance: number } {
  const box = polygonBox(xy);
  let bx = xy[0], by = xy[1], bd = 0;
  let cx = (box.minX + box.maxX) / 2, cy = (box.minY + box.maxY) / 2;
  let hw = (box.maxX - box.minX) / 2, hh = (box.maxY - box.minY) / 2;
  if (!(hw > 0 && hh > 0)) return { x: bx, y: by, clearance: 0 };
  const steps = 16;
  for (let pass = 0; pass < 3; pass++) {
    for (let i = 0; i <= steps; i++) {
      for (let j = 0; j <= steps; j++) {
        const x = cx - hw + (2 * hw * i) / steps;
        const y = cy - hh + (2 * hh * j) / steps;
        if (!pointInPolygon(xy, x, y)) continue;
        const d = distanceToBoundary(xy, x, y);
        if (d > bd) { bd = d; bx = x; by = y; }
      }
    }
    cx = bx; cy = by; hw = (2 * hw) / steps * 1.5; hh = (2 * hh) / steps * 1.5;
  }
  return { x: bx, y: by, clearance: bd };
}

/** Point and unit tangent at arc length `s` along an open polyline; also returns its total length. */
export function pointAlongPolyline(xy: Float64Array, s: number): { x: number; y: number; tx: number; ty: number } {
  const n = xy.length / 2;
  let acc = 0;
  for (let i = 1; i < n; i++) {
    const dx = xy[2 * i] - xy[2 * i - 2], dy = xy[2 * i + 1] - xy[2 * i - 1];
    const len = Math.hypot(dx, dy);
    if (len === 0) continue;
    if (acc + len >= s || i === n - 1) {
      const t = Math.min(1, Math.max(0, (s - acc) / len));
      return { x: xy[2 * i - 2] + t * dx, y: xy[2 * i - 1] + t * dy, tx: dx / len, ty: dy / len };
    }
    acc += len;
  }
  return { x: xy[0], y: xy[1], tx: 1, ty: 0 };
}

/** Length of an open polyline. */
export function polylineLength(xy: Float64Array): number {
  let s = 0;
  for (let i = 2; i < xy.length; i += 2) s += Math.hypot(xy[i] - xy[i - 2], xy[i + 1] - xy[i - 1]);
  return s;
}

/** Whether segment (ax, ay)–(bx, by) meets the box (Liang–Barsky clipping). */
function segmentMeetsBox(ax: number, ay: number, bx: number, by: number, b: Box): boolean {
  let t0 = 0, t1 = 1;
  const dx = bx - ax, dy = by - ay;
  const p = [-dx, dx, -dy, dy];
  const q = [ax - b.minX, b.maxX - ax, ay - b.minY, b.maxY - ay];
  for (let i = 0; i < 4; i++) {
    if (p[i] === 0) { if (q[i] < 0) return false; continue; }
    const r = q[i] / p[i];
    if (p[i] < 0) { if (r > t1) return false; if (r > t0) t0 = r; }
    else { if (r < t0) return false; if (r < t1) t1 = r; }
  }
  return true;
}

/** Whether the closed polygon (its area, not just its outline) overlaps the box. */
export function polygonMeetsBox(xy: Float64Array, b: Box): boolean {
  const n = xy.length / 2;
  for (let i = 0, j = n - 1; i < n; j = i++) {
    if (segmentMeetsBox(xy[2 * j], xy[2 * j + 1], xy[2 * i], xy[2 * i + 1], b)) return true;
  }
  // No edge meets the box: either the box is inside the polygon or they are apart.
  return pointInPolygon(xy, (b.minX + b.maxX) / 2, (b.minY + b.maxY) / 2);
}
