import type { TriMesh } from "../mesh";
import { requirePositive } from "./check-params";
import { frustumLateral } from "./frustum-lateral";

export interface CylinderTubeOptions {
  /** circumradius of the N-gon cross-section, units */
  radius: number;
  /** length along +z, units */
  height: number;
  /** segments around, ≥ 3 */
  segments: number;
  /** bands along the height (vertex rings = bands + 1), ≥ 1; default 1 */
  bands?: number;
}

/**
 * Open tube (no caps) with a regular N-gon cross-section, axis = +z from z = 0 to z = height.
 * Vertex (ring i, segment j) = index i·N + j at angle 2πj/N. Outward normals. Exactly developable: its flat
 * pattern is a rectangle N·2r·sin(π/N) wide and `height` tall.
 */
export function cylinderTube(opts: CylinderTubeOptions): TriMesh {
  requirePositive("radius", opts.radius);
  return frustumLateral({ r1: opts.radius, r2: opts.radius, height: opts.height, segments: opts.segments, bands: opts.bands });
}
