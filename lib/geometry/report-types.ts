/**
 * The flatten report: the contract between the geometry core, the CLI (`npm run flatten -- … --json`), the worker,
 * the API (`GET /api/patterns/[id]`) and the pattern documents (PDF, SVG). JSON-serialisable plain data.
 *
 * All lengths are in `units` at final scale (after thickness compensation and scaling); areas in units²;
 * 2D coordinates are the layout coordinates of the pattern sheet (x right, y up), in `units`.
 */
import type { LengthUnit } from "./mesh";

/** Distortion of a flattened piece, from the singular values s1 ≥ s2 of each triangle's 3D→2D Jacobian. */
export interface StretchMetrics {
  /** max(s1) − 1 */
  maxStretch: number;
  /** area-weighted 95th percentile of s1 − 1 */
  p95Stretch: number;
  /** 1 − min(s2) */
  maxCompress: number;
  /** area-weighted mean of s1/s2 (1 = conformal) */
  meanConformal: number;
  /** max of s1/s2 */
  maxConformal: number;
  /** triangles whose 2D image has negative signed area */
  flippedTriangles: number;
}

export interface SolverStats {
  converged: boolean;
  iterations: number;
  /** relative residual ‖b − Ax‖ / ‖b‖ at exit (linear solvers) or final energy (refinement) */
  residual: number;
  ms: number;
}

/** Registration tick: a short mark across the seam, at matching arc-length positions on both pieces of a run. */
export interface Tick {
  /** seam run id (shared by the two pieces of the run) */
  run: number;
  /** 1-based number of the tick along its run; the same number on both pieces */
  number: number;
  /** position on the outline, layout coordinates */
  x: number;
  y: number;
  /** unit inward normal of the outline at the tick (the mark is drawn from the edge into the piece) */
  nx: number;
  ny: number;
}

/** One seam run of a piece: consecutive seam edges shared with the same neighbour piece. */
export interface BevelRun {
  /** seam run id, the same on both pieces that share it */
  run: number;
  /** label of the piece on the other side of the seam */
  neighbor: string;
  /** length along the seam, units at final scale */
  length: number;
  /** mean dihedral angle, degrees, measured on the outside of the foam (180 = flat) */
  dihedralDeg: number;
  /** bevel per side = (180 − dihedral) / 2, degrees (signed magnitude; see kind) */
  bevelDeg: number;
  /** ridge: the surface folds away from the outside (convex); valley: concave; straight: cut square */
  kind: "ridge" | "valley" | "straight";
  /** which face of the foam the bevel's wider cut opens to */
  opensTo: "outer" | "inner" | "none";
  /** polyline of the run on this piece's outline, layout coordinates, from start to end */
  path: [number, number][];
}

export interface PieceReport {
  /** A, B, … Z, AA, AB, … in a stable order */
  label: string;
  faces: number;
  vertices: number;
  flattenable: boolean;
  /** one sentence telling the designer what to do, when not flattenable */
  problem: string | null;
  /** a suggested cut (mesh vertex index pairs, input-file order) that would make the piece a disk */
  suggestedCut: [number, number][] | null;
  area3d: number;
  area2d: number;
  boundaryLength3d: number;
  boundaryLength2d: number;
  metrics: StretchMetrics | null;
  lscmMetrics: StretchMetrics | null;
  solver: { lscm: SolverStats | null; refine: SolverStats | null };
  /** outer boundary as laid out, counter-clockwise, layout coordinates (not closed: last ≠ first) */
  outline: [number, number][];
  /** placement of this piece on the layout sheet */
  placement: { x: number; y: number; rotationDeg: number; width: number; height: number };
  bevels: BevelRun[];
  ticks: Tick[];
  /** how many to cut, and whether one of them is a mirror image (a mirror plane was given) */
  count: number;
  mirrored: boolean;
}

export interface FlattenReport {
  units: LengthUnit;
  /** linear factor from scan size to final size, and as a percentage */
  scale: { factor: number; percent: number; targetWidth: number | null };
  /** which surface was flattened (thickness compensation) */
  surface: { kind: "scan" | "neutral"; thickness: number; scanFace: "outer" | "inner"; k: number; offset: number };
  mesh: MeshReport;
  pieces: PieceReport[];
  warnings: string[];
  timing: { parseMs: number; flattenMs: number; totalMs: number };
}

/** Intake report of a parsed and welded mesh. */
export interface MeshReport {
  format: "obj" | "stl-ascii" | "stl-binary";
  units: LengthUnit;
  /** counts in the file as read */
  inputVertices: number;
  inputFaces: number;
  /** counts after welding and cleaning (the working mesh, before decimation) */
  vertices: number;
  faces: number;
  weldedVertices: number;
  droppedDegenerateFaces: number;
  droppedDuplicateFaces: number;
  components: number;
  boundaryLoops: number;
  nonManifoldEdges: number;
  eulerCharacteristic: number;
  bbox: { min: [number, number, number]; max: [number, number, number]; size: [number, number, number] };
  /** present when the mesh was over the face budget and a decimated working copy was made */
  decimated: { faceBudget: number; originalFaces: number; workingFaces: number; workingVertices: number; maxError: number } | null;
}
