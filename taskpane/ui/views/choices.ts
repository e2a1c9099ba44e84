/**
 * The choices a stage lets the user change, each option with a one-line why. A changed
 * choice runs the diagnosis again with the engine's options; the pane never recomputes a
 * result itself.
 */
import { JOHANSEN_CASES, JOHANSEN_CASE_LABEL, type JohansenCase } from '../../../addin/johansen/deterministic-case';
import type { DiagnosticSettings } from '../../../addin/report/report-types';
import type { Deterministic } from '../../../addin/result';

/** The options the stages can change. */
export interface StageChoices {
  deterministic: Deterministic;
  lagRule: 'aic' | 'bic';
  johansenCase: JohansenCase | 'auto';
  /** The unit-root test that decides whether each price's levels wander. */
  unitRootTest: 'adf' | 'dfgls';
}

/** Which of the stage choices a control sets. */
export type ChoiceKey = keyof StageChoices;

/** One option of a choice, with why a user would pick it. */
export interface ChoiceOption {
  value: string;
  label: string;
  why: string;
}

/** A choice as the pane shows it. */
export interface ChoiceView {
  key: ChoiceKey;
  label: string;
  /** One line on why the choice matters. */
  matters: string;
  options: ChoiceOption[];
  /** The value in force. */
  value: string;
  /** The why of the value in force (shown under the control). */
  currentWhy: string;
}

/** The stage choices at their defaults. */
export const DEFAULT_CHOICES: StageChoices = { deterministic: 'const', lagRule: 'aic', johansenCase: 'auto', unitRootTest: 'adf' };

/** When each Johansen case suits prices, in a line. */
const CASE_WHY: Record<JohansenCase, string> = {
  none: 'Only for series that hover around zero; seldom right for prices.',
  'restricted-constant': 'For prices that do not drift: the constant sits inside the tie.',
  constant: 'For prices that drift up or down over the years.',
  'restricted-trend': 'For drifting prices whose tie itself moves along a straight trend.',
  trend: 'For prices whose drift itself speeds up; seldom right for prices.',
};

const OPTIONS: Record<ChoiceKey, { label: string; matters: string; options: ChoiceOption[] }> = {
  deterministic: {
    label: 'Level terms',
    matters: 'The tests compare each price with a level it might return to; a steady climb needs a trend in that level.',
    options: [
      { value: 'const', label: 'A constant level', why: 'For prices with no steady climb or fall over the sample.' },
      { value: 'trend', label: 'A level with a trend', why: 'For prices that climb or fall steadily over the whole sample.' },
    ],
  },
  lagRule: {
    label: 'How many past days to use',
    matters: 'Past changes can echo into today; the rule picks how many to allow for.',
    options: [
      { value: 'aic', label: 'Generous (AIC)', why: 'Allows more past changes; safer when moves echo for several days.' },
      { value: 'bic', label: 'Sparing (BIC)', why: 'Prefers fewer past changes; steadier in short samples.' },
    ],
  },
  unitRootTest: {
    label: 'Which test decides whether a price wanders',
    matters: 'A price that returns to its mean only slowly looks much like one that wanders; a test with more power tells them apart more often.',
    options: [
      { value: 'adf', label: 'The usual test (ADF)', why: 'The long-standing choice; every later step of the walk was first checked with it.' },
      { value: 'dfgls', label: 'The test with more power (DF-GLS)', why: 'Removes the level before testing, so a slow return to a mean is caught more often; the changes still use ADF.' },
    ],
  },
  johansenCase: {
    label: 'Trend terms of the system test',
    matters: 'The system test (Johansen) must be told whether prices drift; the wrong case over- or under-finds ties.',
    options: [
      { value: 'auto', label: 'Chosen from the data', why: 'Looks at whether any price drifts and picks the case to match.' },
      ...JOHANSEN_CASES.map((c) => ({ value: c, label: capitalise(JOHANSEN_CASE_LABEL[c]), why: CASE_WHY[c] })),
    ],
  },
};

function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

/** The choice controls of a stage, showing the values the report was made with. */
export function choiceViews(keys: readonly ChoiceKey[], settings: Pick<DiagnosticSettings, ChoiceKey>): ChoiceView[] {
  return keys.map((key) => {
    const def = OPTIONS[key];
    const value = String(settings[key]);
    const current = def.options.find((o) => o.value === value) ?? def.options[0];
    return { key, label: def.label, matters: def.matters, options: def.options, value, currentWhy: current.why };
  });
}

/** The stage choices of a report (what it was made with). */
export function choicesOf(settings: Pick<DiagnosticSettings, ChoiceKey>): StageChoices {
  return { deterministic: settings.deterministic, lagRule: settings.lagRule, johansenCase: settings.johansenCase, unitRootTest: settings.unitRootTest ?? 'adf' };
}
