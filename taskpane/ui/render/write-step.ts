/**
 * Renders "Put it in the sheet": the place (beside the data, a cell, a new sheet), the table
 * offer, the Write button, and then either the cells that would be replaced with an explicit
 * yes or no, or exactly what was written, or the failure.
 */
import { el } from '../dom';
import type { PlaceKind, WriteState, WriteStepView } from '../views/write-view';
import { checkboxField, nextId } from './parts';

/** What the write step asks of the pane. */
export interface WriteStepHandlers {
  change(patch: Partial<WriteState>): void;
  write(): void;
  confirm(yes: boolean): void;
}

const PLACES: { value: PlaceKind; label: string }[] = [
  { value: 'beside', label: 'Beside the data' },
  { value: 'cell', label: 'At a cell I choose' },
  { value: 'new-sheet', label: 'On a new sheet' },
];

/** The step's content. */
export function renderWriteStep(view: WriteStepView, state: WriteState, picker: HTMLElement | null, handlers: WriteStepHandlers): HTMLElement {
  const legendId = nextId('place');
  const group = el('fluent-radio-group', { orientation: 'vertical', name: 'place', value: state.place, 'aria-labelledby': legendId, 'data-choice': 'place', disabled: state.busy });
  for (const p of PLACES) {
    const id = nextId('place');
    group.appendChild(el('fluent-field', { 'label-position': 'after' }, el('label', { slot: 'label', for: id }, p.label), el('fluent-radio', { slot: 'input', id, value: p.value, checked: p.value === state.place })));
  }
  group.addEventListener('change', () => {
    const v = (group as unknown as { value: string }).value as PlaceKind;
    if (v !== state.place) handlers.change({ place: v, plan: null, outcome: null, problem: null });
  });
  const cellId = nextId('cell');
  const cell = el('fluent-text-input', { slot: 'input', id: cellId, value: state.cell, placeholder: 'J2 or Results!B3', 'data-role': 'cell', 'control-size': 'small' });
  cell.addEventListener('change', () => handlers.change({ cell: String((cell as unknown as { value: string }).value ?? ''), plan: null, outcome: null }));
  const write = el('fluent-button', { appearance: 'primary', 'data-role': 'write', disabled: state.busy || view.confirm !== null }, 'Write the block');
  write.addEventListener('click', () => handlers.write());

  let confirm: HTMLElement | null = null;
  if (view.confirm) {
    const yes = el('fluent-button', { appearance: 'primary', 'data-role': 'confirm-yes' }, 'Yes, replace them');
    const no = el('fluent-button', { appearance: 'secondary', 'data-role': 'confirm-no' }, 'No, keep them');
    yes.addEventListener('click', () => handlers.confirm(true));
    no.addEventListener('click', () => handlers.confirm(false));
    confirm = el('div', { class: 'confirm', role: 'alertdialog', 'aria-label': 'Replace filled cells?', 'data-role': 'confirm' },
      el('p', { class: 'question' }, view.confirm.question),
      el('ul', { class: 'occupied' }, ...view.confirm.cells.map((c) => el('li', {}, c))),
      el('div', { class: 'buttons' }, yes, no));
  }
  const result = view.result
    ? el('div', { class: view.result.ok ? 'written' : 'problem', role: 'status', 'data-role': view.result.ok ? 'written' : 'write-failed' },
        el('strong', {}, view.result.ok ? 'Written' : 'Not written'),
        el('ul', {}, ...view.result.lines.map((l) => el('li', {}, l))))
    : null;

  return el('div', { class: 'step-body' },
    picker,
    el('p', {}, `The block for ${view.pairLabel}: the verdicts with live formulas, the numbers behind them, a chart of the spread and the cautions.`),
    el('fieldset', { class: 'choice' }, el('legend', { id: legendId }, 'Where to put it'), group,
      state.place === 'cell' ? el('fluent-field', { 'label-position': 'above', class: 'text' }, el('label', { slot: 'label', for: cellId }, 'Top-left cell'), cell) : null),
    view.tableOffer ? checkboxField(view.tableOffer, state.makeTable, (on) => handlers.change({ makeTable: on }), { 'data-role': 'make-table' }) : null,
    write,
    confirm,
    view.problem ? el('p', { class: 'problem', role: 'alert' }, view.problem) : null,
    result);
}
