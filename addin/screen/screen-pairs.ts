/**
 * Screens every pair of N series for cointegration: each series' order of integration first
 * (series-orders.ts), then Engle-Granger (1987) both ways round with the single-pair defaults
 * on every pair whose two series share an order of 1 or more, a hedge ratio, half-life and
 * latest z-score for each such directed pair, Benjamini-Hochberg (1995) adjusted p-values over
 * the family of every directed pair tested, the chance sentence, and the pairs ranked by
 * evidence. The other pairs are set aside, each with its reason.
 *
 * The family is every directed pair tested: N (N - 1) of them when every series wanders with
 * the same order and every pair has enough shared rows. The half-life range is applied after
 * the adjustment, to what is shown, so a filter never makes the surviving p-values look
 * better than the search that found them.
 */
import { FIELD, RECORD_SIZE, fieldOrNull, isTested } from './pair-record';
import { screenChunk } from './screen-chunk';
import type { ScreenPair } from './screen-ranking';
import { resolveScreenOptions, type ScreenOptions, type ScreenSettings } from './screen-options';
import { ScreenTally, type ScreenSummary } from './screen-tally';
import { screenUniverse, unorderedPairAt, unorderedPairCount, type NamedSeries, type ScreenUniverse } from './screen-universe';
import { setAsidePairs, withSeriesOrders, type SetAsidePair } from './series-orders';

/** The types a caller of screenPairs needs, from one place. */
export type { ScreenPair } from './screen-ranking';
export type { ScreenOptions } from './screen-options';
export type { NamedSeries } from './screen-universe';
export type { SeriesOrder, SetAsidePair } from './series-orders';
export type { ScreenSummary, UntestedPair } from './screen-tally';
export { CANDIDATE_CAUTION, DEPENDENCE_CAUTION } from './screen-tally';

/** Everything a screen reports, every pair kept: the summary with every ranked pair, the set-aside list and the matrices. */
export interface ScreenResult extends ScreenSummary {
  /** Tested directed pairs within the half-life range, ranked by evidence: all of them. */
  pairs: ScreenPair[];
  /** Directed pairs not ranked because their series do not share an order of 1 or more, each with its reason. */
  setAside: SetAsidePair[];
  /** N x N Engle-Granger p-values, row = y, column = x, for every tested pair (before the half-life range); null on the diagonal and where untested or set aside. */
  matrix: (number | null)[][];
  /** The same for the adjusted p-values. */
  adjustedMatrix: (number | null)[][];
}

/** Directed record d: [y, x] series indices (2k is the first of unordered pair k on the second). */
export function directedSeries(d: number, N: number): [number, number] {
  const [i, j] = unorderedPairAt(Math.floor(d / 2), N);
  return d % 2 === 0 ? [i, j] : [j, i];
}

/** Screens every pair of the series on one thread (see the file comment). */
export function screenPairs(series: readonly NamedSeries[], options: ScreenOptions = {}): ScreenResult {
  const settings = resolveScreenOptions(options);
  const universe = withSeriesOrders(screenUniverse(series), settings);
  const records = screenChunk(universe, settings, 0, unorderedPairCount(universe.names.length));
  return finishScreen(universe, settings, records);
}

/**
 * From the records of every unordered pair (in order) to the screen's answer with every pair
 * kept: the tally (screen-tally.ts) and, from the same records, the set-aside list and the
 * matrices. The universe must carry its series' orders (withSeriesOrders), the ones the records
 * were made with. For a universe too large to keep every pair, use ScreenTally directly.
 */
export function finishScreen(universe: ScreenUniverse, settings: ScreenSettings, records: Float64Array): ScreenResult {
  const tally = new ScreenTally(universe, settings);
  const N = universe.names.length;
  const directed = N * (N - 1);
  if (records.length !== directed * RECORD_SIZE) throw new RangeError(`Expected ${directed} records, got ${records.length / RECORD_SIZE}.`);
  tally.add(0, records);
  const { summary, adjustment } = tally.finish();
  const matrix: (number | null)[][] = summary.names.map(() => new Array<number | null>(N).fill(null));
  const adjustedMatrix: (number | null)[][] = summary.names.map(() => new Array<number | null>(N).fill(null));
  for (let d = 0; d < directed; d++) {
    if (!isTested(records[d * RECORD_SIZE + FIELD.status])) continue;
    const [yi, xi] = directedSeries(d, N);
    matrix[yi][xi] = fieldOrNull(records, d, FIELD.pValue);
    adjustedMatrix[yi][xi] = adjustment.adjusted(records[d * RECORD_SIZE + FIELD.pValue]);
  }
  return { ...summary, setAside: setAsidePairs(universe.orders ?? []), matrix, adjustedMatrix };
}
