/**
 * The pair picker of the pair stages: a labelled list of the report's pairs (tied pairs
 * first), shown only when there is more than one pair.
 */
import { el } from '../dom';
import type { PairOption } from '../views/pair-choice';
import { nextId } from './parts';

/** The picker, or null with a single pair; `onPick` gets the index into report.pairs. */
export function pairPicker(options: readonly PairOption[], current: number, onPick: (index: number) => void): HTMLElement | null {
  if (options.length < 2) return null;
  const id = nextId('pair');
  const select = el('select', { id, class: 'pair-select', 'data-role': 'pair-picker' },
    ...options.map((o) => el('option', { value: o.index, selected: o.index === current }, o.label)));
  select.addEventListener('change', () => onPick(Number(select.value)));
  return el('div', { class: 'pair-picker' }, el('label', { for: id }, 'Pair to look at'), select);
}
