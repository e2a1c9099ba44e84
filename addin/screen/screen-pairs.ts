/**
 * Screens every pair of N series for cointegration: Engle-Granger (1987) both ways round
 * with the single-pair defaults, a hedge ratio, half-life and latest z-score for each
 * directed pair, Benjamini-Hochberg (1995) adjusted p-values over the family of every
 * directed pair tested, the chance sentence, and the pairs ranked by evidence.
 *
 * The family is every directed pair tested: N (N - 1) of them when every pair has enough
 * shared rows. The half-life range is applied after the adjustment, to what is shown, so a
 * filter never makes the surviving p-values look better than the search that found them.
 */
import { FIELD, RECORD_SIZE, fieldOrNull, isTested, untestedReason } from './pair-record';
import { benjaminiHochberg } from './benjamini-hochberg';
import { chanceSentence, expectedByChance } from './chance-sentence';
import { screenChunk } from './screen-chunk';
import { decodePairs, rankByEvidence, withinHalfLifeRange, type ScreenPair } from './screen-ranking';
import { resolveScreenOptions, type ScreenOptions, type ScreenSettings } from './screen-options';
import { screenUniverse, unorderedPairAt, unorderedPairCount, type NamedSeries, type ScreenUniverse } from './screen-universe';

/** The types a caller of screenPairs needs, from one place. */
export type { ScreenPair } from './screen-ranking';
export type { ScreenOptions } from './screen-options';
export type { NamedSeries } from './screen-universe';

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
  /** N x N Engle-Granger p-values, row = y, column = x, for every tested pair (before the half-life range); null on the diagonal and where untested. */
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
  const universe = screenUniverse(series);
  const settings = resolveScreenOptions(options);
  const records = screenChunk(universe, settings, 0, unorderedPairCount(universe.names.length));
  return finishScreen(universe, settings, records);
}

/** From the records of every unordered pair (in order) to the screen's answer: adjustment, matrices, ranking, sentence. */
export function finishScreen(universe: ScreenUniverse, settings: ScreenSettings, records: Float64Array): ScreenResult {
  const { names } = universe;
  const N = names.length;
  const directed = N * (N - 1);
  if (records.length !== directed * RECORD_SIZE) throw new RangeError(`Expected ${directed} records, got ${records.length / RECORD_SIZE}.`);
  const tested: number[] = [];
  const untested: UntestedPair[] = [];
  for (let d = 0; d < directed; d++) {
    const status = records[d * RECORD_SIZE + FIELD.status];
    if (isTested(status)) tested.push(d);
    else {
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
  const all = decodePairs(names, records, tested, adjusted, (d) => directedSeries(d, N), settings);
  const position = new Map(names.map((n, i) => [n, i] as const));
  const pairs = rankByEvidence(all.filter((p) => withinHalfLifeRange(p, settings)), position);
  const rawPasses = all.filter((p) => p.pValue <= settings.alpha).length;
  const discoveries = all.filter((p) => p.discovery).length;
  const cautions = [DEPENDENCE_CAUTION, CANDIDATE_CAUTION];
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
    matrix,
    adjustedMatrix,
    names: names.slice(),
    alpha: settings.alpha,
    family: {
      size: tested.length,
      description: `every directed pair tested (${tested.length} of the ${directed} ordered pairs of ${N} series: each pair both ways round)`,
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

