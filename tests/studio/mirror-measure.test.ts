import { describe, expect, it } from "vitest";
import { cube } from "@/lib/geometry/shapes/cube";
import { flatGrid } from "@/lib/geometry/shapes/flat-grid";
import { uvSphere } from "@/lib/geometry/shapes/uv-sphere";
import { fitMirrorPlane, mirrorRuns, mirrorVertices } from "@/lib/studio/mirror-map";
import { convertLength, measureDistance, measureVertices, meshDimensions } from "@/lib/studio/measure";
import { createSeamPathFinder } from "@/lib/studio/seam-path";
import { SeamSet } from "@/lib/studio/seam-set";
import { buildStudioMesh, edgeBetween } from "@/lib/studio/studio-mesh";
import { meridian } from "./fixtures";

describe("mirror mapping", () => {
  it("a grid with an even cell count is symmetric about x = size/2: every vertex matched, seams mirrored edge for edge", () => {
    const n = 12, m = n + 1, size = 6;
    const sm = buildStudioMesh(flatGrid({ faces: 2 * n * n, size }));
    expect(fitMirrorPlane(sm, "x")).toBeCloseTo(size / 2, 12);
    const mirror = mirrorVertices(sm, { axis: "x" });
    expect(mirror.unmatched).toBe(0);
    for (let r = 0; r < m; r++) for (let i = 0; i < m; i++) expect(mirror.partner[r * m + i]).toBe(r * m + (n - i));
    expect(mirror.onPlane).toBe(m); // the middle column
    // a seam on the left half drawn by the path finder, diagonals included
    const set = new SeamSet(sm);
    const finder = createSeamPathFinder(sm);
    set.addRun(finder.through([0 * m + 1, 5 * m + 5, 11 * m + 2])!.vertices);
    const before = Array.from(set.onSeam).reduce((a, b) => a + b, 0);
    const res = mirrorRuns(sm, mirror, set.runs, { from: "negative" });
    expect(res.failed).toBe(0);
    expect(res.mirrored).toBe(before);
    expect(res.chains.length).toBe(1);
    const src = set.runs[0].vertices;
    expect(Array.from(res.chains[0])).toEqual(Array.from(src).map((v) => Math.floor(v / m) * m + (n - (v % m))));
    set.addRuns(res.chains, "mirror seams");
    expect(set.seamEdgeCount).toBe(2 * before);
    for (const e of set.runs[0].edges) {
      const a = mirror.partner[sm.edgeLo[e]], b = mirror.partner[sm.edgeHi[e]];
      expect(set.onSeam[edgeBetween(sm, a, b)]).toBe(1);
    }
    // copying from the other half finds nothing new on the left: those edges are on the "negative" side
    expect(mirrorRuns(sm, mirror, [set.runs[0]], { from: "positive" }).otherSide).toBe(before);
  });

  it("a UV sphere mirrored across y = 0 maps meridian j to meridian S − j", () => {
    const B = 8, S = 16;
    const sm = buildStudioMesh(uvSphere({ radius: 1, latitudeBands: B, longitudeSegments: S }));
    const mirror = mirrorVertices(sm, { axis: "y", offset: 0 });
    expect(mirror.unmatched).toBe(0);
    const res = mirrorRuns(sm, mirror, [{ vertices: meridian(B, S, 3) }]);
    expect(res.failed).toBe(0);
    expect(Array.from(res.chains[0])).toEqual(meridian(B, S, S - 3));
    // meridian 0 lies in the plane y = 0: its own image
    expect(mirrorRuns(sm, mirror, [{ vertices: meridian(B, S, 0) }]).onPlane).toBe(B);
  });

  it("an asymmetric mesh reports the unmatched vertices and the seam edges it could not mirror", () => {
    const n = 10, m = n + 1;
    const mesh = flatGrid({ faces: 2 * n * n, size: 1 });
    const moved = 3 * m + 2; // column 2, row 3; its partner is column 8, row 3
    mesh.positions[3 * moved] += 0.03;
    const sm = buildStudioMesh(mesh);
    const mirror = mirrorVertices(sm, { axis: "x" });
    expect(mirror.unmatched).toBe(2);
    expect(Array.from(mirror.unmatchedSample).sort((a, b) => a - b)).toEqual([moved, 3 * m + 8]);
    const res = mirrorRuns(sm, mirror, [{ vertices: [3 * m + 0, 3 * m + 1, 3 * m + 2, 3 * m + 3, 3 * m + 4] }]);
    expect(res.failed).toBe(2); // the two edges at the moved vertex
    expect(res.mirrored).toBe(2);
    expect(res.chains.length).toBe(2);
    // a wider tolerance matches it again
    expect(mirrorVertices(sm, { axis: "x", tolerance: 0.03 }).unmatched).toBe(0);
  });

  it("a cube has the same partners found by the hash as by brute force on every axis", () => {
    const sm = buildStudioMesh(cube({ size: 3, subdivisions: 3 }));
    const p = sm.mesh.positions;
    for (const axis of ["x", "y", "z"] as const) {
      const k = { x: 0, y: 1, z: 2 }[axis];
      const mirror = mirrorVertices(sm, { axis });
      for (let v = 0; v < sm.vertexCount; v++) {
        let best = -1, bd = Infinity;
        for (let w = 0; w < sm.vertexCount; w++) {
          const d = Math.hypot(p[3 * w + k] + p[3 * v + k], ...[0, 1, 2].filter((j) => j !== k).map((j) => p[3 * w + j] - p[3 * v + j]));
          if (d < bd) { bd = d; best = w; }
        }
        expect(mirror.partner[v]).toBe(best);
      }
    }
  });
});

describe("measuring", () => {
  it("converts between units; a cube's dimensions read in every unit", () => {
    // Source: 1 in = 25.4 mm exactly (international yard and pound agreement, 1959)
    expect(convertLength(1, "in", "mm")).toBe(25.4);
    expect(convertLength(254, "mm", "in")).toBeCloseTo(10, 12);
    expect(convertLength(1.5, "m", "cm")).toBe(150);
    const sm = buildStudioMesh(cube({ size: 40 }));
    const d = meshDimensions(sm, "mm", "cm");
    expect([d.x, d.y, d.z]).toEqual([4, 4, 4]);
    expect(d.text).toBe("4.00 × 4.00 × 4.00 cm");
    expect(d.diagonal).toBeCloseTo(4 * Math.sqrt(3), 12);
    expect(meshDimensions(sm, "mm", "in").x).toBeCloseTo(40 / 25.4, 12);
  });

  it("measures between two picked points and two vertices", () => {
    const m = measureDistance([0, 0, 0], [3, 4, 0], "cm", "mm"); // Source: 3-4-5 right triangle
    expect(m.scanUnits).toBe(5);
    expect(m.value).toBe(50);
    expect(m.text).toBe("50.0 mm");
    const sm = buildStudioMesh(cube({ size: 2 }));
    // corners 0 = (−1, −1, −1) and 7 = (1, 1, 1): the space diagonal 2√3
    expect(measureVertices(sm, 0, 7, "in", "in").value).toBeCloseTo(2 * Math.sqrt(3), 12);
    expect(() => measureDistance([0, 0, NaN], [1, 1, 1], "mm", "mm")).toThrow(/finite/);
  });
});
