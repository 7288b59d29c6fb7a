import { AppError } from "@/lib/errors/app-error";
import { getSequelize } from "@/lib/db/sequelize";
import { getPatternDto, findPattern, type Viewer } from "@/lib/patterns-store/patterns";
import type { PatternDto } from "@/lib/patterns-store/pattern-dto";
import { STATUS_AFTER } from "@/lib/reviews/review-decisions";
import type { ReviewBody } from "@/lib/validations/patterns";
import { Pattern, PatternReview } from "@/models";

/**
 * POST /api/patterns/[id]/reviews: records a decision and sets the pattern's reviewStatus from it, in one
 * transaction with the pattern row locked (two reviewers at once: the later decision wins, both stay in history).
 * Only finished patterns can be reviewed.
 */
export async function decideReview(viewer: Viewer, reviewerId: string, patternId: string, body: ReviewBody): Promise<PatternDto> {
  const p = await findPattern(viewer, patternId);
  if (p.status !== "ready") throw new AppError("CONFLICT", "Only a finished pattern can be reviewed; wait until it is ready.");
  await getSequelize().transaction(async (transaction) => {
    const locked = await Pattern.findByPk(p.id, { transaction, lock: transaction.LOCK.UPDATE });
    if (!locked) throw new AppError("NOT_FOUND", "No such pattern in this shop.");
    await PatternReview.create({ patternId: p.id, reviewerId, decision: body.decision, comment: body.comment ?? null }, { transaction });
    await locked.update({ reviewStatus: STATUS_AFTER[body.decision] }, { transaction });
  });
  return getPatternDto(viewer, p.id);
}
