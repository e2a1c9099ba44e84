/**
 * Renders "Choose prices": where the data are, the columns to compare (Fluent checkboxes;
 * left-out columns listed with why), logs, gaps, the sample window and the level, then the
 * rows the choices leave and what was dropped. Every header is inserted as text.
 */
import { el } from '../dom';
import type { DataChoice } from '../data/prepare-data';
import type { DataStepView } from '../views/data-view';
import { checkboxField, nextId, section } from './parts';

/** What the data step asks of the pane. */
export interface DataStepHandlers {
  /** Looks again for the data around the selection. */
  detect(): void;
  /** A choice changed. */
  change(patch: Partial<DataChoice>): void;
  /** Runs the diagnosis. */
  run(): void;
}

const LEVELS: { value: string; label: string }[] = [
  { value: '0.01', label: '1% (strict)' },
  { value: '0.05', label: '5% (usual)' },
  { value: '0.1', label: '10% (lenient)' },
];

function textField(label: string, value: string, placeholder: string, role: string, onChange: (v: string) => void): HTMLElement {
  const id = nextId(role);
  const input = el('fluent-text-input', { slot: 'input', id, value, placeholder, 'data-role': role, 'control-size': 'small' });
  input.addEventListener('change', () => onChange(String((input as unknown as { value: string }).value ?? '')));
  return el('fluent-field', { 'label-position': 'above', class: 'text' }, el('label', { slot: 'label', for: id }, label), input);
}

/** The step's content. */
export function renderDataStep(view: DataStepView | null, choice: DataChoice, problem: string | null, stale: string | null, handlers: DataStepHandlers, busy: boolean): HTMLElement {
  const detect = el('fluent-button', { appearance: 'secondary', 'data-role': 'detect' }, 'Use the data around my selection');
  detect.addEventListener('click', () => handlers.detect());
  if (!view) {
    return el('div', { class: 'step-body' },
      el('p', {}, 'Select a cell inside your price table, then press the button.'),
      problem ? el('p', { class: 'problem', role: 'alert' }, problem) : null,
      detect);
  }
  const picked = new Set(choice.columns);
  const usable = view.columns.filter((c) => c.usable);
  const leftOut = view.columns.filter((c) => !c.usable);
  const boxes = usable.map((c) => checkboxField(c.header, c.picked, (on) => {
    const next = new Set(picked);
    if (on) next.add(c.index);
    else next.delete(c.index);
    handlers.change({ columns: view.columns.filter((x) => next.has(x.index)).map((x) => x.index) });
  }, { 'data-column': c.header }));

  const levelId = nextId('level');
  const level = el('fluent-radio-group', { orientation: 'vertical', name: 'alpha', value: String(choice.alpha), 'aria-labelledby': levelId, 'data-choice': 'alpha' });
  for (const l of LEVELS) {
    const id = nextId('alpha');
    level.appendChild(el('fluent-field', { 'label-position': 'after' }, el('label', { slot: 'label', for: id }, l.label), el('fluent-radio', { slot: 'input', id, value: l.value, checked: Number(l.value) === choice.alpha })));
  }
  level.addEventListener('change', () => {
    const v = Number((level as unknown as { value: string }).value);
    if (Number.isFinite(v) && v !== choice.alpha) handlers.change({ alpha: v });
  });

  const run = el('fluent-button', { appearance: 'primary', 'data-role': 'run', disabled: !view.ready || busy }, 'Run the diagnosis');
  run.addEventListener('click', () => handlers.run());

  return el('div', { class: 'step-body' },
    stale ? el('p', { class: 'flag', 'data-role': 'stale' }, stale) : null,
    el('p', { class: 'found', 'data-role': 'found' }, view.found),
    el('p', { class: 'why' }, view.dateColumn),
    detect,
    section('Series to compare',
      el('div', { class: 'columns', role: 'group', 'aria-label': 'Series to compare' }, ...boxes),
      leftOut.length > 0 ? el('p', { class: 'why' }, `Not offered: ${leftOut.map((c) => `${c.header} (${c.note})`).join('; ')}.`) : null),
    section('Options',
      checkboxField('Use natural logs of the prices', choice.log, (on) => handlers.change({ log: on }), { 'data-role': 'log' }),
      el('p', { class: 'why' }, 'Logs turn price ratios into differences, so the tie is about percentage moves.'),
      checkboxField('Skip blank or text cells inside a series (they are listed)', choice.skipGaps, (on) => handlers.change({ skipGaps: on }), { 'data-role': 'gaps' }),
      el('div', { class: 'window' },
        textField('From', choice.from ?? '', view.firstKey, 'from', (v) => handlers.change({ from: v })),
        textField('To', choice.to ?? '', view.lastKey, 'to', (v) => handlers.change({ to: v }))),
      el('p', { class: 'why' }, 'Leave From and To empty to use every row.'),
      el('fieldset', { class: 'choice' }, el('legend', { id: levelId }, 'How sure before saying yes'), level,
        el('p', { class: 'why' }, 'A stricter level says "tied" less often by chance, and misses more real ties.'))),
    section('Rows used',
      view.rowsSentence ? el('p', { 'data-role': 'rows-used' }, view.rowsSentence) : null,
      view.dropped.length > 0 ? el('ul', { class: 'dropped', 'data-role': 'dropped' }, ...view.dropped.map((d) => el('li', {}, d))) : null,
      problem ? el('p', { class: 'problem', role: 'alert' }, problem) : null),
    run);
}
