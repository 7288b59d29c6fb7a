/**
 * Vertex-clustering simplification for the small assembly drawings: vertices are snapped to a uniform grid over the
 * bounding box, each cell keeps the mean of its vertices, and triangles that collapse are dropped.
 * Source: J. Rossignac, P. Borrel, "Multi-resolution 3D approximations for rendering complex scenes", 1993.
 *
 * Only used for drawing (a 60 mm view does not need 100 000 triangles); the geometry core never sees the result.
 */

export interface SimpleMesh {
  /** #V×3 */
  positions: Float64Array;
  /** #F×3 */
  triangles: Uint32Array;
  /** #F face → piece index (−1 none) */
  facePiece: Int32Array;
}

/**
 * @param grid  cells along the longest bounding-box side
 */
export function clusterSimplify(mesh: SimpleMesh, grid: number): SimpleMesh {
  const { positions, triangles, facePiece } = mesh;
  const nv = positions.length / 3;
  let minX = Infinity, minY = Infinity, minZ = Infinity, maxX = -Infinity, maxY = -Infinity, maxZ = -Infinity;
  for (let i = 0; i < nv; i++) {
    const x = positions[3 * i], y = positions[3 * i + 1], z = positions[3 * i + 2];
    if (x < minX) minX = x; if (x > maxX) maxX = x;
    if (y < minY) minY = y; if (y > maxY) maxY = y;
    if (z < minZ) minZ = z; if (z > maxZ) maxZ = z;
  }
  const extent = Math.max(maxX - minX, maxY - minY, maxZ - minZ) || 1;
  const cell = extent / grid;
  const g = grid + 1;
  const cellOf = new Int32Array(nv);
  const keyToNew = new Map<number, number>();
  const sums: number[] = [];
  const counts: number[] = [];
  // Only referenced vertices take part (unreferenced entries are normal in working meshes).
  const used = new Uint8Array(nv);
  for (let i = 0; i < triangles.length; i++) used[triangles[i]] = 1;
  for (let i = 0; i < nv; i++) {
    if (!used[i]) { cellOf[i] = -1; continue; }
    const ix = Math.min(grid, Math.floor((positions[3 * i] - minX) / cell));
    const iy = Math.min(grid, Math.floor((positions[3 * i + 1] - minY) / cell));
    const iz = Math.min(grid, Math.floor((positions[3 * i + 2] - minZ) / cell));
    const key = ix + g * (iy + g * iz);
    let id = keyToNew.get(key);
    if (id === undefined) {
      id = counts.length;
      keyToNew.set(key, id);
      counts.push(0);
      sums.push(0, 0, 0);
    }
    cellOf[i] = id;
    counts[id]++;
    sums[3 * id] += positions[3 * i];
    sums[3 * id + 1] += positions[3 * i + 1];
    sums[3 * id + 2] += positions[3 * i + 2];
  }
  const outPos = new Float64Array(counts.length * 3);
  for (let i = 0; i < counts.length; i++) {
    outPos[3 * i] = sums[3 * i] / counts[i];
    outPos[3 * i + 1] = sums[3 * i + 1] / counts[i];
    outPos[3 * i + 2] = sums[3 * i + 2] / counts[i];
  }
  const nf = triangles.length / 3;
  const tri: number[] = [];
  const fp: number[] = [];
  // Drop faces that collapse onto the same three cells. Numeric keys while cells³ fits a double exactly.
  const cells = counts.length;
  const numeric = cells * cells * cells < Number.MAX_SAFE_INTEGER;
  const seenNum = new Set<number>();
  const seenStr = new Set<string>();
  for (let f = 0; f < nf; f++) {
    const a = cellOf[triangles[3 * f]], b = cellOf[triangles[3 * f + 1]], c = cellOf[triangles[3 * f + 2]];
    if (a === b || b === c || a === c) continue;
    const lo = Math.min(a, b, c), hi = Math.max(a, b, c), mid = a + b + c - lo - hi;
    if (numeric) {
      const key = (lo * cells + mid) * cells + hi;
      if (seenNum.has(key)) continue;
      seenNum.add(key);
    } else {
      const key = `${lo},${mid},${hi}`;
      if (seenStr.has(key)) continue;
      seenStr.add(key);
    }
    tri.push(a, b, c);
    fp.push(facePiece[f]);
  }
  return { positions: outPos, triangles: Uint32Array.from(tri), facePiece: Int32Array.from(fp) };
}

/** Simplifies until at most `maxFaces` triangles remain (returns the input when it is already small enough). */
export function simplifyToBudget(mesh: SimpleMesh, maxFaces: number): SimpleMesh {
  if (mesh.triangles.length / 3 <= maxFaces) return mesh;
  let grid = 96;
  let out = clusterSimplify(mesh, grid);
  // A surface's cell count grows with grid², so the next grid is guessed from the last result.
  while (out.triangles.length / 3 > maxFaces && grid > 8) {
    const ratio = Math.sqrt(maxFaces / (out.triangles.length / 3));
    grid = Math.max(8, Math.min(grid - 1, Math.floor(grid * ratio * 0.95)));
    out = clusterSimplify(mesh, grid);
  }
  return out;
}
