import { dijkstra, tracePath } from "./shortest-paths";
import type { HalfEdgeMesh } from "./half-edge";
import { vertexAdjacency, type VertexAdjacency } from "./vertex-adjacency";

export interface CutSuggestion {
  problem: string;
  /** working vertex id pairs, null when no cut could be suggested */
  cut: [number, number][] | null;
}

const NUMBER_WORDS = ["zero", "one", "two", "three", "four", "five", "six", "seven", "eight", "nine", "ten"];
const countWord = (n: number) => (n < NUMBER_WORDS.length ? NUMBER_WORDS[n] : String(n));

/**
 * A sentence and a seam suggestion that would turn a non-disk piece into a disk. All paths are shortest edge
 * paths (Dijkstra on 3D edge lengths).
 * - closed genus 0: a seam between two far-apart vertices (double sweep: farthest from vertex 0, then farthest
 *   from that one);
 * - genus 0 with k ≥ 2 boundary loops: k − 1 shortest connections forming a spanning tree of the loops;
 * - genus ≥ 1: a tree–cotree cut graph (Eppstein 2003, "Dynamic generators of topologically embedded graphs";
 *   Erickson & Whittlesey 2005, "Greedy optimal homotopy and homology generators"), with the primal tree a shortest
 *   path tree so the loops are short, pruned of dangling branches. Not guaranteed shortest.
 *
 * @param loops boundary loops as local vertex chains
 * @param vertexIds local → working vertex ids
 */
export function suggestCut(
  he: HalfEdgeMesh,
  positions: Float64Array,
  loops: Uint32Array[],
  genus: number,
  vertexIds: Uint32Array,
): CutSuggestion {
  const nv = he.vertexCount;
  const adj = vertexAdjacency(he);
  const dist = new Float64Array(nv);
  const pred = new Int32Array(nv);
  const w = (v: number) => vertexIds[v];
  const toPairs = (path: number[], out: [number, number][]) => {
    for (let i = 0; i + 1 < path.length; i++) out.push([w(path[i]), w(path[i + 1])]);
  };
  if (genus > 0) {
    const cut = treeCotreeCut(he, adj, positions, dist, pred);
    const pairs: [number, number][] = cut.map(([a, b]) => [w(a), w(b)]);
    const shown = Array.from(new Set(cut.flat())).slice(0, 4).map(w).join(", ");
    const loopNote = loops.length > 0 ? ` and join its ${countWord(loops.length)} boundary loop${loops.length > 1 ? "s" : ""} to it` : "";
    return {
      problem:
        `handle (genus ${genus}): add a seam around each handle${loopNote}, for example along the suggested cut ` +
        `through vertices ${shown}${pairs.length === 0 ? "" : ` (${pairs.length} edges)`}.`,
      cut: pairs.length > 0 ? pairs : null,
    };
  }
  if (loops.length === 0) {
    dijkstra(adj, positions, [0], dist, pred);
    const a = argmaxFinite(dist);
    dijkstra(adj, positions, [a], dist, pred);
    const b = argmaxFinite(dist);
    const path = tracePath(pred, b);
    const pairs: [number, number][] = [];
    toPairs(path, pairs);
    return {
      problem: `closed surface: add a seam from vertex ${w(a)} to vertex ${w(b)} so the piece can open out flat.`,
      cut: pairs.length > 0 ? pairs : null,
    };
  }
  // genus 0, k ≥ 2 loops: shortest connections between loops, chosen as a minimum spanning tree over the
  // Voronoi regions of the loops (one multi-source Dijkstra; Mehlhorn 1988, "A faster approximation algorithm for
  // the Steiner problem in graphs"), so many holes cost O(n log n), not one search per hole
  const k = loops.length;
  const loopOf = new Int32Array(nv).fill(-1);
  const sources: number[] = [];
  loops.forEach((loop, i) => loop.forEach((v) => { loopOf[v] = i; sources.push(v); }));
  const settled = new Int32Array(nv).fill(-1);
  dijkstra(adj, positions, sources, dist, pred, undefined, undefined, settled);
  const region = new Int32Array(nv).fill(-1);
  for (let s = 0; s < nv && settled[s] >= 0; s++) {
    const v = settled[s];
    region[v] = pred[v] < 0 ? loopOf[v] : region[pred[v]];
  }
  const cand: { cost: number; a: number; b: number }[] = [];
  for (let e = 0; e < he.edgeCount; e++) {
    const a = he.vertex[2 * e], b = he.vertex[2 * e + 1];
    if (region[a] < 0 || region[b] < 0 || region[a] === region[b]) continue;
    const dx = positions[3 * a] - positions[3 * b], dy = positions[3 * a + 1] - positions[3 * b + 1], dz = positions[3 * a + 2] - positions[3 * b + 2];
    cand.push({ cost: dist[a] + dist[b] + Math.sqrt(dx * dx + dy * dy + dz * dz), a, b });
  }
  cand.sort((x, y) => x.cost - y.cost);
  const parent = Int32Array.from({ length: k }, (_, i) => i);
  const root = (x: number): number => { while (parent[x] !== x) { parent[x] = parent[parent[x]]; x = parent[x]; } return x; };
  const pairs: [number, number][] = [];
  const links: string[] = [];
  for (const c of cand) {
    const ra = root(region[c.a]), rb = root(region[c.b]);
    if (ra === rb) continue;
    parent[ra] = rb;
    const path = tracePath(pred, c.a).concat(tracePath(pred, c.b).reverse());
    toPairs(path, pairs);
    links.push(`from vertex ${w(path[0])} to vertex ${w(path[path.length - 1])}`);
    if (links.length === k - 1) break;
  }
  const shown = links.slice(0, 3).join(", ") + (links.length > 3 ? ` and ${links.length - 3} more` : "");
  return {
    problem:
      k === 2
        ? `two boundary loops: join them with a seam ${links[0] ?? ""}.`
        : `${countWord(k)} boundary loops: join them with seams ${shown}.`,
    cut: pairs.length > 0 ? pairs : null,
  };
}

function argmaxFinite(d: Float64Array): number {
  let best = 0, bv = -1;
  for (let i = 0; i < d.length; i++) if (d[i] !== Infinity && d[i] > bv) { bv = d[i]; best = i; }
  return best;
}

/** Edges (local vertex pairs) of a pruned tree–cotree cut graph; boundary vertices are never pruned. */
function treeCotreeCut(
  he: HalfEdgeMesh,
  adj: VertexAdjacency,
  positions: Float64Array,
  dist: Float64Array,
  pred: Int32Array,
): [number, number][] {
  const nv = he.vertexCount, ne = he.edgeCount, nf = he.faceCount;
  dijkstra(adj, positions, [0], dist, pred);
  const inTree = new Uint8Array(ne);
  for (let v = 0; v < nv; v++) {
    const p = pred[v];
    if (p < 0) continue;
    for (let q = adj.offsets[v]; q < adj.offsets[v + 1]; q++) if (adj.neighbors[q] === p) { inTree[adj.edges[q]] = 1; break; }
  }
  // dual spanning tree over faces, never crossing the primal tree
  const candidate = new Uint8Array(ne);
  const seenFace = new Uint8Array(nf);
  const queue = new Int32Array(nf);
  for (let e = 0; e < ne; e++) if (he.face[2 * e] >= 0 && he.face[2 * e + 1] >= 0) candidate[e] = 1;
  for (let start = 0; start < nf; start++) {
    if (seenFace[start]) continue;
    let qh = 0, qt = 0;
    queue[qt++] = start; seenFace[start] = 1;
    while (qh < qt) {
      const f = queue[qh++];
      for (let k = 0; k < 3; k++) {
        const h = he.faceHalfEdge[3 * f + k];
        const e = h >> 1;
        const g = he.face[h ^ 1];
        if (g < 0 || inTree[e] || seenFace[g]) continue;
        seenFace[g] = 1; candidate[e] = 0; queue[qt++] = g;
      }
    }
  }
  const onBoundary = new Uint8Array(nv);
  for (let h = 0; h < 2 * ne; h++) if (he.face[h] < 0) onBoundary[he.vertex[h]] = 1;
  const degree = new Int32Array(nv);
  for (let e = 0; e < ne; e++) if (candidate[e]) { degree[he.vertex[2 * e]]++; degree[he.vertex[2 * e + 1]]++; }
  const stack: number[] = [];
  for (let v = 0; v < nv; v++) if (degree[v] === 1 && !onBoundary[v]) stack.push(v);
  while (stack.length > 0) {
    const v = stack.pop()!;
    if (degree[v] !== 1) continue;
    for (let q = adj.offsets[v]; q < adj.offsets[v + 1]; q++) {
      const e = adj.edges[q];
      if (!candidate[e]) continue;
      candidate[e] = 0;
      degree[v]--;
      const u = adj.neighbors[q];
      degree[u]--;
      if (degree[u] === 1 && !onBoundary[u]) stack.push(u);
      break;
    }
  }
  const out: [number, number][] = [];
  for (let e = 0; e < ne; e++) if (candidate[e]) out.push([he.vertex[2 * e], he.vertex[2 * e + 1]]);
  return out;
}
