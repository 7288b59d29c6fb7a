import { AppError } from "@/lib/errors/app-error";

/** Default body limit for JSON routes: 64 KiB is far above any form in the app. */
export const DEFAULT_MAX_BODY_BYTES = 64 * 1024;

/**
 * Reads a JSON request body with a hard byte limit. Content-Length is only a shortcut for an early refusal; the
 * stream itself is counted, so a missing or false header does not let a larger body through.
 * @throws AppError PAYLOAD_TOO_LARGE (413) over the limit, BAD_JSON (400) for empty, non-UTF-8 or malformed JSON.
 */
export async function readJsonBody(req: Request, maxBytes = DEFAULT_MAX_BODY_BYTES): Promise<unknown> {
  const tooLarge = () =>
    new AppError("PAYLOAD_TOO_LARGE", `Request body is larger than the limit of ${formatBytes(maxBytes)}.`);

  const declared = req.headers.get("content-length");
  if (declared !== null && /^\d+$/.test(declared) && Number(declared) > maxBytes) throw tooLarge();

  const chunks: Uint8Array[] = [];
  let total = 0;
  if (req.body) {
    const reader = req.body.getReader();
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      total += value.byteLength;
      if (total > maxBytes) {
        await reader.cancel().catch(() => {});
        throw tooLarge();
      }
      chunks.push(value);
    }
  }
  if (total === 0) throw new AppError("BAD_JSON", "Request body is empty: send a JSON object.");

  const bytes = new Uint8Array(total);
  let offset = 0;
  for (const c of chunks) {
    bytes.set(c, offset);
    offset += c.byteLength;
  }
  let text: string;
  try {
    text = new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    throw new AppError("BAD_JSON", "Request body is not valid UTF-8 text.");
  }
  try {
    return JSON.parse(text) as unknown;
  } catch (err) {
    throw new AppError("BAD_JSON", `Request body is not valid JSON (${(err as Error).message}).`);
  }
}

function formatBytes(n: number): string {
  return n >= 1024 * 1024 ? `${(n / 1024 / 1024).toFixed(0)} MiB` : n >= 1024 ? `${(n / 1024).toFixed(0)} KiB` : `${n} bytes`;
}
