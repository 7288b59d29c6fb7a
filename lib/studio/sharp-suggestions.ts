/**
 * Suggested seams along sharp ridges and valleys: chains of edges where the surface turns by more than a threshold,
 * |dihedral − 180°| > thresholdDeg (dihedral as in lib/geometry/marks/dihedral-angles.ts: > 180° ridge, < 180°
 * valley). Foam pieces meet well at a crease: the seam hides in the corner and the bevel follows the dihedral.
 *
 * Chains are split where the sharp-edge graph branches or ends (a vertex with other than two sharp edges) and where
 * ridge turns to valley; a chain without such a vertex is a closed loop started at its smallest vertex id. Each chain
 * runs from its smaller end vertex, so its id is stable. Edges already on a seam are left out (a chain is cut into
 * the parts between them), and chains are formed before that, so the other suggestions keep their ids when one is
 * accepted.
 */
import { DEFAULT_SHARP_THRESHOLD_DEG } from "./seam-path";
import type { SeamSuggestion } from "./suggestion";
import type { StudioMesh } from "./studio-mesh";

/** Shortest chain worth proposing, as a fraction of the bounding-box diagonal. Our choice: 2 % keeps lone sharp
 * edges of scan noise out while a real crease on a prop is far longer. */
export const DEFAULT_MIN_CHAIN_FRACTION = 0.02;

export interface SharpSuggestionOptions {
  /** slider value: |dihedral − 180°| above which an edge counts, degrees; default DEFAULT_SHARP_THRESHOLD_DEG */
  thresholdDeg?: number;
  /** chains shorter than this × bbox diagonal are dropped; default DEFAULT_MIN_CHAIN_FRACTION */
  minLengthFraction?: number;
  /** #E current seam flags: those edges are not proposed */
  onSeam?: Uint8Array;
}

/** @returns chains ordered by length, longest first (ties by id) */
export function suggestSharpSeams(sm: StudioMesh, opts: SharpSuggestionOptions = {}): SeamSuggestion[] {
  const thr = opts.thresholdDeg ?? DEFAULT_SHARP_THRESHOLD_DEG;
  if (!(thr >= 0 && thr < 180)) throw new RangeError(`The sharpness threshold must be between 0° and 180° (got ${thr}).`);
  const minLength = (opts.minLengthFraction ?? DEFAULT_MIN_CHAIN_FRACTION) * sm.diagonal;
  const { dihedral, edgeLo, edgeHi, edgeLength, vertexEdgeOffsets: off, vertexEdges: ved, vertexNeighbors: nbr } = sm;
  const ne = sm.edgeCount, nv = sm.vertexCount;
  // kind per edge: 1 ridge, 2 valley, 0 not proposed
  const kind = new Uint8Array(ne);
  const degree = new Uint32Array(nv);
  for (let e = 0; e < ne; e++) {
    const d = dihedral[e];
    if (!(Math.abs(d - 180) > thr)) continue;
    kind[e] = d > 180 ? 1 : 2;
    degree[edgeLo[e]]++;
    degree[edgeHi[e]]++;
  }
  /** the other sharp edge at a degree-2 vertex, or −1 */
  const otherEdge = (v: number, e: number): number => {
    for (let q = off[v]; q < off[v + 1]; q++) if (kind[ved[q]] && ved[q] !== e) return q;
    return -1;
  };
  const isBreak = (v: number): boolean => {
    if (degree[v] !== 2) return true;
    let k = 0;
    for (let q = off[v]; q < off[v + 1]; q++) {
      const e = ved[q];
      if (!kind[e]) continue;
      if (k === 0) k = kind[e]; else if (kind[e] !== k) return true;
    }
    return false;
  };
  const used = new Uint8Array(ne);
  const out: SeamSuggestion[] = [];
  const onSeam = opts.onSeam;
  const emit = (vs: number[], es: number[], closed: boolean): void => {
    let length = 0, weighted = 0, minEdge = ne;
    for (const e of es) { length += edgeLength[e]; weighted += edgeLength[e] * dihedral[e]; if (e < minEdge) minEdge = e; }
    if (es.length === 0 || length < minLength) return;
    if (!closed && vs[vs.length - 1] < vs[0]) { vs.reverse(); es.reverse(); }
    const k = kind[es[0]] === 1 ? "ridge" : "valley";
    const mean = length > 0 ? weighted / length : dihedral[es[0]];
    out.push({
      id: `${k}:${vs[0]}-${vs[vs.length - 1]}:${es.length}:${minEdge}`,
      kind: k,
      vertices: Uint32Array.from(vs),
      edges: Uint32Array.from(es),
      length,
      meanDihedral: mean,
      reason: `${closed ? "Closed " : ""}${k} of ${es.length} edge${es.length === 1 ? "" : "s"} where the surface turns by ${Math.abs(mean - 180).toFixed(0)}° on average (dihedral ${mean.toFixed(0)}°).`,
    });
  };
  const walk = (start: number, q0: number): void => {
    const vs = [start], es: number[] = [];
    let q = q0;
    for (;;) {
      const e = ved[q], w = nbr[q];
      used[e] = 1;
      es.push(e);
      vs.push(w);
      if (w === start || isBreak(w)) break;
      const nq = otherEdge(w, e);
      if (nq < 0 || used[ved[nq]]) break;
      q = nq;
    }
    const closed = vs[vs.length - 1] === start;
    if (!onSeam || !es.some((e) => onSeam[e])) { emit(vs, es, closed); return; }
    // the parts between edges that are already seams
    let from = 0;
    for (let i = 0; i <= es.length; i++) {
      if (i === es.length || onSeam[es[i]]) {
        if (i > from) emit(vs.slice(from, i + 1), es.slice(from, i), false);
        from = i + 1;
      }
    }
  };
  for (let v = 0; v < nv; v++) {
    if (degree[v] === 0 || !isBreak(v)) continue;
    for (let q = off[v]; q < off[v + 1]; q++) if (kind[ved[q]] && !used[ved[q]]) walk(v, q);
  }
  for (let v = 0; v < nv; v++) {
    if (degree[v] !== 2) continue;
    let best = -1;
    for (let q = off[v]; q < off[v + 1]; q++) if (kind[ved[q]] && !used[ved[q]] && (best < 0 || nbr[q] < nbr[best])) best = q;
    if (best >= 0) walk(v, best);
  }
  out.sort((a, b) => b.length - a.length || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
  return out;
}
