import { route } from "@/lib/api/route-handler";
import { json } from "@/lib/api/responses";
import { queueSettings } from "@/lib/jobs/queue-settings";
import { listScans, uploadScan } from "@/lib/scans/scans";
import { projectParamsSchema } from "@/lib/validations/projects";

export const GET = route({ action: "project:read", params: projectParamsSchema }, async ({ session, params }) => ({
  scans: await listScans(session.shop.id, params.id),
}));

/** Multipart upload (`file`, `units`), streamed to a size-capped temp file, then to S3; intake is queued. */
export const POST = route({ action: "scan:upload", params: projectParamsSchema }, async ({ req, session, params }) =>
  json(await uploadScan(req, session.shop.id, session.user.id, params.id, queueSettings().SCAN_MAX_BYTES), { status: 201 }),
);
