/**
 * MOOR.GRANGER and MOOR.VARLAGS: the lead-lag test of a pair and the lag order of a VAR.
 *
 * GRANGER's method: the F test compares regressions that are valid only on stationary data
 * (Sims, Stock & Watson 1990, as the engine notes), and prices usually wander, so the default
 * tests the period-to-period changes; "levels" tests the values as they stand, for series that
 * are already stationary (returns, spreads).
 */
import { grangerF } from '../../addin/causality/granger-f';
import { chooseVarLags } from '../../addin/var/choose-var-lags';
import { differences } from '../../addin/var/var-design';
import { readBlock, readPair } from '../cells/range-input';
import { countOrWord, optionWord, wholeNumber } from '../options/option-values';
import { GRANGER_METHODS, VAR_CRITERIA, VAR_LAG_RULES } from '../options/option-words';
import { showAnswer, testAnswer } from '../render/show-answer';

export function grangerCell(cause: unknown, effect: unknown, lags: unknown, method: unknown, show: unknown) {
  const lagChoice = countOrWord('lags', lags, VAR_LAG_RULES, 'aic', 'lags', 1);
  const form = optionWord('method', method, GRANGER_METHODS, 'changes');
  const pair = readPair(effect, cause, { y: 'effect', x: 'cause' }, 'the lead-lag test');
  const x = pair.x.values;
  const y = pair.y.values;
  const names = { cause: 'cause', effect: 'effect' };
  const result = form === 'changes'
    ? grangerF(differences(x), differences(y), { lags: lagChoice, form: 'changes' }, names)
    : grangerF(x, y, { lags: lagChoice, form: 'values' }, names);
  return showAnswer(testAnswer(result), show);
}

/** The VAR lag order a criterion chooses for the block. */
export function varLagsCell(block: unknown, criterion: unknown, maxlags: unknown): number {
  const which = optionWord('criterion', criterion, VAR_CRITERIA, 'aic');
  const ceiling = wholeNumber('maxlags', maxlags, undefined, 'lags', 1);
  const series = readBlock(block);
  const choice = chooseVarLags(series.map((s) => s.values), { maxLags: ceiling, names: series.map((s) => s.name) });
  return choice[which];
}
