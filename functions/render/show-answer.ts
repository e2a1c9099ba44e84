/**
 * What a test cell returns, chosen by its `show` argument:
 *   headline (default)  the headline number: the p-value of a test, the value of an estimate;
 *   stat                the test statistic;
 *   all                 the labelled two-column table (result-table.ts), spilled;
 *   card                the whole result as an entity value where the host supports it
 *                       (CustomFunctionsRuntime 1.4), else the labelled table.
 * Every answer is a matrix (a 1 x 1 one for a single number), so the functions that take
 * `show` are declared with a matrix result and can spill.
 */
import { formatBoundedPValue, type PValueBound } from '../../addin/p-value-bound';
import type { TestResult } from '../../addin/result';
import { optionWord } from '../options/option-values';
import { SHOW_WORDS, type Show } from '../options/option-words';
import { cellNumber } from './cell-number';
import { hostShowsCards, resultCard } from './result-card';
import { resultRows, type RowExtras, type RowValue } from './result-rows';
import { tableOf } from './result-table';

/** One function's answer before `show` picks what to return. */
export interface Answer {
  result: TestResult;
  extras?: RowExtras;
  /**
   * The headline number, what it is called, why it is missing when it is, and its bound when
   * it is a p-value read off a table's end (the cell keeps the number; the card's text says "< 0.01").
   */
  headline: { value: number | null; name: string; missing?: string; bound?: PValueBound };
}

/** An Answer whose headline is the test's p-value. */
export function testAnswer(result: TestResult, extras?: RowExtras): Answer {
  return {
    result,
    extras,
    headline: { value: result.pValue, name: 'The p-value', missing: result.pValueNote ? `The p-value is ${result.pValueNote}.` : undefined, bound: result.pValueBound },
  };
}

function shortNumber(v: number): string {
  return Number.isFinite(v) ? String(Number(v.toPrecision(4))) : v > 0 ? 'plus infinity' : 'minus infinity';
}

/** Returns what `show` asks for. */
export function showAnswer(answer: Answer, show: unknown, cards: () => boolean = hostShowsCards): (RowValue | Excel.EntityCellValue)[][] {
  const choice: Show = optionWord('show', show, SHOW_WORDS, 'headline');
  const { result } = answer;
  if (choice === 'headline') return [[cellNumber(answer.headline.value, answer.headline.name, answer.headline.missing)]];
  if (choice === 'stat') {
    const why = result.warnings.find((w) => /infinity/.test(w)) ?? result.warnings[0];
    return [[cellNumber(result.statistic, `The statistic (${result.statisticName})`, why)]];
  }
  const rows = resultRows(result, answer.extras);
  if (choice === 'card' && cards()) {
    const h = answer.headline.value;
    const headline = h === null ? '' : formatBoundedPValue(h, answer.headline.bound, shortNumber);
    const text = `${result.test}: ${h === null ? `${result.statisticName} ${shortNumber(result.statistic)}` : `${answer.headline.name.replace(/^The /, '')} ${headline}`}`;
    return [[resultCard(rows, text)]];
  }
  return tableOf(rows);
}
