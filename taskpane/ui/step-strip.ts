/**
 * The strip of step buttons at the top of the pane: one Fluent button per step with its
 * number and its short name in view (the full title in its accessible name), the current one marked with aria-current and a bar under it (not by
 * colour alone). Keys: Left/Right (and Up/Down) move focus along the strip, Home/End jump,
 * Enter or Space opens the step; steps that need a finished diagnosis are disabled until
 * there is one.
 */
import { el } from './dom';
import { STEPS, type StepId } from './steps';

/** The strip; `onOpen` opens a step. */
export function renderStepStrip(current: StepId, reportReady: boolean, onOpen: (id: StepId) => void): HTMLElement {
  const buttons = STEPS.map((s, i) => {
    const enabled = !s.needsReport || reportReady;
    const b = el('fluent-button', {
      appearance: s.id === current ? 'primary' : 'subtle',
      size: 'small',
      'data-step': s.id,
      'aria-current': s.id === current ? 'step' : null,
      'aria-label': `Step ${i + 1} of ${STEPS.length}: ${s.title}${enabled ? '' : ' (after the diagnosis has run)'}`,
      title: s.title,
      tabindex: s.id === current ? '0' : '-1',
      disabled: !enabled,
    }, el('span', { class: 'step-number', 'aria-hidden': 'true' }, String(i + 1)), el('span', { class: 'step-name', 'aria-hidden': 'true' }, s.short));
    b.addEventListener('click', () => onOpen(s.id));
    return b;
  });
  const strip = el('nav', { class: 'step-strip', 'aria-label': 'Steps of the diagnosis' }, ...buttons);
  strip.addEventListener('keydown', (event) => {
    const i = buttons.findIndex((b) => b === document.activeElement || b.contains(document.activeElement));
    if (i < 0) return;
    const enabledAt = (k: number): boolean => !buttons[k].hasAttribute('disabled');
    let target = -1;
    if (event.key === 'ArrowRight' || event.key === 'ArrowDown') for (let k = i + 1; k < buttons.length && target < 0; k++) if (enabledAt(k)) target = k;
    if (event.key === 'ArrowLeft' || event.key === 'ArrowUp') for (let k = i - 1; k >= 0 && target < 0; k--) if (enabledAt(k)) target = k;
    if (event.key === 'Home') target = 0;
    if (event.key === 'End') for (let k = buttons.length - 1; k >= 0 && target < 0; k--) if (enabledAt(k)) target = k;
    if (target < 0) return;
    event.preventDefault();
    buttons.forEach((b, k) => b.setAttribute('tabindex', k === target ? '0' : '-1'));
    buttons[target].focus();
  });
  return strip;
}
