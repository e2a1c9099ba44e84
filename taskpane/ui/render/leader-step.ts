/** Renders "Who moves first" from its view model. */
import { el } from '../dom';
import type { ChoiceKey } from '../views/choices';
import type { LeaderStepView } from '../views/leader-view';
import { cautionsBox, choiceControl, section, testTable, verdictLine } from './parts';

/** The step's content; `onChoice` re-runs the diagnosis with a changed choice. */
export function renderLeaderStep(view: LeaderStepView, picker: HTMLElement | null, onChoice: (key: ChoiceKey, value: string) => void): HTMLElement {
  return el('div', { class: 'step-body' },
    picker,
    el('h3', { class: 'pair-title' }, view.pairLabel),
    verdictLine(view.mark, view.verdict),
    view.method ? section(`Test used: ${view.method}`, el('p', { class: 'why' }, view.why ?? '')) : null,
    ...view.directions.map((d) => section(d.question, el('p', { class: 'answer' }, d.answer), testTable('The numbers', d.rows))),
    ...view.choices.map((c) => choiceControl(c, (v) => onChoice(c.key, v))),
    cautionsBox(view.cautions));
}
