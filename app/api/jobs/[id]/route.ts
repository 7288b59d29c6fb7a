import { route } from "@/lib/api/route-handler";
import { flattenJobStatus } from "@/lib/jobs/job-status";
import { findPattern } from "@/lib/patterns-store/patterns";
import { jobParamsSchema } from "@/lib/validations/patterns";

/** State and progress of a flatten job (its id is the pattern's id). */
export const GET = route({ action: "pattern:read", params: jobParamsSchema }, async ({ session, params }) => {
  const { id: _id, ...status } = await flattenJobStatus(await findPattern({ shopId: session.shop.id, role: session.role }, params.id));
  return status;
});
