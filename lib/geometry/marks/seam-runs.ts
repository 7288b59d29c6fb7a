/**
 * Seam runs: maximal chains of consecutive seam edges between the same two pieces. A chain is split at vertices
 * where the seam branches (three or more seam edges meet), ends (one seam edge, e.g. on the mesh border) or where
 * the piece on either side changes. Each run gets one id (1-based) shared by the two pieces on its sides; a seam
 * inside one piece (a slit or a dart) is a run with the same piece on both sides.
 */
import type { SeamEdgeFaces } from "./seam-edge-faces";

export interface SeamRuns {
  count: number;
  /** #runs+1 offsets into `edges` / `forward` */
  edgeStart: Uint32Array;
  /** seam edge indices (into SeamEdgeFaces) in walking order */
  edges: Uint32Array;
  /** 1 when the walk goes a→b along the edge, 0 when b→a */
  forward: Uint8Array;
  /** #runs piece index left / right of the walking direction (seen from outside) */
  pieceL: Int32Array;
  pieceR: Int32Array;
  /** #runs 1 when the run is a closed loop (its last vertex is its first) */
  closed: Uint8Array;
}

/**
 * @param sef          seam edges with their faces
 * @param facePiece    working face → piece index (−1: none)
 * @param vertexCount  #V of the working mesh
 */
export function buildSeamRuns(sef: SeamEdgeFaces, facePiece: Int32Array, vertexCount: number): SeamRuns {
  const m = sef.count;
  const usable = new Uint8Array(m);
  const deg = new Uint32Array(vertexCount + 1);
  for (let e = 0; e < m; e++) {
    const f1 = sef.faceAB[e], f2 = sef.faceBA[e];
    if (f1 < 0 || f2 < 0 || facePiece[f1] < 0 || facePiece[f2] < 0) continue;
    usable[e] = 1;
    deg[sef.a[e] + 1]++;
    deg[sef.b[e] + 1]++;
  }
  // CSR adjacency vertex → incident usable seam edges
  for (let v = 0; v < vertexCount; v++) deg[v + 1] += deg[v];
  const adjStart = deg;
  const fill = new Uint32Array(vertexCount);
  const adj = new Uint32Array(adjStart[vertexCount]);
  for (let e = 0; e < m; e++) {
    if (!usable[e]) continue;
    const u = sef.a[e], v = sef.b[e];
    adj[adjStart[u] + fill[u]++] = e;
    adj[adjStart[v] + fill[v]++] = e;
  }
  const pairKey = (e: number): number => {
    const p = facePiece[sef.faceAB[e]], q = facePiece[sef.faceBA[e]];
    return p < q ? p * 1_000_003 + q : q * 1_000_003 + p;
  };
  const isBreak = (v: number): boolean => {
    const s = adjStart[v], n = adjStart[v + 1] - s;
    return n !== 2 || pairKey(adj[s]) !== pairKey(adj[s + 1]);
  };

  const visited = new Uint8Array(m);
  const runs: { edges: number[]; forward: number[]; closed: boolean }[] = [];
  const walk = (start: number, firstEdge: number): void => {
    const edges: number[] = [], forward: number[] = [];
    let v = start, e = firstEdge;
    for (;;) {
      visited[e] = 1;
      const fwd = sef.a[e] === v ? 1 : 0;
      edges.push(e);
      forward.push(fwd);
      const w = fwd ? sef.b[e] : sef.a[e];
      if (w === start || isBreak(w)) break;
      const s = adjStart[w];
      const next = adj[s] === e ? adj[s + 1] : adj[s];
      if (visited[next]) break;
      v = w;
      e = next;
    }
    const last = edges[edges.length - 1];
    const end = forward[forward.length - 1] ? sef.b[last] : sef.a[last];
    runs.push({ edges, forward, closed: end === start });
  };
  for (let v = 0; v < vertexCount; v++) {
    if (adjStart[v + 1] === adjStart[v] || !isBreak(v)) continue;
    for (let i = adjStart[v]; i < adjStart[v + 1]; i++) if (!visited[adj[i]]) walk(v, adj[i]);
  }
  // Remaining edges form closed loops without a break vertex; start each at its smallest vertex id, heading to the
  // smaller of its two neighbours, so the result does not depend on the order of the seam list.
  for (let v = 0; v < vertexCount; v++) {
    const s = adjStart[v];
    if (adjStart[v + 1] - s !== 2 || visited[adj[s]]) continue;
    const e0 = adj[s], e1 = adj[s + 1];
    const o0 = sef.a[e0] === v ? sef.b[e0] : sef.a[e0], o1 = sef.a[e1] === v ? sef.b[e1] : sef.a[e1];
    walk(v, o0 <= o1 ? e0 : e1);
  }

  const pieceOf = (r: { edges: number[]; forward: number[] }, left: boolean): number => {
    const e = r.edges[0];
    const fL = r.forward[0] ? sef.faceAB[e] : sef.faceBA[e];
    const fR = r.forward[0] ? sef.faceBA[e] : sef.faceAB[e];
    return facePiece[left ? fL : fR];
  };
  const firstVertex = (r: { edges: number[]; forward: number[] }): number => (r.forward[0] ? sef.a[r.edges[0]] : sef.b[r.edges[0]]);
  const order = runs.map((r, i) => ({ r, i, lo: Math.min(pieceOf(r, true), pieceOf(r, false)), hi: Math.max(pieceOf(r, true), pieceOf(r, false)), v: firstVertex(r) }));
  order.sort((x, y) => x.lo - y.lo || x.hi - y.hi || x.v - y.v || x.i - y.i);

  const count = runs.length;
  let total = 0;
  for (const r of runs) total += r.edges.length;
  const out: SeamRuns = {
    count,
    edgeStart: new Uint32Array(count + 1),
    edges: new Uint32Array(total),
    forward: new Uint8Array(total),
    pieceL: new Int32Array(count),
    pieceR: new Int32Array(count),
    closed: new Uint8Array(count),
  };
  let k = 0;
  order.forEach(({ r }, i) => {
    out.edgeStart[i] = k;
    for (let j = 0; j < r.edges.length; j++, k++) {
      out.edges[k] = r.edges[j];
      out.forward[k] = r.forward[j];
    }
    out.pieceL[i] = pieceOf(r, true);
    out.pieceR[i] = pieceOf(r, false);
    out.closed[i] = r.closed ? 1 : 0;
  });
  out.edgeStart[count] = k;
  return out;
}

/**
 * Working vertex ids along run r in walking order (#edges+1 entries; a closed run repeats its first vertex last).
 */
export function runVertices(runs: SeamRuns, sef: SeamEdgeFaces, r: number): Uint32Array {
  const s = runs.edgeStart[r], n = runs.edgeStart[r + 1] - s;
  const out = new Uint32Array(n + 1);
  for (let i = 0; i < n; i++) {
    const e = runs.edges[s + i];
    const fwd = runs.forward[s + i];
    out[i] = fwd ? sef.a[e] : sef.b[e];
    out[i + 1] = fwd ? sef.b[e] : sef.a[e];
  }
  return out;
}

/** Face left (side 0) or right (side 1) of the k-th edge of the walk. */
export function runEdgeFace(runs: SeamRuns, sef: SeamEdgeFaces, k: number, side: 0 | 1): number {
  const e = runs.edges[k];
  const leftIsAB = runs.forward[k] === 1;
  return (side === 0) === leftIsAB ? sef.faceAB[e] : sef.faceBA[e];
}
