/**
 * Lag choice for the tests on a GLS-detrended series (DF-GLS, Ng-Perron): the regression
 * Δy~_t = gamma y~_{t-1} + sum_{i=1..k} b_i Δy~_{t-i} + e_t, no deterministic terms, on the
 * common sample that kmax allows.
 *
 * - aic, bic: the ADF search's rules (adf-lag-search.ts) on y~ with no deterministic terms.
 * - maic: the modified AIC of Ng & Perron (2001, sec. 4, eq. 9):
 *     MAIC(k) = ln(s2_k) + 2 (tau(k) + k) / n,  tau(k) = gamma_k^2 sum y~_{t-1}^2 / s2_k,
 *   s2_k = SSR_k / n, n the rows of the common sample. The tau(k) term grows when the lagged
 *   level still carries weight, so the rule keeps more lags where a negative moving-average
 *   part would otherwise make the tests reject too often.
 *
 * All fits come from one cross-product matrix (regression/lagged-difference-gram.ts, built in
 * O(n kmax)) and one Cholesky factorisation; the chosen lag is then refitted by QR.
 */
import { MooringInputError } from '../errors';
import { dickeyFullerGram } from '../regression/lagged-difference-gram';
import { chooseAdfLags } from './adf-lag-search';

export type GlsLagRule = 'aic' | 'bic' | 'maic';

export const GLS_LAG_RULES: readonly GlsLagRule[] = ['aic', 'bic', 'maic'];

/** A fixed number of lagged changes, or a rule that chooses it. */
export type GlsLagOption = number | GlsLagRule;

export interface GlsLagChoice {
  lags: number;
  rule: GlsLagRule;
  maxLags: number;
  /** The criterion's value at the chosen lag on the common sample. */
  criterion: number;
}

/** Chooses the number of lagged changes in the regression on the detrended series y~. */
export function chooseGlsLags(detrended: ArrayLike<number>, maxLags: number, rule: GlsLagRule): GlsLagChoice {
  if (!GLS_LAG_RULES.includes(rule)) {
    throw new MooringInputError(`Unknown lag rule '${String(rule)}': use a whole number or one of ${GLS_LAG_RULES.join(', ')}.`);
  }
  if (rule !== 'maic') {
    const choice = chooseAdfLags(detrended, 'none', maxLags, rule);
    return { lags: choice.lags, rule, maxLags, criterion: choice.criterion };
  }
  const gram = dickeyFullerGram(detrended, 'none', maxLags);
  const { xtx, xty, yty, k: width, n } = gram;
  // The Gram's response was divided by responseScale: ln s2 shifts by 2 ln(scale) for every k
  // (the choice is the same); the criterion is reported in the detrended series' own units.
  const shift = 2 * Math.log(gram.responseScale);
  // The Cholesky factor of a leading block is the leading block of the factor, so one
  // factorisation serves every k; only the back substitution for gamma_k differs.
  const size = maxLags + 1;
  const L = new Float64Array(size * size);
  const usable = choleskyInto(xtx, width, size, L);
  const z = new Float64Array(size);
  const b = new Float64Array(size);
  let best = 0;
  let bestValue = Number.POSITIVE_INFINITY;
  let explained = 0;
  for (let k = 0; k < usable; k++) {
    let s = xty[k];
    for (let j = 0; j < k; j++) s -= L[k * size + j] * z[j];
    z[k] = s / L[k * size + k];
    explained += z[k] * z[k];
    const s2 = Math.max(yty - explained, 0) / n;
    if (!(s2 > 0)) break;
    for (let i = k; i >= 0; i--) {
      let v = z[i];
      for (let j = i + 1; j <= k; j++) v -= L[j * size + i] * b[j];
      b[i] = v / L[i * size + i];
    }
    const tau = (b[0] * b[0] * xtx[0]) / s2;
    const value = Math.log(s2) + shift + (2 * (tau + k)) / n;
    if (value < bestValue) {
      bestValue = value;
      best = k;
    }
  }
  return { lags: best, rule, maxLags, criterion: bestValue };
}

/** Cholesky of the leading m x m block of a (width x width) row-major matrix into L (row stride m); returns the columns factored before a breakdown. */
function choleskyInto(a: Float64Array, width: number, m: number, L: Float64Array): number {
  for (let j = 0; j < m; j++) {
    let d = a[j * width + j];
    for (let q = 0; q < j; q++) d -= L[j * m + q] * L[j * m + q];
    if (!(d > 1e-13 * Math.max(a[j * width + j], 1e-300))) return j;
    const ljj = Math.sqrt(d);
    L[j * m + j] = ljj;
    for (let i = j + 1; i < m; i++) {
      let s = a[i * width + j];
      for (let q = 0; q < j; q++) s -= L[i * m + q] * L[j * m + q];
      L[i * m + j] = s / ljj;
    }
  }
  return m;
}
