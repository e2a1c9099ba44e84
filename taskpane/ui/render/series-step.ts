/** Renders "How each series moves" from its view model. */
import { el } from '../dom';
import type { ChoiceKey } from '../views/choices';
import type { SeriesStepView } from '../views/series-view';
import type { TestRowView } from '../views/test-row';
import { chartSlot } from './chart-slot';
import { choiceControl, testTable, verdictLine, warningsBox } from './parts';

/** The step's content; `onChoice` re-runs the diagnosis with a changed choice. */
export function renderSeriesStep(view: SeriesStepView, onChoice: (key: ChoiceKey, value: string) => void): HTMLElement {
  const items = view.items.map((item) => el('article', { class: 'item', 'data-series': item.name },
    el('h3', {}, item.name, el('span', { class: 'order' }, ` ${item.orderText}`)),
    verdictLine(item.mark, item.verdict),
    el('details', {}, el('summary', {}, 'The tests behind it'),
      el('p', { class: 'decided-by', 'data-role': 'decided-by' }, item.decidedBy),
      ...item.tests.map((t) => testTable(t.stage, [t.adf, t.gls, t.ngPerron, t.kpss].filter((r): r is TestRowView => r !== null)))),
    warningsBox('Worth knowing', item.warnings)));
  return el('div', { class: 'step-body' },
    el('p', { class: 'headline' }, view.headline),
    chartSlot(view.chart),
    ...items,
    ...view.choices.map((c) => choiceControl(c, (v) => onChoice(c.key, v))),
    warningsBox('About the data', view.warnings));
}
