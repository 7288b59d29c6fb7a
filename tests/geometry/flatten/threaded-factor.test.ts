import { describe, expect, it } from "vitest";
import { flatGrid } from "@/lib/geometry/shapes/flat-grid";
import { uvSphere } from "@/lib/geometry/shapes/uv-sphere";
import { cutPieces } from "@/lib/geometry/topology/cut-pieces";
import { flattenPiece } from "@/lib/geometry/flatten/flatten-piece";

describe("refinement factorised on a helper thread", () => {
  // a bumped sheet (the benchmark's shape, small) and a sphere cap: the refinement does real work on both
  const sheet = cutPieces(flatGrid({ faces: 4000, size: 1000, bump: 150 }), new Uint32Array())[0];
  const sphere = uvSphere({ radius: 1, latitudeBands: 24, longitudeSegments: 32 });
  const cap = cutPieces({ positions: sphere.positions, triangles: sphere.triangles.slice(0, 3 * (32 + 2 * 32 * 15)) }, new Uint32Array())[0];

  for (const [name, piece] of [["bumped sheet", sheet], ["sphere cap", cap]] as const) {
    it(`gives exactly the sequential result: ${name}`, () => {
      const seq = flattenPiece(piece, { threadFromVertices: Infinity });
      const par = flattenPiece(piece, { threadFromVertices: 0 });
      expect(par.solver.refine.iterations).toBe(seq.solver.refine.iterations);
      expect(par.solver.refine.converged).toBe(seq.solver.refine.converged);
      expect(par.solver.refine.residual).toBe(seq.solver.refine.residual);
      expect(Array.from(par.uv)).toEqual(Array.from(seq.uv));
      expect(Array.from(par.lscmUv)).toEqual(Array.from(seq.lscmUv));
    });
  }
});
