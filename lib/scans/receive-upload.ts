import { randomBytes } from "node:crypto";
import { createWriteStream } from "node:fs";
import { mkdtemp, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { Readable } from "node:stream";
import type { ReadableStream as NodeWebStream } from "node:stream/web";
import busboy from "busboy";
import { AppError } from "@/lib/errors/app-error";

/** Bytes of the start of the file kept in memory for the content check. */
export const PROBE_BYTES = 1 << 16;

export interface ReceivedUpload {
  /** temp file holding the whole upload (delete with cleanup()) */
  filePath: string;
  /** the client's file name, without folders (for people only) */
  fileName: string;
  byteSize: number;
  /** the first PROBE_BYTES bytes (or the whole file when smaller) */
  probe: Uint8Array;
  /** text fields of the form */
  fields: Record<string, string>;
  cleanup: () => Promise<void>;
}

function formatLimit(n: number): string {
  return n >= 1024 * 1024 ? `${Math.round(n / 1024 / 1024)} MiB` : `${Math.round(n / 1024)} KiB`;
}

/**
 * Streams a multipart/form-data upload (one file part named `file`, small text fields) to a temp file, counting
 * bytes as they arrive: over `maxBytes` the upload is cut off and refused with 413, whether or not Content-Length
 * told the truth. Spooling to disk (rather than piping into S3 directly) lets the caller check the content before
 * storing it and give PutObject the exact ContentLength the S3 API needs for a streamed body.
 * @throws AppError PAYLOAD_TOO_LARGE over the limit; VALIDATION for a request that is not such a form
 */
export async function receiveUpload(req: Request, maxBytes: number): Promise<ReceivedUpload> {
  const tooLarge = () =>
    new AppError("PAYLOAD_TOO_LARGE", `The scan file is larger than the upload limit of ${formatLimit(maxBytes)}; simplify or split the mesh and upload it again.`);
  const contentType = req.headers.get("content-type") ?? "";
  if (!/^multipart\/form-data/i.test(contentType)) {
    throw new AppError("VALIDATION", 'file: send the scan as multipart/form-data with the mesh in a field named "file" and its units in "units".');
  }
  const declared = req.headers.get("content-length");
  // the form's own fields and boundaries add a little to the file's size
  if (declared !== null && /^\d+$/.test(declared) && Number(declared) > maxBytes + 64 * 1024) throw tooLarge();
  if (!req.body) throw new AppError("VALIDATION", 'file: the request has no body; attach an OBJ or STL file in the field "file".');

  const dir = await mkdtemp(path.join(tmpdir(), "peelform-upload-"));
  const filePath = path.join(dir, randomBytes(8).toString("hex"));
  const cleanup = () => rm(dir, { recursive: true, force: true });

  try {
    return await new Promise<ReceivedUpload>((resolve, reject) => {
      let bb: busboy.Busboy;
      try {
        bb = busboy({ headers: { "content-type": contentType }, limits: { files: 1, fileSize: maxBytes, fields: 20, fieldSize: 4096, parts: 30 } });
      } catch {
        reject(new AppError("VALIDATION", "file: the multipart form has no boundary; send it as multipart/form-data."));
        return;
      }
      const fields: Record<string, string> = {};
      const probeChunks: Buffer[] = [];
      let probeLength = 0;
      let byteSize = 0;
      let fileName: string | null = null;
      let fileDone: Promise<void> = Promise.resolve();
      let failure: AppError | null = null;
      const source = Readable.fromWeb(req.body as unknown as NodeWebStream<Uint8Array>);

      const fail = (e: AppError) => {
        failure ??= e;
        source.unpipe(bb);
        source.destroy();
        reject(failure);
      };

      bb.on("field", (name, value, info) => {
        if (info.valueTruncated) return fail(new AppError("VALIDATION", `${name}: this field is too long.`));
        fields[name] = value;
      });
      bb.on("file", (name, stream, info) => {
        if (name !== "file" || fileName !== null) {
          stream.resume();
          return;
        }
        fileName = path.basename((info.filename ?? "scan").replace(/\\/g, "/")).slice(0, 255) || "scan";
        const out = createWriteStream(filePath);
        fileDone = new Promise<void>((res, rej) => {
          out.on("finish", res);
          out.on("error", rej);
        });
        stream.on("data", (chunk: Buffer) => {
          byteSize += chunk.length;
          if (probeLength < PROBE_BYTES) {
            probeChunks.push(chunk.subarray(0, PROBE_BYTES - probeLength));
            probeLength += Math.min(chunk.length, PROBE_BYTES - probeLength);
          }
        });
        stream.on("limit", () => {
          out.destroy();
          fail(tooLarge());
        });
        stream.pipe(out);
      });
      bb.on("filesLimit", () => undefined);
      bb.on("error", (e: Error) => fail(new AppError("VALIDATION", `file: the multipart form could not be read (${e.message}).`)));
      bb.on("close", () => {
        if (failure) return;
        fileDone.then(
          () => {
            if (fileName === null) {
              reject(new AppError("VALIDATION", 'file: attach an OBJ or STL file in the field "file".'));
              return;
            }
            resolve({ filePath, fileName, byteSize, probe: new Uint8Array(Buffer.concat(probeChunks)), fields, cleanup });
          },
          (e: Error) => reject(e),
        );
      });
      source.on("error", (e) => fail(new AppError("VALIDATION", `file: the upload was interrupted (${e.message}).`)));
      source.pipe(bb);
    });
  } catch (e) {
    await cleanup();
    throw e;
  }
}
