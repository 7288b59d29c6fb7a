/**
 * Thread side of factorLdltInThread (ldlt-thread.ts): claims the job, runs the numeric LDLᵀ into the shared
 * arrays, publishes the outcome in the shared state word and wakes the waiting thread. Never throws: any failure
 * becomes state FAILED, and the owner then factorises on its own thread.
 */
import { workerData } from "node:worker_threads";
import { factorLdltNumeric, type LdltSymbolic } from "./ldlt";
import { LDLT_STATE, type LdltThreadData } from "./ldlt-thread-state";

const data = workerData as LdltThreadData;
const state = new Int32Array(data.state);
if (Atomics.compareExchange(state, 0, LDLT_STATE.pending, LDLT_STATE.claimed) === LDLT_STATE.pending) {
  let outcome: number = LDLT_STATE.failed;
  try {
    const sym: LdltSymbolic = data.symbolic;
    const bad = factorLdltNumeric(sym, new Uint32Array(data.li), new Float64Array(data.lx), new Float64Array(data.d));
    if (bad >= 0) { state[1] = bad; outcome = LDLT_STATE.notPositive; } else outcome = LDLT_STATE.done;
  } catch {
    outcome = LDLT_STATE.failed;
  }
  Atomics.store(state, 0, outcome);
  Atomics.notify(state, 0);
}
