/**
 * The view of "Who moves first": which lead-lag test suits these data and the engine's why,
 * both directions with their statistics, the verdict with a mark in words, and the lead-lag
 * cautions (a lead is evidence about timing, not cause and effect). The lag rule can be
 * changed here too.
 */
import type { DiagnosticReport } from '../../../addin/report/report-types';
import type { LeadLagDirectionSummary, PairReport } from '../../../addin/report/pair-types';
import { cautionsView, type CautionsView } from './cautions-view';
import { choiceViews, type ChoiceView } from './choices';
import { testRow, type TestRowView } from './test-row';
import { mark, type VerdictMark } from './verdict-mark';

/** One direction of the question. */
export interface DirectionView {
  question: string;
  answer: string;
  rows: TestRowView[];
}

/** The step's view of one pair. */
export interface LeaderStepView {
  pairLabel: string;
  mark: VerdictMark | null;
  verdict: string;
  method: string | null;
  why: string | null;
  directions: DirectionView[];
  choices: ChoiceView[];
  cautions: CautionsView;
  /** The lead-lag test's own cautions (timing is not cause and effect), shown in the step; the standing ones are shown once by the pane. */
  timingCautions: string[];
}

const METHOD_NAMES: Record<string, string> = {
  'f-levels': 'F test on price levels',
  'f-differences': 'F test on price changes',
  'error-correction': 'Error-correction test',
  'toda-yamamoto': 'Toda-Yamamoto test',
};

function direction(d: LeadLagDirectionSummary): DirectionView {
  const rows = [testRow(d.longRun ? 'Short-run test' : d.test.test, d.test)];
  if (d.longRun) rows.push(testRow('Long-run test', d.longRun));
  return { question: `Does ${d.cause} move before ${d.effect}?`, answer: d.leads ? 'Yes' : 'No evidence', rows };
}

/** The step's view of a pair of the report. */
export function leaderStepView(report: DiagnosticReport, pair: PairReport): LeaderStepView {
  const ll = pair.leadLag;
  const choices = choiceViews(['lagRule'], report.settings);
  if (!ll) {
    const reason = pair.unavailable.find((u) => u.part === 'lead-lag test')?.reason ?? 'the engine could not run it on these data';
    return { pairLabel: `${pair.a} and ${pair.b}`, mark: null, verdict: `No lead-lag test for this pair: ${reason}`, method: null, why: null, directions: [], choices, cautions: cautionsView(report), timingCautions: [] };
  }
  const verdictMark = ll.pattern === 'one-way' && ll.leader
    ? mark(`${ll.leader} moves first`, 'yes')
    : ll.pattern === 'both-ways' ? mark('Each moves the other', 'unsure') : mark('Neither moves first', 'no');
  return {
    pairLabel: `${pair.a} and ${pair.b}`,
    mark: verdictMark,
    verdict: ll.verdict,
    method: METHOD_NAMES[ll.method] ?? ll.method,
    why: ll.why,
    directions: [direction(ll.aLeadsB), direction(ll.bLeadsA)],
    choices,
    cautions: cautionsView(report, ll.cautions ?? []),
    timingCautions: (ll.cautions ?? []).filter((c) => !report.cautions.includes(c)),
  };
}
