/**
 * MOOR.JOHANSEN and MOOR.RANK: a block of series (one per column), the Johansen rank test in
 * one of the five deterministic cases, and `show`. The headline is the trace test of "no
 * long-run relation" (is there any relation at all?); MOOR.RANK gives the number of relations.
 */
import type { ResultDetail } from '../../addin/result';
import { johansenTest, type JohansenResult } from '../../addin/johansen/johansen';
import { readBlock } from '../cells/range-input';
import { levelValue, optionWord, wholeNumber } from '../options/option-values';
import { JOHANSEN_CASES } from '../options/option-words';
import { showAnswer, testAnswer } from '../render/show-answer';

function runJohansen(block: unknown, lags: unknown, deterministic: unknown, alpha = 0.05): JohansenResult {
  const K = wholeNumber('lags', lags, 1, 'lagged changes');
  const caseName = optionWord('deterministic', deterministic, JOHANSEN_CASES, 'constant');
  const series = readBlock(block);
  return johansenTest(series.map((s) => s.values), { lags: K, case: caseName, alpha }, series.map((s) => s.name));
}

/** Every step of the rank sequence and the first relation's weights, as labelled details. */
function sequenceDetails(result: JohansenResult, names: readonly string[]): ResultDetail[] {
  const out: ResultDetail[] = [
    { key: 'rankTrace', label: 'Long-run relations (trace test, 5%)', value: result.rank.trace },
    { key: 'rankMaxEigen', label: 'Long-run relations (maximum-eigenvalue test, 5%)', value: result.rank.maxEigen },
  ];
  result.trace.forEach((t, r) => {
    const m = result.maxEigen[r];
    out.push(
      { key: `trace${r}`, label: `Trace statistic, at most ${r} relations`, value: t.statistic },
      { key: `traceP${r}`, label: `p-value, trace, at most ${r} relations`, value: t.pValue },
      { key: `maxEigen${r}`, label: `Maximum-eigenvalue statistic, at most ${r} relations`, value: m.statistic },
      { key: `maxEigenP${r}`, label: `p-value, maximum eigenvalue, at most ${r} relations`, value: m.pValue },
    );
  });
  names.forEach((name, i) => out.push({ key: `weight${i + 1}`, label: `First relation: weight of ${name}`, value: result.beta[i][0] }));
  return out;
}

export function johansenCell(block: unknown, lags: unknown, deterministic: unknown, show: unknown) {
  const result = runJohansen(block, lags, deterministic);
  const names = result.beta.map((_, i) => `series ${i + 1}`);
  return showAnswer(testAnswer(result.trace[0], { verdict: result.verdict, details: sequenceDetails(result, names) }), show);
}

/** The number of long-run relations the trace test finds at `alpha`. */
export function rankCell(block: unknown, lags: unknown, deterministic: unknown, alpha: unknown): number {
  const level = levelValue('alpha', alpha, 0.05);
  return runJohansen(block, lags, deterministic, level).rank.trace;
}
