import type { TriMesh } from "@/lib/geometry/mesh";
import type { PipelineReport } from "@/lib/geometry/pipeline/flatten-mesh";
import type { PatternInput, PatternMeta } from "@/lib/patterns/pattern-input";

/**
 * The input of the pattern document writers (lib/patterns renderPatternPdf / renderPatternSvg) for a flatten
 * result: the report, the project metadata and the working mesh with its face → piece map for the assembly
 * views. One function, so the worker and the CLI draw the same documents from the same result.
 */
export function patternDocumentInput(report: PipelineReport, facePiece: Int32Array, mesh: TriMesh, meta: PatternMeta): PatternInput {
  return {
    report,
    meta,
    assembly: { positions: mesh.positions, triangles: mesh.triangles, facePiece, labels: report.pieces.map((p) => p.label) },
  };
}
