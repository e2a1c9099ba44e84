/**
 * A chart the block added to the in-memory workbook, drawn as a small SVG in the preview's
 * sheet: its title, one line per series read from the cells it names (the first solid, the
 * rest dashed), the first, middle and last category under the axis, the range of the values
 * beside it and a legend that names every line. It reads what the cells show now, so it
 * follows the block's live formulas when rows are appended.
 */
import type { CellGrid, ChartToAdd } from '../workbook/port';

const SVG = 'http://www.w3.org/2000/svg';
const STROKES = ['#123f5a', '#8c6d1f', '#8c6d1f'];

function node<K extends keyof SVGElementTagNameMap>(tag: K, attributes: Record<string, string | number>, text?: string): SVGElementTagNameMap[K] {
  const e = document.createElementNS(SVG, tag);
  for (const [k, v] of Object.entries(attributes)) e.setAttribute(k, String(v));
  if (text !== undefined) e.textContent = text;
  return e;
}

function column(grid: CellGrid): unknown[] {
  return grid.map((row) => row[0] ?? null);
}

/** The chart as an SVG element of the given size; `read` gives what a range on the chart's sheet shows. */
export function drawSheetChart(chart: ChartToAdd, read: (address: string) => CellGrid, width = 520, height = 280): SVGSVGElement {
  const categories = column(read(chart.categories)).map((c) => (c === null ? '' : String(c)));
  const lines = chart.series.map((s) => ({ name: s.name, values: column(read(s.values)).map((v) => (typeof v === 'number' && Number.isFinite(v) ? v : null)) }));
  const numbers = lines.flatMap((l) => l.values.filter((v): v is number => v !== null));
  const svg = node('svg', { width, height, viewBox: `0 0 ${width} ${height}`, role: 'img', class: 'sheet-chart-svg', 'aria-label': chart.title });
  svg.appendChild(node('rect', { x: 0, y: 0, width, height, class: 'chart-paper' }));
  svg.appendChild(node('text', { x: 10, y: 18, class: 'chart-title' }, chart.title));
  const plot = { left: 58, right: width - 12, top: 30, bottom: height - 58 };
  svg.appendChild(node('rect', { x: plot.left, y: plot.top, width: plot.right - plot.left, height: plot.bottom - plot.top, class: 'chart-plot' }));
  if (numbers.length === 0 || categories.length === 0) {
    svg.appendChild(node('text', { x: plot.left + 10, y: (plot.top + plot.bottom) / 2, class: 'chart-note' }, 'No numbers to draw yet.'));
    return svg;
  }
  let low = Math.min(...numbers);
  let high = Math.max(...numbers);
  if (high === low) {
    low -= 1;
    high += 1;
  }
  const n = categories.length;
  const x = (i: number) => plot.left + (n === 1 ? 0 : (i / (n - 1)) * (plot.right - plot.left));
  const y = (v: number) => plot.bottom - ((v - low) / (high - low)) * (plot.bottom - plot.top);
  for (const v of [high, (high + low) / 2, low]) {
    svg.appendChild(node('line', { x1: plot.left, x2: plot.right, y1: y(v), y2: y(v), class: 'chart-grid' }));
    svg.appendChild(node('text', { x: plot.left - 4, y: y(v) + 4, class: 'chart-axis', 'text-anchor': 'end' }, v.toFixed(3)));
  }
  for (const i of [0, Math.floor((n - 1) / 2), n - 1]) {
    svg.appendChild(node('text', { x: x(i), y: plot.bottom + 16, class: 'chart-axis', 'text-anchor': i === 0 ? 'start' : i === n - 1 ? 'end' : 'middle' }, categories[i]));
  }
  lines.forEach((line, k) => {
    let d = '';
    let pen = false;
    line.values.forEach((v, i) => {
      if (v === null) {
        pen = false;
        return;
      }
      d += `${pen ? 'L' : 'M'}${x(i).toFixed(1)},${y(v).toFixed(1)}`;
      pen = true;
    });
    const path = node('path', { d, fill: 'none', stroke: STROKES[k] ?? '#555', 'stroke-width': k === 0 ? 1.4 : 1, 'data-series': line.name });
    if (k > 0) path.setAttribute('stroke-dasharray', '6 4');
    svg.appendChild(path);
  });
  let lx = plot.left;
  lines.forEach((line, k) => {
    const key = node('line', { x1: lx, x2: lx + 22, y1: height - 18, y2: height - 18, stroke: STROKES[k] ?? '#555', 'stroke-width': 2 });
    if (k > 0) key.setAttribute('stroke-dasharray', '6 4');
    svg.appendChild(key);
    svg.appendChild(node('text', { x: lx + 26, y: height - 14, class: 'chart-legend' }, line.name));
    lx += 36 + line.name.length * 6.2;
  });
  return svg;
}
