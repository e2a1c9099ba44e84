/**
 * The series of a screen, checked once and packed into one array that a worker thread can
 * receive whole: N series of T rows each, row-aligned, with NaN marking a gap (a row where
 * that series has no price). Each pair is tested on the rows where both series have a price.
 *
 * For a series without gaps the mean and the centred sum of squares are computed here once
 * (two passes, for accuracy), so a pair of complete series needs only its cross product.
 *
 * Each series is stored times a power of two that brings its largest |price| into [1, 2)
 * (linalg/power-of-two-scale.ts): the statistics of a pair are free of units, and the sums of
 * squares would overflow for prices of 1e300 and vanish for 1e-300. The factors travel with the
 * data, and the hedge ratio and intercept are converted back when the pairs are read out.
 */
import { MooringInputError } from '../errors';
import { powerOfTwoScale } from '../linalg/power-of-two-scale';
import type { SeriesOrder } from './series-orders';

/** One named series as a caller hands it in: numbers, with null or NaN for a gap. */
export interface NamedSeries {
  name: string;
  values: ArrayLike<number | null>;
}

/** The packed, checked series. Plain typed arrays and strings, so it crosses to a worker as it is. */
export interface ScreenUniverse {
  names: string[];
  /** Rows per series. */
  rows: number;
  /** Series j occupies data[j * rows .. (j + 1) * rows - 1]; NaN is a gap. */
  data: Float64Array;
  /** 1 where the series has a price on every row. */
  complete: Uint8Array;
  /** Mean of each complete series (NaN for one with gaps). */
  means: Float64Array;
  /** Sum of squared deviations from the mean of each complete series (NaN for one with gaps). */
  centredSquares: Float64Array;
  /** The power of two each series was multiplied by (data, means and centredSquares are in those units). */
  scales: Float64Array;
  /**
   * Each series' order of integration (series-orders.ts), once decided: the chunk function then
   * tests only the pairs whose members share an order of 1 or more. Absent: every pair is tested.
   */
  orders?: SeriesOrder[];
}

/** Checks the series (at least two, unique names, equal lengths, numbers or gaps) and packs them. */
export function screenUniverse(series: readonly NamedSeries[]): ScreenUniverse {
  if (!Array.isArray(series) || series.length < 2) {
    throw new MooringInputError(`A screen needs at least two series; got ${Array.isArray(series) ? series.length : 'no list of series'}.`);
  }
  const names: string[] = [];
  const seen = new Map<string, number>();
  series.forEach((s, j) => {
    const name = s?.name;
    if (typeof name !== 'string' || name.trim() === '') throw new MooringInputError(`Series ${j + 1} has no name: give every series a name.`);
    const key = name.trim().toLowerCase();
    const other = seen.get(key);
    if (other !== undefined) throw new MooringInputError(`Series ${other + 1} and ${j + 1} are both named '${name}': give each series its own name.`);
    seen.set(key, j);
    names.push(name);
  });
  const rows = series[0].values?.length;
  if (typeof rows !== 'number') throw new MooringInputError(`'${names[0]}' has no values.`);
  const N = series.length;
  const data = new Float64Array(N * rows);
  const complete = new Uint8Array(N);
  const means = new Float64Array(N).fill(Number.NaN);
  const centredSquares = new Float64Array(N).fill(Number.NaN);
  const scales = new Float64Array(N).fill(1);
  for (let j = 0; j < N; j++) {
    const values = series[j].values;
    if (values?.length !== rows) {
      throw new MooringInputError(
        `'${names[j]}' has ${values?.length ?? 0} rows but '${names[0]}' has ${rows}: every series must cover the same rows, with a blank (null) where it has no price.`,
        `series '${names[j]}'`,
      );
    }
    // One pass checks the values, copies them and finds the largest |price| (what powerOfTwoScale
    // reads); a second scales them only when the factor is not 1. The screen packs its universe
    // once per run on the main thread, before any worker can help, so this loop is kept lean.
    let gaps = 0;
    let largest = 0;
    const offset = j * rows;
    for (let t = 0; t < rows; t++) {
      const v = values[t];
      if (typeof v === 'number' && v - v === 0) {
        data[offset + t] = v;
        const a = v < 0 ? -v : v;
        if (a > largest) largest = a;
      } else if (v === null || (typeof v === 'number' && Number.isNaN(v))) {
        data[offset + t] = Number.NaN;
        gaps++;
      } else {
        throw new MooringInputError(
          `'${names[j]}' has ${String(v)} at row ${t + 1}: use a number, or a blank (null) for a missing price.`,
          `series '${names[j]}', row ${t + 1}`,
        );
      }
    }
    const factor = powerOfTwoScale([largest]);
    scales[j] = factor;
    if (factor !== 1) for (let t = 0; t < rows; t++) data[offset + t] *= factor;
    if (gaps === 0 && rows > 0) {
      complete[j] = 1;
      let m = 0;
      for (let t = 0; t < rows; t++) m += data[offset + t];
      m /= rows;
      let ss = 0;
      for (let t = 0; t < rows; t++) ss += (data[offset + t] - m) * (data[offset + t] - m);
      means[j] = m;
      centredSquares[j] = ss;
    }
  }
  return { names, rows, data, complete, means, centredSquares, scales };
}

/** Number of unordered pairs of N series. */
export function unorderedPairCount(N: number): number {
  return (N * (N - 1)) / 2;
}

/**
 * The series (i, j), i < j, of unordered pair number k in the order (0,1), (0,2), ..., (0,N-1),
 * (1,2), ...: the order every chunk and every thread counts in.
 */
export function unorderedPairAt(k: number, N: number): [number, number] {
  let i = 0;
  let before = 0;
  while (before + (N - 1 - i) <= k) {
    before += N - 1 - i;
    i++;
  }
  return [i, i + 1 + (k - before)];
}
