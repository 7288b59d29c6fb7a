import { route } from "@/lib/api/route-handler";
import { downloadResponse, patternReportJson } from "@/lib/patterns-store/documents";
import { findPattern } from "@/lib/patterns-store/patterns";
import { patternParamsSchema } from "@/lib/validations/patterns";

/** The full flatten report (the JSON the CLI writes). */
export const GET = route({ action: "pattern:download", params: patternParamsSchema }, async ({ session, params }) =>
  downloadResponse(await patternReportJson(await findPattern({ shopId: session.shop.id, role: session.role }, params.id))),
);
