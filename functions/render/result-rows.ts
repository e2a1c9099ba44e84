/**
 * The one renderer of the engine's result shape for the cell surface: a TestResult (and the
 * verdict and further details a function adds) as labelled rows, each with a machine key for
 * the card and a plain label for the table. result-table.ts and result-card.ts only lay
 * these rows out; neither formats a field of its own, and nothing here computes a statistic.
 *
 * Values a cell cannot hold are written in words (an infinite statistic as "minus infinity",
 * a missing p-value as "not available" with its note; a p-value that is only a bound keeps its
 * number, with a "p-value reads" row saying "< 0.01"). A NaN is never passed off as a value:
 * it means a fault upstream and is refused.
 */
import { pValueBoundText } from '../../addin/p-value-bound';
import { DETERMINISTIC_LABEL, rejects, type ResultDetail, type TestResult } from '../../addin/result';

/** A cell value the table and the card can hold. */
export type RowValue = number | string | boolean;

/** One labelled row: `key` names it on the card (=A1.pValue), `label` in the table. */
export interface ResultRow {
  key: string;
  label: string;
  value: RowValue;
}

/** What a function adds to the test's own fields. */
export interface RowExtras {
  /** One sentence in plain words, shown right after the test's title. */
  verdict?: string;
  /** Labelled values after the test's own details (e.g. every rank step of Johansen). */
  details?: ResultDetail[];
}

/** The closing caution of every table and card. */
export const CAUTION = 'Evidence, not advice: relations break.';

/** The level the decision row reports. */
const DECISION_LEVEL = 0.05;

/** How the lags were chosen, in words ("Lags: 3, chosen by AIC"). */
const LAG_RULE_WORDS: Record<string, string> = {
  fixed: 'as given',
  aic: 'chosen by AIC',
  bic: 'chosen by BIC',
  tstat: 'chosen by the significance of the last lag',
};

/** A value for a cell: finite numbers as they are, infinities in words; NaN is refused. */
export function cellValue(value: number | string | boolean, what: string): RowValue {
  if (typeof value !== 'number') return value;
  if (Number.isNaN(value)) throw new Error(`${what} came out as NaN`);
  if (value === Infinity) return 'plus infinity';
  if (value === -Infinity) return 'minus infinity';
  return value;
}

/** "5%" -> "critical5", "2.5%" -> "critical2_5". */
function criticalKey(level: string): string {
  return `critical${level.replace('%', '').replace('.', '_')}`;
}

function decisionText(result: TestResult): string {
  const decision = rejects(result, DECISION_LEVEL);
  if (decision === null) return 'cannot say: no p-value and no 5% critical value';
  return decision ? 'rejects the null hypothesis' : 'does not reject the null hypothesis';
}

/** The labelled rows of a result, in reading order, ending with the caution. */
export function resultRows(result: TestResult, extras: RowExtras = {}): ResultRow[] {
  const rows: ResultRow[] = [];
  const add = (key: string, label: string, value: number | string | boolean | null | undefined) => {
    if (value === null || value === undefined) return;
    rows.push({ key, label, value: cellValue(value, label) });
  };
  add('title', 'Test', result.title);
  add('verdict', 'Verdict', extras.verdict);
  add('nullHypothesis', 'Null hypothesis', result.nullHypothesis);
  add('alternative', 'Alternative', result.alternative);
  add('statistic', `Statistic (${result.statisticName})`, result.statistic);
  add('pValue', 'p-value', result.pValue ?? 'not available');
  // A bound read off a table's end: the p-value cell keeps the end number (Excel compares
  // numbers), and this row says how to read it.
  add('pValueReads', 'p-value reads', pValueBoundText(result.pValue, result.pValueBound));
  add('pValueNote', 'About the p-value', result.pValueNote);
  const levels = Object.keys(result.critical).sort((a, b) => parseFloat(a) - parseFloat(b));
  for (const level of levels) add(criticalKey(level), `Critical value at ${level}`, result.critical[level]);
  add('decision5', 'At the 5% level', decisionText(result));
  add('lags', 'Lags', result.lags);
  if (result.lags !== null && result.lagRule) add('lagRule', 'How the lags were chosen', LAG_RULE_WORDS[result.lagRule] ?? result.lagRule);
  add('bandwidth', 'Bandwidth (kernel lags)', result.bandwidth);
  add('observations', 'Observations in the test', result.nobs);
  add('deterministic', 'Deterministic terms', DETERMINISTIC_LABEL[result.deterministic]);
  for (const d of [...result.details, ...(extras.details ?? [])]) add(d.key, d.label, d.value);
  result.warnings.forEach((w, i) => add(`warning${i + 1}`, 'Warning', w));
  add('caution', 'Caution', CAUTION);
  return rows;
}
