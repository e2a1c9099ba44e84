/**
 * The ADF regression's tau and level coefficient for long series, from the cross products of
 * its design (regression/lagged-difference-gram.ts: built in O(n p) because the lagged changes
 * are shifted copies of one series) instead of a Householder QR of the n x (p + d + 1) design,
 * which costs O(n p^2) and, at a million rows and Schwert's 120 lags, tens of seconds.
 *
 * The columns are taken in the order [deterministic, lags 1..p, level], so that one Cholesky
 * G = L L' gives the level's coefficient as z_k / L_kk and its t-ratio as z_k / sqrt(SSR / (n - k)),
 * z = L^{-1} X'y and SSR = y'y - z'z (Golub & Van Loan 2013, sec. 5.3.2). The design is mean-free
 * (or trend-free) and at unit scale, a change of parameters that leaves tau as it is.
 *
 * Forming G squares the design's condition and SSR = y'y - z'z cancels when the fit is close, so
 * the answer is given only where both stay small (every pivot keeps PIVOT_FLOOR of its column's
 * size, and SSR keeps SSR_FLOOR of y'y); otherwise null, and the caller fits by QR. Where it is
 * given, tau agrees with the QR fit to about 1e-13 (tested).
 */
import type { Deterministic } from '../result';
import { dickeyFullerGram } from '../regression/lagged-difference-gram';

/** Smallest share of a column's own sum of squares its Cholesky pivot may keep (keeps the design far from collinear). */
const PIVOT_FLOOR = 1e-2;
/** Smallest share of y'y the residual sum of squares may keep (cancellation of at most ~4 digits). */
const SSR_FLOOR = 1e-4;

/** Rows times columns squared above which the cross-product route pays for itself. */
export const ADF_GRAM_WORK = 5e7;

export interface AdfTauByGram {
  tau: number;
  /** Coefficient on the lagged level, in the data's units. */
  gamma: number;
  nobs: number;
}

/** tau and gamma of the ADF regression with `lags` lagged changes, or null where the cross products are not safe. */
export function adfTauByGram(x: ArrayLike<number>, lags: number, deterministic: Deterministic): AdfTauByGram | null {
  const gram = dickeyFullerGram(x, deterministic, lags);
  const k = gram.k;
  const n = gram.n;
  if (n - k < 1) return null;
  // Gram order is [level, deterministic..., lags...]; take the level last.
  const order = [...Array.from({ length: k - 1 }, (_, i) => i + 1), 0];
  const L = new Float64Array(k * k);
  const z = new Float64Array(k);
  let explained = 0;
  for (let j = 0; j < k; j++) {
    const gj = order[j];
    let d = gram.xtx[gj * k + gj];
    for (let m = 0; m < j; m++) d -= L[j * k + m] * L[j * k + m];
    if (!(d > PIVOT_FLOOR * gram.xtx[gj * k + gj])) return null;
    const ljj = Math.sqrt(d);
    L[j * k + j] = ljj;
    for (let i = j + 1; i < k; i++) {
      let s = gram.xtx[order[i] * k + gj];
      for (let m = 0; m < j; m++) s -= L[i * k + m] * L[j * k + m];
      L[i * k + j] = s / ljj;
    }
    let s = gram.xty[gj];
    for (let m = 0; m < j; m++) s -= L[j * k + m] * z[m];
    z[j] = s / ljj;
    explained += z[j] * z[j];
  }
  const ssr = gram.yty - explained;
  if (!(ssr > SSR_FLOOR * gram.yty)) return null;
  const tau = z[k - 1] / Math.sqrt(ssr / (n - k));
  const coefficient = z[k - 1] / L[(k - 1) * k + (k - 1)];
  const gamma = (coefficient * gram.responseScale) / gram.levelScale;
  if (!Number.isFinite(tau) || !Number.isFinite(gamma)) return null;
  return { tau, gamma, nobs: n };
}
