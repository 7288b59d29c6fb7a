import fs from "node:fs";
import net from "node:net";
import os from "node:os";
import path from "node:path";
import { Queue } from "bullmq";
import { Redis } from "ioredis";
import { afterAll, describe, expect, it } from "vitest";
import { initCluster, psql, resolvePgLocation, startPostgres, stopPostgres } from "@/scripts/stack/postgres";
import { redisUrl, startRedis, stopRedis } from "@/scripts/stack/redis";

/**
 * The promise of `npm start`: stopping and starting the stack keeps every row, key and queued job. Uses the real
 * stack functions on a cluster and a redis-server of its own in a temporary data folder and free ports.
 */
function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.once("error", reject);
    server.listen(0, "127.0.0.1", () => {
      const { port } = server.address() as net.AddressInfo;
      server.close(() => resolve(port));
    });
  });
}

const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), "peelform-restart-"));
const password = "restart-test-password";

describe("restart keeps data", () => {
  let pgData = "";
  let fallbackRoot = "";
  let pgPort = 0;
  let redisOpts: Parameters<typeof startRedis>[0] | undefined;

  afterAll(async () => {
    if (pgData) await stopPostgres(pgData).catch(() => undefined);
    if (redisOpts) await stopRedis(redisOpts).catch(() => undefined);
    fs.rmSync(dataDir, { recursive: true, force: true });
    if (fallbackRoot) fs.rmSync(fallbackRoot, { recursive: true, force: true });
  });

  it("keeps a SQL row, a redis key and a BullMQ job across stop and start", async () => {
    pgPort = await freePort();
    // mkdtemp makes the folder mode 700: as root, the postgres user cannot enter it, so the cluster must move to
    // the fallback location (and say why).
    const location = await resolvePgLocation(dataDir, dataDir, "restart-test");
    pgData = location.pgData;
    if (process.getuid?.() === 0) {
      expect(location.fallbackReason).toContain(`cannot enter ${dataDir}`);
      expect(pgData.startsWith("/var/lib/peelform/")).toBe(true);
      fallbackRoot = path.dirname(path.dirname(pgData));
    }
    const pgOpts = { pgData, port: pgPort, password, fsync: true };
    expect(await initCluster(pgOpts)).toBe(true);
    expect((await startPostgres(pgOpts)).alreadyRunning).toBe(false);
    expect((await startPostgres(pgOpts)).alreadyRunning).toBe(true); // pg_ctl status is checked first

    redisOpts = { dir: path.join(dataDir, "redis"), port: await freePort(), password, persistent: true };
    await startRedis(redisOpts);

    // Write: a table with a row, a key, a job waiting in a queue.
    await psql({ pgData, port: pgPort }, "CREATE TABLE sculpt (id serial PRIMARY KEY, name text NOT NULL)");
    await psql({ pgData, port: pgPort }, "INSERT INTO sculpt (name) VALUES ('dragon head, 4 in')");
    const url = redisUrl(redisOpts.port, password);
    let redis = new Redis(url, { maxRetriesPerRequest: null });
    await redis.set("peelform:restart-test", "still here");
    let queue = new Queue("restart-test", { connection: redis });
    const job = await queue.add("cut", { scanId: 42 });
    await queue.close();
    await redis.quit();

    // Stop both cleanly and start them again with the same folders.
    expect(await stopPostgres(pgData)).toBe(true);
    expect(await stopRedis(redisOpts)).toBe(true);
    expect(await initCluster(pgOpts)).toBe(false); // existing cluster is kept
    expect((await startPostgres(pgOpts)).alreadyRunning).toBe(false);
    expect((await startRedis(redisOpts)).alreadyRunning).toBe(false);

    expect(await psql({ pgData, port: pgPort }, "SELECT name FROM sculpt")).toBe("dragon head, 4 in");
    redis = new Redis(url, { maxRetriesPerRequest: null });
    expect(await redis.get("peelform:restart-test")).toBe("still here");
    queue = new Queue("restart-test", { connection: redis });
    const again = await queue.getJob(String(job.id));
    expect(again?.data).toEqual({ scanId: 42 });
    expect(await again?.getState()).toBe("waiting");
    await queue.close();
    await redis.quit();
  });
});
