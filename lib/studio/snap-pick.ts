/**
 * Turning a ray hit into a seam vertex: a click lands on a triangle (the viewer's BVH pick gives the face id and the
 * hit point); the seam starts or ends at the corner of that triangle nearest to the hit point.
 */
import type { StudioMesh } from "./studio-mesh";

/**
 * @param face   picked face id (0 ≤ face < #F)
 * @param x, y, z hit point on the face, scan units
 * @returns the nearest of the face's three vertices
 */
export function snapToVertex(sm: StudioMesh, face: number, x: number, y: number, z: number): number {
  if (!Number.isInteger(face) || face < 0 || face >= sm.faceCount) throw new RangeError(`Face ${face} is not a face of the mesh (it has ${sm.faceCount}).`);
  const { positions: p, triangles: t } = sm.mesh;
  let best = t[3 * face], bestD = Infinity;
  for (let k = 0; k < 3; k++) {
    const v = t[3 * face + k];
    const dx = p[3 * v] - x, dy = p[3 * v + 1] - y, dz = p[3 * v + 2] - z;
    const d = dx * dx + dy * dy + dz * dz;
    if (d < bestD) { bestD = d; best = v; }
  }
  return best;
}
