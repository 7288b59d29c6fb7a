/**
 * Seam path finder: the shortest chain of mesh edges between two picked vertices. Bidirectional A* search with
 * the average potential π(v) = (|v − t| − |v − s|)/2 (Ikeda et al. 1994, "A fast algorithm for finding better routes
 * by AI search techniques"; Goldberg & Harrelson 2005, "Computing the shortest path: A* search meets graph theory"):
 * both searches run Dijkstra on the same reduced edge costs c − π(v) + π(w) ≥ 0 and stop when the sum of their
 * smallest keys reaches the best path found, which is then exact. Measured on 200k-face meshes
 * (tests/studio/time-studio.ts) it settles fewer vertices than one-sided A* when snapping (about 30k instead of 38k
 * corner to corner on a cube); between opposite points of a sphere any search settles nearly the whole mesh, since
 * every direction is almost as short. Binary heaps over typed arrays.
 *
 * Edge cost = 3D edge length, or length × `sharpFactor` on a sharp edge when snapping to sharp edges. The
 * straight-line distances in π are scaled by sharpFactor when some edge is sharp, so they stay lower bounds of every
 * path's cost (consistent heuristics, hence exact). Scratch arrays are allocated once per finder and reset with a generation
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
  // forward (from the start) and reverse (from the end) labels: distance, predecessor edge, generation stamps
  const gF = new Float64Array(nv), gR = new Float64Array(nv);
  const predF = new Int32Array(nv), predR = new Int32Array(nv);
  const stampF = new Uint32Array(nv), stampR = new Uint32Array(nv); // labelled in generation `gen`
  const doneF = new Uint32Array(nv), doneR = new Uint32Array(nv); // settled in generation `gen`
  const heapF = new MinHeap(2 * sm.edgeCount + 2), heapR = new MinHeap(2 * sm.edgeCount + 2);
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
    if (++gen === 0xffffffff) { stampF.fill(0); stampR.fill(0); doneF.fill(0); doneR.fill(0); gen = 1; }
    const sx = p[3 * from], sy = p[3 * from + 1], sz = p[3 * from + 2];
    const tx = p[3 * to], ty = p[3 * to + 1], tz = p[3 * to + 2];
    /** forward potential π(v) = (|v − t| − |v − s|)/2 × scale; the reverse search uses −π */
    const pot = (w: number): number => {
      const ax = p[3 * w] - tx, ay = p[3 * w + 1] - ty, az = p[3 * w + 2] - tz;
      const bx = p[3 * w] - sx, by = p[3 * w + 1] - sy, bz = p[3 * w + 2] - sz;
      return 0.5 * hScale * (Math.sqrt(ax * ax + ay * ay + az * az) - Math.sqrt(bx * bx + by * by + bz * bz));
    };
    heapF.clear(); heapR.clear();
    gF[from] = 0; predF[from] = -1; stampF[from] = gen; heapF.push(pot(from), from);
    gR[to] = 0; predR[to] = -1; stampR[to] = gen; heapR.push(-pot(to), to);
    let best = Infinity, meetV = -1, meetW = -1, meetE = -1; // best s–t path found: s … v –e– w … t
    let settled = 0;
    while (heapF.size > 0 && heapR.size > 0) {
      if (heapF.topKey() + heapR.topKey() >= best) break;
      const forward = heapF.size <= heapR.size;
      const heap = forward ? heapF : heapR;
      const g = forward ? gF : gR, pred = forward ? predF : predR, stamp = forward ? stampF : stampR, done = forward ? doneF : doneR;
      const gO = forward ? gR : gF, stampO = forward ? stampR : stampF;
      const sign = forward ? 1 : -1;
      const v = heap.pop();
      if (done[v] === gen) continue;
      done[v] = gen;
      settled++;
      const gv = g[v];
      for (let q = off[v], end = off[v + 1]; q < end; q++) {
        const w = nbr[q];
        const e = ved[q];
        const d = gv + edgeCost[e];
        // every scanned edge whose far end the other search has labelled closes an s–t path
        if (stampO[w] === gen && d + gO[w] < best) {
          best = d + gO[w];
          if (forward) { meetV = v; meetW = w; } else { meetV = w; meetW = v; }
          meetE = e;
        }
        if (done[w] === gen) continue;
        if (stamp[w] !== gen || d < g[w]) {
          stamp[w] = gen; g[w] = d; pred[w] = e;
          heap.push(d + sign * pot(w), w);
        }
      }
    }
    if (meetE < 0) return null;
    // s … meetV (forward labels), meetV –meetE– meetW, meetW … t (reverse labels)
    let nf = 0, nr = 0;
    for (let v = meetV; v !== from; nf++) { const e = predF[v]; v = sm.edgeLo[e] === v ? sm.edgeHi[e] : sm.edgeLo[e]; }
    for (let v = meetW; v !== to; nr++) { const e = predR[v]; v = sm.edgeLo[e] === v ? sm.edgeHi[e] : sm.edgeLo[e]; }
    const n = nf + 1 + nr;
    const vertices = new Uint32Array(n + 1), edges = new Uint32Array(n);
    vertices[nf] = meetV;
    for (let i = nf - 1, v = meetV; i >= 0; i--) {
      const e = predF[v];
      edges[i] = e;
      v = sm.edgeLo[e] === v ? sm.edgeHi[e] : sm.edgeLo[e];
      vertices[i] = v;
    }
    edges[nf] = meetE;
    vertices[nf + 1] = meetW;
    for (let i = nf + 1, v = meetW; v !== to; i++) {
      const e = predR[v];
      edges[i] = e;
      v = sm.edgeLo[e] === v ? sm.edgeHi[e] : sm.edgeLo[e];
      vertices[i + 1] = v;
    }
    let length = 0;
    for (let i = 0; i < n; i++) length += edgeLength[edges[i]];
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
