/**
 * Area-weighted vertex normals: the sum of the (unnormalised) face normals (b − a) × (c − a), whose length is twice
 * the face area, then normalised. Source: M. Botsch et al., Polygon Mesh Processing (2010), §3.2, "area weights".
 */

/**
 * @param positions  #V×3 vertex positions (any length unit)
 * @param triangles  #F×3 vertex indices, counter-clockwise seen from the outside of the foam
 * @param out        optional #V×3 output buffer (reused)
 * @returns          #V×3 unit normals; a vertex with no (or only degenerate) faces gets (0, 0, 0)
 */
export function vertexNormals(positions: Float64Array, triangles: Uint32Array, out?: Float64Array): Float64Array {
  const n = out ?? new Float64Array(positions.length);
  n.fill(0);
  for (let f = 0; f < triangles.length; f += 3) {
    const a = triangles[f] * 3, b = triangles[f + 1] * 3, c = triangles[f + 2] * 3;
    const ux = positions[b] - positions[a], uy = positions[b + 1] - positions[a + 1], uz = positions[b + 2] - positions[a + 2];
    const vx = positions[c] - positions[a], vy = positions[c + 1] - positions[a + 1], vz = positions[c + 2] - positions[a + 2];
    const nx = uy * vz - uz * vy, ny = uz * vx - ux * vz, nz = ux * vy - uy * vx;
    n[a] += nx; n[a + 1] += ny; n[a + 2] += nz;
    n[b] += nx; n[b + 1] += ny; n[b + 2] += nz;
    n[c] += nx; n[c + 1] += ny; n[c + 2] += nz;
  }
  for (let v = 0; v < n.length; v += 3) {
    const l = Math.hypot(n[v], n[v + 1], n[v + 2]);
    if (l > 0) {
      n[v] /= l; n[v + 1] /= l; n[v + 2] /= l;
    }
  }
  return n;
}
