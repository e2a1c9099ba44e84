/**
 * Draws a chart model with uPlot: one line per model line, styled by its role (the data in
 * a solid line, bands dashed, centre and guides dotted), dates on the x axis when the model
 * has them, each tick labelled with its year where the span needs it (time-ticks.ts). The chart carries the model's description as its text alternative, and its
 * legend names every line, so no line is told apart by colour alone.
 */
import uPlot from 'uplot';
import type { ChartLine, ChartModel } from '../views/chart-models';
import { timeTickLabels } from './time-ticks';

/** Colours of the data lines, in order (the pane's own palette). */
export const LINE_COLOURS = ['#123f5a', '#c0622b', '#2f7d4f', '#7a4c9c', '#9a7b12', '#5b6770', '#b03a57', '#1f7f8c'];

const GUIDE = '#6b7680';

function seriesOptions(line: ChartLine, k: number): uPlot.Series {
  switch (line.role) {
    case 'series':
      return { label: line.label, stroke: LINE_COLOURS[k % LINE_COLOURS.length], width: 1.5, spanGaps: false };
    case 'band':
      return { label: line.label, stroke: GUIDE, width: 1, dash: [6, 4] };
    case 'centre':
      return { label: line.label, stroke: GUIDE, width: 1, dash: [2, 3] };
    default:
      return { label: line.label, stroke: GUIDE, width: 1, dash: [2, 3] };
  }
}

/** A drawn chart, to resize or remove. */
export interface DrawnChart {
  element: HTMLElement;
  destroy(): void;
}

/** Draws the model into a new element of the given width (in CSS pixels). */
export function drawLineChart(model: ChartModel, width: number): DrawnChart {
  const figure = document.createElement('figure');
  figure.className = 'chart';
  figure.dataset.chart = model.id;
  const caption = document.createElement('figcaption');
  caption.textContent = model.title;
  figure.appendChild(caption);
  const plot = document.createElement('div');
  plot.setAttribute('role', 'img');
  plot.setAttribute('aria-label', `${model.title}. ${model.description}`);
  figure.appendChild(plot);
  let dataK = 0;
  const series: uPlot.Series[] = [{ label: model.time ? 'Date' : 'Row' }];
  for (const line of model.lines) series.push(seriesOptions(line, line.role === 'series' ? dataK++ : 0));
  const options: uPlot.Options = {
    width: Math.max(200, Math.floor(width)),
    height: 170,
    series,
    scales: { x: { time: model.time } },
    // The axis labels are built in UTC, so the ticks are placed in UTC too.
    ...(model.time ? { tzDate: (ts: number) => uPlot.tzDate(new Date(ts * 1000), 'Etc/UTC') } : {}),
    legend: { show: true, live: false },
    cursor: { show: true, points: { show: false } },
    axes: [
      {
        stroke: '#3b454d', grid: { stroke: '#e4e2dc', width: 1 }, size: 32, font: '11px system-ui, sans-serif',
        ...(model.time ? { space: 64, values: (_u: uPlot, splits: number[], _axis: number, _space: number, increment: number) => {
          const labels = timeTickLabels(splits, increment);
          // The labels drawn on the canvas, kept as text too (for tests and for reading the page).
          figure.dataset.xTicks = labels.join(' | ');
          return labels;
        } } : {}),
      },
      { stroke: '#3b454d', grid: { stroke: '#e4e2dc', width: 1 }, size: 44, font: '11px system-ui, sans-serif' },
    ],
  };
  const data = [model.x, ...model.lines.map((l) => l.values)] as uPlot.AlignedData;
  const chart = new uPlot(options, data, plot);
  return {
    element: figure,
    destroy() {
      chart.destroy();
    },
  };
}
