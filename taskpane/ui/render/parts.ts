/**
 * The pieces every step is built from: a verdict line (a mark in words beside the engine's
 * sentence), a table of tests, a list of labelled numbers, warnings, the cautions box, a
 * choice as a Fluent radio group with its one-line why, and a labelled Fluent checkbox.
 * Layout only: each piece shows what its view model holds.
 */
import { el, type Child } from '../dom';
import { cautionsSummary, type CautionsView } from '../views/cautions-view';
import type { ChoiceView } from '../views/choices';
import type { FactView } from '../views/relation-view';
import type { TestRowView } from '../views/test-row';
import type { VerdictMark } from '../views/verdict-mark';

let uid = 0;
/** A page-unique id for label associations. */
export function nextId(prefix: string): string {
  uid += 1;
  return `${prefix}-${uid}`;
}

/** A verdict: the mark's word (toned, never colour alone) and the sentence beside it. */
export function verdictLine(mark: VerdictMark | null, sentence: string): HTMLElement {
  return el('div', { class: 'verdict', 'data-tone': mark?.tone ?? null },
    mark ? el('span', { class: 'verdict-mark', 'data-tone': mark.tone }, mark.word) : null,
    el('p', { class: 'verdict-text' }, sentence));
}

/** A table of tests: what, statistic, p-value, decision; notes under the row. */
export function testTable(caption: string, rows: readonly TestRowView[]): HTMLElement {
  const body = el('tbody');
  for (const r of rows) {
    body.appendChild(el('tr', {}, el('th', { scope: 'row' }, r.label), el('td', { class: 'num' }, r.statistic), el('td', { class: 'num' }, r.pValue), el('td', {}, r.decision)));
    if (r.note) body.appendChild(el('tr', { class: 'note-row' }, el('td', { colspan: 4 }, r.note)));
  }
  return el('table', { class: 'tests' },
    el('caption', {}, caption),
    el('thead', {}, el('tr', {}, el('th', { scope: 'col' }, 'Test'), el('th', { scope: 'col' }, 'Statistic'), el('th', { scope: 'col' }, 'p'), el('th', { scope: 'col' }, 'Decision'))),
    body);
}

/** Labelled numbers as a description list. */
export function factList(facts: readonly FactView[]): HTMLElement {
  const list = el('dl', { class: 'facts' });
  for (const f of facts) list.append(el('dt', {}, f.label), el('dd', {}, f.value));
  return list;
}

/** Warnings from the engine, as a Fluent warning message bar with a list (nothing when none). */
export function warningsBox(title: string, warnings: readonly string[]): HTMLElement | null {
  if (warnings.length === 0) return null;
  return el('fluent-message-bar', { intent: 'warning', layout: 'multiline', class: 'warnings' },
    el('div', {}, el('strong', {}, title), el('ul', {}, ...warnings.map((w) => el('li', {}, w)))));
}

/**
 * The pane's one cautions box: a disclosure under the step strip, open when `open`, its summary
 * always in view on every step of the results; `onToggle` hears the reader open or close it.
 */
export function cautionsBox(view: CautionsView, open: boolean, onToggle: (open: boolean) => void): HTMLElement {
  const box = el('details', { class: 'cautions', 'data-role': 'cautions', open },
    el('summary', {}, cautionsSummary(view)),
    el('ul', {}, ...view.items.map((c) => el('li', {}, c))));
  box.addEventListener('toggle', () => onToggle((box as HTMLDetailsElement).open));
  return box;
}

/** A disclosure: a summary line and what it hides, closed until opened. */
export function disclosure(summary: string, role: string, ...children: Child[]): HTMLElement {
  return el('details', { class: 'more', 'data-role': role }, el('summary', {}, summary), ...children);
}

/** A choice as a radio group with its why; `onChange` gets the new value. */
export function choiceControl(choice: ChoiceView, onChange: (value: string) => void, disabled = false): HTMLElement {
  const labelId = nextId(`choice-${choice.key}`);
  const why = el('p', { class: 'why', 'aria-live': 'polite' }, choice.currentWhy);
  const group = el('fluent-radio-group', { orientation: 'vertical', name: choice.key, value: choice.value, 'aria-labelledby': labelId, 'data-choice': choice.key, disabled });
  for (const o of choice.options) {
    const radioId = nextId(`${choice.key}-${o.value}`);
    group.appendChild(el('fluent-field', { 'label-position': 'after' },
      el('label', { slot: 'label', for: radioId }, o.label),
      el('fluent-radio', { slot: 'input', id: radioId, value: o.value, checked: o.value === choice.value })));
  }
  group.addEventListener('change', () => {
    const value = (group as unknown as { value: string }).value;
    if (typeof value !== 'string' || value === choice.value) return;
    why.textContent = choice.options.find((o) => o.value === value)?.why ?? '';
    onChange(value);
  });
  return el('fieldset', { class: 'choice' },
    el('legend', { id: labelId }, choice.label),
    el('p', { class: 'matters' }, choice.matters),
    group,
    why);
}

/** A Fluent checkbox with its label; `onChange` gets the new state. */
export function checkboxField(label: string, checked: boolean, onChange: (checked: boolean) => void, attributes: Record<string, string> = {}): HTMLElement {
  const id = nextId('check');
  const box = el('fluent-checkbox', { slot: 'input', id, checked, ...attributes });
  box.addEventListener('change', () => onChange(Boolean((box as unknown as { checked: boolean }).checked)));
  return el('fluent-field', { 'label-position': 'after', class: 'check' }, el('label', { slot: 'label', for: id }, label), box);
}

/** A section with a heading. */
export function section(title: string, ...children: Child[]): HTMLElement {
  return el('section', { class: 'part' }, el('h3', {}, title), ...children);
}
