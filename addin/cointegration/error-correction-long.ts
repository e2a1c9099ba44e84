/**
 * The error-correction model's lag choice on long series from cross products
 * (regression/window-design.ts) instead of a Householder QR of the n x (2 + 2 pmax) design,
 * which at a million rows and Schwert's 120 lags is 1.9 GB and O(n p^2) work. Every column is
 * a window of the lagged error u or of the changes of y or x, so the cross products cost O(n)
 * per distinct shift.
 *
 * With X'X = L L' and z_y = L^{-1} X'Δy, z_x = L^{-1} X'Δx, the residual cross products of the
 * model on the first j columns are Δy'Δy - sum_{i<j} z_y,i^2, Δx'Δx - sum z_x,i^2 and
 * Δy'Δx - sum z_y,i z_x,i (the tails of Q'Δy and Q'Δx in the QR route). The changes are first
 * freed of their means (a shift in the span of the constant, so these sums do not change).
 * The chosen model is fitted here too where its design would be large (errorCorrectionFitByGram),
 * else by QR (error-correction.ts).
 */
import { choleskyFactor, forwardSolve, refinedLeastSquares } from '../regression/refined-least-squares';
import { WindowDesign, type WindowColumn } from '../regression/window-design';

/** Rows times columns squared above which the cross-product route pays for itself (as the ADF's). */
export const ECM_GRAM_WORK = 5e7;

/** Pivots keeping no more than this share of their column's sum of squares stop the route (QR then answers). */
const PIVOT_FLOOR = 1e-13;

/** A copy of the changes of v (index t holds v[t] - v[t-1], t >= 1) less their mean. */
function centredChanges(v: ArrayLike<number>): Float64Array {
  const T = v.length;
  const out = new Float64Array(T);
  let mean = 0;
  for (let t = 1; t < T; t++) mean += v[t] - v[t - 1];
  mean = T > 1 ? mean / (T - 1) : 0;
  for (let t = 1; t < T; t++) out[t] = v[t] - v[t - 1] - mean;
  return out;
}

/**
 * System-AIC choice of p in 0..pmax on the common sample of pmax (rows pmax + 1 .. T - 1), the
 * criterion of error-correction.ts; null where the cross products cannot separate every column.
 */
export function chooseEcmLagsByGram(y: ArrayLike<number>, x: ArrayLike<number>, u: ArrayLike<number>, pmax: number): number | null {
  const T = y.length;
  const from = pmax + 1;
  const n = T - from;
  const U = 0;
  const DY = 1;
  const DX = 2;
  const columns: WindowColumn[] = [{ source: U, offset: from - 1 }, { source: -1, offset: 0 }];
  for (let i = 1; i <= pmax; i++) columns.push({ source: DY, offset: from - i }, { source: DX, offset: from - i });
  const design = new WindowDesign([Float64Array.from(u), centredChanges(y), centredChanges(x)], columns, n);
  const dy = { source: DY, offset: from };
  const dx = { source: DX, offset: from };
  const { xtx, xty } = design.gram([dy, dx]);
  const k = columns.length;
  const L = choleskyFactor(xtx, k, k, PIVOT_FLOOR);
  if (L === null) return null;
  const zy = xty[0];
  const zx = xty[1];
  forwardSolve(L, k, k, zy);
  forwardSolve(L, k, k, zx);
  let syy = design.dot(dy, dy);
  let sxx = design.dot(dx, dx);
  let sxy = design.dot(dy, dx);
  let best = 0;
  let bestAic = Infinity;
  let used = 0;
  for (let p = 0; p <= pmax; p++) {
    const size = 2 + 2 * p;
    for (; used < size; used++) {
      syy -= zy[used] * zy[used];
      sxx -= zx[used] * zx[used];
      sxy -= zy[used] * zx[used];
    }
    const det = (syy * sxx - sxy * sxy) / (n * n);
    const aic = n * Math.log(det) + 2 * 2 * size;
    if (aic < bestAic) {
      bestAic = aic;
      best = p;
    }
  }
  return best;
}

/** Smallest share of its column's sum of squares each pivot must keep for the standard errors to be read from the factor. */
const FIT_PIVOT_FLOOR = 1e-2;
/** The last refinement step may move each coefficient by at most this share of its standard error (or of itself, if larger). */
const FIT_TOLERANCE = 1e-12;

/** What the report reads of each equation's fit (the fields of LeastSquaresFit it uses). */
export interface EcmEquationFit {
  coefficients: Float64Array;
  standardErrors: Float64Array;
  tValues: Float64Array;
  dfResid: number;
  rSquared: number;
  nobs: number;
}

/**
 * Both equations with p lags on rows p + 1 .. T - 1, columns [u_{t-1}, 1, Δy_{t-1}, Δx_{t-1}, ...],
 * from the cross products of the design as it stands (not centred, so every coefficient and
 * standard error is the QR route's own): one Cholesky, each equation refined from its true
 * residuals, standard errors from sigma^2 (L L')^{-1}. Null where a pivot keeps less than
 * FIT_PIVOT_FLOOR of its column or a refinement does not settle (the caller fits by QR).
 */
export function errorCorrectionFitByGram(y: ArrayLike<number>, x: ArrayLike<number>, u: ArrayLike<number>, p: number): { y: EcmEquationFit; x: EcmEquationFit } | null {
  const T = y.length;
  const from = p + 1;
  const n = T - from;
  const changes = (v: ArrayLike<number>): Float64Array => {
    const out = new Float64Array(T);
    for (let t = 1; t < T; t++) out[t] = v[t] - v[t - 1];
    return out;
  };
  const dy = changes(y);
  const dx = changes(x);
  const columns: WindowColumn[] = [{ source: 0, offset: from - 1 }, { source: -1, offset: 0 }];
  for (let i = 1; i <= p; i++) columns.push({ source: 1, offset: from - i }, { source: 2, offset: from - i });
  const k = columns.length;
  if (n - k < 1) return null;
  const design = new WindowDesign([Float64Array.from(u), dy, dx], columns, n);
  const { xtx } = design.gram();
  const L = choleskyFactor(xtx, k, k, FIT_PIVOT_FLOOR);
  if (L === null) return null;
  // Diagonal of (L L')^{-1} = L^{-T} L^{-1}: entry j is the sum of squares of column j of L^{-1}.
  const inverseDiagonal = new Float64Array(k);
  const e = new Float64Array(k);
  for (let j = 0; j < k; j++) {
    e.fill(0);
    e[j] = 1;
    forwardSolve(L, k, k, e); // column j of L^{-1}
    for (let i = 0; i < k; i++) inverseDiagonal[j] += e[i] * e[i];
  }
  const equation = (response: Float64Array): EcmEquationFit | null => {
    const window = response.subarray(from, from + n);
    const fit = refinedLeastSquares(design, L, k, window);
    if (fit === null || !(fit.ssr > 0)) return null;
    const dfResid = n - k;
    const sigma2 = fit.ssr / dfResid;
    const standardErrors = new Float64Array(k);
    const tValues = new Float64Array(k);
    for (let j = 0; j < k; j++) {
      standardErrors[j] = Math.sqrt(sigma2 * inverseDiagonal[j]);
      tValues[j] = fit.coefficients[j] / standardErrors[j];
      if (!(Math.abs(fit.lastCorrection[j]) <= FIT_TOLERANCE * Math.max(Math.abs(fit.coefficients[j]), standardErrors[j]))) return null;
    }
    let mean = 0;
    for (let t = 0; t < n; t++) mean += window[t];
    mean /= n;
    let tss = 0;
    for (let t = 0; t < n; t++) tss += (window[t] - mean) ** 2;
    return { coefficients: fit.coefficients, standardErrors, tValues, dfResid, rSquared: tss > 0 ? 1 - fit.ssr / tss : 0, nobs: n };
  };
  const fitY = equation(dy);
  const fitX = fitY === null ? null : equation(dx);
  return fitY === null || fitX === null ? null : { y: fitY, x: fitX };
}
