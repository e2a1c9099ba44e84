/**
 * MOOR.MOVINGHEDGE: the Kalman filter's hedge ratio of y on x row by row (addin/kalman/moving-hedge.ts),
 * spilled beside the prices, one value per row (empty in the rows the filter uses to set itself up
 * and in rows the preparation leaves out). show picks the column: ratio (filtered: from the rows up
 * to each one), smoothed (from every row), spread (y minus the line known the row before), zscore
 * (that spread over its standard deviation), all (six columns: ratio, its standard deviation,
 * smoothed, its standard deviation, spread, z-score), or latest (the ratio on the newest row).
 */
import { movingHedge } from '../../addin/kalman/moving-hedge';
import { readPair, type Orientation } from '../cells/range-input';
import { decimalValue, optionWord, prepValue } from '../options/option-values';
import { MOVING_HEDGE_SHOW_WORDS } from '../options/option-words';
import { cellNumber, spillByRow } from '../render/cell-number';

function spill(values: (number | string)[], orientation: Orientation): (number | string)[][] {
  return orientation === 'row' ? [values] : values.map((v) => [v]);
}

export function movingHedgeCell(y: unknown, x: unknown, show: unknown, stateVar: unknown, obsVar: unknown, prep?: unknown): (number | string)[][] {
  const what = optionWord('show', show, MOVING_HEDGE_SHOW_WORDS, 'ratio');
  const Q = decimalValue('statevar', stateVar, 'the variance of each step of the intercept and the slope; leave it out to estimate it');
  const R = decimalValue('obsvar', obsVar, 'the variance of y around the line; leave it out to estimate it');
  const pair = readPair(y, x, { y: 'y', x: 'x' }, 'a moving hedge ratio', prepValue(prep));
  const r = movingHedge(pair.y.values, pair.x.values, { y: 'y', x: 'x' }, { stateVar: Q, obsVar: R });
  const rows = pair.y.rows;
  const columns = {
    ratio: () => spillByRow(r.beta, rows, 'The moving hedge ratio'),
    ratioStd: () => spillByRow(r.betaStd, rows, 'Its standard deviation'),
    smoothed: () => spillByRow(r.betaSmoothed, rows, 'The smoothed ratio'),
    smoothedStd: () => spillByRow(r.betaSmoothedStd, rows, 'Its standard deviation'),
    spread: () => spillByRow(r.spread, rows, 'The filtered spread'),
    zscore: () => spillByRow(r.spreadStandardised, rows, 'The standardised spread'),
  };
  // The ratio on the newest row (the last in time, wherever it sits in the range), as the report gives it.
  if (what === 'latest') return [[cellNumber(r.latest.beta, 'The latest moving hedge ratio')]];
  if (what !== 'all') return spill(columns[what](), pair.orientation);
  const all = [columns.ratio(), columns.ratioStd(), columns.smoothed(), columns.smoothedStd(), columns.spread(), columns.zscore()];
  return all[0].map((_, i) => all.map((c) => c[i]));
}
