/**
 * Renders "Tied together?" from its view model: with more than two series, first the overview
 * of every pair (sortable by a press on a column head, a pair opened by a press on its name),
 * then the chosen pair's reading, its tests, and, folded away until asked for, Johansen's test
 * of the pair, the test of all the series together and the choices of how the tests run.
 */
import { el } from '../dom';
import type { ChoiceKey } from '../views/choices';
import type { OverviewKey, PairOverview } from '../views/pair-overview';
import type { JohansenView, TiedStepView } from '../views/tied-view';
import { choiceControl, disclosure, testTable, verdictLine, warningsBox } from './parts';

function johansenPart(title: string, j: JohansenView, note: string | null): HTMLElement {
  return disclosure(title, 'johansen',
    note ? el('p', { class: 'flag', 'data-role': 'johansen-note' }, note) : null,
    el('p', {}, j.verdict),
    testTable('Rank test (trace)', j.rows),
    el('p', { class: 'why' }, j.caseReason),
    el('p', { class: 'why' }, j.lagsReason),
    warningsBox('Worth knowing', j.warnings));
}

/** What the overview asks of the pane. */
export interface OverviewHandlers {
  open(index: number): void;
  sort(key: OverviewKey): void;
}

/** The overview table of all pairs; the row of `current` is marked. */
export function overviewTable(view: PairOverview, current: number, handlers: OverviewHandlers): HTMLElement {
  const head = el('tr', {}, ...view.columns.map((c) => {
    const button = el('button', { type: 'button', class: 'sort', 'data-sort': c.key }, c.label, el('span', { class: 'sort-sign', 'aria-hidden': 'true' }, c.sort === 'ascending' ? ' ▲' : c.sort === 'descending' ? ' ▼' : ''));
    button.addEventListener('click', () => handlers.sort(c.key));
    return el('th', { scope: 'col', 'aria-sort': c.sort, class: c.key === 'p' || c.key === 'halfLife' ? 'num' : null }, button);
  }));
  const body = el('tbody', {}, ...view.rows.map((r) => {
    const open = el('button', { type: 'button', class: 'pair-open', 'data-pair': r.index, 'aria-current': r.index === current ? 'true' : null }, r.label);
    open.addEventListener('click', () => handlers.open(r.index));
    return el('tr', { class: r.index === current ? 'current' : null },
      el('th', { scope: 'row' }, open),
      el('td', {}, el('span', { class: 'verdict-mark', 'data-tone': r.mark.tone }, r.mark.word)),
      // One p-value a line, so the column stays narrow in a narrow pane.
      el('td', { class: 'num' }, el('span', { class: 'p-line' }, `${r.pValues[0]} /`), ' ', el('span', { class: 'p-line' }, r.pValues[1])),
      el('td', { class: 'num' }, r.halfLife));
  }));
  return el('div', { class: 'overview-wrap' },
    el('table', { class: 'overview', 'data-role': 'pair-overview' }, el('caption', {}, view.caption), el('thead', {}, head), body));
}

/** The step's content; `onChoice` re-runs the diagnosis with a changed choice. */
export function renderTiedStep(view: TiedStepView, overview: HTMLElement | null, onChoice: (key: ChoiceKey, value: string) => void): HTMLElement {
  return el('div', { class: 'step-body' },
    overview,
    el('h3', { class: 'pair-title', id: 'pair-detail', tabindex: '-1' }, view.pairLabel),
    verdictLine(view.mark, view.verdict),
    warningsBox('The tests do not all agree, or need care', view.warnings),
    testTable('Tests of a long-run tie', view.tests),
    view.johansen ? johansenPart('The system test (Johansen) for this pair', view.johansen, view.johansenNote) : null,
    view.system
      ? disclosure('All the chosen series together', 'system', el('p', {}, view.system.verdict), view.system.johansen ? testTable('Rank test (trace)', view.system.johansen.rows) : null)
      : null,
    view.choices.length > 0 ? disclosure('Change how the tests run', 'tied-choices', ...view.choices.map((c) => choiceControl(c, (v) => onChoice(c.key, v)))) : null);
}
