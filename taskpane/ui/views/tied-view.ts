/**
 * The view of "Tied together?": for the chosen pair, whether the two prices share a
 * long-run relation, in the engine's sentence, with a mark in words, the residual tests
 * both ways, Phillips-Ouliaris and Johansen's rank test (its case and lags each with the
 * engine's why), the pair's warnings (tests that disagree among them), and with more than
 * two series the verdict on the system as a whole. The lag rule and the Johansen case can be
 * changed here.
 *
 * The mark and the words under it come from one decision (tieReading): the residual tests'
 * evidence, whether both prices wander, and whether Johansen's rank test agrees. A pair whose
 * tests disagree is marked as mixed evidence, never in the colour of a tie.
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

/** What the tests say about a pair's tie, taken together. */
export type TieKind = 'tied' | 'one-way' | 'mixed' | 'none' | 'not-wandering';

/** Order of the readings, strongest evidence of a tie first (the pair lists sort by it). */
export const TIE_ORDER: Record<TieKind, number> = { tied: 0, 'one-way': 1, mixed: 2, none: 3, 'not-wandering': 4 };

/** One decision about a pair's tie: its kind, its mark, and the sentence that goes with it. */
export interface TieReading {
  kind: TieKind;
  mark: VerdictMark;
  /** The engine's cointegration sentence, then, when Johansen's rank test bears on it, what that test says. */
  sentence: string;
  /** Said beside Johansen's own verdict when its rank does not mean a tie between the two prices. */
  johansenNote: string | null;
}

/** The step's view of one pair. */
export interface TiedStepView {
  pairLabel: string;
  mark: VerdictMark;
  /** The sentence of the same decision as the mark. */
  verdict: string;
  /** Said beside Johansen's verdict when its rank is no tie between two wandering prices. */
  johansenNote: string | null;
  tests: TestRowView[];
  johansen: JohansenView | null;
  warnings: string[];
  /** The whole system's verdict with more than two series; null otherwise. */
  system: { verdict: string; johansen: JohansenView | null } | null;
  choices: ChoiceView[];
  cautions: CautionsView;
}

/**
 * The reading of a pair's tie. The residual tests (Engle-Granger both ways) decide whether the
 * report counts the pair as tied; Johansen's rank test is the second opinion. Only a tie both
 * ways that Johansen does not contradict is marked "Tied"; tests that point different ways are
 * "Mixed evidence". With a price that does not wander, a Johansen rank of 1 only echoes that
 * price's own pull to its level, and the words say so.
 */
export function tieReading(pair: PairReport): TieReading {
  const c = pair.cointegration;
  const rank = c.johansen ? c.johansen.rank.trace : null;
  const jFinds = rank === null ? null : rank >= 1;
  const add = (extra: string | null): string => (extra ? `${c.verdict} ${extra}` : c.verdict);
  if (!c.bothIntegrated) {
    const note = jFinds
      ? "Johansen's rank test counts a price that keeps returning to its own level as a relation by itself, so the relation it finds here is not a tie between the two."
      : null;
    return { kind: 'not-wandering', mark: mark('Not two wandering prices', 'unsure'), sentence: add(note), johansenNote: note };
  }
  if (c.evidence === 'both-directions') {
    if (jFinds === false) {
      return {
        kind: 'mixed',
        mark: mark('Mixed evidence', 'unsure'),
        sentence: add("Johansen's rank test, however, finds no relation: treat the tie as uncertain."),
        johansenNote: null,
      };
    }
    return { kind: 'tied', mark: mark('Tied', 'yes'), sentence: add(jFinds ? "Johansen's rank test agrees." : null), johansenNote: null };
  }
  if (c.evidence === 'one-direction') {
    const j = jFinds === null ? null : jFinds ? "Johansen's rank test finds a relation too." : "Johansen's rank test finds none.";
    return { kind: 'one-way', mark: mark('Tied, one way only', 'unsure'), sentence: add(j), johansenNote: null };
  }
  if (jFinds) {
    return {
      kind: 'mixed',
      mark: mark('Mixed evidence', 'unsure'),
      sentence: add("Johansen's rank test, however, finds one: treat a tie as unproven, not as ruled out."),
      johansenNote: null,
    };
  }
  return { kind: 'none', mark: mark('No tie found', 'no'), sentence: c.verdict, johansenNote: null };
}

/** The mark of a pair (the mark of its tieReading). */
export function tiedMark(pair: PairReport): VerdictMark {
  return tieReading(pair).mark;
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
  const reading = tieReading(pair);
  return {
    pairLabel: `${pair.a} and ${pair.b}`,
    mark: reading.mark,
    verdict: reading.sentence,
    johansenNote: reading.johansenNote,
    tests,
    johansen: c.johansen ? johansenView(c.johansen) : null,
    warnings: pair.warnings.map((w) => w.text),
    system,
    choices: choiceViews(['lagRule', 'johansenCase'], report.settings),
    cautions: cautionsView(report),
  };
}
