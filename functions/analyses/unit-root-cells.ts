/**
 * MOOR.ADF, MOOR.KPSS, MOOR.PP and MOOR.ORDER: one series from a range, the option words read
 * by the shared parser, the engine's test, and `show` to pick what the cell returns.
 */
import { adfTest } from '../../addin/unitroot/adf';
import { integrationOrder } from '../../addin/unitroot/integration-order';
import { kpssTest } from '../../addin/unitroot/kpss';
import { phillipsPerronTest } from '../../addin/unitroot/phillips-perron';
import { isBlockRange, readBlock, readSeries } from '../cells/range-input';
import { countOrWord, levelValue, optionWord, prepValue } from '../options/option-values';
import { ADF_LAG_RULES, BANDWIDTH_RULES, DETERMINISTIC_WORDS, KPSS_DETERMINISTIC_WORDS } from '../options/option-words';
import { showAnswer, testAnswer } from '../render/show-answer';

const NAME = 'the series';

/** Reads the bandwidth argument: a whole number of kernel lags or auto. */
export function bandwidthOption(value: unknown): number | 'auto' {
  return countOrWord('bandwidth', value, BANDWIDTH_RULES, 'auto', 'kernel lags');
}

export function adfCell(series: unknown, deterministic: unknown, lags: unknown, show: unknown, prep?: unknown) {
  const det = optionWord('deterministic', deterministic, DETERMINISTIC_WORDS, 'const');
  const lagChoice = countOrWord('lags', lags, ADF_LAG_RULES, 'aic', 'lagged changes');
  const input = readSeries(series, NAME, prepValue(prep));
  return showAnswer(testAnswer(adfTest(input.series.values, { deterministic: det, lags: lagChoice }, NAME)), show);
}

export function kpssCell(series: unknown, deterministic: unknown, bandwidth: unknown, show: unknown, prep?: unknown) {
  const det = optionWord('deterministic', deterministic, KPSS_DETERMINISTIC_WORDS, 'const');
  const bw = bandwidthOption(bandwidth);
  const input = readSeries(series, NAME, prepValue(prep));
  return showAnswer(testAnswer(kpssTest(input.series.values, { deterministic: det, bandwidth: bw }, NAME)), show);
}

export function ppCell(series: unknown, deterministic: unknown, bandwidth: unknown, show: unknown, prep?: unknown) {
  const det = optionWord('deterministic', deterministic, DETERMINISTIC_WORDS, 'const');
  const bw = bandwidthOption(bandwidth);
  const input = readSeries(series, NAME, prepValue(prep));
  return showAnswer(testAnswer(phillipsPerronTest(input.series.values, { deterministic: det, bandwidth: bw }, NAME)), show);
}

/** The unit-root tests that can decide the levels step of the order (integration-order.ts). */
export const ORDER_TESTS = ['adf', 'dfgls'] as const;

/** The order of integration: 0, 1 or 2, or the text "above 2". `test` names the test that decides the levels: adf or dfgls. */
export function orderCell(series: unknown, alpha: unknown, deterministic: unknown, test?: unknown, prep?: unknown): (number | string)[][] {
  const level = levelValue('alpha', alpha, 0.05);
  const det = optionWord('deterministic', deterministic, DETERMINISTIC_WORDS, 'const');
  const unitRootTest = optionWord('test', test, ORDER_TESTS, 'adf');
  const how = prepValue(prep);
  if (isBlockRange(series)) {
    // Several columns: one order per column, on the rows they share (one analysis, one sample).
    const block = readBlock(series, 'the block', how);
    return [block.map((s) => integrationOrder(s.values, { alpha: level, deterministic: det, unitRootTest }, s.name).order)];
  }
  const input = readSeries(series, NAME, how);
  const result = integrationOrder(input.series.values, { alpha: level, deterministic: det, unitRootTest }, NAME);
  return [[result.order]];
}
