/** Renders "Tied together?" from its view model. */
import { el } from '../dom';
import type { ChoiceKey } from '../views/choices';
import type { JohansenView, TiedStepView } from '../views/tied-view';
import { cautionsBox, choiceControl, section, testTable, verdictLine, warningsBox } from './parts';

function johansenPart(title: string, j: JohansenView): HTMLElement {
  return section(title,
    el('p', {}, j.verdict),
    testTable('Rank test (trace)', j.rows),
    el('p', { class: 'why' }, j.caseReason),
    el('p', { class: 'why' }, j.lagsReason),
    warningsBox('Worth knowing', j.warnings));
}

/** The step's content; `onChoice` re-runs the diagnosis with a changed choice. */
export function renderTiedStep(view: TiedStepView, picker: HTMLElement | null, onChoice: (key: ChoiceKey, value: string) => void): HTMLElement {
  return el('div', { class: 'step-body' },
    picker,
    el('h3', { class: 'pair-title' }, view.pairLabel),
    verdictLine(view.mark, view.verdict),
    warningsBox('The tests do not all agree, or need care', view.warnings),
    testTable('Tests of a long-run tie', view.tests),
    view.johansen ? johansenPart('The system test for this pair', view.johansen) : null,
    view.system ? section('All the chosen series together', el('p', {}, view.system.verdict), view.system.johansen ? testTable('Rank test (trace)', view.system.johansen.rows) : null) : null,
    ...view.choices.map((c) => choiceControl(c, (v) => onChoice(c.key, v))),
    cautionsBox(view.cautions));
}
