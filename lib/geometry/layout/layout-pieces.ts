/**
 * Pattern-sheet layout: each piece is turned to its minimum-area bounding rectangle (long side along x) and the
 * rectangles are placed in rows with a gap. Rotation and translation only, so outlines stay counter-clockwise.
 */
import { boundaryLoops, loopArea } from "./boundary-loops";
import { convexHull } from "./convex-hull";
import { minAreaRect } from "./min-area-rect";
import { packRows } from "./pack-rows";

export interface LayoutInput {
  /** #V×2 flattened coordinates, output units, orientation-preserving (counter-clockwise faces) */
  uv: Float64Array;
  /** #F×3 local faces */
  triangles: Uint32Array;
  /** false: keep out of the sheet (not cut, e.g. the mirror twin of another piece); it is still rotated */
  onSheet: boolean;
}

export interface LaidOutPiece {
  /** #V×2 coordinates on the sheet, output units (a new array) */
  uv: Float64Array;
  /** local vertex ids of the outer boundary, counter-clockwise */
  outlineLoop: Uint32Array;
  outline: [number, number][];
  placement: { x: number; y: number; rotationDeg: number; width: number; height: number };
}

export interface LayoutOptions {
  /** clearance between pieces, output units */
  gap: number;
  /** row width, output units; default max(widest piece, 1.2·√(Σ box areas)) */
  sheetWidth?: number;
}

/** Outer boundary loop (largest |area|) of a flattened piece, as local vertex ids. */
export function outerBoundary(uv: Float64Array, triangles: Uint32Array): Uint32Array {
  const loops = boundaryLoops(triangles, uv.length / 2);
  let best: Uint32Array = new Uint32Array(0), bestArea = -1;
  for (const l of loops) {
    const a = Math.abs(loopArea(uv, l));
    if (a > bestArea) {
      bestArea = a;
      best = l;
    }
  }
  return best;
}

export function layoutPieces(pieces: LayoutInput[], opts: LayoutOptions): LaidOutPiece[] {
  const turned = pieces.map((p) => {
    const loop = outerBoundary(p.uv, p.triangles);
    const hull = convexHull(p.uv, loop.length >= 3 ? loop : undefined);
    const rect = minAreaRect(p.uv, hull);
    let angle = rect.angle;
    if (rect.height > rect.width) angle += Math.PI / 2;
    const c = Math.cos(angle), s = Math.sin(angle);
    const uv = new Float64Array(p.uv.length);
    let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity;
    for (let i = 0; i < uv.length; i += 2) {
      const x = c * p.uv[i] - s * p.uv[i + 1], y = s * p.uv[i] + c * p.uv[i + 1];
      uv[i] = x;
      uv[i + 1] = y;
    }
    // box of the referenced vertices only
    for (let i = 0; i < p.triangles.length; i++) {
      const v = 2 * p.triangles[i];
      if (uv[v] < minX) minX = uv[v];
      if (uv[v] > maxX) maxX = uv[v];
      if (uv[v + 1] < minY) minY = uv[v + 1];
      if (uv[v + 1] > maxY) maxY = uv[v + 1];
    }
    if (p.triangles.length === 0) minX = minY = maxX = maxY = 0;
    let deg = (angle * 180) / Math.PI;
    deg = ((deg % 360) + 360) % 360;
    return { uv, loop, minX, minY, width: maxX - minX, height: maxY - minY, rotationDeg: deg };
  });
  const sheet = turned.filter((_, i) => pieces[i].onSheet);
  const boxArea = sheet.reduce((s, t) => s + (t.width + opts.gap) * (t.height + opts.gap), 0);
  const widest = sheet.reduce((m, t) => Math.max(m, t.width), 0);
  const sheetWidth = opts.sheetWidth ?? Math.max(widest, 1.2 * Math.sqrt(boxArea));
  const corners = packRows(sheet.map((t) => ({ width: t.width, height: t.height })), opts.gap, sheetWidth);
  let k = 0;
  return turned.map((t, i) => {
    let x = 0, y = 0;
    if (pieces[i].onSheet) {
      x = corners[2 * k];
      y = corners[2 * k + 1];
      k++;
    }
    const dx = x - t.minX, dy = y - t.minY;
    for (let j = 0; j < t.uv.length; j += 2) {
      t.uv[j] += dx;
      t.uv[j + 1] += dy;
    }
    const outline: [number, number][] = Array.from(t.loop, (v) => [t.uv[2 * v], t.uv[2 * v + 1]] as [number, number]);
    return { uv: t.uv, outlineLoop: t.loop, outline, placement: { x, y, rotationDeg: t.rotationDeg, width: t.width, height: t.height } };
  });
}
