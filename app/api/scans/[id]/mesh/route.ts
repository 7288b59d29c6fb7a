import { route } from "@/lib/api/route-handler";
import { AppError } from "@/lib/errors/app-error";
import { findScan } from "@/lib/scans/scans";
import { getObjectBuffer } from "@/lib/storage/s3";
import { scanParamsSchema } from "@/lib/validations/scans";

/** The working mesh for the viewer: the compact binary of lib/scans/mesh-binary.ts (Float32 positions, Uint32 faces). */
export const GET = route({ action: "project:read", params: scanParamsSchema }, async ({ session, params }) => {
  const scan = await findScan(session.shop.id, params.id);
  if (scan.status !== "ready" || !scan.workingKey) {
    throw new AppError("CONFLICT", scan.status === "failed" ? `This scan could not be read: ${scan.error ?? ""}`.trim() : "This scan is still being processed.");
  }
  const body = await getObjectBuffer(scan.workingKey);
  if (!body) throw new Error(`working mesh of scan ${scan.id} is missing from storage`);
  return new Response(new Uint8Array(body), {
    headers: {
      "content-type": "application/octet-stream",
      "content-length": String(body.byteLength),
      "cache-control": "private, max-age=3600",
    },
  });
});
