/**
 * MOOR.LEVELBOUNDS (the bounds test of a long-run relation when the orders are mixed),
 * MOOR.RELATIONIS (is the Johansen relation the given weights?) and MOOR.ADJUSTS (does each
 * series move to close the gap?). Each reads its ranges through the shared cleaner, calls the
 * engine once and answers in the one result shape; nothing is computed here.
 */
import type { BoundsCase } from '../../addin/ardl/bounds-case';
import { ardlBoundsTest, type ArdlBoundsResult } from '../../addin/ardl/bounds-test';
import { BOUNDS_LEVELS } from '../../addin/ardl/bounds-tables';
import type { OrderChoice } from '../../addin/ardl/ardl-orders';
import { MooringInputError } from '../../addin/errors';
import { betaRestrictionTest, exogeneityTests } from '../../addin/johansen/restrictions';
import { johansenTest } from '../../addin/johansen/johansen';
import type { ResultDetail } from '../../addin/result';
import { readBlock, readRelation } from '../cells/range-input';
import { countOrWord, optionWord, prepValue, wholeNumber } from '../options/option-values';
import { JOHANSEN_CASES } from '../options/option-words';
import { showAnswer, testAnswer } from '../render/show-answer';

function orderOf(option: string, value: unknown): OrderChoice {
  const v = countOrWord(option, value, ['aic', 'bic'] as const, 'aic', 'lags in levels', 1);
  return typeof v === 'number' ? { fixed: v } : { criterion: v, max: 4 };
}

/** The bounds test's result with its bounds, p-values, orders and long run as labelled details. */
function boundsDetails(result: ArdlBoundsResult): ResultDetail[] {
  const out: ResultDetail[] = [
    { key: 'outcome', label: 'Outcome at the chosen level', value: result.outcome },
    { key: 'case', label: 'Case', value: `${result.case}: ${result.caseLabel}` },
    { key: 'orders', label: 'ARDL orders in levels (y, then each x)', value: [result.orders.p, ...result.orders.q].join(', ') },
    { key: 'tStatistic', label: 't statistic of the speed of adjustment', value: result.tTest.statistic },
    { key: 'pValueUpper', label: 'p-value of F with every x wandering (I(1))', value: result.pValue?.upper ?? null },
    { key: 'pValueLower', label: 'p-value of F with every x stationary (I(0))', value: result.pValue?.lower ?? null },
  ];
  for (const l of BOUNDS_LEVELS) {
    out.push({ key: `upper${l.replace('.', '_').replace('%', '')}`, label: `${l} upper bound of F (every x I(1))`, value: result.critical[l].upper });
  }
  out.push({ key: 'boundsFrom', label: 'Bounds from', value: result.criticalSource });
  out.push({ key: 'speed', label: 'Speed of adjustment of y', value: result.speed.coefficient });
  result.longRun.forEach((t, j) => {
    out.push({ key: `longRun${j + 1}`, label: `Long-run coefficient on ${t.name}`, value: t.coefficient });
    out.push({ key: `longRunStandardError${j + 1}`, label: `Standard error, long-run coefficient on ${t.name}`, value: t.standardError });
  });
  return out;
}

export function levelBoundsCell(y: unknown, x: unknown, boundsCase: unknown, lags: unknown, order: unknown, show: unknown, prep?: unknown) {
  const c = wholeNumber('case', boundsCase, 3, 'the case (1 to 5)', 1);
  if (c > 5) throw new MooringInputError(`case must be 1 to 5 (1 none; 2 a constant inside the relation; 3 a free constant; 4 a free constant and a trend inside the relation; 5 a free constant and trend); got ${c}.`);
  const input = readRelation(y, x, { y: 'y', x: 'x' }, prepValue(prep));
  const result = ardlBoundsTest(
    input.y.values,
    input.xs.map((s) => s.values),
    { case: c as BoundsCase, lags: orderOf('lags', lags), order: [orderOf('order', order)] },
    { y: 'y', x: input.xs.map((_, j) => (input.xs.length > 1 ? `x${j + 1}` : 'x')) },
  );
  return showAnswer(testAnswer(result.fTest, { verdict: result.verdict, details: boundsDetails(result) }), show);
}

function readWeights(weights: unknown): number[] {
  const cells = Array.isArray(weights) ? (weights as unknown[][]).flat() : [weights];
  const values = cells.filter((v) => v !== '' && v !== null && v !== undefined);
  if (values.length === 0 || values.some((v) => typeof v !== 'number' || !Number.isFinite(v))) {
    throw new MooringInputError('weights must be numbers, one per series of the block, in a row or a column (such as 1 and -1).');
  }
  return values as number[];
}

export function relationIsCell(block: unknown, weights: unknown, lags: unknown, deterministic: unknown, show: unknown, prep?: unknown) {
  const K = wholeNumber('lags', lags, 1, 'lagged changes');
  const caseName = optionWord('deterministic', deterministic, JOHANSEN_CASES, 'constant');
  const series = readBlock(block, 'the block', prepValue(prep));
  const test = betaRestrictionTest(series.map((s) => s.values), readWeights(weights), { lags: K, case: caseName }, series.map((s) => s.name));
  return showAnswer(testAnswer(test.result), show);
}

export function adjustsCell(block: unknown, seriesNumber: unknown, lags: unknown, deterministic: unknown, show: unknown, prep?: unknown) {
  const K = wholeNumber('lags', lags, 1, 'lagged changes');
  const caseName = optionWord('deterministic', deterministic, JOHANSEN_CASES, 'constant');
  const series = readBlock(block, 'the block', prepValue(prep));
  const which = wholeNumber('series', seriesNumber, 1, 'the column of the block', 1);
  if (which > series.length) throw new MooringInputError(`series must be a column of the block, 1 to ${series.length}; got ${which}.`);
  const values = series.map((s) => s.values);
  const names = series.map((s) => s.name);
  const rank = johansenTest(values, { lags: K, case: caseName }, names).rank.trace;
  const tests = exogeneityTests(values, { lags: K, case: caseName, rank: Math.min(Math.max(rank, 1), series.length - 1) }, names);
  return showAnswer(testAnswer(tests[which - 1].result), show);
}
