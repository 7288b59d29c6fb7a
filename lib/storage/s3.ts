import { Readable } from "node:stream";
import {
  DeleteObjectCommand,
  GetObjectCommand,
  HeadBucketCommand,
  NoSuchKey,
  PutObjectCommand,
  S3Client,
} from "@aws-sdk/client-s3";
import { getEnv } from "@/lib/env";

// The SDK prints a Node-version notice on Node 20; it is noise in our logs.
process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED ??= "true";

/**
 * S3-compatible object storage (s3rver locally, any S3 API in production). Path-style URLs work with every
 * S3-compatible server; checksums only WHEN_REQUIRED, because the SDK's default flexible checksums corrupt
 * streamed uploads on s3rver and several other S3-compatible servers.
 */
let client: S3Client | undefined;

export function getS3Client(): S3Client {
  if (client) return client;
  const env = getEnv();
  client = new S3Client({
    region: env.S3_REGION,
    endpoint: env.S3_ENDPOINT,
    forcePathStyle: true,
    credentials: { accessKeyId: env.S3_ACCESS_KEY_ID, secretAccessKey: env.S3_SECRET_ACCESS_KEY },
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
    maxAttempts: 3,
  });
  return client;
}

export type ObjectBody = Buffer | Uint8Array | string | Readable;

export interface PutObjectOptions {
  contentType?: string;
  /** Byte length; required for a stream (the S3 API needs it up front), computed for buffers and strings. */
  contentLength?: number;
}

/** Object keys: slash-separated segments of safe characters, no "..", at most 1024 bytes. */
export function assertObjectKey(key: string): void {
  if (!/^[A-Za-z0-9!_.*'()\-/]{1,1024}$/.test(key) || key.split("/").some((s) => s === "" || s === "." || s === "..")) {
    throw new Error(`invalid storage key "${key}": use segments of letters, digits and !_.*'()- separated by single slashes`);
  }
}

/** Stores `body` under `key` in the configured bucket. Streams are sent as they are read (never buffered). */
export async function putObject(key: string, body: ObjectBody, options: PutObjectOptions = {}): Promise<void> {
  assertObjectKey(key);
  let contentLength = options.contentLength;
  if (body instanceof Readable) {
    if (contentLength === undefined) throw new Error(`putObject("${key}"): contentLength is required for a stream`);
  } else {
    contentLength ??= typeof body === "string" ? Buffer.byteLength(body) : body.byteLength;
  }
  await getS3Client().send(
    new PutObjectCommand({
      Bucket: getEnv().S3_BUCKET,
      Key: key,
      Body: body,
      ContentLength: contentLength,
      ContentType: options.contentType ?? "application/octet-stream",
    }),
  );
}

export interface StoredObject {
  stream: Readable;
  contentType: string | undefined;
  contentLength: number | undefined;
}

/** Opens the object for reading, or returns null when there is no object under `key`. */
export async function getObjectStream(key: string): Promise<StoredObject | null> {
  assertObjectKey(key);
  try {
    const out = await getS3Client().send(new GetObjectCommand({ Bucket: getEnv().S3_BUCKET, Key: key }));
    if (!out.Body) return null;
    return { stream: out.Body as Readable, contentType: out.ContentType, contentLength: out.ContentLength };
  } catch (error) {
    if (error instanceof NoSuchKey || (error as { name?: string }).name === "NoSuchKey") return null;
    throw error;
  }
}

/** Reads a whole (small) object into memory; null when missing. */
export async function getObjectBuffer(key: string): Promise<Buffer | null> {
  const object = await getObjectStream(key);
  if (!object) return null;
  const chunks: Buffer[] = [];
  for await (const chunk of object.stream) chunks.push(Buffer.from(chunk as Uint8Array));
  return Buffer.concat(chunks);
}

/** Deletes the object; deleting a missing key is not an error (S3 semantics). */
export async function deleteObject(key: string): Promise<void> {
  assertObjectKey(key);
  await getS3Client().send(new DeleteObjectCommand({ Bucket: getEnv().S3_BUCKET, Key: key }));
}

/** Health check: the bucket exists and the credentials work. Throws with the reason otherwise. */
export async function checkStorage(timeoutMs = 3_000): Promise<void> {
  await getS3Client().send(new HeadBucketCommand({ Bucket: getEnv().S3_BUCKET }), {
    abortSignal: AbortSignal.timeout(timeoutMs),
  });
}
