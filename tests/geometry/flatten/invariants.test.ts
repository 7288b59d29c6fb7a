import { describe, expect, it } from "vitest";
import type { TriMesh } from "@/lib/geometry/mesh";
import { coneLateral } from "@/lib/geometry/shapes/cone-lateral";
import { cube } from "@/lib/geometry/shapes/cube";
import { cylinderTube } from "@/lib/geometry/shapes/cylinder-tube";
import { flatGrid } from "@/lib/geometry/shapes/flat-grid";
import { foldedSheet } from "@/lib/geometry/shapes/folded-sheet";
import { uvSphere } from "@/lib/geometry/shapes/uv-sphere";
import { cotanLaplacian } from "@/lib/geometry/flatten/cotan-laplacian";
import { flattenPiece } from "@/lib/geometry/flatten/flatten-piece";
import { triangleFrames } from "@/lib/geometry/flatten/triangle-frames";
import { asymmetry, csrMatVec } from "@/lib/geometry/sparse/csr-matrix";
import { cutPieces } from "@/lib/geometry/topology/cut-pieces";
import type { StretchMetrics } from "@/lib/geometry/report-types";

const fixtures: Record<string, TriMesh> = {
  tube: cylinderTube({ radius: 1, height: 3, segments: 16, bands: 5 }),
  cone: coneLateral({ radius: 1, height: 2, segments: 16, bands: 4 }),
  sphere: uvSphere({ radius: 1, latitudeBands: 12, longitudeSegments: 24 }),
  cube: cube({ size: 1, subdivisions: 3 }),
  fold: foldedSheet({ width: 2, depth: 1, dihedralDeg: 100, fold: "down", cellsAlong: 4, cellsAcross: 2 }),
  bump: flatGrid({ faces: 800, bump: 0.3 }),
};

/** rotate (about an oblique axis), scale and move */
function transform(m: TriMesh, scale: number, shift: [number, number, number]): TriMesh {
  const ax = [1, 2, 2].map((x) => x / 3), ang = 0.7, c = Math.cos(ang), s = Math.sin(ang);
  const p = new Float64Array(m.positions.length);
  for (let i = 0; i < p.length; i += 3) {
    const x = m.positions[i], y = m.positions[i + 1], z = m.positions[i + 2];
    const dot = ax[0] * x + ax[1] * y + ax[2] * z;
    const cx = ax[1] * z - ax[2] * y, cy = ax[2] * x - ax[0] * z, cz = ax[0] * y - ax[1] * x;
    // Rodrigues' rotation formula
    p[i] = scale * (x * c + cx * s + ax[0] * dot * (1 - c)) + shift[0];
    p[i + 1] = scale * (y * c + cy * s + ax[1] * dot * (1 - c)) + shift[1];
    p[i + 2] = scale * (z * c + cz * s + ax[2] * dot * (1 - c)) + shift[2];
  }
  return { positions: p, triangles: m.triangles };
}

describe("cotan Laplacian", () => {
  for (const [name, mesh] of Object.entries(fixtures)) {
    it(`${name}: symmetric and L·1 = 0`, () => {
      const fr = triangleFrames(mesh.positions, mesh.triangles);
      const L = cotanLaplacian(mesh.positions.length / 3, mesh.triangles, fr.cot);
      let maxDiag = 0;
      for (let i = 0; i < L.n; i++) for (let q = L.rowPtr[i]; q < L.rowPtr[i + 1]; q++) if (L.colIdx[q] === i) maxDiag = Math.max(maxDiag, L.values[q]);
      expect(asymmetry(L)).toBeLessThanOrEqual(1e-14 * maxDiag);
      const ones = new Float64Array(L.n).fill(1), y = new Float64Array(L.n);
      csrMatVec(L, ones, y);
      for (let i = 0; i < L.n; i++) expect(Math.abs(y[i])).toBeLessThan(1e-12 * maxDiag);
    });
  }
});

describe("LSCM and refinement", () => {
  it("LSCM reproduces a planar mesh up to a similarity", () => {
    // an irregular planar mesh: a grid with its vertices moved in-plane, then placed obliquely in 3D
    const g = flatGrid({ faces: 2 * 12 * 12, size: 3 });
    for (let i = 0; i < g.positions.length; i += 3) {
      const x = g.positions[i], y = g.positions[i + 1];
      g.positions[i] = x + 0.08 * Math.sin(3 * y + 1.3 * x);
      g.positions[i + 1] = y + 0.08 * Math.cos(2.1 * x - y);
    }
    const m = transform(g, 1, [5, -2, 1]);
    const [p] = cutPieces(m, new Uint32Array());
    const flat = flattenPiece(p, { refine: false });
    // similarity scaled to equal area = an isometry: every edge keeps its length
    expect(flat.lscmMetrics.maxConformal - 1).toBeLessThan(1e-8);
    expect(flat.lscmMetrics.maxStretch).toBeLessThan(1e-8);
    expect(flat.lscmMetrics.maxCompress).toBeLessThan(1e-8);
    expect(flat.solver.lscm.converged).toBe(true);
    expect(flat.solver.lscm.residual).toBeLessThan(1e-10);
  });

  it("refinement on a non-developable bump lowers the length error of LSCM and flips nothing", () => {
    const [p] = cutPieces(fixtures.bump, new Uint32Array());
    const flat = flattenPiece(p);
    expect(flat.metrics.flippedTriangles).toBe(0);
    expect(flat.solver.refine.converged).toBe(true);
    const worst = (m: StretchMetrics) => Math.max(m.maxStretch, m.maxCompress);
    expect(worst(flat.metrics)).toBeLessThan(worst(flat.lscmMetrics));
    expect(flat.triangleS1.every((s, i) => s >= flat.triangleS2[i])).toBe(true);
  });

  it("rejects a piece that is not a disk", () => {
    const [p] = cutPieces(fixtures.tube, new Uint32Array());
    expect(() => flattenPiece(p)).toThrow(/two boundary loops/);
  });
});

describe("invariance under moving, rotating and scaling by 1e±3 and 1e±6", () => {
  const base = flatGrid({ faces: 800, bump: 0.3 });
  const [p0] = cutPieces(base, new Uint32Array());
  const ref = flattenPiece(p0);
  const edgeSum = (uv: Float64Array, t: Uint32Array) => {
    let s = 0;
    for (let f = 0; f < t.length; f += 3) for (let k = 0; k < 3; k++) {
      const a = t[f + k], b = t[f + ((k + 1) % 3)];
      s += Math.hypot(uv[2 * a] - uv[2 * b], uv[2 * a + 1] - uv[2 * b + 1]);
    }
    return s;
  };
  const refLen = edgeSum(ref.uv, p0.triangles);
  for (const scale of [1e-6, 1e-3, 1, 1e3, 1e6]) {
    it(`scale ${scale}`, () => {
      const [p] = cutPieces(transform(base, scale, [1234.5 * scale, -77 * scale, 3e2 * scale]), new Uint32Array());
      const flat = flattenPiece(p);
      for (const key of ["maxStretch", "p95Stretch", "maxCompress", "meanConformal", "maxConformal"] as const) {
        expect(Math.abs(flat.metrics[key] - ref.metrics[key])).toBeLessThan(1e-6 * Math.max(1, Math.abs(ref.metrics[key])));
        expect(Math.abs(flat.lscmMetrics[key] - ref.lscmMetrics[key])).toBeLessThan(1e-6 * Math.max(1, Math.abs(ref.lscmMetrics[key])));
      }
      expect(flat.metrics.flippedTriangles).toBe(ref.metrics.flippedTriangles);
      expect(Math.abs(edgeSum(flat.uv, p.triangles) / scale - refLen) / refLen).toBeLessThan(1e-6);
    });
  }
});
