/**
 * z-scores of a spread: how many standard deviations it stands from its mean, over the
 * full sample or over a trailing window. Standard deviations use n - 1 (the sample standard
 * deviation, as STDEV.S in a spreadsheet).
 *
 * The rolling version slides the window's mean and sum of squared deviations forward
 * (O(n) in all) with the engine the rolling relation uses (stability/sliding-comoments.ts):
 * deviations from the running mean, and a fresh pass over the window whenever a removal
 * cancelled too many digits, so an outlier leaving the window leaves nothing behind and each
 * window's z-score is the one a fresh pass over its values gives.
 */
import { MooringInputError } from '../errors';
import { requireAlignedSeries } from '../cointegration/cointegrating-regression';
import { toUnitScale } from '../linalg/power-of-two-scale';
import { SlidingComoments } from '../stability/sliding-comoments';

/**
 * A window counts as constant when its standard deviation is at most this share of its mean's
 * size: its values then differ only in their last few digits, where rounding decides.
 */
const CONSTANT_WINDOW = 1e-12;

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
  // z-scores are free of units; the sum of squares is not (it overflows for spreads of 1e300 and
  // vanishes for 1e-300), so it runs on the spread brought to a size near one by a power of two.
  const { values: unit, factor } = toUnitScale(spread);
  const mean = meanOf(unit);
  let ss = 0;
  for (let i = 0; i < n; i++) ss += (unit[i] - mean) ** 2;
  const standardDeviation = Math.sqrt(ss / (n - 1));
  if (!(standardDeviation > 0)) throw new MooringInputError('The spread is constant, so it has no z-score: every value equals the mean.');
  const values = new Float64Array(n);
  for (let i = 0; i < n; i++) values[i] = (unit[i] - mean) / standardDeviation;
  return { values, mean: mean / factor, standardDeviation: standardDeviation / factor };
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
  const out: (number | null)[] = new Array(n).fill(null);
  const { values: unit } = toUnitScale(spread); // as in zScore: no overflow or underflow in the squares
  const sliding = new SlidingComoments(1, (t, row) => {
    row[0] = unit[t];
  });
  for (let i = window - 1; i < n; i++) {
    sliding.moveTo(i - window + 1, i);
    const mean = sliding.moments.mean(0);
    const sd = Math.sqrt(Math.max(sliding.moments.comoment(0, 0), 0) / (window - 1));
    out[i] = sd > 0 && sd > CONSTANT_WINDOW * Math.abs(mean) ? (unit[i] - mean) / sd : null;
  }
  return out;
}
