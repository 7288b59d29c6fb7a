import { describe, expect, it } from "vitest";
import { uvSphere } from "@/lib/geometry/shapes/uv-sphere";
import { cutPieces } from "@/lib/geometry/topology/cut-pieces";
import { boundaryLoops, buildHalfEdges } from "@/lib/geometry/topology/half-edge";
import { arapRefine, countFlips } from "@/lib/geometry/flatten/arap";
import { flattenPiece } from "@/lib/geometry/flatten/flatten-piece";
import { lscm } from "@/lib/geometry/flatten/lscm";
import { triangleFrames } from "@/lib/geometry/flatten/triangle-frames";
import { meshVertexOrdering } from "@/lib/geometry/flatten/vertex-ordering";

describe("refinement flip guard", () => {
  // a sphere with only a small cap removed around the south pole: a disk that cannot lie flat without severe
  // distortion, where unguarded local/global steps fold triangles over near the opening
  const B = 32, S = 48, keep = 30;
  const sphere = uvSphere({ radius: 1, latitudeBands: B, longitudeSegments: S });
  const mesh = { positions: sphere.positions, triangles: sphere.triangles.slice(0, 3 * (S + 2 * S * (keep - 1))) };
  const [piece] = cutPieces(mesh, new Uint32Array());

  it("unguarded steps flip triangles here; guarded refinement never ends with more flips than LSCM", () => {
    expect(piece.topology.isDisk).toBe(true);
    const frames = triangleFrames(piece.positions, piece.triangles);
    const loops = boundaryLoops(buildHalfEdges(piece.triangles, piece.positions.length / 3));
    const order = meshVertexOrdering(piece.positions.length / 3, piece.triangles, piece.positions);
    const start = lscm(piece.positions, piece.triangles, frames, loops[0], order);
    const startFlips = countFlips(piece.triangles, start.uv);
    const unguarded = arapRefine(piece.triangles, frames, start.uv, order, { flipGuard: false });
    expect(unguarded.flipped).toBeGreaterThan(startFlips);
    const guarded = arapRefine(piece.triangles, frames, start.uv, order);
    expect(guarded.flipped).toBeLessThanOrEqual(startFlips);
    expect(countFlips(piece.triangles, guarded.uv)).toBe(guarded.flipped);
    expect(guarded.backtracks).toBeGreaterThan(0);
    // it had to stop early, and says so instead of claiming convergence
    expect(guarded.solver.converged).toBe(false);
  });

  it("flattenPiece reports the honest flip count and the refinement status", () => {
    const flat = flattenPiece(piece);
    expect(flat.metrics.flippedTriangles).toBeLessThanOrEqual(flat.lscmMetrics.flippedTriangles);
    expect(flat.metrics.flippedTriangles).toBe(countFlips(piece.triangles, flat.uv));
    expect(flat.solver.refine.converged).toBe(false);
  });
});
