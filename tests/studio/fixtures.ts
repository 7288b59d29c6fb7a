/** Small meshes and seam helpers shared by the studio tests. */
import type { TriMesh } from "@/lib/geometry/mesh";
import { edgeBetween, type StudioMesh } from "@/lib/studio/studio-mesh";

/** #E seam flags from vertex pairs (throws when a pair is not an edge, so a typo cannot pass silently). */
export function seamFlags(sm: StudioMesh, pairs: readonly (readonly [number, number])[]): Uint8Array {
  const flags = new Uint8Array(sm.edgeCount);
  for (const [a, b] of pairs) {
    const e = edgeBetween(sm, a, b);
    if (e < 0) throw new Error(`[${a}, ${b}] is not an edge`);
    flags[e] = 1;
  }
  return flags;
}

/** Consecutive pairs of a vertex chain. */
export function chainPairs(chain: readonly number[]): [number, number][] {
  const out: [number, number][] = [];
  for (let i = 0; i + 1 < chain.length; i++) out.push([chain[i], chain[i + 1]]);
  return out;
}

/** Meridian j of a UV sphere (north pole … south pole), see uv-sphere.ts for the numbering. */
export function meridian(bands: number, segments: number, j: number): number[] {
  const south = segments * (bands - 1) + 1;
  const out = [0];
  for (let k = 1; k < bands; k++) out.push(1 + (k - 1) * segments + j);
  out.push(south);
  return out;
}

/** Latitude ring k (1 … bands−1) of a UV sphere as a closed chain. */
export function ring(segments: number, k: number): number[] {
  const out: number[] = [];
  for (let j = 0; j <= segments; j++) out.push(1 + (k - 1) * segments + (j % segments));
  return out;
}

/** Copy of a mesh with the vertices moved by (dx, dy, dz) and scaled by s. */
export function transformed(mesh: TriMesh, s: number, dx = 0, dy = 0, dz = 0): TriMesh {
  const p = new Float64Array(mesh.positions.length);
  for (let i = 0; i < p.length; i += 3) {
    p[i] = mesh.positions[i] * s + dx; p[i + 1] = mesh.positions[i + 1] * s + dy; p[i + 2] = mesh.positions[i + 2] * s + dz;
  }
  return { positions: p, triangles: mesh.triangles.slice() };
}
