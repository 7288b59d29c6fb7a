import { Redis, type RedisOptions } from "ioredis";
import { getEnv } from "@/lib/env";

/**
 * Redis connections for BullMQ. Every process (web app, each worker machine) connects to the same Redis given by
 * REDIS_URL; queues are the only shared state besides PostgreSQL and object storage.
 */

/** Queue names, one per kind of background job. Workers register a processor per name (workers/processors). */
export const QUEUE_NAMES = {
  /** Outgoing e-mail with retries (invitations, password resets). */
  mail: "mail",
  /** Scan intake: parse, weld, report and write the working meshes of an upload (workers/processors/scan-intake.ts). */
  scanIntake: "scan-intake",
  /** Flattening a scan's seam map into a pattern and its documents (workers/processors/flatten-pattern.ts). */
  flatten: "flatten",
} as const;

export type QueueName = (typeof QUEUE_NAMES)[keyof typeof QUEUE_NAMES];

/**
 * A new ioredis connection to REDIS_URL. `maxRetriesPerRequest: null` is what BullMQ requires (blocking commands
 * of a worker must wait through reconnects instead of failing). Callers own the connection: `quit()` it.
 */
export function createRedis(overrides: RedisOptions = {}): Redis {
  return new Redis(getEnv().REDIS_URL, {
    maxRetriesPerRequest: null,
    connectionName: `peelform:${process.pid}`,
    ...overrides,
  });
}
