/**
 * z-scores of a spread: how many standard deviations it stands from its mean, over the
 * full sample or over a trailing window. Standard deviations use n - 1 (the sample standard
 * deviation, as STDEV.S in a spreadsheet).
 *
 * The rolling version keeps running sums of s and s^2 over the window (O(n) in all). To keep
 * the sum of squares from losing digits on series far from zero, values are first taken
 * relative to the full-sample mean (a shift that changes no z-score).
 */
import { MooringInputError } from '../errors';
import { requireAlignedSeries } from '../cointegration/cointegrating-regression';

export interface ZScores {
  values: Float64Array;
  mean: number;
  standardDeviation: number;
}

function meanOf(s: ArrayLike<number>): number {
  let m = 0;
  for (let i = 0; i < s.length; i++) m += s[i];
  return m / s.length;
}

/** (s_t - mean) / sd over the full sample. Refuses a constant series. */
export function zScore(spread: ArrayLike<number>): ZScores {
  const n = requireAlignedSeries([spread], ['the spread']);
  if (n < 2) throw new MooringInputError(`${n} value is too few for a z-score: it needs at least 2.`);
  const mean = meanOf(spread);
  let ss = 0;
  for (let i = 0; i < n; i++) ss += (spread[i] - mean) ** 2;
  const standardDeviation = Math.sqrt(ss / (n - 1));
  if (!(standardDeviation > 0)) throw new MooringInputError('The spread is constant, so it has no z-score: every value equals the mean.');
  const values = new Float64Array(n);
  for (let i = 0; i < n; i++) values[i] = (spread[i] - mean) / standardDeviation;
  return { values, mean, standardDeviation };
}

/**
 * z-score of each value against the trailing window that ends on it (window values,
 * itself included). The first window - 1 entries are null; so is any entry whose window is
 * constant. Refuses window < 3 or window > n.
 */
export function rollingZScore(spread: ArrayLike<number>, window: number): (number | null)[] {
  const n = requireAlignedSeries([spread], ['the spread']);
  if (!Number.isInteger(window) || window < 3) {
    throw new MooringInputError(`The rolling window must be a whole number of at least 3 values; got ${window}.`);
  }
  if (window > n) throw new MooringInputError(`A rolling window of ${window} is longer than the spread (${n} values): use at most ${n}.`);
  const shift = meanOf(spread);
  const out: (number | null)[] = new Array(n).fill(null);
  let sum = 0;
  let sumSquares = 0;
  for (let i = 0; i < n; i++) {
    const v = spread[i] - shift;
    sum += v;
    sumSquares += v * v;
    if (i >= window) {
      const old = spread[i - window] - shift;
      sum -= old;
      sumSquares -= old * old;
    }
    if (i < window - 1) continue;
    const mean = sum / window;
    const variance = Math.max((sumSquares - window * mean * mean) / (window - 1), 0);
    const sd = Math.sqrt(variance);
    // Running sums carry rounding of order sqrt(eps) relative to the window's size, so a
    // standard deviation below 1e-7 of the window's root mean square counts as constant.
    out[i] = sd > 1e-7 * Math.sqrt(sumSquares / window) ? (v - mean) / sd : null;
  }
  return out;
}
