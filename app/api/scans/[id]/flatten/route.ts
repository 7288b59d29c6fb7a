import { route } from "@/lib/api/route-handler";
import { json } from "@/lib/api/responses";
import { queueFlatten } from "@/lib/patterns-store/patterns";
import { flattenParamsSchema } from "@/lib/validations/flatten";
import { scanParamsSchema } from "@/lib/validations/scans";

/** Queues a flatten of the scan: 202 { jobId, patternId }; follow it at GET /api/jobs/[jobId]. */
export const POST = route({ action: "flatten:run", params: scanParamsSchema, body: flattenParamsSchema }, async ({ session, params, body }) =>
  json(await queueFlatten(session.shop.id, session.user.id, params.id, body), { status: 202 }),
);
