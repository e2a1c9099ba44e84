/**
 * MOOR.HEDGE, MOOR.SPREAD, MOOR.HALFLIFE and MOOR.ZSCORE: the long-run line of a pair and the
 * spread it leaves, from ranges lined up by row. Spilled results follow the input's layout (a
 * column for column input, a row for row input) and start with an empty cell for every blank
 * the input began with, so each value sits beside the prices it came from.
 */
import { cointegratingRegression } from '../../addin/cointegration/cointegrating-regression';
import { dynamicOlsHedgeRatio, olsHedgeRatio, reverseOlsHedgeRatio, totalLeastSquaresHedgeRatio, type HedgeRatio } from '../../addin/cointegration/hedge-ratio';
import { halfLife } from '../../addin/spread/half-life';
import { roundingNoiseOf } from '../../addin/spread/rounding-noise';
import { spreadSeries } from '../../addin/spread/spread-series';
import { rollingZScore, zScore } from '../../addin/spread/z-score';
import { NoValue } from '../cells/no-value';
import { readPair, readRelation, readSeries, type Orientation } from '../cells/range-input';
import { decimalValue, isOmitted, optionWord, prepValue, wholeNumber } from '../options/option-values';
import { HALF_LIFE_SHOW_WORDS, HEDGE_SHOW_WORDS, HEDGE_WORDS, type HedgeWord } from '../options/option-words';
import { HALF_LIFE_INTERVAL_METHOD } from '../../addin/spread/half-life-interval';
import { CAUTION } from '../render/result-rows';
import { hedgeUnits } from '../../addin/cointegration/hedge-units';
import { cellNumber, spillByRow } from '../render/cell-number';

/** The spread and where its first value sits. */
interface SpreadOf {
  values: Float64Array;
  orientation: Orientation;
  /** Source index of each value in the range, so the spill lines up with the rows it came from. */
  rows: Int32Array;
}

function hedgeRatio(method: HedgeWord, y: Float64Array, x: Float64Array): HedgeRatio {
  switch (method) {
    case 'ols':
      return olsHedgeRatio(y, x);
    case 'reverse-ols':
      return reverseOlsHedgeRatio(y, x);
    case 'tls':
      return totalLeastSquaresHedgeRatio(y, x);
    case 'dols':
      return dynamicOlsHedgeRatio(y, x).ratio;
  }
}

/** A single x for the pair functions: one column (or row) beside y. */
function pairOf(y: unknown, x: unknown, prep: unknown) {
  return readPair(y, x, { y: 'y', x: 'x' }, 'a hedge ratio', prepValue(prep));
}

/** Units of x per unit of y in the line y = intercept + beta x. */
export function hedgeCell(y: unknown, x: unknown, method: unknown, show: unknown, prep?: unknown): number {
  const word = optionWord('method', method, HEDGE_WORDS, 'ols');
  const what = optionWord('show', show, HEDGE_SHOW_WORDS, 'slope');
  const pair = pairOf(y, x, prep);
  const slope = cellNumber(hedgeRatio(word, pair.y.values, pair.x.values).beta, 'The hedge ratio');
  if (what === 'slope') return slope;
  return hedgeUnits(slope, pair.y.values, pair.x.values, pair.y.logged, { y: 'y', x: 'x' }).hedgeUnits;
}

/** The Engle-Granger spread (step-1 residual, with a constant) of y on the xs, or y itself when x is left out. */
function spreadOf(y: unknown, x: unknown, prep: unknown): SpreadOf {
  const how = prepValue(prep);
  if (isOmitted(x)) {
    const single = readSeries(y, 'y', how);
    return { values: single.series.values, orientation: single.orientation, rows: single.series.rows };
  }
  const input = readRelation(y, x, undefined, how);
  const step1 = cointegratingRegression(input.y.values, input.xs.map((s) => s.values), 'const', { y: input.y.name, xs: input.xs.map((s) => s.name) });
  // The one check of every surface (addin/spread/rounding-noise.ts): #N/A with its sentence.
  const noise = roundingNoiseOf(input.y.values, step1.residuals, step1.names);
  if (noise) throw new NoValue(noise.message);
  return { values: step1.residuals, orientation: input.orientation, rows: input.y.rows };
}

function spill(values: (number | string)[], orientation: Orientation): (number | string)[][] {
  return orientation === 'row' ? [values] : values.map((v) => [v]);
}

/** The spread y - beta x, beta as given (no intercept) or, when left out, y - intercept - beta x by least squares. */
export function spreadCell(y: unknown, x: unknown, beta: unknown, prep?: unknown): (number | string)[][] {
  const given = decimalValue('beta', beta, 'the hedge ratio: units of x per unit of y');
  const pair = pairOf(y, x, prep);
  const fit = given === undefined ? olsHedgeRatio(pair.y.values, pair.x.values) : { beta: given, intercept: 0 };
  const values = spreadSeries(pair.y.values, pair.x.values, fit.beta, fit.intercept, { y: 'y', x: 'x', rowLabel: (t) => pair.y.rowLabel(pair.y.rows[t]) });
  return spill(spillByRow(values, pair.y.rows, 'The spread'), pair.orientation);
}

/**
 * Periods for a gap in the spread to halve (AR(1) of the spread); #N/A when the spread does not
 * revert. show low / high: an end of its 95% interval (#N/A with the reason where the interval
 * has no such end); all: the labelled table of the half-life, its interval and the AR(1) fit.
 */
export function halfLifeCell(y: unknown, x: unknown, show: unknown, prep?: unknown): (number | string)[][] {
  const what = optionWord('show', show, HALF_LIFE_SHOW_WORDS, 'value');
  const spread = spreadOf(y, x, prep);
  const answer = halfLife(spread.values);
  const { interval } = answer;
  const noHalfLife = answer.halfLife === null ? `No half-life: ${answer.note}.` : undefined;
  if (what === 'value') return [[cellNumber(answer.halfLife, 'The half-life', noHalfLife)]];
  if (what === 'low') return [[cellNumber(interval.low, 'The low end of the half-life\'s interval', `No low end: ${interval.text}.`)]];
  if (what === 'high') return [[cellNumber(interval.high, 'The high end of the half-life\'s interval', `No high end: ${interval.text}.`)]];
  const orText = (v: number | null, why: string): number | string => (v === null ? why : v);
  return [
    ['Half-life (periods)', orText(answer.halfLife, answer.note ?? 'none')],
    [`Low end, ${interval.level * 100}% interval (periods)`, orText(interval.low, 'none: no reversion throughout')],
    [`High end, ${interval.level * 100}% interval (periods)`, orText(interval.high, 'none: the interval reaches no reversion')],
    ['The interval in words', interval.text],
    ['Speed of adjustment (lambda)', answer.lambda],
    ['Its standard error', answer.standardError],
    ['Speed, low end of its interval', interval.speedLow],
    ['Speed, high end of its interval', interval.speedHigh],
    ['AR(1) coefficient (1 + lambda)', answer.phi],
    ['Rows of the AR(1) regression', answer.nobs],
    ['How the interval is found', HALF_LIFE_INTERVAL_METHOD],
    ['Caution', CAUTION],
  ];
}

/** z-scores of the spread (or of y), over the whole sample or a trailing window. */
export function zScoreCell(y: unknown, x: unknown, window: unknown, prep?: unknown): (number | string)[][] {
  const w = wholeNumber('window', window, undefined, 'rows in the trailing window', 3);
  const spread = spreadOf(y, x, prep);
  const values = w === undefined ? zScore(spread.values).values : rollingZScore(spread.values, w);
  return spill(spillByRow(values, spread.rows, 'The z-score'), spread.orientation);
}
