import type { TriMesh } from "@/lib/geometry/mesh";

export type Vec3 = [number, number, number];

/** One click on the surface: the nearest corner of the hit triangle and the exact hit point. */
export interface SurfacePick {
  /** working vertex id (the ids of the seam API) */
  vertex: number;
  /** working face id */
  face: number;
  point: Vec3;
  /** time spent in the BVH raycast, milliseconds (performance.now) */
  ms: number;
}

export interface LineLayer {
  id: string;
  /** 6 per segment, scan units */
  positions: Float32Array;
  color: string;
  width: number;
  dashed?: boolean;
  /** drawn through the surface (for highlights that must show from any side) */
  onTop?: boolean;
}

export interface PieceTag {
  key: string;
  position: Vec3;
  text: string;
  flagged: boolean;
}

export interface ScanViewerProps {
  mesh: TriMesh;
  /** working face → piece index (−1 none); null before the first cut */
  facePiece: Int32Array | null;
  lines: LineLayer[];
  tags: PieceTag[];
  /** small spheres at picked points (measure ends, the open seam's last point) */
  markers: { position: Vec3; color: string }[];
  mirror: { axis: "x" | "y" | "z"; offset: number } | null;
  wireframe: boolean;
  /** change to re-fit the camera to the scan */
  fitKey: number;
  picking: boolean;
  onPick: (pick: SurfacePick) => void;
}
