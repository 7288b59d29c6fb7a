import { randomBytes } from "node:crypto";
import { QueueEvents } from "bullmq";
import type { Redis } from "ioredis";
import { writeObj } from "@/lib/geometry/intake/write-mesh";
import { cylinderTube } from "@/lib/geometry/shapes/cylinder-tube";
import { createRedis } from "@/lib/queue/connection";
import { TEST_ORIGIN } from "@/tests/integration/api/support/call";

/**
 * Helpers of the queue tests: demo meshes, multipart uploads through the route handler, and waiting on BullMQ
 * events of one prefix (never on sleeps).
 */

/** A fresh BullMQ prefix, so a test's worker never takes jobs of the stack's worker or of another test. */
export function freshPrefix(label: string): string {
  return `t-${label}-${randomBytes(4).toString("hex")}`;
}

/**
 * Open tube, N segments around, `bands` rings along z, and the seam straight along one side (vertex j = 0 of each
 * ring): cut there it unrolls into one rectangular piece.
 */
export function seamedTubeObj(radius: number, height: number, N: number, bands: number): { obj: string; seams: [number, number][] } {
  const tube = cylinderTube({ radius, height, segments: N, bands });
  const seams: [number, number][] = [];
  for (let i = 0; i < bands; i++) seams.push([i * N, (i + 1) * N]);
  return { obj: writeObj(tube), seams };
}

type Handler = (req: Request, ctx: { params: Promise<unknown> }) => Promise<Response>;

/** POST multipart/form-data to a handler, as a browser form would send it. */
export async function postForm(handler: Handler, path: string, cookie: string, params: Record<string, string>, form: FormData): Promise<Response> {
  const req = new Request(new URL(path, TEST_ORIGIN), { method: "POST", headers: { cookie }, body: form });
  return handler(req, { params: Promise.resolve(params) });
}

export function scanForm(bytes: string | Uint8Array, fileName: string, units = "mm"): FormData {
  const form = new FormData();
  form.append("units", units);
  form.append("file", new Blob([typeof bytes === "string" ? bytes : new Uint8Array(bytes)]), fileName);
  return form;
}

/** Events of one queue: resolves waits for a job id's completion or failure, records progress in arrival order. */
export class JobWatcher {
  readonly events: QueueEvents;
  private readonly connection: Redis;
  private readonly done = new Map<string, { ok: boolean; value: string }>();
  private readonly waiters = new Map<string, (r: { ok: boolean; value: string }) => void>();
  readonly progress = new Map<string, number[]>();
  private readonly progressWaiters: { jobId: string; min: number; resolve: () => void }[] = [];

  constructor(queue: string, prefix: string) {
    this.connection = createRedis();
    this.events = new QueueEvents(queue, { connection: this.connection, prefix });
    this.events.on("completed", ({ jobId, returnvalue }) => this.settle(jobId, { ok: true, value: JSON.stringify(returnvalue) }));
    this.events.on("failed", ({ jobId, failedReason }) => this.settle(jobId, { ok: false, value: failedReason }));
    this.events.on("progress", ({ jobId, data }) => {
      const list = this.progress.get(jobId) ?? [];
      list.push(Number(data));
      this.progress.set(jobId, list);
      for (const w of [...this.progressWaiters]) {
        if (w.jobId === jobId && Number(data) >= w.min) {
          this.progressWaiters.splice(this.progressWaiters.indexOf(w), 1);
          w.resolve();
        }
      }
    });
  }

  ready(): Promise<void> {
    return this.events.waitUntilReady().then(() => undefined);
  }

  private settle(jobId: string, r: { ok: boolean; value: string }): void {
    this.done.set(jobId, r);
    this.waiters.get(jobId)?.(r);
  }

  /** The job's final outcome (completed → ok, failed → the reason). */
  outcome(jobId: string): Promise<{ ok: boolean; value: string }> {
    const known = this.done.get(jobId);
    if (known) return Promise.resolve(known);
    return new Promise((resolve) => this.waiters.set(jobId, resolve));
  }

  /** The next outcome of a job id (for a job run again after it finished). */
  outcomeAfter(jobId: string): Promise<{ ok: boolean; value: string }> {
    this.done.delete(jobId);
    return new Promise((resolve) => this.waiters.set(jobId, resolve));
  }

  /** Resolves once the job reported progress ≥ min. */
  progressAtLeast(jobId: string, min: number): Promise<void> {
    if ((this.progress.get(jobId) ?? []).some((p) => p >= min)) return Promise.resolve();
    return new Promise((resolve) => this.progressWaiters.push({ jobId, min, resolve }));
  }

  async close(): Promise<void> {
    await this.events.close();
    await this.connection.quit().catch(() => undefined);
  }
}
