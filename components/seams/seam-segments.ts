/**
 * Line-segment buffers (6 floats per edge, scan units) for the viewer's seam layers. Ends are lifted a little off
 * the surface along the vertex normal, so a straight edge over a convex patch (a chord, inside the surface) stays
 * visible.
 */
import type { StudioMesh } from "@/lib/studio/studio-mesh";

/** Unit area-weighted vertex normals (#V×3) and the lift distance (scan units). */
export interface SurfaceLift { normals: Float32Array; amount: number }

const lifts = new WeakMap<StudioMesh, SurfaceLift>();

/** The lift of a mesh: 0.25 % of its bounding-box diagonal along area-weighted vertex normals (computed once). */
export function surfaceLift(sm: StudioMesh): SurfaceLift {
  const cached = lifts.get(sm);
  if (cached) return cached;
  const p = sm.mesh.positions, t = sm.mesh.triangles;
  const n = new Float32Array(p.length);
  for (let f = 0; f < t.length; f += 3) {
    const a = 3 * t[f], b = 3 * t[f + 1], c = 3 * t[f + 2];
    const ux = p[b] - p[a], uy = p[b + 1] - p[a + 1], uz = p[b + 2] - p[a + 2];
    const vx = p[c] - p[a], vy = p[c + 1] - p[a + 1], vz = p[c + 2] - p[a + 2];
    const nx = uy * vz - uz * vy, ny = uz * vx - ux * vz, nz = ux * vy - uy * vx;
    for (const v of [a, b, c]) { n[v] += nx; n[v + 1] += ny; n[v + 2] += nz; }
  }
  for (let i = 0; i < n.length; i += 3) {
    const l = Math.hypot(n[i], n[i + 1], n[i + 2]) || 1;
    n[i] /= l; n[i + 1] /= l; n[i + 2] /= l;
  }
  const lift = { normals: n, amount: sm.diagonal * 0.0025 };
  lifts.set(sm, lift);
  return lift;
}

function put(out: Float32Array, o: number, sm: StudioMesh, v: number): void {
  const p = sm.mesh.positions, { normals: n, amount } = surfaceLift(sm);
  out[o] = p[3 * v] + amount * n[3 * v];
  out[o + 1] = p[3 * v + 1] + amount * n[3 * v + 1];
  out[o + 2] = p[3 * v + 2] + amount * n[3 * v + 2];
}

/** Segments of every edge with `flags[e]` ≠ 0. */
export function flaggedSegments(sm: StudioMesh, flags: ArrayLike<number>): Float32Array {
  let n = 0;
  for (let e = 0; e < sm.edgeCount; e++) if (flags[e]) n++;
  const out = new Float32Array(6 * n);
  let o = 0;
  for (let e = 0; e < sm.edgeCount; e++) {
    if (!flags[e]) continue;
    put(out, o, sm, sm.edgeLo[e]);
    put(out, o + 3, sm, sm.edgeHi[e]);
    o += 6;
  }
  return out;
}

/** Segments along vertex chains. */
export function chainSegments(sm: StudioMesh, chains: readonly ArrayLike<number>[]): Float32Array {
  let n = 0;
  for (const c of chains) n += Math.max(0, c.length - 1);
  const out = new Float32Array(6 * n);
  let o = 0;
  for (const c of chains) {
    for (let i = 1; i < c.length; i++) {
      put(out, o, sm, c[i - 1]);
      put(out, o + 3, sm, c[i]);
      o += 6;
    }
  }
  return out;
}

/**
 * Outline of chosen pieces: edges whose two sides lie in different pieces (or one side only), at least one of them
 * flagged. `facePiece` is the piece per face, `flagged` one entry per piece.
 */
export function pieceOutline(sm: StudioMesh, facePiece: Int32Array, flagged: Uint8Array): Float32Array {
  const first = new Int32Array(sm.edgeCount).fill(-2);
  const mark = new Uint8Array(sm.edgeCount);
  const sides = sm.sideEdge;
  for (let s = 0; s < sides.length; s++) {
    const e = sides[s], piece = facePiece[(s / 3) | 0];
    if (first[e] === -2) first[e] = piece;
    else if (first[e] !== piece && (flagged[piece] || (first[e] >= 0 && flagged[first[e]]))) mark[e] = 1;
  }
  for (let e = 0; e < sm.edgeCount; e++) if (sm.edgeFaces[e] === 1 && first[e] >= 0 && flagged[first[e]]) mark[e] = 1;
  return flaggedSegments(sm, mark);
}

/** Edge flags of a list of vertex pairs (pairs that are not edges are skipped). */
export function pairFlags(sm: StudioMesh, pairs: readonly (readonly [number, number])[], edgeBetween: (sm: StudioMesh, a: number, b: number) => number): Uint8Array {
  const f = new Uint8Array(sm.edgeCount);
  for (const [a, b] of pairs) {
    if (a >= sm.vertexCount || b >= sm.vertexCount) continue;
    const e = edgeBetween(sm, a, b);
    if (e >= 0) f[e] = 1;
  }
  return f;
}
