/**
 * The one rule against numbers too far apart to compute with: no value may exceed the typical
 * size of its series by more than MAGNITUDE_RANGE. The series cleaner applies it to every series
 * it hands on, and the spread applies it to a spread built on a given hedge ratio, so overflow
 * is refused where it would start, naming the row and the value, instead of turning into NaN
 * in a statistic several steps later.
 *
 * Why a ratio and not a ceiling: a statistic must not depend on the units of the prices, so the
 * same prices times 1e300 or 1e-300 stay acceptable; what no unit can rescue is one value that
 * dwarfs the rest, because the statistics square the values and add the squares (sums of squares,
 * cross products of two series, squared partial sums of KPSS), and a square 1e154 times too big
 * has no double to live in whatever the scale.
 */
import { formatValue } from './clean-series';

/**
 * Widest allowed ratio between a value's magnitude and the series' typical magnitude (its median
 * magnitude). Doubles reach about 1.8e308, so a ratio past about 1.3e154 makes the ratio's
 * square alone overflow. Measured on the engine: with one value 1e150 times a price series
 * every test, estimator and formula still returns finite numbers, and from about 1e154 they fail
 * with NaN. 1e100 keeps fifty orders of magnitude in hand for sums over many rows and products
 * across two series. No price series comes near it: a value that far out is a typing, unit or
 * formula error.
 */
export const MAGNITUDE_RANGE = 1e100;

/** A value too far from the rest: its position, the series' typical magnitude, and how many such values there are. */
export interface MagnitudeOutlier {
  position: number;
  typical: number;
  count: number;
}

/**
 * The first value whose magnitude exceeds MAGNITUDE_RANGE times the median magnitude of the
 * values (of the non-zero values when more than half are zero), or null when there is none. One
 * pass in the ordinary case: the median is only found when the largest and smallest non-zero
 * magnitudes are already that far apart.
 */
export function magnitudeOutlier(values: ArrayLike<number>): MagnitudeOutlier | null {
  const n = values.length;
  let largest = 0;
  let smallest = Infinity;
  for (let i = 0; i < n; i++) {
    const a = Math.abs(values[i]);
    if (a > largest) largest = a;
    if (a !== 0 && a < smallest) smallest = a;
  }
  if (!(largest > MAGNITUDE_RANGE * smallest)) return null;
  const typical = medianMagnitude(values);
  const limit = MAGNITUDE_RANGE * typical;
  let position = -1;
  let count = 0;
  for (let i = 0; i < n; i++) {
    if (Math.abs(values[i]) > limit) {
      if (position < 0) position = i;
      count++;
    }
  }
  return position < 0 ? null : { position, typical, count };
}

/** Median of |v| over the values, or over the non-zero ones when more than half are zero. */
function medianMagnitude(values: ArrayLike<number>): number {
  const all = Float64Array.from(values as ArrayLike<number>, Math.abs).sort();
  const firstNonZero = all.findIndex((a) => a !== 0);
  const pool = firstNonZero > all.length / 2 ? all.subarray(firstNonZero) : all;
  const m = pool.length >> 1;
  return pool.length % 2 === 1 ? pool[m] : (pool[m - 1] + pool[m]) / 2;
}

/** "1e+308, about 10^306 times the series' typical size (60.5)": the value and how far it is out, for a message. */
export function describeMagnitude(value: number, typical: number): string {
  const orders = Math.floor(Math.log10(Math.abs(value)) - Math.log10(typical));
  return `${formatValue(value)}, about 10^${orders} times the series' typical size (${formatValue(typical)})`;
}
