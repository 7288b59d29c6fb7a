import { csrFromTriplets, TripletList } from "../sparse/triplets";
import type { CsrMatrix } from "../sparse/csr-matrix";

/**
 * Cotangent Laplacian (Pinkall & Polthier 1993, "Computing discrete minimal surfaces and their conjugates";
 * MacNeal 1949): L_ij = −½(cot α_ij + cot β_ij) for an edge, L_ii = −Σ_j L_ij, so ½·uᵀLu is the Dirichlet energy
 * ½∫|∇u|² of the piecewise-linear function u. Symmetric positive semi-definite with L·1 = 0.
 *
 * @param vertexCount #V
 * @param triangles #F×3
 * @param cot #F×3 corner cotangents (see triangleFrames)
 */
export function cotanLaplacian(vertexCount: number, triangles: Uint32Array, cot: Float64Array): CsrMatrix {
  const nf = triangles.length / 3;
  const t = new TripletList(12 * nf);
  for (let f = 0; f < nf; f++) {
    for (let k = 0; k < 3; k++) {
      const i = triangles[3 * f + ((k + 1) % 3)], j = triangles[3 * f + ((k + 2) % 3)];
      const w = 0.5 * cot[3 * f + k];
      t.add(i, j, -w); t.add(j, i, -w); t.add(i, i, w); t.add(j, j, w);
    }
  }
  return csrFromTriplets(vertexCount, t);
}
