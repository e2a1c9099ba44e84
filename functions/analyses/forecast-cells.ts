/**
 * MOOR.AHEAD: the error-correction model's forecast of a block of series (addin/forecast/vecm-forecast.ts),
 * one row per step ahead. show: forecast (one column per series), lower or upper (their 95% bounds),
 * spread (the first long-run relation's path, its low and high), or all (forecast, low, high for each
 * series in turn). The bounds ignore the uncertainty of the estimated coefficients.
 */
import { vecmForecast } from '../../addin/forecast/vecm-forecast';
import { readBlock } from '../cells/range-input';
import { NoValue } from '../cells/no-value';
import { MooringInputError } from '../../addin/errors';
import { optionWord, prepValue, wholeNumber } from '../options/option-values';
import { AHEAD_SHOW_WORDS, JOHANSEN_CASES } from '../options/option-words';

export function aheadCell(block: unknown, horizon: unknown, rank: unknown, lags: unknown, deterministic: unknown, show: unknown, prep?: unknown): number[][] {
  const H = wholeNumber('horizon', horizon, undefined, 'steps ahead', 1);
  if (H === undefined) throw new MooringInputError('horizon is needed: how many rows ahead to forecast, a whole number of 1 or more.');
  const r = wholeNumber('rank', rank, undefined, 'long-run relations', 0);
  const K = wholeNumber('lags', lags, 1, 'lagged changes');
  const caseName = optionWord('deterministic', deterministic, JOHANSEN_CASES, 'constant');
  const what = optionWord('show', show, AHEAD_SHOW_WORDS, 'forecast');
  const series = readBlock(block, 'the block', prepValue(prep));
  const f = vecmForecast(series.map((s) => s.values), series.map((s) => s.name), { horizon: H, rank: r, lags: K, case: caseName });
  if (what === 'forecast') return f.forecast;
  if (what === 'lower') return f.lower;
  if (what === 'upper') return f.upper;
  if (what === 'all') return f.forecast.map((row, h) => row.flatMap((v, i) => [v, f.lower[h][i], f.upper[h][i]]));
  if (!f.spread) throw new NoValue('No spread: with rank 0 there is no long-run relation to follow.');
  const s = f.spread;
  return s.path.map((v, h) => [v, s.lower[h], s.upper[h]]);
}
