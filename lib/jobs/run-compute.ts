import { Worker } from "node:worker_threads";
import { GeometryError, type GeometryErrorCode } from "@/lib/geometry/errors";
import type { FlattenRequest, FlattenResponse, IntakeRequest, IntakeResponse, ThreadMessage } from "./compute-messages";

/**
 * Runs one compute request in a fresh thread (lib/jobs/compute-thread.ts) and resolves with its result.
 * Bad input rejects with the thread's GeometryError (same code and sentence); anything else with an Error.
 * Threads do not inherit the parent's `--import tsx` loader hooks, so the thread first registers tsx itself (the
 * worker process always runs from the TypeScript sources, like `node --import tsx workers/main.ts`).
 */
const THREAD_URL = new URL("./compute-thread.ts", import.meta.url).href;
const BOOT = `import("tsx/esm/api").then((m) => { m.register(); return import(${JSON.stringify(THREAD_URL)}); })`;

export function runCompute(req: IntakeRequest, onProgress?: (step: string, fraction: number) => void): Promise<IntakeResponse>;
export function runCompute(req: FlattenRequest, onProgress?: (step: string, fraction: number) => void): Promise<FlattenResponse>;
export function runCompute(req: IntakeRequest | FlattenRequest, onProgress?: (step: string, fraction: number) => void): Promise<IntakeResponse | FlattenResponse> {
  return new Promise((resolve, reject) => {
    const transfer = req.kind === "intake" ? [req.bytes.buffer as ArrayBuffer] : [];
    const thread = new Worker(BOOT, { eval: true, workerData: req, transferList: transfer });
    let settled = false;
    thread.on("message", (m: ThreadMessage) => {
      if (m.type === "progress") onProgress?.(m.step, m.fraction);
      else if (m.type === "result") {
        settled = true;
        resolve(m.result);
      } else {
        settled = true;
        reject(m.geometry ? new GeometryError(m.code as GeometryErrorCode, m.message) : new Error(m.message));
      }
    });
    thread.on("error", (e) => {
      if (!settled) {
        settled = true;
        reject(e);
      }
    });
    thread.on("exit", (code) => {
      if (!settled) {
        settled = true;
        reject(new Error(`the compute thread exited with code ${code} before answering`));
      }
    });
  });
}
