/**
 * MOOR.GLSROOT and MOOR.MSTATS: one series from a range, the option words read by the shared
 * parser, the engine's DF-GLS or Ng-Perron test, and `show` to pick what the cell returns.
 */
import { dfglsTest } from '../../addin/unitroot/dfgls';
import { GLS_DETERMINISTIC_WORDS } from '../../addin/unitroot/gls-detrend';
import { GLS_LAG_RULES } from '../../addin/unitroot/gls-lag-search';
import { ngPerronTest } from '../../addin/unitroot/ng-perron';
import { readSeries } from '../cells/range-input';
import { countOrWord, optionWord, prepValue } from '../options/option-values';
import { showAnswer, testAnswer } from '../render/show-answer';

const NAME = 'the series';

function glsOptions(deterministic: unknown, lags: unknown) {
  return {
    deterministic: optionWord('deterministic', deterministic, GLS_DETERMINISTIC_WORDS, 'const'),
    lags: countOrWord('lags', lags, GLS_LAG_RULES, 'maic', 'lagged changes'),
  };
}

export function glsRootCell(series: unknown, deterministic: unknown, lags: unknown, show: unknown, prep?: unknown) {
  const options = glsOptions(deterministic, lags);
  const input = readSeries(series, NAME, prepValue(prep));
  return showAnswer(testAnswer(dfglsTest(input.series.values, options, NAME)), show);
}

export function mStatsCell(series: unknown, deterministic: unknown, lags: unknown, show: unknown, prep?: unknown) {
  const options = glsOptions(deterministic, lags);
  const input = readSeries(series, NAME, prepValue(prep));
  return showAnswer(testAnswer(ngPerronTest(input.series.values, options, NAME)), show);
}
