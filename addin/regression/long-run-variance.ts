/**
 * Long-run variance of a residual series with the Bartlett kernel (Newey & West 1987):
 *   lambda^2 = (1/n) [ sum u_t^2 + 2 sum_{i=1..L} (1 - i/(L+1)) sum_t u_t u_{t-i} ],
 * and the automatic bandwidth of Newey & West (1994) for that kernel, in the form Hobijn,
 * Franses & Ooms (1998) give for the KPSS test:
 *   n_c = floor(n^(2/9)) autocovariances; s0 = g0 + 2 sum_{j<=n_c} g_j; s1 = 2 sum_{j<=n_c} j g_j;
 *   gamma = 1.1447 ((s1/s0)^2)^(1/3); L = floor(gamma n^(1/3)), at most n - 1.
 *
 * Which test uses which rule: KPSS and Phillips-Perron ("auto") use this automatic bandwidth
 * on their own residuals; a fixed bandwidth is used exactly as given.
 */
import { MooringInputError } from '../errors';

/** Bartlett-kernel long-run variance with bandwidth L (L = 0 gives the plain variance sum u^2 / n). */
export function bartlettLongRunVariance(u: ArrayLike<number>, bandwidth: number): number {
  const n = u.length;
  if (!Number.isInteger(bandwidth) || bandwidth < 0) {
    throw new MooringInputError(`The bandwidth must be a whole number of 0 or more; got ${bandwidth}.`);
  }
  if (bandwidth >= n) {
    throw new MooringInputError(`A bandwidth of ${bandwidth} is too large for ${n} observations: the largest allowed is ${n - 1}.`);
  }
  let s = 0;
  for (let t = 0; t < n; t++) s += u[t] * u[t];
  for (let i = 1; i <= bandwidth; i++) {
    let c = 0;
    for (let t = i; t < n; t++) c += u[t] * u[t - i];
    s += 2 * (1 - i / (bandwidth + 1)) * c;
  }
  if (!Number.isFinite(s)) throw overflowError();
  return s / n;
}

/** Sums of squared residuals past the largest double: said where it happens, not passed on as NaN. */
export function overflowError(): MooringInputError {
  return new MooringInputError(
    'The long-run variance overflows: the squares of these residuals pass the largest number a double holds (about 1.8e308). ' +
      'Divide the prices by a power of ten (the test does not depend on their units) and run it again.');
}

/** Newey & West (1994) automatic Bartlett bandwidth, capped at n - 1. */
export function neweyWestBandwidth(u: ArrayLike<number>): number {
  const n = u.length;
  const covLags = Math.floor(Math.pow(n, 2 / 9));
  let g0 = 0;
  for (let t = 0; t < n; t++) g0 += u[t] * u[t];
  let s0 = g0 / n;
  let s1 = 0;
  for (let j = 1; j <= covLags; j++) {
    let c = 0;
    for (let t = j; t < n; t++) c += u[t] * u[t - j];
    const twice = (2 * c) / n;
    s0 += twice;
    s1 += j * twice;
  }
  if (!Number.isFinite(s0) || !Number.isFinite(s1)) throw overflowError();
  if (!(s0 > 0)) return 0;
  const ratio = s1 / s0;
  const gamma = 1.1447 * Math.pow(ratio * ratio, 1 / 3);
  return Math.min(Math.floor(gamma * Math.pow(n, 1 / 3)), n - 1);
}
