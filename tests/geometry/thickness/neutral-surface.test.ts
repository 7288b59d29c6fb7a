import { describe, expect, it } from "vitest";
import { bendAllowance } from "@/lib/geometry/thickness/bend-allowance";
import { neutralSurface } from "@/lib/geometry/thickness/neutral-surface";
import { vertexNormals } from "@/lib/geometry/thickness/vertex-normals";
import { cylinderTube } from "@/lib/geometry/shapes/cylinder-tube";
import { frustumLateral } from "@/lib/geometry/shapes/frustum-lateral";

/** Perimeter of ring 0 (vertices 0…n−1) of a tube. */
function ringPerimeter(p: Float64Array, n: number): number {
  let s = 0;
  for (let j = 0; j < n; j++) {
    const a = 3 * j, b = 3 * ((j + 1) % n);
    s += Math.hypot(p[b] - p[a], p[b + 1] - p[a + 1], p[b + 2] - p[a + 2]);
  }
  return s;
}

describe("bendAllowance", () => {
  it("matches a published worked example", () => {
    // Source: https://machinecalcs.com/bend-allowance-k-factor — 90° bend, R = 3 mm, t = 2 mm, K = 0.33 → 5.75 mm
    expect(bendAllowance(90, 3, 2, 0.33)).toBeCloseTo(5.75, 2);
  });
});

describe("neutralSurface", () => {
  const r = 100, t = 6, n = 256;
  const tube = cylinderTube({ radius: r, height: 50, segments: n, bands: 2 });

  it("vertex normals of a tube are radial to within the one-sided diagonal of the quads (< 0.5°)", () => {
    // Each vertex has two triangles of one quad and one of the other, so area weights tilt the normal by about
    // π/(3N) tangentially; the radial component stays cos(tilt).
    const nrm = vertexNormals(tube.positions, tube.triangles);
    for (let v = 0; v < tube.positions.length / 3; v++) {
      const x = tube.positions[3 * v], y = tube.positions[3 * v + 1];
      const l = Math.hypot(x, y);
      expect(nrm[3 * v] * (x / l) + nrm[3 * v + 1] * (y / l)).toBeGreaterThan(Math.cos((0.5 * Math.PI) / 180));
    }
  });

  it("outer-face scan of a cylinder: neutral radius r − t/2 (K = 0.5)", () => {
    const res = neutralSurface(tube.positions, tube.triangles, t, "outer", 0.5);
    expect(res.offset).toBe(-3);
    expect(res.invertedFaces).toBe(0);
    for (let v = 0; v < res.positions.length / 3; v++) {
      expect(Math.hypot(res.positions[3 * v], res.positions[3 * v + 1])).toBeCloseTo(r - t / 2, 3);
    }
  });

  it("inner-face scan: unrolled neutral length = bend allowance θ·(R + K·T) for a full turn", () => {
    // Source: BA = θ·(R + K·T) (Machinery's Handbook); R = the inner face radius, θ = 2π
    const k = 0.33;
    const res = neutralSurface(tube.positions, tube.triangles, t, "inner", k);
    // the N-gon perimeter relates to its circumradius by 2N·sin(π/N); compare on the same polygon
    const polygon = 2 * n * Math.sin(Math.PI / n);
    const ba = bendAllowance(360, r, t, k) * (polygon / (2 * Math.PI));
    expect(ringPerimeter(res.positions, n)).toBeCloseTo(ba, 3);
  });

  it("quarter turn matches the worked example through the offset surface", () => {
    // Source: https://machinecalcs.com/bend-allowance-k-factor — R = 3, T = 2, K = 0.33, 90° → 5.75 mm
    // Inner-face scan of a fine tube of radius 3: a quarter of the neutral ring is the bend allowance.
    const fine = 4096;
    const tb = cylinderTube({ radius: 3, height: 1, segments: fine });
    const res = neutralSurface(tb.positions, tb.triangles, 2, "inner", 0.33);
    expect(ringPerimeter(res.positions, fine) / 4).toBeCloseTo(5.75, 2);
  });

  it("zero thickness leaves the scan as is, and the copy is independent", () => {
    const res = neutralSurface(tube.positions, tube.triangles, 0, "outer");
    expect(res.offset === 0).toBe(true);
    expect(Array.from(res.positions)).toEqual(Array.from(tube.positions));
    expect(res.positions).not.toBe(tube.positions);
  });

  it("counts inverted faces when the offset is larger than the radius", () => {
    const cone = frustumLateral({ r1: 2, r2: 1, height: 1, segments: 32 });
    expect(neutralSurface(cone.positions, cone.triangles, 10, "outer", 0.5).invertedFaces).toBeGreaterThan(0);
  });
});
