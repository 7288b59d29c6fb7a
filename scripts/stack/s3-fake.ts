import fs from "node:fs";
import S3rver from "s3rver";
import { assertPortFree } from "./ports";

/**
 * Local stand-in for S3-compatible storage: s3rver on 127.0.0.1, objects kept as files in `dir` between runs,
 * the bucket created at start. Clients use credentials S3RVER/S3RVER and path-style URLs.
 */
export interface S3FakeOptions {
  dir: string;
  port: number;
  bucket: string;
}

export interface RunningService {
  close(): Promise<void>;
}

export async function startS3Fake(opts: S3FakeOptions): Promise<RunningService> {
  await assertPortFree(opts.port, "the S3 fake", "S3_PORT / TEST_S3_PORT");
  fs.mkdirSync(opts.dir, { recursive: true, mode: 0o700 });
  const server = new S3rver({
    address: "127.0.0.1",
    port: opts.port,
    silent: true,
    directory: opts.dir,
    vhostBuckets: false,
    configureBuckets: [{ name: opts.bucket }],
  });
  await server.run();
  return {
    close: async () => {
      server.httpServer?.closeAllConnections?.();
      await server.close();
    },
  };
}
