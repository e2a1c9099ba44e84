/**
 * A Bartlett bandwidth for the long-run variance of a persistent residual: Andrews' (1991)
 * AR(1) plug-in rule. With rho the first-order autocorrelation of u,
 *   alpha = 4 rho^2 / ((1 - rho)^2 (1 + rho)^2),   S = 1.1447 (alpha n)^(1/3)
 * (Andrews 1991, eqs. 6.2 and 6.4, Bartlett kernel). The kernel of regression/long-run-variance.ts
 * weights lag i by 1 - i/(L + 1), so S corresponds to L = ceil(S) - 1.
 *
 * Why dynamic OLS uses it (cointegration/dynamic-ols.ts, on every surface): the spread of a
 * cointegrated pair is persistent
 * (an AR(1) coefficient of 0.94 is a half-life of 12 days), and the Newey-West automatic rule
 * starts from only n^(2/9) autocovariances, so it picks a short bandwidth there and the
 * standard error of beta comes out too small. The plug-in grows with the persistence.
 * |rho| is capped at 0.97 (a common guard, so a near-unit-root residual does not ask for a
 * bandwidth of the whole sample), and L at a third of n.
 */
import { overflowError } from './long-run-variance';

/** Largest |rho| the plug-in uses. */
export const RHO_CAP = 0.97;

/** Andrews' AR(1) plug-in Bartlett bandwidth of u, with the autocorrelation it used. */
export function persistentBandwidth(u: ArrayLike<number>): { bandwidth: number; rho: number } {
  const n = u.length;
  let num = 0;
  let den = 0;
  for (let t = 1; t < n; t++) {
    num += u[t] * u[t - 1];
    den += u[t - 1] * u[t - 1];
  }
  if (!Number.isFinite(num) || !Number.isFinite(den)) throw overflowError();
  const raw = den > 0 ? num / den : 0;
  const rho = Math.max(-RHO_CAP, Math.min(RHO_CAP, raw));
  const alpha = (4 * rho * rho) / ((1 - rho) ** 2 * (1 + rho) ** 2);
  const s = 1.1447 * Math.cbrt(alpha * n);
  const bandwidth = Math.max(0, Math.min(Math.ceil(s) - 1, Math.floor(n / 3)));
  return { bandwidth, rho };
}
