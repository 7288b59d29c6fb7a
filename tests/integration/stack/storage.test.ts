import "@/tests/support/test-env";
import { randomBytes } from "node:crypto";
import { Readable } from "node:stream";
import { describe, expect, it } from "vitest";
import { checkStorage, deleteObject, getObjectBuffer, getObjectStream, putObject } from "@/lib/storage/s3";

/** Object storage through the S3 fake of the test stack, with the same client settings as production. */
describe("lib/storage/s3 against the S3 fake", () => {
  const prefix = `tests/storage-${Date.now()}-${randomBytes(3).toString("hex")}`;

  it("reaches the bucket", async () => {
    await expect(checkStorage()).resolves.toBeUndefined();
  });

  it("round-trips a buffer byte for byte", async () => {
    const bytes = randomBytes(200_000);
    await putObject(`${prefix}/mesh.stl`, bytes, { contentType: "model/stl" });
    const object = await getObjectStream(`${prefix}/mesh.stl`);
    expect(object?.contentType).toBe("model/stl");
    expect(object?.contentLength).toBe(bytes.length);
    const chunks: Buffer[] = [];
    for await (const chunk of object!.stream) chunks.push(Buffer.from(chunk as Uint8Array));
    expect(Buffer.concat(chunks).equals(bytes)).toBe(true);
  });

  it("uploads a stream without corrupting it", async () => {
    const bytes = randomBytes(3 * 1024 * 1024 + 17);
    // Several chunks, as a file or request body stream arrives.
    const stream = Readable.from(Array.from({ length: 7 }, (_, i) => bytes.subarray(Math.floor((i * bytes.length) / 7), Math.floor(((i + 1) * bytes.length) / 7))));
    await putObject(`${prefix}/pattern.pdf`, stream, { contentType: "application/pdf", contentLength: bytes.length });
    const back = await getObjectBuffer(`${prefix}/pattern.pdf`);
    expect(back?.length).toBe(bytes.length);
    expect(back?.equals(bytes)).toBe(true);
  });

  it("deletes, and reports a missing object as null", async () => {
    await putObject(`${prefix}/gone.txt`, "temporary");
    await deleteObject(`${prefix}/gone.txt`);
    expect(await getObjectStream(`${prefix}/gone.txt`)).toBeNull();
    await expect(deleteObject(`${prefix}/never-there.txt`)).resolves.toBeUndefined();
  });

  it("rejects unsafe keys and streams without a length", async () => {
    await expect(putObject("../etc/passwd", "x")).rejects.toThrow(/invalid storage key/);
    await expect(putObject(`${prefix}//double`, "x")).rejects.toThrow(/invalid storage key/);
    await expect(putObject(`${prefix}/s`, Readable.from(["a"]))).rejects.toThrow(/contentLength is required/);
  });
});
