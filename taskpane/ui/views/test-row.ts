/**
 * One line of a test table in the pane: the test in words, its statistic, its p-value and
 * what it decided at the report's level, all taken from the engine's TestSummary.
 */
import type { TestSummary } from '../../../addin/report/test-summary';
import { showNumber, showPValue } from './numbers';

/** A test as one table row. */
export interface TestRowView {
  label: string;
  statistic: string;
  pValue: string;
  /** What the test decided, in words ("rejects", "does not reject", "no decision"). */
  decision: string;
  /** The engine's note when the statistic or p-value is missing or beyond the table. */
  note: string | null;
}

/** The row of a test summary under a label of the caller's choosing. */
export function testRow(label: string, test: TestSummary): TestRowView {
  const decision = test.rejects === null ? 'no decision' : test.rejects ? 'rejects' : 'does not reject';
  const notes = [test.statisticNote, test.pValueNote].filter((n): n is string => typeof n === 'string' && n !== '');
  return {
    label,
    statistic: showNumber(test.statistic),
    pValue: showPValue(test.pValue, test.pValueBound),
    decision,
    note: notes.length > 0 ? notes.join('; ') : null,
  };
}
