/**
 * The modified unit-root statistics of Ng & Perron (2001, sec. 2) on a GLS-detrended series
 * y~_1..y~_T, with kappa = T^-2 sum_{t=2..T} y~_{t-1}^2 and the autoregressive spectral
 * estimate s2_AR = s2_k / (1 - sum b_i)^2 (their eq. 7), s2_k = SSR / n the residual variance
 * of the regression Δy~_t = gamma y~_{t-1} + sum_{i=1..k} b_i Δy~_{t-i} + e_t over its n rows:
 *   MZa = (y~_T^2 / T - s2_AR) / (2 kappa)
 *   MSB = sqrt(kappa / s2_AR)
 *   MZt = MZa * MSB
 *   MPT = (c^2 kappa - c y~_T^2 / T) / s2_AR               (constant)
 *   MPT = (c^2 kappa + (1 - c) y~_T^2 / T) / s2_AR         (constant and trend)
 * All four reject a unit root for small values.
 */
import type { AdfRegression } from './adf-regression';
import type { GlsDeterministic } from './gls-detrend';

export interface MStatistics {
  MZa: number;
  MZt: number;
  MSB: number;
  MPT: number;
  /** The autoregressive spectral estimate at frequency zero (in the detrended series' unit scale). */
  s2AR: number;
}

export const M_STATISTIC_NAMES = ['MZa', 'MZt', 'MSB', 'MPT'] as const;
export type MStatisticName = (typeof M_STATISTIC_NAMES)[number];

export function mStatistics(detrended: ArrayLike<number>, regression: AdfRegression, deterministic: GlsDeterministic, cbar: number): MStatistics {
  const { fit, lags, nobs } = regression;
  let lagSum = 0;
  for (let i = 1; i <= lags; i++) lagSum += fit.coefficients[i];
  return mStatisticsFrom(detrended, { ssr: fit.ssr, lagSum, nobs }, deterministic, cbar);
}

/** The same statistics from the regression's residual sum of squares, lag-coefficient sum and rows (however fitted). */
export function mStatisticsFrom(detrended: ArrayLike<number>, fit: { ssr: number; lagSum: number; nobs: number }, deterministic: GlsDeterministic, cbar: number): MStatistics {
  const T = detrended.length;
  const { ssr, lagSum, nobs } = fit;
  const s2AR = ssr / nobs / ((1 - lagSum) * (1 - lagSum));
  let sum = 0;
  for (let t = 0; t < T - 1; t++) sum += detrended[t] * detrended[t];
  const kappa = sum / (T * T);
  const end = (detrended[T - 1] * detrended[T - 1]) / T;
  const MZa = (end - s2AR) / (2 * kappa);
  const MSB = Math.sqrt(kappa / s2AR);
  const MPT = deterministic === 'const'
    ? (cbar * cbar * kappa - cbar * end) / s2AR
    : (cbar * cbar * kappa + (1 - cbar) * end) / s2AR;
  return { MZa, MZt: MZa * MSB, MSB, MPT, s2AR };
}
