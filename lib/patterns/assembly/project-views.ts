/**
 * Orthographic views of the scan for the assembly sheet: painter's-algorithm order (far triangles first) and flat
 * shading (Lambert term of each face normal against a fixed light, taken as |n·l| so inconsistently wound scans
 * still shade). Pieces are coloured with the palette and lettered at the centroid of their visible faces.
 * Source: painter's algorithm and Lambertian flat shading, J. D. Foley et al., "Computer Graphics: Principles and
 * Practice", 2nd ed., §15.5 (depth-sort) and §16.2 (flat shading).
 *
 * Axes: the scan's y axis is up, +z faces the viewer in the front view (the usual OBJ/glTF convention).
 */
import { NO_PIECE_COLOR, pieceColor } from "../palette";
import { simplifyToBudget, type SimpleMesh } from "./cluster-simplify";

export type ViewName = "front" | "side" | "top" | "three-quarter";

export interface ProjectedView {
  name: ViewName;
  title: string;
  /** #T×6 view-plane coordinates (x right, y up), in mesh units; drawing order = array order (back to front) */
  triangles: Float64Array;
  /** #T×3 shaded RGB 0…1 */
  colors: Float32Array;
  minX: number; minY: number; maxX: number; maxY: number;
  /** piece letters at the centroid of each piece's faces that face the viewer */
  letters: { label: string; x: number; y: number }[];
}

/** Triangle budget for the drawings (per view). */
export const VIEW_FACE_BUDGET = 6000;

type Vec3 = [number, number, number];

function norm(v: Vec3): Vec3 {
  const l = Math.hypot(v[0], v[1], v[2]) || 1;
  return [v[0] / l, v[1] / l, v[2] / l];
}

function cross(a: Vec3, b: Vec3): Vec3 {
  return [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
}

/** Camera rows (right, up, toward viewer) looking from direction `from` with `up`. */
function camera(from: Vec3, up: Vec3): [Vec3, Vec3, Vec3] {
  const z = norm(from);
  const d = up[0] * z[0] + up[1] * z[1] + up[2] * z[2];
  const y = norm([up[0] - d * z[0], up[1] - d * z[1], up[2] - d * z[2]]);
  return [cross(y, z), y, z];
}

const YAW = (35 * Math.PI) / 180, PITCH = (25 * Math.PI) / 180;

export const VIEWS: { name: ViewName; title: string; rows: [Vec3, Vec3, Vec3] }[] = [
  { name: "front", title: "Front", rows: camera([0, 0, 1], [0, 1, 0]) },
  { name: "side", title: "Right side", rows: camera([1, 0, 0], [0, 1, 0]) },
  { name: "top", title: "Top", rows: camera([0, 1, 0], [0, 0, -1]) },
  {
    name: "three-quarter", title: "Three-quarter",
    rows: camera([Math.sin(YAW) * Math.cos(PITCH), Math.sin(PITCH), Math.cos(YAW) * Math.cos(PITCH)], [0, 1, 0]),
  },
];

const LIGHT: Vec3 = norm([-0.35, 0.55, 0.75]);

/**
 * Projects the mesh into the four views.
 * @param labels      piece labels by piece index (facePiece values)
 * @param colorIndex  palette index per piece index (default: the piece index), so views match the pattern sheet
 */
export function projectViews(mesh: SimpleMesh, labels: string[], colorIndex?: number[]): ProjectedView[] {
  const m = simplifyToBudget(mesh, VIEW_FACE_BUDGET);
  const nv = m.positions.length / 3;
  const nf = m.triangles.length / 3;
  const vx = new Float64Array(nv), vy = new Float64Array(nv), vz = new Float64Array(nv);
  const depth = new Float64Array(nf);
  const order = new Uint32Array(nf);
  const out: ProjectedView[] = [];
  for (const view of VIEWS) {
    const [r0, r1, r2] = view.rows;
    let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity;
    for (let i = 0; i < nv; i++) {
      const x = m.positions[3 * i], y = m.positions[3 * i + 1], z = m.positions[3 * i + 2];
      vx[i] = r0[0] * x + r0[1] * y + r0[2] * z;
      vy[i] = r1[0] * x + r1[1] * y + r1[2] * z;
      vz[i] = r2[0] * x + r2[1] * y + r2[2] * z;
    }
    for (let f = 0; f < nf; f++) {
      order[f] = f;
      depth[f] = vz[m.triangles[3 * f]] + vz[m.triangles[3 * f + 1]] + vz[m.triangles[3 * f + 2]];
    }
    order.sort((a, b) => depth[a] - depth[b]);
    const triangles = new Float64Array(nf * 6);
    const colors = new Float32Array(nf * 3);
    const sumX = new Float64Array(labels.length), sumY = new Float64Array(labels.length), sumA = new Float64Array(labels.length);
    for (let k = 0; k < nf; k++) {
      const f = order[k];
      const a = m.triangles[3 * f], b = m.triangles[3 * f + 1], c = m.triangles[3 * f + 2];
      triangles[6 * k] = vx[a]; triangles[6 * k + 1] = vy[a];
      triangles[6 * k + 2] = vx[b]; triangles[6 * k + 3] = vy[b];
      triangles[6 * k + 4] = vx[c]; triangles[6 * k + 5] = vy[c];
      for (const v of [a, b, c]) {
        if (vx[v] < minX) minX = vx[v]; if (vx[v] > maxX) maxX = vx[v];
        if (vy[v] < minY) minY = vy[v]; if (vy[v] > maxY) maxY = vy[v];
      }
      // Face normal in view space.
      const ux = vx[b] - vx[a], uy = vy[b] - vy[a], uz = vz[b] - vz[a];
      const wx = vx[c] - vx[a], wy = vy[c] - vy[a], wz = vz[c] - vz[a];
      const nx = uy * wz - uz * wy, ny = uz * wx - ux * wz, nz = ux * wy - uy * wx;
      const nl = Math.hypot(nx, ny, nz) || 1;
      const lambert = Math.abs((nx * LIGHT[0] + ny * LIGHT[1] + nz * LIGHT[2]) / nl);
      const shade = 0.45 + 0.55 * lambert;
      const piece = m.facePiece[f];
      const base = piece >= 0 ? pieceColor(colorIndex?.[piece] ?? piece) : NO_PIECE_COLOR;
      colors[3 * k] = base[0] * shade; colors[3 * k + 1] = base[1] * shade; colors[3 * k + 2] = base[2] * shade;
      // nz > 0: the face is wound counter-clockwise as seen, i.e. it faces the viewer.
      if (piece >= 0 && nz > 0) {
        const area = nz / 2;
        sumA[piece] += area;
        sumX[piece] += (area * (vx[a] + vx[b] + vx[c])) / 3;
        sumY[piece] += (area * (vy[a] + vy[b] + vy[c])) / 3;
      }
    }
    let totalA = 0;
    for (let p = 0; p < labels.length; p++) totalA += sumA[p];
    const letters: ProjectedView["letters"] = [];
    for (let p = 0; p < labels.length; p++) {
      // Letter only pieces that show a visible share of the view.
      if (sumA[p] > totalA * 0.004) letters.push({ label: labels[p], x: sumX[p] / sumA[p], y: sumY[p] / sumA[p] });
    }
    if (nf === 0) { minX = minY = 0; maxX = maxY = 1; }
    out.push({ name: view.name, title: view.title, triangles, colors, minX, minY, maxX, maxY, letters });
  }
  return out;
}
