/**
 * A fast estimate, per piece, of how far the piece must stretch to lie flat, and where.
 *
 * Gaussian curvature is the obstruction to flattening without stretch (Source: Gauss's Theorema Egregium: an
 * isometry preserves K, and the plane has K = 0). Discretely, K at an interior vertex integrates to its angle defect
 * 2π − Σ corner angles (Source: Meyer, Desbrun, Schröder & Barr, "Discrete Differential-Geometry Operators for
 * Triangulated 2-Manifolds", VisMath 2002; lib/geometry/analysis/angle-defect.ts). How much stretch that curvature
 * forces grows with the size of the region it sits in: a geodesic disc of radius r on a surface of curvature K has
 * circumference C = 2πr(1 − K r²/6 + O(r⁴)) (Source: Bertrand–Diguet–Puiseux theorem, 1848:
 * K = lim_{r→0} 3(2πr − C(r))/(π r³)), so laying the largest disc around a vertex v flat
 * with its radius kept changes the rim length by the fraction
 *
 *     ε(v) = |K(v)| · d(v)² / 6,
 *
 * d(v) = distance from v to the piece's boundary along mesh edges (multi-source Dijkstra from every boundary and
 * seam vertex). K(v) = |Σ defect| / Σ vertex area over a few rings around v (box filter, `smoothingRounds` passes),
 * so scan noise of alternating sign cancels. The piece's estimate is the largest ε(v) over its interior vertices; that
 * vertex is its "tip" (where curvature has accumulated farthest from any cut), and the shortest edge path from the
 * boundary to it is where a dart relieves it: after the dart, d shrinks around the tip.
 *
 * The estimate is a screening number, not the flattening's result (the flattening spreads the error between
 * directions and reports the real stretch); tests/studio compares it with flattenPiece on spherical caps.
 */
import { angleDefect } from "@/lib/geometry/analysis/angle-defect";
import type { LivePieces } from "./live-pieces";
import { MinHeap } from "./min-heap";
import type { StudioMesh } from "./studio-mesh";

/** Box-filter passes over the vertex rings before taking K. Our choice: 3 rings average out scan noise of a few
 * triangles while a 200k-face prop keeps its features. */
export const DEFAULT_SMOOTHING_ROUNDS = 3;

export interface PieceStretchEstimate {
  piece: number;
  label: string;
  isDisk: boolean;
  /** Σ |angle defect| of the piece's interior vertices, radians (0 for a developable piece) */
  totalCurvature: number;
  /** largest ε(v), fraction (0.05 = 5 %); 0 for a piece with no interior vertex; NaN for a closed piece */
  estimatedStretch: number;
  /** vertex where ε is largest, −1 when none */
  tip: number;
  /** d(tip), scan units */
  tipDistance: number;
  /** shortest edge path from the boundary to the tip (boundary vertex first), empty when tip = −1 */
  dartPath: Uint32Array;
}

export interface StretchEstimator {
  /** @param onSeam #E seam flags the pieces were computed from */
  estimate(live: LivePieces, onSeam: Uint8Array, opts?: { smoothingRounds?: number }): PieceStretchEstimate[];
}

export function createStretchEstimator(sm: StudioMesh): StretchEstimator {
  const nv = sm.vertexCount, nf = sm.faceCount;
  const { positions: p, triangles: t } = sm.mesh;
  const defect = angleDefect(sm.mesh).perVertex;
  const area = new Float64Array(nv); // barycentric vertex area: a third of each incident face
  for (let f = 0; f < nf; f++) {
    const a = 3 * t[3 * f], b = 3 * t[3 * f + 1], c = 3 * t[3 * f + 2];
    const ux = p[b] - p[a], uy = p[b + 1] - p[a + 1], uz = p[b + 2] - p[a + 2];
    const vx = p[c] - p[a], vy = p[c + 1] - p[a + 1], vz = p[c + 2] - p[a + 2];
    const ar = Math.hypot(uy * vz - uz * vy, uz * vx - ux * vz, ux * vy - uy * vx) / 6;
    area[t[3 * f]] += ar; area[t[3 * f + 1]] += ar; area[t[3 * f + 2]] += ar;
  }
  const boundary = new Uint8Array(nv);
  const pieceOf = new Int32Array(nv);
  const d0 = new Float64Array(nv), d1 = new Float64Array(nv), a0 = new Float64Array(nv), a1 = new Float64Array(nv);
  const dist = new Float64Array(nv);
  const pred = new Int32Array(nv);
  const heap = new MinHeap(2 * sm.edgeCount + nv + 1);
  const { vertexEdgeOffsets: off, vertexNeighbors: nbr, vertexEdges: ved, edgeLength, edgeFaces, edgeLo, edgeHi } = sm;

  const estimate = (live: LivePieces, onSeam: Uint8Array, opts: { smoothingRounds?: number } = {}): PieceStretchEstimate[] => {
    const rounds = opts.smoothingRounds ?? DEFAULT_SMOOTHING_ROUNDS;
    boundary.fill(0);
    for (let e = 0; e < sm.edgeCount; e++) {
      if (onSeam[e] || edgeFaces[e] !== 2 || Number.isNaN(sm.dihedral[e])) { boundary[edgeLo[e]] = 1; boundary[edgeHi[e]] = 1; }
    }
    pieceOf.fill(-1);
    for (let f = 0; f < nf; f++) for (let k = 0; k < 3; k++) pieceOf[t[3 * f + k]] = live.facePiece[f];
    // smoothed defect and area; boundary vertices hold defect 0 and their own area, so nothing leaks across seams
    for (let v = 0; v < nv; v++) { d0[v] = boundary[v] ? 0 : defect[v]; a0[v] = area[v]; }
    let D = d0, A = a0, Dn = d1, An = a1;
    for (let r = 0; r < rounds; r++) {
      for (let v = 0; v < nv; v++) {
        if (boundary[v]) { Dn[v] = 0; An[v] = area[v]; continue; }
        let sd = D[v], sa = A[v];
        for (let q = off[v]; q < off[v + 1]; q++) { sd += D[nbr[q]]; sa += A[nbr[q]]; }
        Dn[v] = sd; An[v] = sa;
      }
      [D, Dn] = [Dn, D];
      [A, An] = [An, A];
    }
    // distance to the boundary within each piece (seam edges are not crossed)
    dist.fill(Infinity);
    pred.fill(-1);
    heap.clear();
    for (let v = 0; v < nv; v++) if (boundary[v]) { dist[v] = 0; heap.push(0, v); }
    while (heap.size > 0) {
      const key = heap.topKey();
      const v = heap.pop();
      if (key > dist[v]) continue;
      for (let q = off[v]; q < off[v + 1]; q++) {
        const e = ved[q];
        if (onSeam[e]) continue;
        const w = nbr[q];
        const nd = key + edgeLength[e];
        if (nd < dist[w]) { dist[w] = nd; pred[w] = v; heap.push(nd, w); }
      }
    }
    const out: PieceStretchEstimate[] = [];
    const best = new Float64Array(live.count), tip = new Int32Array(live.count).fill(-1), total = new Float64Array(live.count);
    const hasInterior = new Uint8Array(live.count);
    for (let v = 0; v < nv; v++) {
      const pc = pieceOf[v];
      if (pc < 0 || boundary[v]) continue;
      hasInterior[pc] = 1;
      total[pc] += Math.abs(defect[v]);
      const d = dist[v];
      if (d === Infinity || !(A[v] > 0)) continue;
      const eps = (Math.abs(D[v]) / A[v]) * d * d / 6;
      if (eps > best[pc] || tip[pc] < 0) { best[pc] = eps; tip[pc] = v; }
    }
    for (let pc = 0; pc < live.count; pc++) {
      const closed = live.boundaryLoops[pc] === 0;
      const v = closed ? -1 : tip[pc];
      const chain: number[] = [];
      for (let u = v; u !== -1; u = pred[u]) chain.push(u);
      out.push({
        piece: pc,
        label: live.labels[pc],
        isDisk: live.isDisk[pc] === 1,
        totalCurvature: total[pc],
        estimatedStretch: closed && hasInterior[pc] ? NaN : v < 0 ? 0 : best[pc],
        tip: v,
        tipDistance: v < 0 ? 0 : dist[v],
        dartPath: Uint32Array.from(chain.reverse()),
      });
    }
    return out;
  };
  return { estimate };
}
