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
  let s: number;
  if (n * (bandwidth + 1) > BARTLETT_WINDOW_WORK) {
    s = bartlettByWindows(u, bandwidth);
  } else {
    const c = autocovarianceSums(u, bandwidth);
    s = c[0];
    for (let i = 1; i <= bandwidth; i++) s += 2 * (1 - i / (bandwidth + 1)) * c[i];
  }
  if (!Number.isFinite(s)) throw overflowError();
  return s / n;
}

/** Rows times lags above which the Bartlett sum is taken from window sums (O(n)) rather than lag by lag (O(n L)). */
export const BARTLETT_WINDOW_WORK = 2e7;

/**
 * The Bartlett-weighted sum c_0 + 2 sum_{i=1..L} (1 - i/(L+1)) c_i in O(n + L): it equals
 * (1/(L+1)) sum over every window of L + 1 consecutive positions that meets the data (the
 * windows starting at -L .. n-1, cut to the data) of the square of the window's sum, since a
 * pair of rows i apart shares L + 1 - i such windows. A sum of squares does not cancel, so
 * it is at least as exact as the lag-by-lag sum. Each window's sum is carried from the last
 * (one row in, one out) and recomputed from its rows every L + 1 windows, so rounding does not
 * travel further than one window length.
 */
export function bartlettByWindows(u: ArrayLike<number>, L: number): number {
  const n = u.length;
  const width = L + 1;
  let total = 0;
  let w = 0;
  for (let start = -L; start < n; start++) {
    const from = Math.max(0, start);
    const to = Math.min(n - 1, start + L);
    if ((start + L) % width === 0) {
      w = 0;
      for (let t = from; t <= to; t++) w += u[t];
    } else {
      if (start + L <= n - 1) w += u[start + L];
      if (start - 1 >= 0) w -= u[start - 1];
    }
    total += w * w;
  }
  return total / width;
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
  const c = autocovarianceSums(u, Math.min(covLags, n - 1));
  let s0 = c[0] / n;
  let s1 = 0;
  for (let j = 1; j <= covLags; j++) {
    const twice = (2 * (c[j] ?? 0)) / n;
    s0 += twice;
    s1 += j * twice;
  }
  if (!Number.isFinite(s0) || !Number.isFinite(s1)) throw overflowError();
  if (!(s0 > 0)) return 0;
  const ratio = s1 / s0;
  const gamma = 1.1447 * Math.pow(ratio * ratio, 1 / 3);
  return Math.min(Math.floor(gamma * Math.pow(n, 1 / 3)), n - 1);
}

/** Lags whose sums share one sweep over the data in autocovarianceSums. */
const LAGS_PER_SWEEP = 8;

/**
 * c[i] = sum_{t=i..n-1} u_t u_{t-i} for i = 0..maxLag (maxLag < n): the unscaled
 * autocovariances both the Bartlett sum and the bandwidth rule need.
 *
 * Eight lags are accumulated in one sweep, each in its own running sum: the data pass through
 * the cache once per eight lags instead of once per lag, and the eight chains of additions run
 * side by side instead of one waiting on the next. Each sum still adds its terms in the order
 * t = i, i+1, ..., n-1, so every c[i] is the same double as one lag per pass gives.
 */
export function autocovarianceSums(u: ArrayLike<number>, maxLag: number): Float64Array {
  const n = u.length;
  const c = new Float64Array(maxLag + 1);
  for (let first = 0; first <= maxLag; first += LAGS_PER_SWEEP) {
    const last = Math.min(first + LAGS_PER_SWEEP - 1, maxLag);
    if (last - first + 1 < LAGS_PER_SWEEP) {
      for (let i = first; i <= last; i++) {
        let s = 0;
        for (let t = i; t < n; t++) s += u[t] * u[t - i];
        c[i] = s;
      }
      continue;
    }
    let s0 = 0;
    let s1 = 0;
    let s2 = 0;
    let s3 = 0;
    let s4 = 0;
    let s5 = 0;
    let s6 = 0;
    let s7 = 0;
    const f = first;
    // The head: t from f to f + 6, where only the lags up to t have terms yet (in order).
    const head = Math.min(f + LAGS_PER_SWEEP - 1, n);
    for (let t = f; t < head; t++) {
      const ut = u[t];
      const back = t - f; // lags f..f+back have a term at t
      s0 += ut * u[t - f];
      if (back >= 1) s1 += ut * u[t - f - 1];
      if (back >= 2) s2 += ut * u[t - f - 2];
      if (back >= 3) s3 += ut * u[t - f - 3];
      if (back >= 4) s4 += ut * u[t - f - 4];
      if (back >= 5) s5 += ut * u[t - f - 5];
      if (back >= 6) s6 += ut * u[t - f - 6];
    }
    for (let t = head; t < n; t++) {
      const ut = u[t];
      const b = t - f;
      s0 += ut * u[b];
      s1 += ut * u[b - 1];
      s2 += ut * u[b - 2];
      s3 += ut * u[b - 3];
      s4 += ut * u[b - 4];
      s5 += ut * u[b - 5];
      s6 += ut * u[b - 6];
      s7 += ut * u[b - 7];
    }
    c[f] = s0;
    c[f + 1] = s1;
    c[f + 2] = s2;
    c[f + 3] = s3;
    c[f + 4] = s4;
    c[f + 5] = s5;
    c[f + 6] = s6;
    c[f + 7] = s7;
  }
  return c;
}
