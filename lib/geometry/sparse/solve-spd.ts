import type { SolverStats } from "../report-types";
import { csrMatVec, relativeResidual, type CsrMatrix } from "./csr-matrix";
import { solveLdlt, type LdltFactor } from "./ldlt";

/**
 * Direct solve with iterative refinement: x = factor⁻¹·b, then up to `maxRefine` corrections x += factor⁻¹·(b − Ax)
 * until the relative residual ‖b − Ax‖/‖b‖ ≤ tol. Reports convergence and the final residual.
 */
export function solveSpd(
  a: CsrMatrix, f: LdltFactor, b: Float64Array, x: Float64Array, tol = 1e-10, maxRefine = 3,
): SolverStats {
  const t0 = performance.now();
  const n = a.n;
  const work = new Float64Array(n);
  const r = new Float64Array(n);
  const dx = new Float64Array(n);
  solveLdlt(f, b, x, work);
  let res = relativeResidual(a, x, b, r);
  let it = 0;
  while (res > tol && it < maxRefine) {
    csrMatVec(a, x, r);
    for (let i = 0; i < n; i++) r[i] = b[i] - r[i];
    solveLdlt(f, r, dx, work);
    for (let i = 0; i < n; i++) x[i] += dx[i];
    res = relativeResidual(a, x, b, r);
    it++;
  }
  return { converged: res <= tol, iterations: it + 1, residual: res, ms: performance.now() - t0 };
}
