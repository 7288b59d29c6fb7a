import type { TriMesh } from "../mesh";
import { GeometryError } from "../errors";
import { requireInteger, requirePositive } from "./check-params";

export interface FoldedSheetOptions {
  /** length of the crease (along x), units */
  width: number;
  /** depth of each of the two rectangles, measured from the crease, units */
  depth: number;
  /** dihedral angle between the two rectangles, degrees, 0 < angle ≤ 180 (180 = flat) */
  dihedralDeg: number;
  /** "up": the second rectangle rises towards +z, the side the normals point to; "down": away from it */
  fold: "up" | "down";
  /** grid cells along the crease, ≥ 1; default 1 */
  cellsAlong?: number;
  /** grid cells across each rectangle, ≥ 1; default 1 */
  cellsAcross?: number;
}

/**
 * Two rectangles meeting at a crease on the x axis. The first lies in z = 0 for y ∈ [−depth, 0] with normal +z;
 * the second leaves the crease at the given dihedral angle. Crease vertices are shared (one mesh, one component).
 * Vertex (column i along x, row r across from y = −depth) = r·(cellsAlong + 1) + i; the crease is row cellsAcross.
 */
export function foldedSheet(opts: FoldedSheetOptions): TriMesh {
  const { width, depth, dihedralDeg, fold } = opts;
  const nx = opts.cellsAlong ?? 1;
  const ny = opts.cellsAcross ?? 1;
  requirePositive("width", width);
  requirePositive("depth", depth);
  requireInteger("cellsAlong", nx, 1);
  requireInteger("cellsAcross", ny, 1);
  if (!(dihedralDeg > 0 && dihedralDeg <= 180)) {
    throw new GeometryError("BAD_PARAMETER", `dihedralDeg must be in (0, 180] degrees (got ${dihedralDeg}).`);
  }
  const turn = Math.PI - (dihedralDeg * Math.PI) / 180;
  const sign = fold === "up" ? 1 : -1;
  const rows = 2 * ny + 1;
  const cols = nx + 1;
  const positions = new Float64Array(3 * rows * cols);
  for (let r = 0; r < rows; r++) {
    const t = ((r - ny) / ny) * depth;
    for (let i = 0; i < cols; i++) {
      const v = r * cols + i;
      positions[3 * v] = (i / nx) * width;
      if (t <= 0) {
        positions[3 * v + 1] = t;
      } else {
        positions[3 * v + 1] = t * Math.cos(turn);
        positions[3 * v + 2] = sign * t * Math.sin(turn);
      }
    }
  }
  const triangles = new Uint32Array(6 * nx * 2 * ny);
  let f = 0;
  for (let r = 0; r < rows - 1; r++) {
    for (let i = 0; i < nx; i++) {
      const a = r * cols + i, b = a + 1, c = a + cols + 1, d = a + cols;
      triangles[f++] = a; triangles[f++] = b; triangles[f++] = c;
      triangles[f++] = a; triangles[f++] = c; triangles[f++] = d;
    }
  }
  return { positions, triangles };
}
