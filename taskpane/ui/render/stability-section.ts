/**
 * The "Through time" section of the relation step: a button that asks the worker how the
 * chosen pair's relation held through the sample, then, while it works, a line with a Cancel
 * button, and once done the charts of the rolling p-value, hedge ratio and half-life, the
 * engine's sentences and the table of the one-break tests with the date each found.
 */
import { el } from '../dom';
import type { StabilityView } from '../views/stability-view';
import { chartSlot } from './chart-slot';
import { disclosure, section, testTable } from './parts';

/** Where the section stands. */
export type StabilitySectionState =
  | { kind: 'idle' }
  | { kind: 'running' }
  | { kind: 'failed'; problem: string }
  | { kind: 'done'; view: StabilityView };

/** What the section asks of the pane. */
export interface StabilityHandlers {
  start(): void;
  cancel(): void;
}

/** The section for a pair. */
export function renderStabilitySection(pairLabel: string, state: StabilitySectionState, handlers: StabilityHandlers): HTMLElement {
  const title = 'Through time: did the relation hold?';
  if (state.kind === 'done') {
    const v = state.view;
    return el('section', { class: 'part through-time', 'data-role': 'through-time' },
      el('h3', {}, title),
      el('p', { class: 'why' }, v.intro),
      v.summary.length > 0 ? el('ul', { class: 'summary', 'data-role': 'rolling-summary' }, ...v.summary.map((s) => el('li', {}, s))) : null,
      ...v.charts.map((c) => chartSlot(c)),
      v.breaks.length > 0 ? testTable('Tests that allow one break', v.breaks.map((b) => ({ ...b.row, label: `${b.row.label} (found at ${b.breakAt})` }))) : null,
      v.breaks.length > 0 ? disclosure('What the break tests say', 'break-verdicts', el('ul', {}, ...v.breaks.map((b) => el('li', {}, b.verdict)))) : null,
      ...v.problems.map((p) => el('p', { class: 'problem' }, p)));
  }
  const start = el('fluent-button', { appearance: 'secondary', 'data-role': 'stability-run', disabled: state.kind === 'running' }, 'Check it through time');
  start.addEventListener('click', () => handlers.start());
  const cancel = el('fluent-button', { appearance: 'secondary', 'data-role': 'stability-cancel' }, 'Cancel');
  cancel.addEventListener('click', () => handlers.cancel());
  const part = section(title,
    el('p', { class: 'why' }, `A relation found over the whole sample may hold only in part of it. This looks at ${pairLabel} in rolling windows, and tests for one break at a date the data suggest.`),
    state.kind === 'running' ? el('div', { class: 'progress', role: 'status', 'data-role': 'stability-progress' }, el('fluent-progress-bar', { 'aria-label': 'Checking through time' }), el('p', {}, 'Working through the windows and the break dates…'), cancel) : start,
    state.kind === 'failed' ? el('p', { class: 'problem', role: 'alert', 'data-role': 'stability-problem' }, state.problem) : null);
  part.classList.add('through-time');
  part.dataset.role = 'through-time';
  return part;
}
