import { describe, expect, it } from "vitest";
import { coneLateral } from "@/lib/geometry/shapes/cone-lateral";
import { cube } from "@/lib/geometry/shapes/cube";
import { cylinderTube } from "@/lib/geometry/shapes/cylinder-tube";
import { flatGrid } from "@/lib/geometry/shapes/flat-grid";
import { foldedSheet } from "@/lib/geometry/shapes/folded-sheet";
import { frustumLateral } from "@/lib/geometry/shapes/frustum-lateral";
import { uvSphere } from "@/lib/geometry/shapes/uv-sphere";
import type { TriMesh } from "@/lib/geometry/mesh";
import { buildHalfEdges, countBoundaryLoops } from "@/lib/geometry/topology/half-edge";

/** Σ over faces of (p0 · (p1 × p2)) / 6: the enclosed volume, positive when normals point outward. */
function signedVolume(m: TriMesh): number {
  let v = 0;
  const p = m.positions, t = m.triangles;
  for (let f = 0; f < t.length; f += 3) {
    const a = 3 * t[f], b = 3 * t[f + 1], c = 3 * t[f + 2];
    v += (p[a] * (p[b + 1] * p[c + 2] - p[b + 2] * p[c + 1]) - p[a + 1] * (p[b] * p[c + 2] - p[b + 2] * p[c]) + p[a + 2] * (p[b] * p[c + 1] - p[b + 1] * p[c])) / 6;
  }
  return v;
}

/** Every face normal has a positive component along the outward radial direction (x, y, 0) at its centroid. */
function normalsPointAwayFromAxis(m: TriMesh): boolean {
  const p = m.positions, t = m.triangles;
  for (let f = 0; f < t.length; f += 3) {
    const a = 3 * t[f], b = 3 * t[f + 1], c = 3 * t[f + 2];
    const ux = p[b] - p[a], uy = p[b + 1] - p[a + 1], uz = p[b + 2] - p[a + 2];
    const vx = p[c] - p[a], vy = p[c + 1] - p[a + 1], vz = p[c + 2] - p[a + 2];
    const nx = uy * vz - uz * vy, ny = uz * vx - ux * vz;
    const cx = (p[a] + p[b] + p[c]) / 3, cy = (p[a + 1] + p[b + 1] + p[c + 1]) / 3;
    if (!(nx * cx + ny * cy > 0)) return false;
  }
  return true;
}

function euler(m: TriMesh) {
  const he = buildHalfEdges(m.triangles, m.positions.length / 3);
  return { chi: m.positions.length / 3 - he.edgeCount + he.faceCount, loops: countBoundaryLoops(he), nonManifold: he.nonManifoldEdges + he.orientationConflicts };
}

describe("procedural shapes", () => {
  it("cylinder tube: counts, two boundary loops, outward normals", () => {
    const m = cylinderTube({ radius: 2, height: 3, segments: 10, bands: 4 });
    expect(m.positions.length / 3).toBe(50);
    expect(m.triangles.length / 3).toBe(80);
    expect(euler(m)).toEqual({ chi: 0, loops: 2, nonManifold: 0 });
    expect(normalsPointAwayFromAxis(m)).toBe(true);
  });

  it("cone and frustum: one / two loops, outward normals", () => {
    const c = coneLateral({ radius: 1, height: 2, segments: 12, bands: 3 });
    expect(euler(c)).toEqual({ chi: 1, loops: 1, nonManifold: 0 });
    expect(normalsPointAwayFromAxis(c)).toBe(true);
    const f = frustumLateral({ r1: 2.5, r2: 4, height: 4, segments: 16, bands: 2 });
    expect(euler(f)).toEqual({ chi: 0, loops: 2, nonManifold: 0 });
    expect(normalsPointAwayFromAxis(f)).toBe(true);
  });

  it("UV sphere and cube are closed, genus 0, with outward normals (positive enclosed volume)", () => {
    const s = uvSphere({ radius: 1, latitudeBands: 24, longitudeSegments: 48 });
    expect(euler(s)).toEqual({ chi: 2, loops: 0, nonManifold: 0 });
    // Source: sphere volume 4/3·π·R³; an inscribed polyhedron is slightly smaller
    expect(signedVolume(s)).toBeGreaterThan(0.98 * (4 / 3) * Math.PI);
    expect(signedVolume(s)).toBeLessThan((4 / 3) * Math.PI);
    const c = cube({ size: 2 });
    expect(c.positions.length / 3).toBe(8);
    expect(c.triangles.length / 3).toBe(12);
    expect(euler(c)).toEqual({ chi: 2, loops: 0, nonManifold: 0 });
    expect(signedVolume(c)).toBeCloseTo(8, 12);
    const c3 = cube({ size: 2, subdivisions: 3 });
    expect(euler(c3)).toEqual({ chi: 2, loops: 0, nonManifold: 0 });
    expect(signedVolume(c3)).toBeCloseTo(8, 12);
  });

  it("folded sheet: a disk whose second half leaves the crease at the dihedral angle", () => {
    const m = foldedSheet({ width: 2, depth: 1, dihedralDeg: 90, fold: "up", cellsAlong: 2, cellsAcross: 2 });
    expect(euler(m)).toEqual({ chi: 1, loops: 1, nonManifold: 0 });
    const last = m.positions.length / 3 - 1; // far edge of the second rectangle
    expect(m.positions[3 * last + 1]).toBeCloseTo(0, 12);
    expect(m.positions[3 * last + 2]).toBeCloseTo(1, 12);
    const down = foldedSheet({ width: 2, depth: 1, dihedralDeg: 120, fold: "down" });
    expect(down.positions[3 * 5 + 2]).toBeCloseTo(-Math.sin(Math.PI / 3), 12);
  });

  it("flat grid: about the requested number of faces, a disk", () => {
    for (const faces of [10_000, 100_000]) {
      const g = flatGrid({ faces });
      expect(Math.abs(g.triangles.length / 3 - faces) / faces).toBeLessThan(0.02);
    }
    expect(euler(flatGrid({ faces: 200 }))).toEqual({ chi: 1, loops: 1, nonManifold: 0 });
  });

  it("rejects bad parameters with a clear error", () => {
    expect(() => cylinderTube({ radius: -1, height: 1, segments: 8 })).toThrow(/radius must be/);
    expect(() => uvSphere({ radius: 1, latitudeBands: 1, longitudeSegments: 8 })).toThrow(/latitudeBands/);
  });
});
