import type { VertexAdjacency } from "./vertex-adjacency";

/**
 * Dijkstra's shortest paths on mesh edges weighted by Euclidean length (binary heap with lazy deletion).
 *
 * @param positions #V×3 positions (edge weight = 3D length)
 * @param sources vertices at distance 0
 * @param dist #V output distances (Infinity when unreachable)
 * @param pred #V output predecessor vertex (−1 for sources and unreachable)
 * @param target optional #V flags; the search stops at the first settled vertex with target[v] ≠ 0 and returns it
 * @param blocked optional #E flags; edges with blocked[e] ≠ 0 are not crossed
 * @param settled optional #V output: vertices in the order they were settled (unused tail entries are left as is)
 * @returns the settled target vertex, or −1 (no target given or none reachable)
 */
export function dijkstra(
  adj: VertexAdjacency,
  positions: Float64Array,
  sources: ArrayLike<number>,
  dist: Float64Array,
  pred: Int32Array,
  target?: Uint8Array,
  blocked?: Uint8Array,
  settled?: Int32Array,
): number {
  const nv = dist.length;
  dist.fill(Infinity);
  pred.fill(-1);
  const cap = adj.neighbors.length + sources.length + 1;
  const heapKey = new Float64Array(cap);
  const heapVal = new Uint32Array(cap);
  let size = 0;
  const push = (key: number, v: number) => {
    let i = size++;
    while (i > 0) {
      const p = (i - 1) >> 1;
      if (heapKey[p] <= key) break;
      heapKey[i] = heapKey[p]; heapVal[i] = heapVal[p]; i = p;
    }
    heapKey[i] = key; heapVal[i] = v;
  };
  const done = new Uint8Array(nv);
  let settledCount = 0;
  for (let s = 0; s < sources.length; s++) {
    const v = sources[s];
    if (dist[v] !== 0) { dist[v] = 0; push(0, v); }
  }
  while (size > 0) {
    const key = heapKey[0], v = heapVal[0];
    // pop
    size--;
    const lk = heapKey[size], lv = heapVal[size];
    let i = 0;
    for (;;) {
      let c = 2 * i + 1;
      if (c >= size) break;
      if (c + 1 < size && heapKey[c + 1] < heapKey[c]) c++;
      if (heapKey[c] >= lk) break;
      heapKey[i] = heapKey[c]; heapVal[i] = heapVal[c]; i = c;
    }
    heapKey[i] = lk; heapVal[i] = lv;
    if (done[v] || key > dist[v]) continue;
    done[v] = 1;
    if (settled) settled[settledCount++] = v;
    if (target && target[v]) return v;
    const x = positions[3 * v], y = positions[3 * v + 1], z = positions[3 * v + 2];
    for (let p = adj.offsets[v]; p < adj.offsets[v + 1]; p++) {
      if (blocked && blocked[adj.edges[p]]) continue;
      const w = adj.neighbors[p];
      if (done[w]) continue;
      const dx = positions[3 * w] - x, dy = positions[3 * w + 1] - y, dz = positions[3 * w + 2] - z;
      const d = key + Math.sqrt(dx * dx + dy * dy + dz * dz);
      if (d < dist[w]) { dist[w] = d; pred[w] = v; push(d, w); }
    }
  }
  return -1;
}

/** Vertex chain from a source to `v` following `pred` (source first). */
export function tracePath(pred: Int32Array, v: number): number[] {
  const path: number[] = [];
  for (let u = v; u !== -1; u = pred[u]) path.push(u);
  return path.reverse();
}
