/**
 * The augmented Dickey-Fuller regression with p lagged changes, fitted by QR on every
 * observation it can use (T - 1 - p rows):
 *   Δx_t = gamma x_{t-1} + sum_{i=1..p} c_i Δx_{t-i} + deterministic terms + e_t.
 * Column order [lagged level, lags 1..p, deterministic] is the reference library's;
 * tau is the t-ratio of gamma with s^2 = SSR / (n - k).
 */
import { MooringInputError } from '../errors';
import type { Deterministic } from '../result';
import { deterministicColumns, deterministicNames } from '../regression/deterministic-terms';
import { type LeastSquaresFit, leastSquares } from '../regression/least-squares';

export interface AdfRegression {
  fit: LeastSquaresFit;
  /** t-ratio of the lagged level. */
  tau: number;
  /** Coefficient on the lagged level (rho - 1). */
  gamma: number;
  lags: number;
  nobs: number;
}

export function adfRegression(x: ArrayLike<number>, lags: number, deterministic: Deterministic, options: { withoutCovariance?: boolean } = {}): AdfRegression {
  const T = x.length;
  const n = T - 1 - lags;
  if (n <= 0) throw new MooringInputError(`${T} observations are too few for ${lags} lags.`);
  const y = new Float64Array(n);
  const level = new Float64Array(n);
  const lagColumns: Float64Array[] = [];
  for (let i = 1; i <= lags; i++) lagColumns.push(new Float64Array(n));
  for (let r = 0; r < n; r++) {
    const t = r + lags; // index into the changes dx[t] = x[t+1] - x[t]
    y[r] = x[t + 1] - x[t];
    level[r] = x[t];
    for (let i = 1; i <= lags; i++) lagColumns[i - 1][r] = x[t + 1 - i] - x[t - i];
  }
  const columns = [level, ...lagColumns, ...deterministicColumns(deterministic, n)];
  const names = ['lagged level', ...lagColumns.map((_, i) => `change lag ${i + 1}`), ...deterministicNames(deterministic)];
  const fit = leastSquares(y, columns, { names });
  return { fit, tau: fit.tValues[0], gamma: fit.coefficients[0], lags, nobs: n };
}
