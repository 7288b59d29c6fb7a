/**
 * The one in-memory mesh shape used across Peelform's geometry core.
 *
 * Flat typed arrays, never arrays of {x,y,z} objects (see ../shared/STYLE.md).
 */

/** Length units a user can declare for a scan or ask for in a report. */
export type LengthUnit = "mm" | "cm" | "m" | "in";

export const LENGTH_UNITS: readonly LengthUnit[] = ["mm", "cm", "m", "in"] as const;

/** Millimetres per unit. Source: 1 in = 25.4 mm exactly (international yard and pound agreement, 1959). */
export const MM_PER_UNIT: Readonly<Record<LengthUnit, number>> = { mm: 1, cm: 10, m: 1000, in: 25.4 };

/** A triangle mesh. */
export interface TriMesh {
  /** #V×3 vertex positions, in the scan's declared units. */
  positions: Float64Array;
  /** #F×3 vertex indices into `positions` (counter-clockwise seen from the outside of the foam). */
  triangles: Uint32Array;
}

/** Number of vertices of a mesh. */
export function vertexCount(mesh: TriMesh): number {
  return mesh.positions.length / 3;
}

/** Number of triangles of a mesh. */
export function faceCount(mesh: TriMesh): number {
  return mesh.triangles.length / 3;
}
