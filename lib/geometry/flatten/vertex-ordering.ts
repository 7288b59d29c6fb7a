import { nestedDissection } from "../sparse/nested-dissection";

/**
 * Nested-dissection order of the vertices of a triangle mesh (graph = mesh edges). Used to order the unknowns of
 * the LSCM and ARAP systems, whose sparsity follows the mesh.
 *
 * @param positions optional #V×3 coordinates for geometric separators (see nestedDissection)
 * @returns perm[new] = old vertex
 */
export function meshVertexOrdering(vertexCount: number, triangles: Uint32Array, positions?: Float64Array): Uint32Array {
  const nf = triangles.length / 3;
  const deg = new Uint32Array(vertexCount + 1);
  for (let f = 0; f < nf; f++) {
    for (let k = 0; k < 3; k++) deg[triangles[3 * f + k] + 1] += 2;
  }
  for (let v = 0; v < vertexCount; v++) deg[v + 1] += deg[v];
  const fill = deg.slice(0, vertexCount);
  const raw = new Uint32Array(deg[vertexCount]);
  for (let f = 0; f < nf; f++) {
    for (let k = 0; k < 3; k++) {
      const a = triangles[3 * f + k];
      raw[fill[a]++] = triangles[3 * f + ((k + 1) % 3)];
      raw[fill[a]++] = triangles[3 * f + ((k + 2) % 3)];
    }
  }
  // duplicates (each interior edge appears twice) are harmless for the BFS; keep them
  return nestedDissection(vertexCount, deg, raw, positions);
}
