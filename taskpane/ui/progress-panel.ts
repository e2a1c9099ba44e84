/**
 * The panel shown while a diagnosis runs: a Fluent progress bar (moving, since the engine
 * does the whole report in one call), what is being worked on, the seconds so far, and a
 * Cancel button that stops the worker at once.
 */
import { el } from './dom';
import type { RunSize } from '../worker/diagnosis-runner';

/** The sentence under the progress bar. */
export function progressSentence(size: RunSize | null, seconds: number): string {
  const what = size
    ? `Testing ${size.series} series (${size.pairs} pair${size.pairs === 1 ? '' : 's'}) over ${size.rows} rows`
    : 'Starting the diagnosis';
  return `${what}… ${seconds} s so far.`;
}

/** The panel; `onCancel` stops the run. */
export function renderProgressPanel(size: RunSize | null, seconds: number, onCancel: () => void): HTMLElement {
  const cancel = el('fluent-button', { appearance: 'secondary', 'data-role': 'cancel' }, 'Cancel');
  cancel.addEventListener('click', onCancel);
  return el('div', { class: 'progress', role: 'status', 'aria-live': 'polite', 'data-role': 'progress' },
    el('fluent-progress-bar', { 'aria-label': 'Diagnosis in progress' }),
    el('p', { 'data-role': 'progress-text' }, progressSentence(size, seconds)),
    cancel);
}
