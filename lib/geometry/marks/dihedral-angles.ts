/**
 * Dihedral angle at seam edges, measured on the side the face normals point to: the outside of the foam.
 * 180° = flat; more than 180° = a ridge (the surface is convex there, like a cube edge: 270° outside, 90° inside);
 * less than 180° = a valley (concave).
 *
 * With n1 the unit normal of the face left of a→b, n2 of the face right of it and e the unit edge direction, the
 * signed bending angle is θ = atan2((n1 × n2)·e, n1·n2) (positive when convex), and the outside dihedral is 180° + θ.
 * Source: signed dihedral angle from face normals, e.g. M. Botsch et al., Polygon Mesh Processing (2010), §3.3 and
 * the discrete-shell bending energy of Grinspun et al., "Discrete Shells" (SCA 2003), which use the same θ.
 */

/**
 * @param positions  #V×3 vertex positions
 * @param triangles  #F×3 faces, counter-clockwise seen from outside
 * @param a, b       #E edge endpoints; a→b runs counter-clockwise in faceAB
 * @param faceAB     #E face left of a→b
 * @param faceBA     #E face right of a→b (−1: border edge, result NaN)
 * @param out        optional #E output
 * @returns          #E outside dihedral angles in degrees, (0, 360); NaN for border or degenerate edges
 */
export function dihedralAngles(
  positions: Float64Array,
  triangles: Uint32Array,
  a: Uint32Array,
  b: Uint32Array,
  faceAB: Int32Array,
  faceBA: Int32Array,
  out?: Float64Array,
): Float64Array {
  const res = out ?? new Float64Array(a.length);
  const n1 = new Float64Array(3), n2 = new Float64Array(3);
  for (let i = 0; i < a.length; i++) {
    const f1 = faceAB[i], f2 = faceBA[i];
    if (f1 < 0 || f2 < 0 || !faceNormal(positions, triangles, f1, n1) || !faceNormal(positions, triangles, f2, n2)) {
      res[i] = NaN;
      continue;
    }
    const pa = a[i] * 3, pb = b[i] * 3;
    let ex = positions[pb] - positions[pa], ey = positions[pb + 1] - positions[pa + 1], ez = positions[pb + 2] - positions[pa + 2];
    const el = Math.hypot(ex, ey, ez);
    if (el === 0) {
      res[i] = NaN;
      continue;
    }
    ex /= el; ey /= el; ez /= el;
    const cx = n1[1] * n2[2] - n1[2] * n2[1], cy = n1[2] * n2[0] - n1[0] * n2[2], cz = n1[0] * n2[1] - n1[1] * n2[0];
    const sin = cx * ex + cy * ey + cz * ez;
    const cos = n1[0] * n2[0] + n1[1] * n2[1] + n1[2] * n2[2];
    res[i] = 180 + (Math.atan2(sin, cos) * 180) / Math.PI;
  }
  return res;
}

/** Unit normal of face f into out; false for a degenerate face. */
function faceNormal(p: Float64Array, t: Uint32Array, f: number, out: Float64Array): boolean {
  const a = t[3 * f] * 3, b = t[3 * f + 1] * 3, c = t[3 * f + 2] * 3;
  const ux = p[b] - p[a], uy = p[b + 1] - p[a + 1], uz = p[b + 2] - p[a + 2];
  const vx = p[c] - p[a], vy = p[c + 1] - p[a + 1], vz = p[c + 2] - p[a + 2];
  const nx = uy * vz - uz * vy, ny = uz * vx - ux * vz, nz = ux * vy - uy * vx;
  const l = Math.hypot(nx, ny, nz);
  if (l === 0) return false;
  out[0] = nx / l; out[1] = ny / l; out[2] = nz / l;
  return true;
}
