import type { FlattenResponse } from "@/lib/jobs/compute-messages";
import { getSequelize } from "@/lib/db/sequelize";
import type { PaperId } from "@/lib/patterns/paper-sizes";
import { putObject } from "@/lib/storage/s3";
import { encodeHeatmap } from "@/lib/scans/mesh-binary";
import { patternKeys } from "@/lib/scans/storage-keys";
import { Pattern, PatternPiece } from "@/models";
import type { PatternFiles } from "@/models/pattern";
import type { PieceDetails } from "@/models/pattern-piece";

/**
 * Writes a flatten result so that running it twice (a retried or re-taken job) leaves exactly one copy:
 * 1. objects under keys derived from the pattern id and piece labels (a second run overwrites them);
 * 2. one transaction that locks the pattern row, deletes any pieces an earlier run of this pattern stored, inserts
 *    the pieces (unique per pattern + label) and marks the pattern ready. Two runs that race serialise on the lock;
 *    whichever commits last leaves the same rows.
 * @returns false when the pattern row is gone (deleted meanwhile)
 */
export async function storeFlattenResult(patternId: string, result: FlattenResponse, paper: PaperId): Promise<boolean> {
  const keys = patternKeys(patternId);
  const { pieces: reportPieces, ...summary } = result.report;
  await putObject(keys.report, JSON.stringify(result.report, null, 2), { contentType: "application/json" });
  await putObject(keys.svg, result.svg, { contentType: "image/svg+xml" });
  await putObject(keys.pdf(paper), Buffer.from(result.pdf), { contentType: "application/pdf" });
  const heatmapKeys: (string | null)[] = [];
  for (const piece of result.pieces) {
    if (!piece.flattenable || !piece.uv || !piece.triangleS1 || !piece.triangleS2) {
      heatmapKeys.push(null);
      continue;
    }
    const key = keys.heatmap(piece.label);
    await putObject(key, encodeHeatmap({ uv: piece.uv, triangles: piece.triangles, s1: piece.triangleS1, s2: piece.triangleS2, faces: piece.faces }));
    heatmapKeys.push(key);
  }
  const files: PatternFiles = { report: keys.report, svg: keys.svg, pdf: keys.pdf(paper), pdfPaper: paper, assembly: null };

  return getSequelize().transaction(async (transaction) => {
    const pattern = await Pattern.findByPk(patternId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!pattern) return false;
    await PatternPiece.destroy({ where: { patternId }, transaction });
    await PatternPiece.bulkCreate(
      reportPieces.map((p, i) => {
        const { label, flattenable, problem, metrics, outline, bevels, ticks, ...details } = p;
        return {
          patternId,
          label,
          position: i,
          flattenable,
          problem,
          metrics,
          outline,
          bevels,
          ticks,
          details: details as PieceDetails,
          heatmapKey: heatmapKeys[i],
        };
      }),
      { transaction },
    );
    await pattern.update(
      { status: "ready", error: null, report: summary as unknown as Record<string, unknown>, files, completedAt: new Date() },
      { transaction },
    );
    return true;
  });
}
