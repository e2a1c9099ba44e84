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
import { levelText } from '../cointegration/wording';
import { FIELD, PAIR_STATUS, RECORD_SIZE, fieldOrNull, isTested, untestedReason } from './pair-record';
import { benjaminiHochberg } from './benjamini-hochberg';
import { chanceSentence, expectedByChance } from './chance-sentence';
import { screenChunk } from './screen-chunk';
import { decodePairs, rankByEvidence, withinHalfLifeRange, type ScreenPair } from './screen-ranking';
import { resolveScreenOptions, type ScreenOptions, type ScreenSettings } from './screen-options';
import { screenUniverse, unorderedPairAt, unorderedPairCount, type NamedSeries, type ScreenUniverse } from './screen-universe';
import { ORDER_DETERMINISTIC, setAsideReason, setAsideSummary, withSeriesOrders, type SeriesOrder, type SetAsidePair } from './series-orders';

/** The types a caller of screenPairs needs, from one place. */
export type { ScreenPair } from './screen-ranking';
export type { ScreenOptions } from './screen-options';
export type { NamedSeries } from './screen-universe';
export type { SeriesOrder, SetAsidePair } from './series-orders';

/** A directed pair that was not tested, and why. */
export interface UntestedPair {
  y: string;
  x: string;
  reason: string;
}

/** Everything a screen reports. */
export interface ScreenResult {
  /** Tested directed pairs within the half-life range, ranked by evidence. */
  pairs: ScreenPair[];
  /** Each series' order of integration, in the order of `names`. */
  orders: SeriesOrder[];
  /** How the orders were decided: the screen's level and the report's default deterministic terms. */
  orderTests: { alpha: number; deterministic: string; description: string };
  /** Directed pairs not ranked because their series do not share an order of 1 or more, each with its reason. */
  setAside: SetAsidePair[];
  /** The set-aside pairs in a few grouped lines (empty when none was set aside). */
  setAsideSummary: string[];
  /** N x N Engle-Granger p-values, row = y, column = x, for every tested pair (before the half-life range); null on the diagonal and where untested or set aside. */
  matrix: (number | null)[][];
  /** The same for the adjusted p-values. */
  adjustedMatrix: (number | null)[][];
  names: string[];
  alpha: number;
  /** The multiple-testing family, in words and size. */
  family: { size: number; description: string };
  /** Pairs whose own p-value is at or below alpha. */
  rawPasses: number;
  /** tested x alpha: passes expected if no pair were related. */
  expectedByChance: number;
  /** Pairs whose adjusted p-value is at or below alpha (before the half-life range). */
  discoveries: number;
  chanceSentence: string;
  untested: UntestedPair[];
  settings: ScreenSettings;
  /** Sentences a reader should keep in mind. */
  cautions: string[];
}

/** Dependence caution: what Benjamini-Hochberg assumes and how far a pair screen meets it. */
export const DEPENDENCE_CAUTION =
  'The two directions of a pair use the same data, and pairs that share a series are related: Benjamini-Hochberg controls the false-discovery rate ' +
  'for independent or positively dependent tests (Benjamini & Yekutieli 2001), which a pair screen meets only approximately.';

/** A pair that passes a screen is a candidate: it still needs a look at its spread, a check out of sample, and a test for a break. */
export const CANDIDATE_CAUTION =
  'A pair that passes is a candidate to examine, not a trade: look at its spread, check it on rows the screen did not see, and test it for a break.';

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
 * From the records of every unordered pair (in order) to the screen's answer: set-aside pairs,
 * adjustment, matrices, ranking, sentence. The universe must carry its series' orders
 * (withSeriesOrders), the ones the records were made with.
 */
export function finishScreen(universe: ScreenUniverse, settings: ScreenSettings, records: Float64Array): ScreenResult {
  const { names, orders } = universe;
  if (!orders) throw new RangeError('The screen universe carries no orders of integration: decide them with withSeriesOrders first.');
  const N = names.length;
  const directed = N * (N - 1);
  if (records.length !== directed * RECORD_SIZE) throw new RangeError(`Expected ${directed} records, got ${records.length / RECORD_SIZE}.`);
  const tested: number[] = [];
  const untested: UntestedPair[] = [];
  const setAside: SetAsidePair[] = [];
  for (let d = 0; d < directed; d++) {
    const status = records[d * RECORD_SIZE + FIELD.status];
    if (isTested(status)) tested.push(d);
    else if (status === PAIR_STATUS.setAside) {
      const [yi, xi] = directedSeries(d, N);
      setAside.push({ y: names[yi], x: names[xi], orderY: orders[yi].order, orderX: orders[xi].order, reason: setAsideReason(orders[yi], orders[xi]) });
    } else {
      const [yi, xi] = directedSeries(d, N);
      untested.push({ y: names[yi], x: names[xi], reason: untestedReason(status, records[d * RECORD_SIZE + FIELD.nobs], settings.minObservations) });
    }
  }
  const pValues = Float64Array.from(tested, (d) => records[d * RECORD_SIZE + FIELD.pValue]);
  const adjusted = benjaminiHochberg(pValues);
  const matrix: (number | null)[][] = names.map(() => new Array<number | null>(N).fill(null));
  const adjustedMatrix: (number | null)[][] = names.map(() => new Array<number | null>(N).fill(null));
  tested.forEach((d, f) => {
    const [yi, xi] = directedSeries(d, N);
    matrix[yi][xi] = fieldOrNull(records, d, FIELD.pValue);
    adjustedMatrix[yi][xi] = adjusted[f];
  });
  const all = decodePairs(names, records, tested, adjusted, (d) => directedSeries(d, N), settings, orders, universe.scales);
  const position = new Map(names.map((n, i) => [n, i] as const));
  const pairs = rankByEvidence(all.filter((p) => withinHalfLifeRange(p, settings)), position);
  const rawPasses = all.filter((p) => p.pValue <= settings.alpha).length;
  const discoveries = all.filter((p) => p.discovery).length;
  const cautions = [DEPENDENCE_CAUTION, CANDIDATE_CAUTION];
  if (setAside.length > 0) {
    cautions.push(
      `${setAside.length} directed pair${setAside.length === 1 ? ' was' : 's were'} set aside (listed under setAside) and are not in the family: ` +
        'their two series do not wander with the same order. The orders come from unit-root tests, which can misjudge a series near the boundary, ' +
        'so a set-aside pair is not shown to be unrelated.',
    );
  }
  if (untested.length > 0) {
    cautions.push(`${untested.length} directed pair${untested.length === 1 ? ' was' : 's were'} not tested (listed under untested) and are not in the family.`);
  }
  if (settings.minHalfLife !== null || settings.maxHalfLife !== null) {
    const shownDiscoveries = pairs.filter((p) => p.discovery).length;
    cautions.push(
      `The half-life range keeps ${pairs.length} of the ${all.length} tested pairs (${shownDiscoveries} of the ${discoveries} discoveries); ` +
        'it was applied after the adjustment, so the adjusted p-values still count every pair tested.',
    );
  }
  const exact = all.filter((p) => p.statistic === null).length;
  if (exact > 0) cautions.push(`${exact} directed pair${exact === 1 ? ' is' : 's are'} an exact fit (p = 0): one column is probably copied or computed from another.`);
  return {
    pairs,
    orders: orders.map((o) => ({ ...o })),
    orderTests: {
      alpha: settings.alpha,
      deterministic: ORDER_DETERMINISTIC,
      description: `each series' order of integration by ADF from the second differences down, checked by KPSS, at ${levelText(settings.alpha)} with a constant (as in the pairwise report)`,
    },
    setAside,
    setAsideSummary: setAsideSummary(orders, setAside),
    matrix,
    adjustedMatrix,
    names: names.slice(),
    alpha: settings.alpha,
    family: {
      size: tested.length,
      description:
        `every directed pair tested (${tested.length} of the ${directed} ordered pairs of ${N} series: each pair both ways round` +
        `${setAside.length > 0 ? `; ${setAside.length} set aside because their series do not wander with the same order` : ''})`,
    },
    rawPasses,
    expectedByChance: expectedByChance(tested.length, settings.alpha),
    discoveries,
    chanceSentence: chanceSentence({ tested: tested.length, alpha: settings.alpha, rawPasses, discoveries }),
    untested,
    settings,
    cautions,
  };
}

