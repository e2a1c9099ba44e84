/**
 * Least squares on a window design (window-design.ts) without forming or factorising the design:
 * one Cholesky of its cross products G = X'X = L L', then iterative refinement from the true
 * residuals r = y - X b, each step O(n k): solve G c = X'r, b += c, until the correction
 * stops mattering (Higham 2002, ch. 12 and sec. 20.5, refinement of the seminormal equations;
 * the same route the ADF statistic takes on long series, unitroot/adf-tau-gram.ts). The
 * residual sum of squares is then r'r from the refined residuals, so it does not cancel the
 * way y'y - z'z does in a close fit.
 *
 * Callers use it only for long series, where QR's O(n k^2) work and n x k copies do not fit,
 * and check the answer's last correction before reporting it; otherwise they fit by QR.
 */
import type { WindowDesign } from './window-design';

/** Most refinement steps. */
const REFINE_STEPS = 10;

/**
 * Lower Cholesky factor of the leading m x m block of a k x k cross-product matrix, or null
 * where a pivot keeps no more than `pivotFloor` of its column's own sum of squares.
 */
export function choleskyFactor(xtx: Float64Array, k: number, m: number, pivotFloor: number): Float64Array | null {
  const L = new Float64Array(k * k);
  for (let j = 0; j < m; j++) {
    let d = xtx[j * k + j];
    for (let q = 0; q < j; q++) d -= L[j * k + q] * L[j * k + q];
    if (!(d > pivotFloor * xtx[j * k + j])) return null;
    const ljj = Math.sqrt(d);
    L[j * k + j] = ljj;
    for (let i = j + 1; i < m; i++) {
      let s = xtx[i * k + j];
      for (let q = 0; q < j; q++) s -= L[i * k + q] * L[j * k + q];
      L[i * k + j] = s / ljj;
    }
  }
  return L;
}

/** Solves L v = rhs in place for the leading m x m block of the k-wide factor. */
export function forwardSolve(L: Float64Array, k: number, m: number, v: Float64Array): void {
  for (let i = 0; i < m; i++) {
    let s = v[i];
    for (let j = 0; j < i; j++) s -= L[i * k + j] * v[j];
    v[i] = s / L[i * k + i];
  }
}

/** Solves (L L') v = rhs in place for the leading m x m block of the k-wide factor. */
export function choleskySolve(L: Float64Array, k: number, m: number, v: Float64Array): void {
  forwardSolve(L, k, m, v);
  for (let i = m - 1; i >= 0; i--) {
    let s = v[i];
    for (let j = i + 1; j < m; j++) s -= L[j * k + i] * v[j];
    v[i] = s / L[i * k + i];
  }
}

export interface RefinedFit {
  coefficients: Float64Array;
  residuals: Float64Array;
  ssr: number;
  /** The last step's change to each coefficient (how settled the answer is). */
  lastCorrection: Float64Array;
}

/**
 * Least squares of y (length n) on the first m columns of the design, refined from the true
 * residuals; null if the corrections do not settle within REFINE_STEPS.
 */
export function refinedLeastSquares(design: WindowDesign, L: Float64Array, m: number, y: ArrayLike<number>): RefinedFit | null {
  const n = design.n;
  const k = design.k;
  const r = new Float64Array(n);
  const b = new Float64Array(m);
  const c = new Float64Array(m);
  // b = 0 first: the residual is y, and the first "correction" is the plain normal-equations solution.
  let previous = Infinity;
  for (let step = 0; step <= REFINE_STEPS; step++) {
    design.residual(b, m, y, r);
    design.crossWith(r, m, c);
    choleskySolve(L, k, m, c);
    let size = 0;
    let bSize = 0;
    for (let j = 0; j < m; j++) {
      b[j] += c[j];
      size = Math.max(size, Math.abs(c[j]));
      bSize = Math.max(bSize, Math.abs(b[j]));
    }
    if (step === 0) continue;
    // Settled: the correction is at rounding level, or it has stopped shrinking (the limit of
    // double precision for this design); the caller checks that it no longer moves its answer.
    if (size <= 4 * Number.EPSILON * bSize || size > 0.5 * previous) {
      design.residual(b, m, y, r);
      let ssr = 0;
      for (let t = 0; t < n; t++) ssr += r[t] * r[t];
      return { coefficients: b, residuals: r, ssr, lastCorrection: c };
    }
    previous = size;
  }
  return null;
}
