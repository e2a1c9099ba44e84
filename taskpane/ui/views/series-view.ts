/**
 * The view of "How each series moves": for each series, whether its price wanders (I(1)),
 * keeps returning to a level (I(0)) or is something else, in one sentence from the engine,
 * with the ADF and KPSS numbers behind it, whether the two tests agree, and its warnings;
 * then the chart of the series rebased to 100 and the deterministic-terms choice.
 */
import type { DiagnosticReport, SeriesReport } from '../../../addin/report/report-types';
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
  tests: { stage: string; adf: TestRowView; kpss: TestRowView }[];
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

/** The view of one series. */
export function seriesItem(s: SeriesReport, period: string): SeriesItemView {
  return {
    name: s.name,
    mark: seriesMark(s),
    orderText: s.orderText,
    verdict: s.verdict,
    testsAgree: s.agree,
    tests: s.steps.map((step) => ({
      stage: stageName(step.differences, period),
      adf: testRow('Unit root (ADF)', step.adf),
      kpss: testRow('Steadiness (KPSS)', step.kpss),
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
    items: report.series.map((s) => seriesItem(s, report.data.period)),
    chart: chartModelsOf(report).series,
    choices: choiceViews(['deterministic'], report.settings),
    // Each series shows its own warnings; the step's list keeps the data's.
    warnings: report.warnings.filter((w) => !report.series.some((s) => s.warnings.includes(w))),
    cautions: cautionsView(report),
  };
}
