import { route } from "@/lib/api/route-handler";
import { downloadResponse, patternSvg } from "@/lib/patterns-store/documents";
import { findPattern } from "@/lib/patterns-store/patterns";
import { patternParamsSchema } from "@/lib/validations/patterns";

/** The pattern sheet as true-size SVG. */
export const GET = route({ action: "pattern:download", params: patternParamsSchema }, async ({ session, params }) =>
  downloadResponse(await patternSvg(await findPattern({ shopId: session.shop.id, role: session.role }, params.id))),
);
