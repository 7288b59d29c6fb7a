import { Op, type WhereOptions } from "sequelize";
import { AppError } from "@/lib/errors/app-error";
import { isGeometryError } from "@/lib/geometry/errors";
import { parseFlattenOptions } from "@/lib/geometry/pipeline/flatten-options";
import { getSequelize } from "@/lib/db/sequelize";
import { enqueueFlatten } from "@/lib/jobs/queues";
import { can } from "@/lib/permissions/permissions";
import type { Role } from "@/lib/permissions/roles";
import { findProject } from "@/lib/projects/projects";
import { findScan } from "@/lib/scans/scans";
import { findSeamMap } from "@/lib/seam-maps/seam-maps";
import type { FlattenParams } from "@/lib/validations/flatten";
import { flattenOptionsFromParams } from "@/lib/patterns-store/flatten-options-from-params";
import { toPatternDto, type PatternDto, type PatternSummaryDto } from "@/lib/patterns-store/pattern-dto";
import { Pattern, PatternPiece, PatternReview, User } from "@/models";

/** Who is asking: fabricators (no pattern:read) see approved, finished patterns only; others 404 for them. */
export interface Viewer {
  shopId: string;
  role: Role;
}

function visibleWhere(viewer: Viewer): WhereOptions<Pattern> {
  return can(viewer.role, "pattern:read")
    ? { shopId: viewer.shopId }
    : { shopId: viewer.shopId, reviewStatus: "approved", status: "ready" };
}

/** A pattern the viewer may see; anything else (another shop's, unknown, not approved for a fabricator) is 404. */
export async function findPattern(viewer: Viewer, id: string): Promise<Pattern> {
  getSequelize();
  const p = await Pattern.findOne({ where: { ...visibleWhere(viewer), id } as WhereOptions<Pattern> });
  if (!p) throw new AppError("NOT_FOUND", "No such pattern in this shop.");
  return p;
}

export async function getPatternDto(viewer: Viewer, id: string): Promise<PatternDto> {
  const p = await findPattern(viewer, id);
  const [pieces, reviews] = await Promise.all([
    PatternPiece.findAll({ where: { patternId: p.id } }),
    PatternReview.findAll({ where: { patternId: p.id }, include: [{ model: User, as: "reviewer", attributes: ["id", "name"] }] }),
  ]);
  return toPatternDto(p, pieces, reviews);
}

/** Patterns of a project the viewer may see, newest first. */
export async function listPatterns(viewer: Viewer, projectId: string): Promise<PatternSummaryDto[]> {
  await findProject(viewer.shopId, projectId);
  const rows = await Pattern.findAll({ where: { ...visibleWhere(viewer), projectId } as WhereOptions<Pattern>, order: [["createdAt", "DESC"]] });
  const counts = rows.length
    ? ((await PatternPiece.findAll({
        attributes: ["patternId", [getSequelize().fn("COUNT", getSequelize().col("id")), "n"]],
        where: { patternId: { [Op.in]: rows.map((r) => r.id) } },
        group: ["patternId"],
        raw: true,
      })) as unknown as { patternId: string; n: string }[])
    : [];
  const countOf = new Map(counts.map((c) => [c.patternId, Number(c.n)]));
  return rows.map((r) => {
    const { pieces: _p, reviews: _r, ...rest } = toPatternDto(r, [], []);
    return { ...rest, pieceCount: countOf.get(r.id) ?? 0 };
  });
}

/**
 * POST /api/scans/[id]/flatten: checks the scan is ready, picks the seam-map version (default the latest), checks
 * the options the geometry core will see, creates the pattern row ("queued") and queues the job (job id = pattern
 * id). The job payload is `{ patternId }` only.
 */
export async function queueFlatten(shopId: string, userId: string, scanId: string, params: FlattenParams): Promise<{ jobId: string; patternId: string }> {
  const scan = await findScan(shopId, scanId);
  if (scan.status !== "ready") {
    throw new AppError("CONFLICT", scan.status === "failed" ? `This scan could not be read, so it cannot be flattened: ${scan.error ?? ""}`.trim() : "This scan is still being processed; flatten it once it is ready.");
  }
  const seamMap = await findSeamMap(scan.id, params.seamMapVersion);
  try {
    parseFlattenOptions(flattenOptionsFromParams(params));
  } catch (e) {
    if (isGeometryError(e)) throw new AppError("VALIDATION", e.message);
    throw e;
  }
  const pattern = await Pattern.create({
    shopId,
    projectId: scan.projectId,
    scanId: scan.id,
    seamMapId: seamMap?.id ?? null,
    seamMapVersion: seamMap?.version ?? null,
    createdById: userId,
    params: { ...params, seamMapVersion: seamMap?.version ?? undefined },
    status: "queued",
  });
  try {
    await enqueueFlatten(pattern.id);
  } catch (e) {
    await pattern.update({ status: "failed", error: "The pattern could not be queued; try again." });
    throw e;
  }
  return { jobId: pattern.id, patternId: pattern.id };
}
