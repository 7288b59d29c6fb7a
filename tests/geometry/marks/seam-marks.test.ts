import { describe, expect, it } from "vitest";
import { foldedSheet } from "@/lib/geometry/shapes/folded-sheet";
import { cutPieces } from "@/lib/geometry/topology/cut-pieces";
import { dihedralAngles } from "@/lib/geometry/marks/dihedral-angles";
import { seamEdgeFaces } from "@/lib/geometry/marks/seam-edge-faces";
import { buildSeamRuns } from "@/lib/geometry/marks/seam-runs";
import { pieceFaceIndex } from "@/lib/geometry/marks/piece-face-index";
import { seamMarks, type SeamBevelRun } from "@/lib/geometry/marks/seam-marks";
import type { PieceMesh } from "@/lib/geometry/topology/piece-mesh";

/**
 * Exact development of a folded sheet piece: the flat rectangle keeps (x, y); the tilted one is unrolled about the
 * crease to (x, +distance from the crease). Then each piece is turned and moved differently, as a layout would.
 */
function develop(p: PieceMesh, angle: number, dx: number, dy: number): Float64Array {
  const n = p.positions.length / 3, uv = new Float64Array(2 * n);
  const c = Math.cos(angle), s = Math.sin(angle);
  for (let v = 0; v < n; v++) {
    const x = p.positions[3 * v], y = p.positions[3 * v + 1], z = p.positions[3 * v + 2];
    const t = z === 0 && y <= 0 ? y : Math.hypot(y, z);
    uv[2 * v] = c * x - s * t + dx;
    uv[2 * v + 1] = s * x + c * t + dy;
  }
  return uv;
}

function arcTo(path: [number, number][], x: number, y: number): number {
  // arc length along the path up to the closest point (x, y) on it
  let best = Infinity, bestArc = 0, acc = 0;
  for (let i = 0; i + 1 < path.length; i++) {
    const [x0, y0] = path[i], [x1, y1] = path[i + 1];
    const l = Math.hypot(x1 - x0, y1 - y0);
    const u = Math.max(0, Math.min(1, ((x - x0) * (x1 - x0) + (y - y0) * (y1 - y0)) / (l * l)));
    const d = Math.hypot(x0 + u * (x1 - x0) - x, y0 + u * (y1 - y0) - y);
    if (d < best) {
      best = d;
      bestArc = acc + u * l;
    }
    acc += l;
  }
  return bestArc;
}

function setup(width: number, spacing: number, lengthFactor = 1) {
  const cellsAlong = 7;
  const m = foldedSheet({ width, depth: 30, dihedralDeg: 120, fold: "down", cellsAlong, cellsAcross: 2 });
  const cols = cellsAlong + 1, e: number[] = [];
  for (let i = 0; i < cellsAlong; i++) e.push(2 * cols + i, 2 * cols + i + 1);
  const seams = new Uint32Array(e);
  const pieces = cutPieces(m, seams);
  const nv = m.positions.length / 3;
  const sef = seamEdgeFaces(m.triangles, nv, seams);
  const { facePiece, faceLocal } = pieceFaceIndex(pieces, m.triangles.length / 3);
  const runs = buildSeamRuns(sef, facePiece, nv);
  const dihedral = dihedralAngles(m.positions, m.triangles, sef.a, sef.b, sef.faceAB, sef.faceBA);
  const uvs = [develop(pieces[0], 0.3, 10, 20), develop(pieces[1], -2.1, 500, -40)].map((uv) => uv.map((x) => x * lengthFactor));
  const marks = seamMarks({
    positions: m.positions,
    sef,
    runs,
    dihedral,
    facePiece,
    faceLocal,
    pieces: pieces.map((p, i) => ({ label: p.label, uv: uvs[i], triangles: p.triangles, vertexIds: p.vertexIds })),
    lengthFactor,
    tickSpacing: spacing,
    letterInset: 5,
  });
  return { pieces, marks, uvs };
}

describe("seam marks", () => {
  it("ticks sit at matching arc lengths on both pieces, same numbers, count = floor(L/spacing)", () => {
    const { marks } = setup(237, 50);
    const [ta, tb] = marks.ticks;
    // Rule (documented in seam-marks.ts): n = floor(237 / 50) = 4 ticks at (i − ½)·L/n
    expect(ta.length).toBe(4);
    expect(tb.length).toBe(4);
    const [ra] = marks.bevels[0], [rb] = marks.bevels[1];
    expect(ra.run).toBe(rb.run);
    expect(ra.length).toBeCloseTo(237, 9);
    expect(ra.tickCount).toBe(4);
    for (let i = 0; i < 4; i++) {
      expect(ta[i].number).toBe(i + 1);
      expect(tb[i].number).toBe(i + 1);
      const sa = arcTo(ra.path, ta[i].x, ta[i].y), sb = arcTo(rb.path, tb[i].x, tb[i].y);
      expect(Math.abs(sa - sb)).toBeLessThan(1e-9 * 237);
      expect(sa).toBeCloseTo(((i + 0.5) * 237) / 4, 9);
    }
  });

  it("tick normals point into their piece and letters name the neighbour", () => {
    const { marks, uvs, pieces } = setup(237, 50);
    for (let p = 0; p < 2; p++) {
      // centroid of the piece's vertices
      let cx = 0, cy = 0;
      const n = uvs[p].length / 2;
      for (let v = 0; v < n; v++) {
        cx += uvs[p][2 * v] / n;
        cy += uvs[p][2 * v + 1] / n;
      }
      for (const t of marks.ticks[p]) {
        expect(Math.hypot(t.nx, t.ny)).toBeCloseTo(1, 12);
        expect((cx - t.x) * t.nx + (cy - t.y) * t.ny).toBeGreaterThan(0);
      }
      const run = marks.bevels[p][0] as SeamBevelRun;
      expect(run.neighbor).toBe(pieces[1 - p].label);
      expect(run.letter.text).toBe(pieces[1 - p].label);
      expect((cx - run.letter.x) * -run.letter.dy + (cy - run.letter.y) * run.letter.dx).toBeLessThan(0);
    }
  });

  it("bevels: both sides report the same ridge, bevel −30° for a 120° fold seen from outside as 240°", () => {
    // foldedSheet "down" with 120°: outside dihedral 360 − 120 = 240, bevel (180 − 240)/2 = −30 (ridge)
    const { marks } = setup(100, 50);
    for (const side of [marks.bevels[0][0], marks.bevels[1][0]]) {
      expect(side.dihedralDeg).toBeCloseTo(240, 9);
      expect(side.bevelDeg).toBeCloseTo(-30, 9);
      expect(side.kind).toBe("ridge");
      expect(side.opensTo).toBe("inner");
    }
  });

  it("exact multiples and short runs follow the rule: 200/50 → 4, 49/50 → 0", () => {
    expect(setup(200, 50).marks.ticks[0].length).toBe(4);
    expect(setup(49, 50).marks.ticks[0].length).toBe(0);
  });

  it("lengths and ticks are in output units at final size", () => {
    // a 100-unit seam scaled ×2.54 is 254 long; 254 / 50 → 5 ticks
    const { marks } = setup(100, 50, 2.54);
    expect(marks.bevels[0][0].length).toBeCloseTo(254, 9);
    expect(marks.ticks[1].length).toBe(5);
  });
});
