/**
 * MOOR.ENGLEGRANGER and MOOR.PHILLIPSOULIARIS: y and one or more x series from ranges lined up by row, the
 * residual-based cointegration test, and `show`.
 */
import { engleGranger } from '../../addin/cointegration/engle-granger';
import { phillipsOuliaris } from '../../addin/cointegration/phillips-ouliaris';
import { readRelation, type RangeRelation } from '../cells/range-input';
import { countOrWord, optionWord, prepValue } from '../options/option-values';
import { ADF_LAG_RULES, DETERMINISTIC_WORDS } from '../options/option-words';
import { showAnswer, testAnswer } from '../render/show-answer';
import { bandwidthOption } from './unit-root-cells';

function names(input: RangeRelation): { y: string; xs: string[] } {
  return { y: input.y.name, xs: input.xs.map((s) => s.name) };
}

export function egCell(y: unknown, x: unknown, deterministic: unknown, lags: unknown, show: unknown, prep?: unknown) {
  const det = optionWord('deterministic', deterministic, DETERMINISTIC_WORDS, 'const');
  const lagChoice = countOrWord('lags', lags, ADF_LAG_RULES, 'aic', 'lagged changes');
  const input = readRelation(y, x, undefined, prepValue(prep));
  const result = engleGranger(input.y.values, input.xs.map((s) => s.values), { deterministic: det, lags: lagChoice }, names(input));
  return showAnswer(testAnswer(result.test, { verdict: result.verdict }), show);
}

export function poCell(y: unknown, x: unknown, deterministic: unknown, bandwidth: unknown, show: unknown, prep?: unknown) {
  const det = optionWord('deterministic', deterministic, DETERMINISTIC_WORDS, 'const');
  const bw = bandwidthOption(bandwidth);
  const input = readRelation(y, x, undefined, prepValue(prep));
  const result = phillipsOuliaris(input.y.values, input.xs.map((s) => s.values), { deterministic: det, bandwidth: bw }, names(input));
  return showAnswer(testAnswer(result.test, { verdict: result.verdict }), show);
}
