/**
 * Half-edge connectivity of a triangle mesh as flat parallel arrays.
 *
 * Half-edges come in pairs: edge e owns half-edges 2e and 2e + 1, so the twin of h is h ^ 1. A half-edge whose
 * face is −1 is a boundary half-edge; its `next` follows the boundary loop (the hole lies on its left, like a face).
 * Built in O(#F) expected time with an open-addressing hash on undirected edge keys.
 *
 * Non-manifold input never throws: a third (fourth, …) face on an edge, or a second face that runs the edge in the
 * same direction as the first (inconsistent orientation), gets its own edge pair whose twin is a boundary
 * half-edge, i.e. it becomes a separate sheet along that edge. Such edges are counted in `nonManifoldEdges` /
 * `orientationConflicts` and listed in `irregularEdges`.
 */
export interface HalfEdgeMesh {
  vertexCount: number;
  faceCount: number;
  /** number of edges; half-edges = 2·edgeCount */
  edgeCount: number;
  /** #H origin vertex of each half-edge */
  vertex: Uint32Array;
  /** #H face of each half-edge, −1 on the boundary */
  face: Int32Array;
  /** #H next half-edge around the same face (or along the same boundary loop) */
  next: Uint32Array;
  /** #H corner id 3f + k of the half-edge's origin in its face (−1 on the boundary) */
  corner: Int32Array;
  /** #F×3 half-edge leaving corner k of face f (from triangles[3f+k] to triangles[3f+(k+1)%3]) */
  faceHalfEdge: Uint32Array;
  /** edges that carried more than two faces (each extra face counted once) */
  nonManifoldEdges: number;
  /** edges whose two faces ran them in the same direction (inconsistent orientation) */
  orientationConflicts: number;
  /** vertex pairs (2 per entry) of the edges counted above */
  irregularEdges: Uint32Array;
}

function hashPair(lo: number, hi: number, mask: number): number {
  return ((Math.imul(lo, 0x9e3779b1) ^ Math.imul(hi + 0x7f4a7c15, 0x85ebca77)) >>> 0) & mask;
}

/**
 * @param triangles #F×3 vertex indices
 * @param vertexCount #V (indices must be < #V)
 */
export function buildHalfEdges(triangles: Uint32Array, vertexCount: number): HalfEdgeMesh {
  const nf = triangles.length / 3;
  const maxH = 6 * nf;
  const vertex = new Uint32Array(maxH);
  const face = new Int32Array(maxH).fill(-1);
  const next = new Uint32Array(maxH);
  const corner = new Int32Array(maxH).fill(-1);
  const faceHalfEdge = new Uint32Array(3 * nf);
  let cap = 1;
  while (cap < 2 * 3 * nf + 2) cap <<= 1;
  const mask = cap - 1;
  const tLo = new Int32Array(cap).fill(-1);
  const tHi = new Int32Array(cap);
  const tEdge = new Int32Array(cap);
  let ne = 0;
  let nonManifold = 0;
  let conflicts = 0;
  const irregular: number[] = [];

  for (let f = 0; f < nf; f++) {
    for (let k = 0; k < 3; k++) {
      const a = triangles[3 * f + k];
      const b = triangles[3 * f + (k === 2 ? 0 : k + 1)];
      const lo = a < b ? a : b;
      const hi = a < b ? b : a;
      let slot = hashPair(lo, hi, mask);
      while (tLo[slot] !== -1 && !(tLo[slot] === lo && tHi[slot] === hi)) slot = (slot + 1) & mask;
      let h = -1;
      if (tLo[slot] === -1) {
        tLo[slot] = lo; tHi[slot] = hi; tEdge[slot] = ne;
      } else {
        const e = tEdge[slot];
        const t = 2 * e + 1;
        if (face[t] === -1 && vertex[2 * e] === b) {
          h = t;
        } else {
          if (face[t] === -1) conflicts++; else nonManifold++;
          irregular.push(a, b);
        }
      }
      if (h === -1) {
        const e = ne++;
        h = 2 * e;
        vertex[h] = a;
        vertex[h + 1] = b;
      }
      face[h] = f;
      corner[h] = 3 * f + k;
      faceHalfEdge[3 * f + k] = h;
    }
    const h0 = faceHalfEdge[3 * f], h1 = faceHalfEdge[3 * f + 1], h2 = faceHalfEdge[3 * f + 2];
    next[h0] = h1; next[h1] = h2; next[h2] = h0;
  }
  const nh = 2 * ne;
  // boundary `next`: rotate around the head vertex through faces until the next boundary half-edge
  for (let h = 0; h < nh; h++) {
    if (face[h] !== -1) continue;
    let g = h ^ 1;
    let guard = 0;
    for (;;) {
      const p = next[next[g]]; // half-edge entering the head vertex inside g's face
      const q = p ^ 1;
      if (face[q] === -1) { next[h] = q; break; }
      g = q;
      if (++guard > nh) { next[h] = h ^ 1; break; }
    }
  }
  return {
    vertexCount,
    faceCount: nf,
    edgeCount: ne,
    vertex: vertex.slice(0, nh),
    face: face.slice(0, nh),
    next: next.slice(0, nh),
    corner: corner.slice(0, nh),
    faceHalfEdge,
    nonManifoldEdges: nonManifold,
    orientationConflicts: conflicts,
    irregularEdges: new Uint32Array(irregular),
  };
}

/** Number of boundary loops (cycles of boundary half-edges). */
export function countBoundaryLoops(he: HalfEdgeMesh): number {
  const nh = 2 * he.edgeCount;
  const seen = new Uint8Array(nh);
  let loops = 0;
  for (let h = 0; h < nh; h++) {
    if (he.face[h] !== -1 || seen[h]) continue;
    loops++;
    let g = h;
    let guard = 0;
    while (!seen[g] && guard++ <= nh) { seen[g] = 1; g = he.next[g]; }
  }
  return loops;
}

/** Boundary loops as vertex chains (origin of each boundary half-edge in loop order). */
export function boundaryLoops(he: HalfEdgeMesh): Uint32Array[] {
  const nh = 2 * he.edgeCount;
  const seen = new Uint8Array(nh);
  const out: Uint32Array[] = [];
  const buf: number[] = [];
  for (let h = 0; h < nh; h++) {
    if (he.face[h] !== -1 || seen[h]) continue;
    buf.length = 0;
    let g = h;
    let guard = 0;
    while (!seen[g] && guard++ <= nh) { seen[g] = 1; buf.push(he.vertex[g]); g = he.next[g]; }
    out.push(new Uint32Array(buf));
  }
  return out;
}
