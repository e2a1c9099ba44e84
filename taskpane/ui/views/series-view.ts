/**
 * The view of "How each series moves": for each series, whether its price wanders (I(1)),
 * keeps returning to a level (I(0)) or is something else, in one sentence from the engine,
 * with the ADF, DF-GLS, Ng-Perron (for comparison) and KPSS numbers behind it (each with its critical value), which test decided, whether the two tests agree, and its warnings;
 * then the chart of the series rebased to 100 and the deterministic-terms choice.
 */
import type { DiagnosticReport, SeriesReport } from '../../../addin/report/report-types';
import type { NgPerronSummary } from '../../../addin/report/ng-perron-summary';
import type { TestSummary } from '../../../addin/report/test-summary';
import { showNumber } from './numbers';
import { cautionsView, type CautionsView } from './cautions-view';
import { chartModelsOf } from './chart-list';
import type { ChartModel } from './chart-models';
import { choiceViews, type ChoiceView } from './choices';
import { testRow, type TestRowView } from './test-row';
import { mark, type VerdictMark } from './verdict-mark';

/** One series in the step. */
export interface SeriesItemView {
  name: string;
  mark: VerdictMark;
  orderText: string;
  verdict: string;
  /** Whether ADF and KPSS tell the same story (the engine's warning says more when not). */
  testsAgree: boolean;
  tests: { stage: string; adf: TestRowView; kpss: TestRowView; gls: TestRowView | null; ngPerron: TestRowView | null }[];
  /** Which test decided the levels, in words. */
  decidedBy: string;
  warnings: string[];
}

/** The whole step. */
export interface SeriesStepView {
  headline: string;
  items: SeriesItemView[];
  chart: ChartModel;
  choices: ChoiceView[];
  warnings: string[];
  cautions: CautionsView;
}

/** The stage of the order decision in words: levels, changes from one row to the next, changes of those. */
export function stageName(differences: number, period: string): string {
  if (differences === 0) return 'Price levels';
  if (differences === 1) return `Changes from ${period} to ${period}`;
  return differences === 2 ? 'Changes of those changes' : `${differences} rounds of changes`;
}

/** The mark of a series: wanders, returns to a level, or neither. */
export function seriesMark(s: Pick<SeriesReport, 'order'>): VerdictMark {
  if (s.order === 1) return mark('Wanders', 'yes');
  if (s.order === 0) return mark('Returns to a level', 'unsure');
  return mark('Drifts faster than a random walk', 'no');
}

/** The engine's critical value at the report's level, in words ("rejects below -2.89 at 5%"); null when the test has none there. */
export function criticalWords(test: TestSummary, alpha: number): string | null {
  const key = `${Math.round(alpha * 1000) / 10}%`;
  const value = test.critical[key];
  if (value === undefined) return null;
  return `rejects ${test.rejectTail === 'lower' ? 'below' : 'above'} ${showNumber(value)} at ${key}`;
}

/** A unit-root test row with its critical value in its note. */
function unitRootRow(label: string, test: TestSummary, alpha: number): TestRowView {
  const row = testRow(label, test);
  const critical = criticalWords(test, alpha);
  if (!critical) return row;
  return { ...row, note: row.note ? `${critical[0].toUpperCase()}${critical.slice(1)}; ${row.note}` : `${critical[0].toUpperCase()}${critical.slice(1)}.` };
}

/** The words of one M statistic: its value, where it rejects and what it decided, all from the report. */
function mStatisticWords(m: NgPerronSummary['statistics'][number], alpha: number): string {
  const key = `${Math.round(alpha * 1000) / 10}%`;
  const value = m.critical[key];
  const decision = m.rejects === null ? 'no decision' : m.rejects ? 'rejects' : 'does not reject';
  return `${m.name} ${showNumber(m.statistic)}${value === undefined ? '' : ` (rejects below ${showNumber(value)} at ${key})`}: ${decision}`;
}

/**
 * The Ng-Perron row: MZt with its critical value, what the test adds (good size when the changes
 * are autocorrelated), that it is shown for comparison, and MZa, MSB and MPT in its note.
 */
export function ngPerronRow(test: NgPerronSummary, alpha: number): TestRowView {
  const row = unitRootRow('Unit root, sized for short samples (Ng-Perron MZt), shown for comparison', test, alpha);
  const others = test.statistics.filter((m) => m.name !== test.statisticName).map((m) => mStatisticWords(m, alpha));
  const parts = [
    row.note ? row.note.replace(/\.$/, '') : '',
    'It keeps its stated error rate when the changes are autocorrelated, where ADF and DF-GLS may reject too often; it does not decide the order',
    `The other forms: ${others.join('; ')}`,
  ].filter((p) => p !== '');
  return { ...row, note: `${parts.join('. ')}.` };
}

/** The view of one series. */
export function seriesItem(s: SeriesReport, period: string, alpha = 0.05): SeriesItemView {
  return {
    name: s.name,
    mark: seriesMark(s),
    orderText: s.orderText,
    verdict: s.verdict,
    testsAgree: s.agree,
    decidedBy: s.decidedBy === 'dfgls'
      ? 'Decided on the levels by the test with more power against a slow return to a mean (DF-GLS); the changes by ADF.'
      : 'Decided by ADF; the test with more power against a slow return to a mean (DF-GLS) is shown beside it.',
    tests: s.steps.map((step) => ({
      stage: stageName(step.differences, period),
      adf: unitRootRow(s.decidedBy === 'adf' || step.differences > 0 ? 'Unit root (ADF), decides' : 'Unit root (ADF)', step.adf, alpha),
      kpss: unitRootRow('Steadiness (KPSS)', step.kpss, alpha),
      ngPerron: step.ngPerron ? ngPerronRow(step.ngPerron, alpha) : null,
      gls: step.gls ? unitRootRow(s.decidedBy === 'dfgls' ? 'Unit root, more power against a slow return (DF-GLS), decides' : 'Unit root, more power against a slow return (DF-GLS)', step.gls, alpha) : null,
    })),
    warnings: s.warnings.slice(),
  };
}

/** The step's first line: how many of the prices wander, with the verb agreeing with its subject. */
export function seriesHeadline(wandering: number, total: number): string {
  if (wandering === total) {
    return total === 2
      ? 'Both prices wander: they can be tested for a tie.'
      : `All ${total} prices wander: each can be tested for a tie with the others.`;
  }
  if (wandering === 0) {
    return total === 2
      ? 'Neither price wanders like a random walk, so the tie tests that follow do not apply to them.'
      : 'None of these prices wanders like a random walk, so the tie tests that follow do not apply to them.';
  }
  const verb = wandering === 1 ? 'wanders' : 'wander';
  const rest = total - wandering === 1 ? 'the other' : 'the others';
  return `${wandering} of ${total} prices ${verb}; pairs with ${rest} are not read as long-run ties.`;
}

/** The view of the step from the report. */
export function seriesStepView(report: DiagnosticReport): SeriesStepView {
  const wandering = report.series.filter((s) => s.order === 1).length;
  const total = report.series.length;
  const headline = seriesHeadline(wandering, total);
  return {
    headline,
    items: report.series.map((s) => seriesItem(s, report.data.period, report.settings.alpha)),
    chart: chartModelsOf(report).series,
    choices: choiceViews(['deterministic', 'unitRootTest'], report.settings),
    // Each series shows its own warnings; the step's list keeps the data's.
    warnings: report.warnings.filter((w) => !report.series.some((s) => s.warnings.includes(w))),
    cautions: cautionsView(report),
  };
}
