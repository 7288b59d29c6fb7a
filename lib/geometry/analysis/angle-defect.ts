/**
 * Angle defect (discrete Gaussian curvature) per vertex and in total.
 *
 * Interior vertex: 2π − Σ incident corner angles. Boundary vertex: π − Σ incident corner angles (the geodesic
 * turning of the boundary there). By the discrete Gauss–Bonnet theorem the total equals 2π·χ for any triangle mesh
 * that is a manifold surface, with or without boundary. Source: M. Meyer, M. Desbrun, P. Schröder, A. H. Barr,
 * "Discrete Differential-Geometry Operators for Triangulated 2-Manifolds", VisMath 2002, §5 (Gauss–Bonnet,
 * ∑ (2π − Σθ) = 2πχ); Botsch et al., "Polygon Mesh Processing", 2010, §3.3.
 */
import type { TriMesh } from "../mesh";
import { buildEdgeTable } from "./edge-table";

export interface AngleDefect {
  /** #V defect per vertex, radians (0 for unreferenced vertices) */
  perVertex: Float64Array;
  /** Σ perVertex, radians */
  total: number;
  /** vertices on at least one boundary edge */
  boundaryVertices: number;
}

/** @param mesh  positions in any length unit (angles do not depend on it) */
export function angleDefect(mesh: TriMesh): AngleDefect {
  const { positions: p, triangles: t } = mesh;
  const vertexCount = p.length / 3;
  const angleSum = new Float64Array(vertexCount);
  const used = new Uint8Array(vertexCount);
  for (let f = 0; f < t.length; f += 3) {
    for (let k = 0; k < 3; k++) {
      const v = t[f + k], a = t[f + ((k + 1) % 3)], b = t[f + ((k + 2) % 3)];
      const ux = p[3 * a] - p[3 * v], uy = p[3 * a + 1] - p[3 * v + 1], uz = p[3 * a + 2] - p[3 * v + 2];
      const wx = p[3 * b] - p[3 * v], wy = p[3 * b + 1] - p[3 * v + 1], wz = p[3 * b + 2] - p[3 * v + 2];
      const cx = uy * wz - uz * wy, cy = uz * wx - ux * wz, cz = ux * wy - uy * wx;
      // atan2(|u×w|, u·w) is accurate for angles near 0 and π, where acos of a normalised dot product is not.
      angleSum[v] += Math.atan2(Math.hypot(cx, cy, cz), ux * wx + uy * wy + uz * wz);
      used[v] = 1;
    }
  }
  const table = buildEdgeTable(t, vertexCount);
  const boundary = new Uint8Array(vertexCount);
  for (let e = 0; e < table.edgeCount; e++) {
    if (table.edgeFaces[e] === 1) {
      boundary[table.edgeLo[e]] = 1;
      boundary[table.edgeHi[e]] = 1;
    }
  }
  const perVertex = new Float64Array(vertexCount);
  let total = 0;
  let boundaryVertices = 0;
  for (let v = 0; v < vertexCount; v++) {
    if (used[v] === 0) continue;
    if (boundary[v] === 1) boundaryVertices++;
    const d = (boundary[v] === 1 ? Math.PI : 2 * Math.PI) - angleSum[v];
    perVertex[v] = d;
    total += d;
  }
  return { perVertex, total, boundaryVertices };
}
