import { route } from "@/lib/api/route-handler";
import { getScanDto } from "@/lib/scans/scans";
import { scanParamsSchema } from "@/lib/validations/scans";

export const GET = route({ action: "project:read", params: scanParamsSchema }, async ({ session, params }) =>
  getScanDto(session.shop.id, params.id),
);
