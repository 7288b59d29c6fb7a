import { describe, expect, it } from "vitest";
import { projectViews, VIEW_FACE_BUDGET } from "@/lib/patterns/assembly/project-views";
import { clusterSimplify, simplifyToBudget } from "@/lib/patterns/assembly/cluster-simplify";
import { tubeAssembly } from "./fixtures";

describe("assembly views", () => {
  const tube = tubeAssembly(4);

  it("draws four orthographic views, far triangles first", () => {
    const views = projectViews(tube, tube.labels);
    expect(views.map((v) => v.name)).toEqual(["front", "side", "top", "three-quarter"]);
    // Front view of a radius-1, height-2 tube: 2 wide, 2 tall.
    const front = views[0];
    expect(front.maxX - front.minX).toBeCloseTo(2, 6);
    expect(front.maxY - front.minY).toBeCloseTo(2, 6);
    // Top view: the circle, 2 × 2 (vertices lie on the circle).
    expect(views[2].maxX - views[2].minX).toBeCloseTo(2, 6);
    expect(views[2].maxY - views[2].minY).toBeCloseTo(2, 6);
    expect(front.triangles.length / 6).toBe(tube.triangles.length / 3);
  });

  it("letters only pieces that face the viewer, at their visible centroid", () => {
    const views = projectViews(tube, tube.labels);
    // Pieces are quarter strips starting at angle 0 (x axis) going towards +z: A and B face the front (+z).
    const front = views[0].letters.map((l) => l.label).sort();
    expect(front).toEqual(["A", "B"]);
    for (const l of views[0].letters) { expect(Math.abs(l.x)).toBeLessThan(1); expect(Math.abs(l.y)).toBeLessThan(0.2); }
  });

  it("simplifies large meshes under the drawing budget and keeps piece ids", () => {
    const big = tubeAssembly(5, 400, 60); // 48 000 faces
    const s = simplifyToBudget(big, VIEW_FACE_BUDGET);
    expect(s.triangles.length / 3).toBeLessThanOrEqual(VIEW_FACE_BUDGET);
    expect(s.triangles.length / 3).toBeGreaterThan(500);
    expect(new Set(s.facePiece).size).toBe(5);
    // Vertex clustering keeps the shape within one cell of the original.
    const c = clusterSimplify(big, 32);
    for (let i = 0; i < c.positions.length; i += 3) expect(Math.hypot(c.positions[i], c.positions[i + 2])).toBeGreaterThan(0.9);
  });
});
