import { Worker } from "node:worker_threads";
import { analyseLdlt, factorLdlt, factorLdltNumeric, notPositiveDefinite, type LdltFactor } from "./ldlt";
import type { CsrMatrix } from "./csr-matrix";
import { LDLT_STATE, type LdltThreadData } from "./ldlt-thread-state";

/** A factorisation that may still be running on another thread. */
export interface PendingLdlt {
  /**
   * Blocks until the factor is ready and returns it. If the thread has not started yet, the caller factorises
   * itself instead of waiting (so a slow thread start never costs more than the sequential path).
   * @throws GeometryError SOLVER_FAILED when a pivot is not positive, as factorLdlt
   */
  join(): LdltFactor;
  /** gives the work up (the caller failed before needing it): stops the thread; join() must not be called after */
  cancel(): void;
  /** where the numeric factorisation ran: "thread", "caller", or "sequential" (no thread was started) */
  ranOn(): "thread" | "caller" | "sequential" | "pending";
}

export interface LdltThreadOptions {
  /** start a thread only from this many unknowns (thread start-up is ~0.1–0.5 s); default 40 000 */
  minUnknowns?: number;
  /** join() waits for the thread even if it has not started yet (tests use it to exercise the threaded path) */
  waitForThread?: boolean;
}

const ENTRY_URL = new URL("./ldlt-thread-entry.ts", import.meta.url).href;
/**
 * Threads do not inherit tsx's loader hooks, so the thread registers tsx before importing the TypeScript entry (as
 * lib/jobs/run-compute.ts does). If that fails, the state word is set to FAILED so the owner never waits for it.
 */
const BOOT = `const { workerData } = require("node:worker_threads");
const st = new Int32Array(workerData.state);
const fail = () => { if (Atomics.compareExchange(st, 0, ${LDLT_STATE.pending}, ${LDLT_STATE.failed}) === ${LDLT_STATE.pending}) Atomics.notify(st, 0); };
import("tsx/esm/api").then((m) => { m.register(); return import(${JSON.stringify(ENTRY_URL)}); }).catch(fail);`;

/**
 * Starts the sparse LDLᵀ factorisation of `a` on a helper thread and returns at once, so the caller can do other
 * work on its own core meanwhile (the flatten factorises the refinement's Laplacian while the conformal system is
 * factorised). The symbolic analysis runs here; the thread writes L and D straight into SharedArrayBuffers, so
 * nothing is copied back. join() waits with Atomics.wait (allowed on Node's main thread and in worker threads).
 * The result is bit-for-bit the one factorLdlt computes (same code, same order of operations).
 *
 * Below `minUnknowns`, or where SharedArrayBuffer/threads are unavailable, it factorises sequentially at join().
 */
export function factorLdltInThread(a: CsrMatrix, perm?: Uint32Array, opts: LdltThreadOptions = {}): PendingLdlt {
  const minUnknowns = opts.minUnknowns ?? 40_000;
  if (a.n < minUnknowns || typeof SharedArrayBuffer === "undefined") {
    let result: LdltFactor | null = null;
    return {
      join: () => (result ??= factorLdlt(a, perm)),
      ranOn: () => (result ? "sequential" : "pending"),
      cancel: () => {},
    };
  }
  const symbolic = analyseLdlt(a, perm);
  const { n, nnzL } = symbolic;
  const stateBuf = new SharedArrayBuffer(8);
  const state = new Int32Array(stateBuf);
  const liBuf = new SharedArrayBuffer(4 * Math.max(1, nnzL));
  const lxBuf = new SharedArrayBuffer(8 * Math.max(1, nnzL));
  const dBuf = new SharedArrayBuffer(8 * Math.max(1, n));
  const li = new Uint32Array(liBuf, 0, nnzL);
  const lx = new Float64Array(lxBuf, 0, nnzL);
  const d = new Float64Array(dBuf, 0, n);
  const data: LdltThreadData = { symbolic, state: stateBuf, li: liBuf, lx: lxBuf, d: dBuf };
  let worker: Worker | null = null;
  try {
    worker = new Worker(BOOT, { eval: true, workerData: data });
    worker.unref();
    // a failure is already published through the state word; the listener only keeps it from being rethrown here
    worker.on("error", () => {});
  } catch {
    Atomics.store(state, 0, LDLT_STATE.failed);
  }
  let result: LdltFactor | null = null;
  let where: "thread" | "caller" | "pending" = "pending";
  const local = (): number => factorLdltNumeric(symbolic, li, lx, d);
  return {
    join: () => {
      if (result) return result;
      let bad: number;
      if (opts.waitForThread) {
        while (Atomics.load(state, 0) === LDLT_STATE.pending) Atomics.wait(state, 0, LDLT_STATE.pending);
      }
      if (Atomics.compareExchange(state, 0, LDLT_STATE.pending, LDLT_STATE.claimed) === LDLT_STATE.pending) {
        where = "caller";
        bad = local();
      } else {
        while (Atomics.load(state, 0) === LDLT_STATE.claimed) Atomics.wait(state, 0, LDLT_STATE.claimed);
        const s = Atomics.load(state, 0);
        if (s === LDLT_STATE.done) { where = "thread"; bad = -1; }
        else if (s === LDLT_STATE.notPositive) { where = "thread"; bad = state[1]; }
        else { where = "caller"; bad = local(); }
      }
      void worker?.terminate();
      if (bad >= 0) throw notPositiveDefinite(bad, n);
      result = { n, perm: symbolic.perm, lp: symbolic.lp, li, lx, d, nnzL };
      return result;
    },
    ranOn: () => where,
    cancel: () => {
      Atomics.compareExchange(state, 0, LDLT_STATE.pending, LDLT_STATE.failed);
      void worker?.terminate();
    },
  };
}
