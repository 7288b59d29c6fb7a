/**
 * Mirror mapping for symmetric scans: each vertex's partner across an axis-aligned plane, and seam runs carried from
 * one half to the other.
 *
 * The plane is { axis, offset } in scan coordinates (x = offset for axis "x"), the same convention as
 * lib/geometry/layout/mirror-plane.ts; `fitMirrorPlane` puts it through the bounding-box centre on that axis.
 * Partners are found with a uniform spatial hash (cell = 2 × tolerance, so the tolerance ball around a query meets
 * at most 2 × 2 × 2 cells: the query's cell and the nearer neighbour on each axis; nearest vertex within the
 * tolerance wins), O(#V) expected.
 */
import type { SeamPathFinder } from "./seam-path";
import { edgeBetween, type StudioMesh } from "./studio-mesh";

export type MirrorAxis = "x" | "y" | "z";

/** Default match tolerance as a fraction of the bounding-box diagonal. Our choice: 0.2 % is below the vertex
 * spacing of a 200k-face scan (about 0.3 % of its diagonal) yet absorbs float noise of a mirrored export. */
export const DEFAULT_MIRROR_TOLERANCE = 0.002;

export interface MirrorPlaneSpec {
  axis: MirrorAxis;
  /** plane position along the axis, scan units; default the bounding-box centre (fitMirrorPlane) */
  offset?: number;
  /** match tolerance as a fraction of the bounding-box diagonal; default DEFAULT_MIRROR_TOLERANCE */
  tolerance?: number;
}

export interface VertexMirror {
  axis: MirrorAxis;
  offset: number;
  /** absolute match tolerance, scan units */
  tolerance: number;
  /** #V partner vertex, −1 unmatched, −2 not used by any face */
  partner: Int32Array;
  /** used vertices with no partner within the tolerance */
  unmatched: number;
  /** up to 100 of them, for highlighting */
  unmatchedSample: Uint32Array;
  /** used vertices that are their own partner (on the plane) */
  onPlane: number;
}

const AXIS_INDEX: Record<MirrorAxis, number> = { x: 0, y: 1, z: 2 };

/** Plane offset through the bounding-box centre on the axis, scan units. */
export function fitMirrorPlane(sm: StudioMesh, axis: MirrorAxis): number {
  const k = AXIS_INDEX[axis];
  return (sm.bbox[k] + sm.bbox[3 + k]) / 2;
}

function cellHash(ix: number, iy: number, iz: number, mask: number): number {
  return ((Math.imul(ix | 0, 0x9e3779b1) ^ Math.imul(iy | 0, 0x85ebca77) ^ Math.imul(iz | 0, 0xc2b2ae3d)) >>> 0) & mask;
}

export function mirrorVertices(sm: StudioMesh, spec: MirrorPlaneSpec): VertexMirror {
  const k = AXIS_INDEX[spec.axis];
  if (k === undefined) throw new RangeError(`The mirror axis must be x, y or z (got ${String(spec.axis)}).`);
  const offset = spec.offset ?? fitMirrorPlane(sm, spec.axis);
  const frac = spec.tolerance ?? DEFAULT_MIRROR_TOLERANCE;
  if (!Number.isFinite(offset)) throw new RangeError(`The mirror plane offset must be a finite number (got ${offset}).`);
  if (!(frac > 0)) throw new RangeError(`The mirror tolerance must be a positive fraction (got ${frac}).`);
  const tol = frac * (sm.diagonal > 0 ? sm.diagonal : 1);
  const nv = sm.vertexCount;
  const p = sm.mesh.positions;
  const cell = 2 * tol;
  let cap = 1;
  while (cap < 2 * nv) cap <<= 1;
  const mask = cap - 1;
  const cellOf = new Uint32Array(nv);
  const start = new Uint32Array(cap + 1);
  for (let v = 0; v < nv; v++) {
    if (!sm.referenced[v]) continue;
    const h = cellHash(Math.floor(p[3 * v] / cell), Math.floor(p[3 * v + 1] / cell), Math.floor(p[3 * v + 2] / cell), mask);
    cellOf[v] = h;
    start[h + 1]++;
  }
  for (let h = 0; h < cap; h++) start[h + 1] += start[h];
  const fill = start.slice(0, cap);
  const bucket = new Uint32Array(start[cap]);
  for (let v = 0; v < nv; v++) if (sm.referenced[v]) bucket[fill[cellOf[v]]++] = v;

  const partner = new Int32Array(nv).fill(-2);
  const sample: number[] = [];
  let unmatched = 0, onPlane = 0;
  const tol2 = tol * tol;
  const q = new Float64Array(3);
  for (let v = 0; v < nv; v++) {
    if (!sm.referenced[v]) continue;
    q[0] = p[3 * v]; q[1] = p[3 * v + 1]; q[2] = p[3 * v + 2];
    q[k] = 2 * offset - q[k];
    const fx = q[0] / cell, fy = q[1] / cell, fz = q[2] / cell;
    const cx = Math.floor(fx), cy = Math.floor(fy), cz = Math.floor(fz);
    // the neighbour cell on the side of the query point: −1 when it sits in the lower half of its cell
    const sx = fx - cx < 0.5 ? -1 : 1, sy = fy - cy < 0.5 ? -1 : 1, sz = fz - cz < 0.5 ? -1 : 1;
    let best = -1, bestD = tol2;
    for (let i = 0; i < 8; i++) {
      const h = cellHash(cx + (i & 1 ? sx : 0), cy + (i & 2 ? sy : 0), cz + (i & 4 ? sz : 0), mask);
      for (let i = start[h]; i < start[h + 1]; i++) {
        const w = bucket[i];
        const ex = p[3 * w] - q[0], ey = p[3 * w + 1] - q[1], ez = p[3 * w + 2] - q[2];
        const d = ex * ex + ey * ey + ez * ez;
        if (d <= bestD) { if (d < bestD || best < 0 || w < best) best = w; bestD = d; }
      }
    }
    partner[v] = best;
    if (best < 0) { unmatched++; if (sample.length < 100) sample.push(v); }
    else if (best === v) onPlane++;
  }
  return { axis: spec.axis, offset, tolerance: tol, partner, unmatched, unmatchedSample: Uint32Array.from(sample), onPlane };
}

export interface MirroredRuns {
  /** vertex chains to add (SeamSet.addRuns(chains, "mirror seams")) */
  chains: Uint32Array[];
  /** source edges carried over as a mesh edge */
  mirrored: number;
  /** source edges carried over by a short bridging path (only with a path finder) */
  bridged: number;
  /** source edges that could not be mirrored: an end without partner, or partners not joined by an edge */
  failed: number;
  /** source edges that are their own mirror image (on the plane), left as they are */
  onPlane: number;
  /** source edges skipped because they lie on the other side of the plane */
  otherSide: number;
}

export interface MirrorRunsOptions {
  /** which half holds the seams to copy: the side with larger ("positive") or smaller coordinate, or "both" */
  from?: "positive" | "negative" | "both";
  /**
   * join partners that are not neighbours (a scan that is only roughly symmetric) with the shortest edge path, when
   * that path is at most `maxBridgeFactor` × the source edge length (default 2)
   */
  finder?: SeamPathFinder;
  maxBridgeFactor?: number;
}

/** Mirror images of seam runs (each run a vertex chain). */
export function mirrorRuns(sm: StudioMesh, mirror: VertexMirror, runs: readonly { vertices: ArrayLike<number> }[], opts: MirrorRunsOptions = {}): MirroredRuns {
  const from = opts.from ?? "both";
  const k = AXIS_INDEX[mirror.axis];
  const p = sm.mesh.positions;
  const maxBridge = opts.maxBridgeFactor ?? 2;
  const res: MirroredRuns = { chains: [], mirrored: 0, bridged: 0, failed: 0, onPlane: 0, otherSide: 0 };
  for (const run of runs) {
    const vs = run.vertices;
    let chain: number[] = [];
    const flush = () => { if (chain.length >= 2) res.chains.push(Uint32Array.from(chain)); chain = []; };
    for (let i = 0; i + 1 < vs.length; i++) {
      const a = vs[i], b = vs[i + 1];
      const side = (p[3 * a + k] + p[3 * b + k]) / 2 - mirror.offset;
      if ((from === "positive" && side < 0) || (from === "negative" && side > 0)) { res.otherSide++; flush(); continue; }
      const ma = mirror.partner[a], mb = mirror.partner[b];
      if (ma < 0 || mb < 0) { res.failed++; flush(); continue; }
      if ((ma === a && mb === b) || (ma === b && mb === a)) { res.onPlane++; flush(); continue; }
      let leg: ArrayLike<number> | null = null;
      if (ma !== mb && edgeBetween(sm, ma, mb) >= 0) { leg = [ma, mb]; res.mirrored++; }
      else if (opts.finder && ma !== mb) {
        const e = edgeBetween(sm, a, b);
        const path = opts.finder.find(ma, mb);
        if (path && path.length <= maxBridge * sm.edgeLength[e]) { leg = path.vertices; res.bridged++; }
      }
      if (!leg) { res.failed++; flush(); continue; }
      if (chain.length > 0 && chain[chain.length - 1] !== leg[0]) flush();
      for (let j = chain.length === 0 ? 0 : 1; j < leg.length; j++) chain.push(leg[j]);
    }
    flush();
  }
  return res;
}
