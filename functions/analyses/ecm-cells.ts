/**
 * MOOR.ECM: the error-correction model of a pair. Its headline is y's speed of adjustment
 * (the coefficient on yesterday's gap to the long-run relation: negative means y moves back);
 * "stat" is that coefficient's t-value. For the table and the card the model is laid out in
 * the engine's one result shape: the adjustment coefficient's t-test (null: y does not move to
 * close the gap) with every other estimate as a labelled detail. Nothing is re-estimated here.
 */
import { errorCorrectionModel, type AdjustmentEquation, type ErrorCorrectionResult } from '../../addin/cointegration/error-correction';
import { longRunHypotheses } from '../../addin/causality/causality-wording';
import type { ResultDetail, TestResult } from '../../addin/result';
import { readPair } from '../cells/range-input';
import { countOrWord, prepValue } from '../options/option-values';
import { showAnswer } from '../render/show-answer';

function equationDetails(eq: AdjustmentEquation, tag: 'Y' | 'X'): ResultDetail[] {
  const out: ResultDetail[] = [
    { key: `speed${tag}`, label: `Speed of adjustment of ${eq.series}`, value: eq.alpha },
    { key: `speedStandardError${tag}`, label: `Standard error, speed of ${eq.series}`, value: eq.standardError },
    { key: `speedP${tag}`, label: `p-value, speed of ${eq.series}`, value: eq.pValue },
    { key: `gapSpeed${tag}`, label: `Share of the gap ${eq.series} closes per period (negative closes)`, value: eq.gapSpeed },
    { key: `halfLife${tag}`, label: `Half-life if only ${eq.series} adjusted (periods)`, value: eq.halfLifeAlone ?? eq.halfLifeAloneNote ?? null },
    { key: `rSquared${tag}`, label: `R² of the equation for ${eq.series}`, value: eq.rSquared },
  ];
  return out;
}

/** The model as a TestResult: the t-test of y's adjustment coefficient, every estimate as a detail. */
export function ecmResult(ecm: ErrorCorrectionResult): TestResult {
  const { nullHypothesis, alternative } = longRunHypotheses({ cause: ecm.x.series, effect: ecm.y.series });
  const details: ResultDetail[] = [
    { key: 'relation', label: 'Equilibrium error (the gap)', value: ecm.relation },
    { key: 'beta', label: `Long-run coefficient on ${ecm.x.series}`, value: ecm.beta },
    { key: 'intercept', label: 'Long-run intercept', value: ecm.intercept },
    ...equationDetails(ecm.y, 'Y'),
    ...equationDetails(ecm.x, 'X'),
    { key: 'combinedSpeed', label: 'Share of the gap closed per period, both sides', value: ecm.combinedSpeed },
    { key: 'ecmHalfLife', label: 'Half-life implied by the error-correction model, both prices adjusting (periods)', value: ecm.ecmHalfLife ?? ecm.ecmHalfLifeNote ?? null },
    { key: 'maxLags', label: 'Largest lag searched', value: ecm.maxLags },
  ];
  return {
    test: 'Error correction',
    title: `Error-correction model of ${ecm.y.series} and ${ecm.x.series}`,
    statisticName: 't',
    statistic: ecm.y.tValue,
    pValue: ecm.y.pValue,
    critical: {},
    rejectTail: 'lower',
    lags: ecm.lags,
    lagRule: ecm.lagRule,
    nobs: ecm.nobs,
    deterministic: 'const',
    nullHypothesis,
    alternative,
    warnings: ecm.warnings,
    details,
  };
}

export function ecmCell(y: unknown, x: unknown, lags: unknown, show: unknown, prep?: unknown) {
  const lagChoice = countOrWord('lags', lags, ['aic'] as const, 'aic', 'lagged changes');
  const pair = readPair(y, x, { y: 'y', x: 'x' }, 'the error-correction model', prepValue(prep));
  const ecm = errorCorrectionModel(pair.y.values, pair.x.values, { lags: lagChoice }, { y: pair.y.name, x: pair.x.name });
  const answer = {
    result: ecmResult(ecm),
    extras: { verdict: ecm.verdict },
    headline: { value: ecm.y.alpha, name: `The speed of adjustment of ${ecm.y.series}` },
  };
  return showAnswer(answer, show);
}
