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
 * Only the choice is made here; the chosen model is fitted by QR (error-correction.ts).
 */
import { choleskyFactor, forwardSolve } from '../regression/refined-least-squares';
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
