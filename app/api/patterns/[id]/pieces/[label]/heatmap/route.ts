import { z } from "zod";
import { route } from "@/lib/api/route-handler";
import { AppError } from "@/lib/errors/app-error";
import { findPattern } from "@/lib/patterns-store/patterns";
import { getObjectBuffer } from "@/lib/storage/s3";
import { patternParamsSchema } from "@/lib/validations/patterns";
import { PatternPiece } from "@/models";

/** Route params of this handler: the pattern id and a piece label (A…Z, AA…, as cut-pieces names them). */
const pieceParamsSchema = patternParamsSchema.extend({ label: z.string().regex(/^[A-Z]{1,4}$/, { error: "Piece label must be capital letters." }) });

/**
 * One flattened piece's stretch heat map: the PFHEAT1 binary of lib/scans/mesh-binary.ts (laid-out uv, triangles,
 * per-triangle s1/s2 and the working face ids). Visible exactly like the pattern (fabricators: approved only).
 */
export const GET = route({ action: "pattern:read-approved", params: pieceParamsSchema }, async ({ session, params }) => {
  const pattern = await findPattern({ shopId: session.shop.id, role: session.role }, params.id);
  const piece = await PatternPiece.findOne({ where: { patternId: pattern.id, label: params.label }, attributes: ["id", "heatmapKey", "flattenable"] });
  if (!piece) throw new AppError("NOT_FOUND", `This pattern has no piece ${params.label}.`);
  if (!piece.heatmapKey) throw new AppError("NOT_FOUND", `Piece ${params.label} was not flattened, so it has no stretch map.`);
  const body = await getObjectBuffer(piece.heatmapKey);
  if (!body) throw new Error(`heat map of pattern ${pattern.id} piece ${params.label} is missing from storage`);
  return new Response(new Uint8Array(body), {
    headers: {
      "content-type": "application/octet-stream",
      "content-length": String(body.byteLength),
      "cache-control": "private, max-age=3600",
    },
  });
});
