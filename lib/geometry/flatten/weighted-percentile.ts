/**
 * Weighted percentile: the smallest value v such that the weights of all values ≤ v sum to at least q·Σw.
 * Expected O(n) by three-way quickselect on copies (inputs are not modified).
 *
 * @param values #n values
 * @param weights #n non-negative weights
 * @param q fraction in [0, 1]
 */
export function weightedPercentile(values: Float64Array, weights: Float64Array, q: number): number {
  const n = values.length;
  const v = Float64Array.from(values);
  const w = Float64Array.from(weights);
  let total = 0;
  for (let i = 0; i < n; i++) total += w[i];
  let target = q * total;
  let lo = 0, hi = n; // active range [lo, hi)
  let seed = 12345;
  while (hi - lo > 1) {
    seed = (Math.imul(seed, 1103515245) + 12345) >>> 0;
    const pivot = v[lo + (seed % (hi - lo))];
    // three-way partition: [lo, lt) < pivot, [lt, gt) == pivot, [gt, hi) > pivot
    let lt = lo, i = lo, gt = hi;
    let wLess = 0, wEq = 0;
    while (i < gt) {
      const x = v[i];
      if (x < pivot) {
        wLess += w[i];
        const tv = v[lt], tw = w[lt]; v[lt] = v[i]; w[lt] = w[i]; v[i] = tv; w[i] = tw;
        lt++; i++;
      } else if (x > pivot) {
        gt--;
        const tv = v[gt], tw = w[gt]; v[gt] = v[i]; w[gt] = w[i]; v[i] = tv; w[i] = tw;
      } else {
        wEq += w[i];
        i++;
      }
    }
    if (wLess >= target && lt > lo) { hi = lt; }
    else if (wLess + wEq >= target) return pivot;
    else { target -= wLess + wEq; if (gt >= hi) return pivot; lo = gt; }
  }
  return v[lo];
}
