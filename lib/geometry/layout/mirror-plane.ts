/**
 * Mirror symmetry across a plane, for "cut 2, one mirrored" pieces.
 *
 * The plane is axis-aligned in scan coordinates: { axis: "x", offset: 0 } is the plane x = 0.
 * - full model (default): a piece whose mirror image across the plane matches another piece (area and area
 *   centroid within `tolerance` × the mesh's bounding-box diagonal) is its twin; the earlier label is cut twice, one
 *   of them mirrored (count 2, mirrored true), the later one is not cut again (count 0, mirrorOf = earlier label).
 *   A piece that is its own mirror image is cut once.
 * - half model (`half: true`, only one half was sculpted): every piece that is not its own mirror image is cut twice,
 *   one mirrored.
 */

export interface MirrorPlane {
  axis: "x" | "y" | "z";
  /** plane position along the axis, scan units */
  offset: number;
  /** the mesh is one half of a symmetric build */
  half?: boolean;
  /** match tolerance as a fraction of the mesh's bounding-box diagonal (default 0.01) */
  tolerance?: number;
}

export interface MirrorResult {
  count: number[];
  mirrored: boolean[];
  /** index of the piece this one is the mirror image of (not cut again), −1 otherwise */
  mirrorOf: number[];
  /** pieces with no twin in a full model */
  unmatched: number[];
}

/** Area and area centroid of a set of working faces. */
export interface PieceMoments {
  area: number;
  cx: number;
  cy: number;
  cz: number;
  /** bounding box min/max, for the self-symmetry test */
  min: [number, number, number];
  max: [number, number, number];
}

export function pieceMoments(positions: Float64Array, triangles: Uint32Array, faces: Uint32Array): PieceMoments {
  let area = 0, cx = 0, cy = 0, cz = 0;
  const min: [number, number, number] = [Infinity, Infinity, Infinity], max: [number, number, number] = [-Infinity, -Infinity, -Infinity];
  for (let i = 0; i < faces.length; i++) {
    const f = faces[i] * 3;
    const a = triangles[f] * 3, b = triangles[f + 1] * 3, c = triangles[f + 2] * 3;
    const ux = positions[b] - positions[a], uy = positions[b + 1] - positions[a + 1], uz = positions[b + 2] - positions[a + 2];
    const vx = positions[c] - positions[a], vy = positions[c + 1] - positions[a + 1], vz = positions[c + 2] - positions[a + 2];
    const ar = Math.hypot(uy * vz - uz * vy, uz * vx - ux * vz, ux * vy - uy * vx) / 2;
    area += ar;
    cx += (ar * (positions[a] + positions[b] + positions[c])) / 3;
    cy += (ar * (positions[a + 1] + positions[b + 1] + positions[c + 1])) / 3;
    cz += (ar * (positions[a + 2] + positions[b + 2] + positions[c + 2])) / 3;
    for (const v of [a, b, c]) {
      for (let k = 0; k < 3; k++) {
        if (positions[v + k] < min[k]) min[k] = positions[v + k];
        if (positions[v + k] > max[k]) max[k] = positions[v + k];
      }
    }
  }
  return area > 0 ? { area, cx: cx / area, cy: cy / area, cz: cz / area, min, max } : { area, cx: 0, cy: 0, cz: 0, min, max };
}

/**
 * @param moments  per piece (only flattenable pieces take part; pass null for the others)
 * @param diag     bounding-box diagonal of the mesh, scan units
 */
export function mirrorTwins(moments: (PieceMoments | null)[], plane: MirrorPlane, diag: number): MirrorResult {
  const n = moments.length;
  const tol = (plane.tolerance ?? 0.01) * diag;
  const ax = plane.axis === "x" ? 0 : plane.axis === "y" ? 1 : 2;
  const count = new Array<number>(n).fill(1), mirrored = new Array<boolean>(n).fill(false);
  const mirrorOf = new Array<number>(n).fill(-1), unmatched: number[] = [];
  const c = (m: PieceMoments): [number, number, number] => [m.cx, m.cy, m.cz];
  const reflect = (p: [number, number, number]): [number, number, number] => {
    const q: [number, number, number] = [p[0], p[1], p[2]];
    q[ax] = 2 * plane.offset - p[ax];
    return q;
  };
  const dist = (p: number[], q: number[]): number => Math.hypot(p[0] - q[0], p[1] - q[1], p[2] - q[2]);
  const selfSymmetric = (m: PieceMoments): boolean => {
    const lo = 2 * plane.offset - m.max[ax], hi = 2 * plane.offset - m.min[ax];
    return dist(reflect(c(m)), c(m)) <= tol && Math.abs(lo - m.min[ax]) <= tol && Math.abs(hi - m.max[ax]) <= tol;
  };
  const taken = new Uint8Array(n);
  for (let i = 0; i < n; i++) {
    const mi = moments[i];
    if (!mi || taken[i]) continue;
    if (selfSymmetric(mi)) continue;
    if (plane.half) {
      count[i] = 2;
      mirrored[i] = true;
      continue;
    }
    let twin = -1, bestD = Infinity;
    const ri = reflect(c(mi));
    for (let j = i + 1; j < n; j++) {
      const mj = moments[j];
      if (!mj || taken[j]) continue;
      if (Math.abs(mj.area - mi.area) > 2 * (plane.tolerance ?? 0.01) * Math.max(mi.area, mj.area)) continue;
      const d = dist(ri, c(mj));
      if (d <= tol && d < bestD) {
        bestD = d;
        twin = j;
      }
    }
    if (twin < 0) {
      unmatched.push(i);
      continue;
    }
    taken[twin] = 1;
    count[i] = 2;
    mirrored[i] = true;
    count[twin] = 0;
    mirrorOf[twin] = i;
  }
  return { count, mirrored, mirrorOf, unmatched };
}
