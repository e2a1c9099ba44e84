/**
 * What the Ng-Perron statistics need from the regression
 *   Δy~_t = gamma y~_{t-1} + sum_{i=1..k} b_i Δy~_{t-i} + e_t
 * (m-statistics.ts): its residual sum of squares and the sum of its lag coefficients, for long
 * series with many lags, from the regression's cross products (regression/lagged-difference-gram.ts,
 * built in O(n k)) instead of a Householder QR of the n x (k + 1) design. At a million rows and
 * Schwert's 120 lags the QR design alone is about 1 GB and the fit takes half a minute.
 *
 * The normal equations are solved by one Cholesky of the cross products and refined from the true
 * residuals (the refinement of adf-tau-gram.ts, which DF-GLS's long route uses: Higham 2002,
 * ch. 12 and sec. 20.5), so the residual sum of squares is r'r and does not cancel. The answer is
 * given only where the last correction moves 1 - sum b_i by at most REFINE_SUM_TOLERANCE of it
 * (s2_AR divides by its square); otherwise null, and the caller fits by QR.
 */
import { dickeyFullerGram } from '../regression/lagged-difference-gram';
import { OrderedDesign, orderedCholesky, refinedFit } from './adf-tau-gram';

/** Largest share of |1 - sum b_i| the last refinement step may move it by. */
const REFINE_SUM_TOLERANCE = 1e-12;

export interface SpectralInputs {
  /** Residual sum of squares, in the detrended series' units. */
  ssr: number;
  /** Sum of the lag coefficients b_1..b_k. */
  lagSum: number;
  nobs: number;
}

/** The residual sum of squares and lag-coefficient sum of the regression above with `lags` lags, or null where the route declines. */
export function spectralInputsByGram(detrended: ArrayLike<number>, lags: number): SpectralInputs | null {
  const gram = dickeyFullerGram(detrended, 'none', lags);
  const { k, n } = gram;
  if (n - k < 1) return null;
  // Gram order is [level, lags 1..k-1]; the ordered design takes the lags first, then the level.
  const order = [...Array.from({ length: k - 1 }, (_, i) => i + 1), 0];
  const L = orderedCholesky(gram, order);
  if (L === null) return null;
  const design = new OrderedDesign(gram, order);
  const y = gram.dx.subarray(gram.start, gram.start + n);
  const fit = refinedFit(design, L, k, k, y);
  if (fit === null) return null;
  // The lags are shifted copies of the response (one scale), so their coefficients need no rescaling.
  let lagSum = 0;
  let lastStep = 0;
  for (let i = 0; i < k - 1; i++) {
    lagSum += fit.b[i];
    lastStep += fit.lastCorrection[i];
  }
  if (!(Math.abs(lastStep) <= REFINE_SUM_TOLERANCE * Math.abs(1 - lagSum))) return null;
  const ssr = fit.ssr * gram.responseScale * gram.responseScale;
  if (!Number.isFinite(ssr) || !Number.isFinite(lagSum)) return null;
  return { ssr, lagSum, nobs: n };
}
