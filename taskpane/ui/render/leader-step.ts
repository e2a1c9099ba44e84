/** Renders "Who moves first" from its view model. */
import { el } from '../dom';
import type { ChoiceKey } from '../views/choices';
import type { LeaderStepView } from '../views/leader-view';
import { choiceControl, section, testTable, verdictLine } from './parts';

/** The step's content; `onChoice` re-runs the diagnosis with a changed choice. */
export function renderLeaderStep(view: LeaderStepView, picker: HTMLElement | null, onChoice: (key: ChoiceKey, value: string) => void): HTMLElement {
  return el('div', { class: 'step-body' },
    picker,
    el('h3', { class: 'pair-title' }, view.pairLabel),
    verdictLine(view.mark, view.verdict),
    view.method ? section(`Test used: ${view.method}`, el('p', { class: 'why' }, view.why ?? '')) : null,
    ...view.directions.map((d) => section(d.question, el('p', { class: 'answer' }, d.answer), testTable('The numbers', d.rows))),
    view.timingCautions.length > 0
      ? el('aside', { class: 'timing-cautions', 'aria-label': 'About who moves first' }, el('h3', {}, 'About who moves first'), el('ul', {}, ...view.timingCautions.map((c) => el('li', {}, c))))
      : null,
    ...view.choices.map((c) => choiceControl(c, (v) => onChoice(c.key, v))));
}
