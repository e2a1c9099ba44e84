/**
 * The view of "Tied together?": for the chosen pair, whether the two prices share a
 * long-run relation, in the engine's sentence, with a mark in words, the residual tests
 * both ways, Phillips-Ouliaris and Johansen's rank test (its case and lags each with the
 * engine's why), the pair's warnings (tests that disagree among them), and with more than
 * two series the verdict on the system as a whole. The lag rule and the Johansen case can be
 * changed here.
 */
import type { JohansenSummary, DiagnosticReport } from '../../../addin/report/report-types';
import type { PairReport } from '../../../addin/report/pair-types';
import { cautionsView, type CautionsView } from './cautions-view';
import { choiceViews, type ChoiceView } from './choices';
import { testRow, type TestRowView } from './test-row';
import { mark, type VerdictMark } from './verdict-mark';

/** Johansen's rank test, as the step shows it. */
export interface JohansenView {
  verdict: string;
  caseReason: string;
  lagsReason: string;
  rows: TestRowView[];
  warnings: string[];
}

/** The step's view of one pair. */
export interface TiedStepView {
  pairLabel: string;
  mark: VerdictMark;
  verdict: string;
  tests: TestRowView[];
  johansen: JohansenView | null;
  warnings: string[];
  /** The whole system's verdict with more than two series; null otherwise. */
  system: { verdict: string; johansen: JohansenView | null } | null;
  choices: ChoiceView[];
  cautions: CautionsView;
}

/** The mark of a pair: tied, not tied, or not a question the tests can answer here. */
export function tiedMark(pair: PairReport): VerdictMark {
  const c = pair.cointegration;
  if (!c.bothIntegrated) return mark('Tests do not apply', 'unsure');
  if (!c.cointegrated) return mark('No tie found', 'no');
  return c.evidence === 'both-directions' ? mark('Tied', 'yes') : mark('Tied, one way only', 'unsure');
}

/** Johansen's rows and reasons. */
export function johansenView(j: JohansenSummary): JohansenView {
  return {
    verdict: j.verdict,
    caseReason: j.caseReason,
    lagsReason: j.lagsReason,
    rows: j.trace.map((t, r) => testRow(r === 0 ? 'Johansen: no relation' : `Johansen: at most ${r}`, t)),
    warnings: j.warnings.slice(),
  };
}

/** The step's view of a pair of the report. */
export function tiedStepView(report: DiagnosticReport, pair: PairReport): TiedStepView {
  const c = pair.cointegration;
  const { aOnB, bOnA } = c.engleGranger;
  const tests = [
    testRow(`Engle-Granger, ${aOnB.dependent} on ${aOnB.regressor}`, aOnB),
    testRow(`Engle-Granger, ${bOnA.dependent} on ${bOnA.regressor}`, bOnA),
  ];
  if (c.phillipsOuliaris) tests.push(testRow('Phillips-Ouliaris', c.phillipsOuliaris));
  const system = report.system
    ? { verdict: report.system.verdict, johansen: report.system.johansen ? johansenView(report.system.johansen) : null }
    : null;
  return {
    pairLabel: `${pair.a} and ${pair.b}`,
    mark: tiedMark(pair),
    verdict: c.verdict,
    tests,
    johansen: c.johansen ? johansenView(c.johansen) : null,
    warnings: pair.warnings.map((w) => w.text),
    system,
    choices: choiceViews(['lagRule', 'johansenCase'], report.settings),
    cautions: cautionsView(report),
  };
}
