/**
 * Binary min-heap of (key, vertex) pairs on preallocated typed arrays, with lazy deletion left to the caller (push a
 * vertex again with a smaller key; skip stale pops). No allocation after construction.
 */
export class MinHeap {
  private keys: Float64Array;
  private vals: Uint32Array;
  size = 0;

  /** @param capacity most entries held at once (for lazy deletion: #relaxations + #sources) */
  constructor(capacity: number) {
    this.keys = new Float64Array(Math.max(1, capacity));
    this.vals = new Uint32Array(Math.max(1, capacity));
  }

  clear(): void {
    this.size = 0;
  }

  push(key: number, v: number): void {
    if (this.size === this.keys.length) this.grow();
    const keys = this.keys, vals = this.vals;
    let i = this.size++;
    while (i > 0) {
      const p = (i - 1) >> 1;
      if (keys[p] <= key) break;
      keys[i] = keys[p]; vals[i] = vals[p]; i = p;
    }
    keys[i] = key; vals[i] = v;
  }

  /** Key of the top entry (undefined behaviour when empty). */
  topKey(): number {
    return this.keys[0];
  }

  /** Removes the top entry and returns its vertex (call topKey first for its key). */
  pop(): number {
    const keys = this.keys, vals = this.vals;
    const top = vals[0];
    const n = --this.size;
    const lk = keys[n], lv = vals[n];
    let i = 0;
    for (;;) {
      let c = 2 * i + 1;
      if (c >= n) break;
      if (c + 1 < n && keys[c + 1] < keys[c]) c++;
      if (keys[c] >= lk) break;
      keys[i] = keys[c]; vals[i] = vals[c]; i = c;
    }
    keys[i] = lk; vals[i] = lv;
    return top;
  }

  private grow(): void {
    const k = new Float64Array(2 * this.keys.length), v = new Uint32Array(2 * this.vals.length);
    k.set(this.keys); v.set(this.vals);
    this.keys = k; this.vals = v;
  }
}
