/**
 * MOOR.JOHANSEN and MOOR.RANK: a block of series (one per column), the Johansen rank test in
 * one of the five deterministic cases, and `show`. The headline is the trace test of "no
 * long-run relation" (is there any relation at all?); MOOR.RANK gives the number of relations.
 */
import { pValueBoundText } from '../../addin/p-value-bound';
import type { ResultDetail, TestResult } from '../../addin/result';
import { johansenTest, type JohansenResult } from '../../addin/johansen/johansen';
import { readBlock } from '../cells/range-input';
import { levelValue, optionWord, prepValue, wholeNumber } from '../options/option-values';
import { JOHANSEN_CASES } from '../options/option-words';
import { showAnswer, testAnswer } from '../render/show-answer';

function runJohansen(block: unknown, lags: unknown, deterministic: unknown, prep: unknown, alpha = 0.05): JohansenResult {
  const K = wholeNumber('lags', lags, 1, 'lagged changes');
  const caseName = optionWord('deterministic', deterministic, JOHANSEN_CASES, 'constant');
  const series = readBlock(block, 'the block', prepValue(prep));
  return johansenTest(series.map((s) => s.values), { lags: K, case: caseName, alpha }, series.map((s) => s.name));
}

/** A "p-value reads < 0.001" row beside a p-value that is only a bound read off the table's end; none for an exact one. */
function boundRow(key: string, label: string, test: TestResult): ResultDetail[] {
  const reads = pValueBoundText(test.pValue, test.pValueBound);
  return reads === null ? [] : [{ key, label, value: reads }];
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
      ...boundRow(`traceP${r}Reads`, `p-value reads, trace, at most ${r} relations`, t),
      { key: `maxEigen${r}`, label: `Maximum-eigenvalue statistic, at most ${r} relations`, value: m.statistic },
      { key: `maxEigenP${r}`, label: `p-value, maximum eigenvalue, at most ${r} relations`, value: m.pValue },
      ...boundRow(`maxEigenP${r}Reads`, `p-value reads, maximum eigenvalue, at most ${r} relations`, m),
    );
  });
  names.forEach((name, i) => out.push({ key: `weight${i + 1}`, label: `First relation: weight of ${name}`, value: result.beta[i][0] }));
  return out;
}

export function johansenCell(block: unknown, lags: unknown, deterministic: unknown, show: unknown, prep?: unknown) {
  const result = runJohansen(block, lags, deterministic, prep);
  const names = result.beta.map((_, i) => `series ${i + 1}`);
  return showAnswer(testAnswer(result.trace[0], { verdict: result.verdict, details: sequenceDetails(result, names) }), show);
}

/** The number of long-run relations the trace test finds at `alpha`. */
export function rankCell(block: unknown, lags: unknown, deterministic: unknown, alpha: unknown, prep?: unknown): number {
  const level = levelValue('alpha', alpha, 0.05);
  return runJohansen(block, lags, deterministic, prep, level).rank.trace;
}
