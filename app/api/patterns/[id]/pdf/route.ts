import { route } from "@/lib/api/route-handler";
import { downloadResponse, patternPdf } from "@/lib/patterns-store/documents";
import { findPattern } from "@/lib/patterns-store/patterns";
import { pdfQuerySchema } from "@/lib/validations/flatten";
import { patternParamsSchema } from "@/lib/validations/patterns";

/** The true-scale PDF, ?paper=letter|a4|a3|tabloid|full (default: the paper chosen when it was queued). */
export const GET = route({ action: "pattern:download", params: patternParamsSchema, query: pdfQuerySchema }, async ({ session, params, query }) =>
  downloadResponse(await patternPdf(await findPattern({ shopId: session.shop.id, role: session.role }, params.id), query.paper)),
);
