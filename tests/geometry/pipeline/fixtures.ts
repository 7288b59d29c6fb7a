/** Pipeline fixtures: real intake (OBJ text through readMesh) of procedural shapes, with seams by position. */
import { readMesh, type IntakeResult } from "@/lib/geometry/intake/read-mesh";
import { writeObj } from "@/lib/geometry/intake/write-mesh";
import type { LengthUnit, TriMesh } from "@/lib/geometry/mesh";
import { cube } from "@/lib/geometry/shapes/cube";
import { cylinderTube } from "@/lib/geometry/shapes/cylinder-tube";

export async function intakeOf(mesh: TriMesh, units: LengthUnit = "mm"): Promise<IntakeResult> {
  return readMesh(new TextEncoder().encode(writeObj(mesh)), { units });
}

/** Open tube with one straight seam from bottom to top through segment 0. */
export function seamedTube(radius: number, height: number, segments: number, bands: number): { mesh: TriMesh; seams: Uint32Array } {
  const mesh = cylinderTube({ radius, height, segments, bands });
  const s: number[] = [];
  for (let i = 0; i < bands; i++) s.push(i * segments, (i + 1) * segments);
  return { mesh, seams: new Uint32Array(s) };
}

/**
 * Subdivided cube with a spanning tree of its edges as seam: the top path t0–t1–t2–t3 and the four vertical edges.
 * Cutting a sphere along a tree through all 8 corners leaves one disk that unfolds without stretch.
 */
export function treeCutCube(size: number, subdivisions: number): { mesh: TriMesh; seams: Uint32Array } {
  const mesh = cube({ size, subdivisions });
  const h = size / 2, n = subdivisions;
  const key = (x: number, y: number, z: number): string => [x, y, z].map((c) => Math.round((c / size) * 2 * n)).join(",");
  const id = new Map<string, number>();
  for (let v = 0; v < mesh.positions.length / 3; v++) id.set(key(mesh.positions[3 * v], mesh.positions[3 * v + 1], mesh.positions[3 * v + 2]), v);
  const seams: number[] = [];
  const edge = (p: [number, number, number], q: [number, number, number]): void => {
    for (let i = 0; i < n; i++) {
      const at = (t: number): number => id.get(key(p[0] + (q[0] - p[0]) * t, p[1] + (q[1] - p[1]) * t, p[2] + (q[2] - p[2]) * t))!;
      seams.push(at(i / n), at((i + 1) / n));
    }
  };
  const t: [number, number, number][] = [[-h, -h, h], [h, -h, h], [h, h, h], [-h, h, h]];
  edge(t[0], t[1]);
  edge(t[1], t[2]);
  edge(t[2], t[3]);
  for (const c of t) edge(c, [c[0], c[1], -h]);
  return { mesh, seams: new Uint32Array(seams) };
}

/** Applies x ↦ s·R·x + d to a copy of the mesh (R a rotation about the axis (1, 2, 3) by `angle`). */
export function transformed(mesh: TriMesh, s: number, angle: number, d: [number, number, number]): TriMesh {
  const l = Math.hypot(1, 2, 3), ux = 1 / l, uy = 2 / l, uz = 3 / l;
  const c = Math.cos(angle), sn = Math.sin(angle), C = 1 - c;
  const R = [
    c + ux * ux * C, ux * uy * C - uz * sn, ux * uz * C + uy * sn,
    uy * ux * C + uz * sn, c + uy * uy * C, uy * uz * C - ux * sn,
    uz * ux * C - uy * sn, uz * uy * C + ux * sn, c + uz * uz * C,
  ];
  const p = mesh.positions, q = new Float64Array(p.length);
  for (let v = 0; v < p.length; v += 3) {
    for (let r = 0; r < 3; r++) q[v + r] = s * (R[3 * r] * p[v] + R[3 * r + 1] * p[v + 1] + R[3 * r + 2] * p[v + 2]) + d[r];
  }
  return { positions: q, triangles: mesh.triangles };
}
