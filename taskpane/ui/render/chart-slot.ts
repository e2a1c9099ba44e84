/**
 * A place for a chart in a step: the renderer puts a slot where the chart goes, and the
 * pane draws the chart once the step is on the page and the slot has its width.
 */
import { drawLineChart, type DrawnChart } from '../charts/line-chart';
import type { ChartModel } from '../views/chart-models';

const models = new WeakMap<HTMLElement, ChartModel>();

/** A slot that will hold the chart of `model`. */
export function chartSlot(model: ChartModel): HTMLElement {
  const slot = document.createElement('div');
  slot.className = 'chart-slot';
  slot.dataset.chartSlot = model.id;
  models.set(slot, model);
  return slot;
}

/** Draws every chart slot under `root` at its width; returns the drawn charts, to destroy later. */
export function drawChartSlots(root: HTMLElement): DrawnChart[] {
  const drawn: DrawnChart[] = [];
  for (const slot of Array.from(root.querySelectorAll<HTMLElement>('.chart-slot'))) {
    const model = models.get(slot);
    if (!model || slot.firstChild) continue;
    const chart = drawLineChart(model, slot.clientWidth || 300);
    slot.appendChild(chart.element);
    drawn.push(chart);
  }
  return drawn;
}
