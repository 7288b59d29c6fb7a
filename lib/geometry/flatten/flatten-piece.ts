import { GeometryError } from "../errors";
import type { SolverStats, StretchMetrics } from "../report-types";
import { boundaryLoops, buildHalfEdges } from "../topology/half-edge";
import type { PieceMesh } from "../topology/piece-mesh";
import { factorLdltInThread, type PendingLdlt } from "../sparse/ldlt-thread";
import { arapRefine, arapSystem, type ArapSystem } from "./arap";
import { lscm } from "./lscm";
import { stretchMetrics, triangleSingularValues } from "./stretch-metrics";
import { triangleFrames } from "./triangle-frames";
import { meshVertexOrdering } from "./vertex-ordering";

export interface FlattenPieceOptions {
  /** run the length-preserving refinement after LSCM; default true */
  refine?: boolean;
  /** refinement iteration cap; default 100 */
  maxIterations?: number;
  /** refinement stops when the relative energy change is below this; default 1e−5 */
  tolerance?: number;
  /**
   * factorise the refinement's Laplacian on a helper thread while LSCM runs, from this many vertices; default
   * 100 000 (~200k faces). Below it the factor takes under ~0.5 s, close to a thread's start-up (tsx boot, measured
   * 0.3–1.2 s on a shared 2-core machine), and on a busy machine the thread only competes with LSCM; Infinity never
   * starts one
   */
  threadFromVertices?: number;
}

export interface FlatPiece {
  /** #V×2 final flat positions, same units as the piece positions */
  uv: Float64Array;
  /** #V×2 LSCM result (scaled to the 3D area) */
  lscmUv: Float64Array;
  metrics: StretchMetrics;
  lscmMetrics: StretchMetrics;
  /** #F singular values of the final map per triangle, s1 ≥ s2 */
  triangleS1: Float64Array;
  triangleS2: Float64Array;
  solver: { lscm: SolverStats; refine: SolverStats };
}

/**
 * Flattens one disk-shaped piece: LSCM (conformal, pinned at two far-apart boundary vertices, scaled to the 3D
 * area), then as-rigid-as-possible refinement toward lengths as in 3D, with a flip guard. Reports stretch for both.
 * The uv frame is arbitrary (rotation/translation); layout is the pipeline's job.
 *
 * The two sparse factorisations are independent: the refinement's pinned cotan Laplacian depends on the 3D
 * geometry only, so on large pieces it is factorised on a second core (factorLdltInThread) while the conformal
 * (Hermitian) system is factorised here; the results are identical to the sequential order. (Preconditioning the
 * conformal system by that Laplacian instead of factorising it was measured and rejected: near-holomorphic maps
 * make L⁻¹H nearly singular, PCG took 221 iterations on 10k faces and did not reach 1e−10 in 500 on 100k.)
 *
 * @throws GeometryError BAD_PARAMETER when the piece is not a topological disk (see piece.topology.problem)
 */
export function flattenPiece(piece: PieceMesh, opts: FlattenPieceOptions = {}): FlatPiece {
  if (!piece.topology.isDisk) {
    throw new GeometryError(
      "BAD_PARAMETER",
      `Piece ${piece.label} cannot be flattened as it is: ${piece.topology.problem ?? "it is not a single disk-shaped piece."}`,
    );
  }
  const { positions, triangles } = piece;
  const nv = positions.length / 3;
  const nf = triangles.length / 3;
  if (nf === 0) throw new GeometryError("BAD_PARAMETER", `Piece ${piece.label} has no faces.`);
  const frames = triangleFrames(positions, triangles);
  const he = buildHalfEdges(triangles, nv);
  const loops = boundaryLoops(he);
  if (loops.length !== 1) {
    throw new GeometryError("BAD_PARAMETER", `Piece ${piece.label} has ${loops.length} boundary loops; flattening needs exactly one.`);
  }
  const tOrder = performance.now();
  const order = meshVertexOrdering(nv, triangles, positions);
  const orderMs = performance.now() - tOrder;
  let refinePrep: { system: ArapSystem; factor: PendingLdlt } | undefined;
  let prepMs = 0;
  if (opts.refine !== false) {
    const t = performance.now();
    const system = arapSystem(triangles, frames, order);
    refinePrep = { system, factor: factorLdltInThread(system.lap, undefined, { minUnknowns: opts.threadFromVertices ?? 100_000 }) };
    prepMs = performance.now() - t;
  }
  let conformal: ReturnType<typeof lscm>;
  try {
    conformal = lscm(positions, triangles, frames, loops[0], order);
  } catch (e) {
    refinePrep?.factor.cancel();
    throw e;
  }
  // the fill-reducing ordering is shared with the refinement; it is counted in the LSCM time
  conformal.solver.ms += orderMs;
  const s1 = new Float64Array(nf), s2 = new Float64Array(nf);
  const lscmFlips = triangleSingularValues(frames.local, triangles, conformal.uv, s1, s2);
  const lscmMetrics = stretchMetrics(s1, s2, frames.area, lscmFlips);
  if (opts.refine === false) {
    return {
      uv: Float64Array.from(conformal.uv),
      lscmUv: conformal.uv,
      metrics: lscmMetrics,
      lscmMetrics,
      triangleS1: s1,
      triangleS2: s2,
      solver: { lscm: conformal.solver, refine: { converged: true, iterations: 0, residual: 0, ms: 0 } },
    };
  }
  const refined = arapRefine(triangles, frames, conformal.uv, order, {
    maxIterations: opts.maxIterations,
    tolerance: opts.tolerance,
    prepared: refinePrep,
  });
  // assembly and symbolic analysis ran before LSCM; a threaded numeric factorisation overlaps LSCM and only
  // its remaining wait shows in the refinement's own time
  refined.solver.ms += prepMs;
  const flips = triangleSingularValues(frames.local, triangles, refined.uv, s1, s2);
  return {
    uv: refined.uv,
    lscmUv: conformal.uv,
    metrics: stretchMetrics(s1, s2, frames.area, flips),
    lscmMetrics,
    triangleS1: s1,
    triangleS2: s2,
    solver: { lscm: conformal.solver, refine: refined.solver },
  };
}
