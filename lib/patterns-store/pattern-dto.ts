import type { PipelinePieceReport } from "@/lib/geometry/pipeline/flatten-mesh";
import type { FlattenParams } from "@/lib/validations/flatten";
import type { ReviewDecision, ReviewStatus } from "@/lib/reviews/review-decisions";
import type { Pattern, PatternPiece, PatternReview } from "@/models";
import type { PatternStatus } from "@/models/pattern";

export interface PatternReviewDto {
  id: string;
  decision: ReviewDecision;
  comment: string | null;
  reviewer: { id: string; name: string } | null;
  createdAt: string;
}

/** The API shape of a pattern (GET /api/patterns/[id]); `pieces` have the fields of the CLI's JSON report. */
export interface PatternDto {
  id: string;
  projectId: string;
  scanId: string;
  seamMapVersion: number | null;
  /** the flatten job's id (the same as the pattern's) */
  jobId: string;
  status: PatternStatus;
  error: string | null;
  reviewStatus: ReviewStatus;
  params: FlattenParams;
  /** the report without its pieces (units, scale, surface, mesh, warnings, timing); null until ready */
  report: Record<string, unknown> | null;
  pieces: PipelinePieceReport[];
  reviews: PatternReviewDto[];
  downloads: { pdf: string; svg: string; json: string } | null;
  createdAt: string;
  completedAt: string | null;
}

/** A stored piece row back in the report's shape. */
export function pieceRowToReport(p: PatternPiece): PipelinePieceReport {
  return {
    label: p.label,
    ...p.details,
    flattenable: p.flattenable,
    problem: p.problem,
    metrics: p.metrics,
    outline: p.outline,
    bevels: p.bevels,
    ticks: p.ticks,
  };
}

export function toReviewDto(r: PatternReview): PatternReviewDto {
  return {
    id: r.id,
    decision: r.decision,
    comment: r.comment ?? null,
    reviewer: r.reviewer ? { id: r.reviewer.id, name: r.reviewer.name } : null,
    createdAt: r.createdAt.toISOString(),
  };
}

/** Summary for list entries (no pieces or reviews). */
export type PatternSummaryDto = Omit<PatternDto, "pieces" | "reviews"> & { pieceCount: number };

export function toPatternDto(p: Pattern, pieces: PatternPiece[], reviews: PatternReview[]): PatternDto {
  const base = `/api/patterns/${p.id}`;
  return {
    id: p.id,
    projectId: p.projectId,
    scanId: p.scanId,
    seamMapVersion: p.seamMapVersion ?? null,
    jobId: p.id,
    status: p.status,
    error: p.error ?? null,
    reviewStatus: p.reviewStatus,
    params: p.params,
    report: p.report ?? null,
    pieces: [...pieces].sort((a, b) => a.position - b.position).map(pieceRowToReport),
    reviews: [...reviews].sort((a, b) => a.createdAt.getTime() - b.createdAt.getTime()).map(toReviewDto),
    downloads: p.status === "ready" ? { pdf: `${base}/pdf`, svg: `${base}/svg`, json: `${base}/json` } : null,
    createdAt: p.createdAt.toISOString(),
    completedAt: p.completedAt ? p.completedAt.toISOString() : null,
  };
}
