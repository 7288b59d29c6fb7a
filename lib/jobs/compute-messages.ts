import type { LengthUnit } from "@/lib/geometry/mesh";
import type { MeshReport } from "@/lib/geometry/report-types";
import type { FlattenOptionsInput } from "@/lib/geometry/pipeline/flatten-options";
import type { FlattenedPiece, PipelineReport } from "@/lib/geometry/pipeline/flatten-mesh";
import type { PaperId } from "@/lib/patterns/paper-sizes";
import type { PatternMeta } from "@/lib/patterns/pattern-input";

/** Messages between a job processor and its compute thread (lib/jobs/compute-thread.ts). */
export interface IntakeRequest {
  kind: "intake";
  bytes: Uint8Array;
  units: LengthUnit;
}
export interface IntakeResponse {
  report: MeshReport;
  positions: Float64Array;
  triangles: Uint32Array;
  inputToWorking: Uint32Array;
}

export interface FlattenRequest {
  kind: "flatten";
  positions: Float64Array;
  triangles: Uint32Array;
  inputToWorking: Uint32Array;
  meshReport: MeshReport;
  /** input-file vertex pairs of the seam map (resolved in the thread) */
  seams: [number, number][];
  options: FlattenOptionsInput;
  meta: PatternMeta;
  paper: PaperId;
  overlapMm: number;
}
export interface FlattenResponse {
  report: PipelineReport;
  pieces: FlattenedPiece[];
  facePiece: Int32Array;
  svg: string;
  pdf: Uint8Array;
}

export type ComputeRequest = IntakeRequest | FlattenRequest;

export type ThreadMessage =
  | { type: "progress"; step: string; fraction: number }
  | { type: "result"; result: IntakeResponse | FlattenResponse }
  /** geometry: the input is bad (retrying cannot help); otherwise a crash worth retrying */
  | { type: "error"; geometry: boolean; code: string; message: string };
