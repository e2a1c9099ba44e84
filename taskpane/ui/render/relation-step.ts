/** Renders "The relation and its pull" from its view model. */
import { el } from '../dom';
import type { RelationStepView } from '../views/relation-view';
import { chartSlot } from './chart-slot';
import { factList, section, warningsBox } from './parts';

/** The step's content; `throughTime` is the section on the relation through time. */
export function renderRelationStep(view: RelationStepView, picker: HTMLElement | null, throughTime: HTMLElement | null = null): HTMLElement {
  return el('div', { class: 'step-body' },
    picker,
    el('h3', { class: 'pair-title' }, view.pairLabel),
    view.untiedNote ? el('p', { class: 'flag' }, view.untiedNote) : null,
    view.pullVerdict ? el('div', { class: 'verdict' }, el('p', { class: 'verdict-text', 'data-role': 'pull' }, view.pullVerdict)) : null,
    section('The long-run line',
      view.relationText ? el('p', { class: 'relation' }, view.relationText) : el('p', {}, 'No long-run line could be estimated.'),
      view.normalisationReason ? el('p', { class: 'why' }, view.normalisationReason) : null,
      view.hedgeText ? el('p', { class: 'why', 'data-role': 'hedge' }, view.hedgeText) : null,
      factList(view.lineFacts),
      view.halvesNote ? el('p', { class: 'why' }, view.halvesNote) : null),
    section('How a gap closes', factList(view.pullFacts)),
    view.spreadVerdict ? section('Where the spread is now', el('p', {}, view.spreadVerdict)) : null,
    view.spreadLineNote ? el('p', { class: 'why', 'data-role': 'spread-line' }, view.spreadLineNote) : null,
    view.charts ? chartSlot(view.charts.spread) : null,
    view.charts ? chartSlot(view.charts.rollingZ) : null,
    view.pathCharts.movingHedge ? chartSlot(view.pathCharts.movingHedge) : null,
    view.pathCharts.forecast ? chartSlot(view.pathCharts.forecast) : null,
    warningsBox('Worth knowing', [...view.warnings, ...view.unavailable]),
    throughTime);
}
