import { route } from "@/lib/api/route-handler";
import { getPatternDto } from "@/lib/patterns-store/patterns";
import { patternParamsSchema } from "@/lib/validations/patterns";

/** The pattern with parameters, pieces (the CLI report's fields), review status and history. */
export const GET = route({ action: "pattern:read-approved", params: patternParamsSchema }, async ({ session, params }) =>
  getPatternDto({ shopId: session.shop.id, role: session.role }, params.id),
);
