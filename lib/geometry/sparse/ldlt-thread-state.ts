import type { LdltSymbolic } from "./ldlt";

/** State word shared between factorLdltInThread and its thread (Int32Array over a SharedArrayBuffer, index 0). */
export const LDLT_STATE = {
  /** nobody has started the numeric factorisation */
  pending: 0,
  /** one side (thread or owner) is factorising */
  claimed: 1,
  done: 2,
  /** a pivot was not positive; its index is in word 1 */
  notPositive: 3,
  /** the thread could not boot or crashed: the owner factorises itself */
  failed: 4,
} as const;

/** workerData of the factorisation thread: the symbolic analysis (copied) and the shared output buffers. */
export interface LdltThreadData {
  symbolic: LdltSymbolic;
  state: SharedArrayBuffer;
  li: SharedArrayBuffer;
  lx: SharedArrayBuffer;
  d: SharedArrayBuffer;
}
