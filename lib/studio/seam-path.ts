/**
 * Seam path finder: the shortest chain of mesh edges between two picked vertices, A* search (Hart, Nilsson &
 * Raphael 1968, "A Formal Basis for the Heuristic Determination of Minimum Cost Paths") with the straight-line
 * distance to the target as heuristic, on a binary heap over typed arrays.
 *
 * Edge cost = 3D edge length, or length × `sharpFactor` on a sharp edge when snapping to sharp edges. The heuristic
 * is the straight-line distance × min(1, sharpFactor), a lower bound of every path's cost, so A* stays exact
 * (admissible and consistent heuristic). Scratch arrays are allocated once per finder and reset with a generation
 * stamp, so a query touches only the vertices it visits.
 */
import type { StudioMesh } from "./studio-mesh";
import { MinHeap } from "./min-heap";

/** Default threshold for "sharp": the surface turns by more than this at the edge, |dihedral − 180°| in degrees.
 * Our choice: 30° of turn is a bevel of 15° per side, three times the square-cut limit of bevel-kind.ts, clearly a
 * corner of the form rather than scan noise. */
export const DEFAULT_SHARP_THRESHOLD_DEG = 30;

/** Default cost factor of a sharp edge when snapping. Our choice: a quarter of its length, so a seam follows a
 * crease even when the crease is up to four times longer than the straight way across. */
export const DEFAULT_SHARP_FACTOR = 0.25;

export interface SeamPathOptions {
  /** prefer sharp edges (snap to sharp edges); default false */
  snapToSharp?: boolean;
  /** |dihedral − 180°| above which an edge is sharp, degrees; default DEFAULT_SHARP_THRESHOLD_DEG */
  sharpThresholdDeg?: number;
  /** cost factor of a sharp edge, 0 < f ≤ 1; default DEFAULT_SHARP_FACTOR */
  sharpFactor?: number;
}

export interface SeamPath {
  /** vertex chain from `from` to `to` (one vertex when from = to) */
  vertices: Uint32Array;
  /** edge ids along the chain (vertices.length − 1) */
  edges: Uint32Array;
  /** 3D length of the chain, scan units (not the snapped cost) */
  length: number;
  /** vertices settled by the search (a measure of the work done) */
  settled: number;
}

export interface SeamPathFinder {
  /** @returns the path, or null when `to` cannot be reached from `from` (another component of the scan) */
  find(from: number, to: number, opts?: SeamPathOptions): SeamPath | null;
  /** Chain through several picked vertices in order (consecutive duplicates skipped); null if a leg is unreachable. */
  through(picks: ArrayLike<number>, opts?: SeamPathOptions): SeamPath | null;
}

export function createSeamPathFinder(sm: StudioMesh): SeamPathFinder {
  const nv = sm.vertexCount;
  const p = sm.mesh.positions;
  const { vertexEdgeOffsets: off, vertexNeighbors: nbr, vertexEdges: ved, edgeLength, dihedral } = sm;
  const g = new Float64Array(nv);
  const predEdge = new Int32Array(nv);
  const stamp = new Uint32Array(nv); // visited in generation `gen`
  const done = new Uint32Array(nv); // settled in generation `gen`
  const heap = new MinHeap(2 * sm.edgeCount + 2);
  const edgeCost = new Float64Array(sm.edgeCount);
  let costKey = ""; // options the edgeCost array was filled for
  let sharpCount = 0; // sharp edges under those options
  let gen = 0;

  const prepareCosts = (opts: SeamPathOptions): number => {
    const snap = opts.snapToSharp === true;
    const thr = opts.sharpThresholdDeg ?? DEFAULT_SHARP_THRESHOLD_DEG;
    const factor = opts.sharpFactor ?? DEFAULT_SHARP_FACTOR;
    if (snap && !(factor > 0 && factor <= 1)) throw new RangeError(`sharpFactor must be in (0, 1] (got ${factor}).`);
    if (snap && !(thr >= 0 && thr < 180)) throw new RangeError(`sharpThresholdDeg must be in [0, 180) (got ${thr}).`);
    const key = snap ? `s${thr}:${factor}` : "plain";
    if (key !== costKey) {
      sharpCount = 0;
      for (let e = 0; e < edgeCost.length; e++) {
        const sharp = snap && Math.abs(dihedral[e] - 180) > thr;
        edgeCost[e] = sharp ? edgeLength[e] * factor : edgeLength[e];
        if (sharp) sharpCount++;
      }
      costKey = key;
    }
    // with no sharp edge every cost is the length, and the full straight-line heuristic stays a lower bound
    return snap && sharpCount > 0 ? factor : 1;
  };

  const checkVertex = (v: number, what: string) => {
    if (!Number.isInteger(v) || v < 0 || v >= nv) throw new RangeError(`${what} vertex ${v} is not a vertex of the mesh (it has ${nv}).`);
  };

  const find = (from: number, to: number, opts: SeamPathOptions = {}): SeamPath | null => {
    checkVertex(from, "Start");
    checkVertex(to, "End");
    const hScale = prepareCosts(opts);
    if (from === to) return { vertices: Uint32Array.of(from), edges: new Uint32Array(0), length: 0, settled: 0 };
    if (++gen === 0xffffffff) { stamp.fill(0); done.fill(0); gen = 1; }
    const tx = p[3 * to], ty = p[3 * to + 1], tz = p[3 * to + 2];
    heap.clear();
    g[from] = 0; predEdge[from] = -1; stamp[from] = gen;
    heap.push(0, from);
    let settled = 0;
    let reached = false;
    while (heap.size > 0) {
      const v = heap.pop();
      if (done[v] === gen) continue;
      done[v] = gen;
      settled++;
      if (v === to) { reached = true; break; }
      const gv = g[v];
      for (let q = off[v], end = off[v + 1]; q < end; q++) {
        const w = nbr[q];
        if (done[w] === gen) continue;
        const e = ved[q];
        const d = gv + edgeCost[e];
        if (stamp[w] !== gen || d < g[w]) {
          stamp[w] = gen; g[w] = d; predEdge[w] = e;
          const dx = p[3 * w] - tx, dy = p[3 * w + 1] - ty, dz = p[3 * w + 2] - tz;
          heap.push(d + hScale * Math.sqrt(dx * dx + dy * dy + dz * dz), w);
        }
      }
    }
    if (!reached) return null;
    let n = 0;
    for (let v = to; v !== from; n++) { const e = predEdge[v]; v = sm.edgeLo[e] === v ? sm.edgeHi[e] : sm.edgeLo[e]; }
    const vertices = new Uint32Array(n + 1), edges = new Uint32Array(n);
    let length = 0;
    vertices[n] = to;
    for (let i = n - 1, v = to; i >= 0; i--) {
      const e = predEdge[v];
      edges[i] = e;
      length += edgeLength[e];
      v = sm.edgeLo[e] === v ? sm.edgeHi[e] : sm.edgeLo[e];
      vertices[i] = v;
    }
    return { vertices, edges, length, settled };
  };

  const through = (picks: ArrayLike<number>, opts: SeamPathOptions = {}): SeamPath | null => {
    if (picks.length === 0) throw new RangeError("A seam needs at least one picked vertex.");
    const vs: number[] = [picks[0]];
    const es: number[] = [];
    let length = 0, settled = 0;
    checkVertex(picks[0], "Picked");
    for (let i = 1; i < picks.length; i++) {
      if (picks[i] === vs[vs.length - 1]) continue;
      const leg = find(vs[vs.length - 1], picks[i], opts);
      if (!leg) return null;
      for (let k = 1; k < leg.vertices.length; k++) vs.push(leg.vertices[k]);
      for (let k = 0; k < leg.edges.length; k++) es.push(leg.edges[k]);
      length += leg.length;
      settled += leg.settled;
    }
    return { vertices: Uint32Array.from(vs), edges: Uint32Array.from(es), length, settled };
  };

  return { find, through };
}
