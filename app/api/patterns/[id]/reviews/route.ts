import { route } from "@/lib/api/route-handler";
import { json } from "@/lib/api/responses";
import { decideReview } from "@/lib/reviews/reviews";
import { patternParamsSchema, reviewBodySchema } from "@/lib/validations/patterns";

/** A review decision: approve, or request changes (comment required). Answers the pattern with its history. */
export const POST = route({ action: "review:decide", params: patternParamsSchema, body: reviewBodySchema }, async ({ session, params, body }) =>
  json(await decideReview({ shopId: session.shop.id, role: session.role }, session.user.id, params.id, body), { status: 201 }),
);
