/**
 * Decimated working copy of a large scan, with meshoptimizer's edge-collapse simplifier (quadric error metric;
 * Source: M. Garland, P. Heckbert, "Surface Simplification Using Quadric Error Metrics", SIGGRAPH 1997).
 *
 * The simplifier returns indices into the vertex buffer it was given, so the working mesh keeps the input vertex index
 * space: collapsed vertices stay in `positions` as unreferenced entries and seam indices remain valid for the rest.
 */
import { MeshoptSimplifier } from "meshoptimizer";

export interface DecimateResult {
  /** #F'×3 indices into the original positions, F' ≤ faceBudget when the simplifier could reach it */
  triangles: Uint32Array;
  /** largest deviation from the original surface the simplifier estimates, in the mesh's length unit */
  maxError: number;
}

/**
 * @param positions   #V×3 positions (working units)
 * @param triangles   #F×3 welded, cleaned faces
 * @param faceBudget  target face count
 * @param center      a point near the mesh (bounding-box centre) subtracted before the float32 conversion the
 *                    simplifier needs, so precision does not depend on where the scan sits in space
 */
export async function decimateToBudget(
  positions: Float64Array,
  triangles: Uint32Array,
  faceBudget: number,
  center: [number, number, number],
): Promise<DecimateResult> {
  await MeshoptSimplifier.ready;
  const local = new Float32Array(positions.length);
  for (let k = 0; k < positions.length; k += 3) {
    local[k] = positions[k] - center[0];
    local[k + 1] = positions[k + 1] - center[1];
    local[k + 2] = positions[k + 2] - center[2];
  }
  // Target error 1 (= the whole mesh extent) leaves the face budget as the only stopping rule; the error the
  // simplifier reaches is reported instead. 'Sparse' is not used: the buffer is the mesh's own vertex set.
  const [indices, relativeError] = MeshoptSimplifier.simplify(triangles, local, 3, 3 * faceBudget, 1, []);
  const scale = MeshoptSimplifier.getScale(local, 3);
  return { triangles: new Uint32Array(indices), maxError: relativeError * scale };
}
