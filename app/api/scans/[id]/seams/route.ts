import { route } from "@/lib/api/route-handler";
import { AppError } from "@/lib/errors/app-error";
import { findScan } from "@/lib/scans/scans";
import { findSeamMap, saveSeamMap, toSeamMapDto } from "@/lib/seam-maps/seam-maps";
import { scanParamsSchema, seamsBodySchema, SEAMS_MAX_BODY_BYTES } from "@/lib/validations/scans";

/** The latest seam map of the scan. */
export const GET = route({ action: "project:read", params: scanParamsSchema }, async ({ session, params }) => {
  const scan = await findScan(session.shop.id, params.id);
  const map = await findSeamMap(scan.id);
  if (!map) throw new AppError("NOT_FOUND", "This scan has no saved seams yet.");
  return toSeamMapDto(map);
});

/** Saves the seams as a new version (earlier versions stay) and answers the pieces they make. */
export const PUT = route(
  { action: "seams:edit", params: scanParamsSchema, body: seamsBodySchema, maxBodyBytes: SEAMS_MAX_BODY_BYTES },
  async ({ session, params, body }) => saveSeamMap(session.shop.id, session.user.id, params.id, body.seams.map(([i, j]) => [i, j] as [number, number])),
);
