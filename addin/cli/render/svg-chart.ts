/**
 * A small writer of inline SVG line charts for the static HTML report: lines over a shared
 * x axis (the rows), horizontal rules (a mean, bands), a legend, round-number y ticks and a
 * few date ticks. It draws the numbers it is given and derives nothing from them but the
 * picture. Above two points per horizontal pixel, each pixel column keeps its lowest and
 * highest value in row order, so spikes survive the thinning. Every label is escaped.
 */
import { escapeHtml } from './html-text';

/** One line of the chart. */
export interface ChartLine {
  values: readonly (number | null)[];
  colour: string;
  label: string;
}

/** A horizontal rule across the chart at a y value. */
export interface ChartRule {
  y: number;
  colour: string;
  label: string;
  dashed?: boolean;
}

/** What to draw. */
export interface LineChartSpec {
  /** Read out by screen readers and shown as the SVG title. */
  title: string;
  width: number;
  height: number;
  lines: readonly ChartLine[];
  rules?: readonly ChartRule[];
  /** Label of each row on the x axis (dates or row labels). */
  xLabels: readonly string[];
}

const MARGIN = { left: 58, right: 14, top: 30, bottom: 30 };
const AXIS = '#8a8577';
const GRID = '#e6e1d6';
const INK = '#3b3a36';

/** About five round-number ticks covering [lo, hi]. */
export function niceTicks(lo: number, hi: number): number[] {
  const span = hi - lo || Math.abs(hi) || 1;
  const raw = span / 5;
  const power = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 2.5, 5, 10].map((m) => m * power).find((s) => s >= raw) ?? 10 * power;
  const out: number[] = [];
  for (let v = Math.ceil(lo / step) * step; v <= hi + step * 1e-9; v += step) out.push(Number(v.toPrecision(12)));
  return out;
}

function tickText(v: number, step: number): string {
  const decimals = Math.max(0, Math.min(6, -Math.floor(Math.log10(step || 1))));
  return v.toFixed(decimals);
}

/** Indices to draw: all of them when few, else each pixel column's lowest and highest in row order. */
function thinned(values: readonly (number | null)[], columns: number): number[] {
  const n = values.length;
  if (n <= 2 * columns) return Array.from({ length: n }, (_, i) => i);
  const out: number[] = [];
  const size = n / columns;
  for (let c = 0; c < columns; c++) {
    const from = Math.floor(c * size);
    const to = Math.min(n, Math.floor((c + 1) * size));
    let lo = -1;
    let hi = -1;
    for (let i = from; i < to; i++) {
      const v = values[i];
      if (v === null) continue;
      if (lo < 0 || v < (values[lo] as number)) lo = i;
      if (hi < 0 || v > (values[hi] as number)) hi = i;
    }
    if (lo < 0) {
      out.push(from); // a gap: keep one null so the line breaks here
      continue;
    }
    if (lo === hi) out.push(lo);
    else out.push(Math.min(lo, hi), Math.max(lo, hi));
  }
  return out;
}

interface LegendItem {
  colour: string;
  label: string;
  dashed: boolean;
  x: number;
  row: number;
}

/** Legend entries laid out left to right, wrapping onto a new row at the right edge. */
function legendLayout(spec: LineChartSpec): LegendItem[] {
  const items = [...spec.lines.map((l) => ({ colour: l.colour, label: l.label, dashed: false })), ...(spec.rules ?? []).map((r) => ({ colour: r.colour, label: r.label, dashed: r.dashed ?? false }))];
  const out: LegendItem[] = [];
  let x = MARGIN.left;
  let row = 0;
  for (const item of items) {
    const w = 23 + Math.min(260, 6.6 * item.label.length) + 16;
    if (x + w > spec.width - MARGIN.right && x > MARGIN.left) {
      x = MARGIN.left;
      row++;
    }
    out.push({ ...item, x, row });
    x += w;
  }
  return out;
}

/** The chart as an <svg> element. */
export function lineChart(spec: LineChartSpec): string {
  const legend = legendLayout(spec);
  const legendRows = legend.length === 0 ? 0 : legend[legend.length - 1].row + 1;
  const top = MARGIN.top + 16 * Math.max(0, legendRows - 1);
  const width = spec.width;
  const height = spec.height + top - MARGIN.top;
  const plotW = width - MARGIN.left - MARGIN.right;
  const plotH = height - top - MARGIN.bottom;
  const n = Math.max(...spec.lines.map((l) => l.values.length), 1);
  let lo = Infinity;
  let hi = -Infinity;
  for (const l of spec.lines) for (const v of l.values) if (v !== null && Number.isFinite(v)) { lo = Math.min(lo, v); hi = Math.max(hi, v); }
  for (const r of spec.rules ?? []) { lo = Math.min(lo, r.y); hi = Math.max(hi, r.y); }
  if (!Number.isFinite(lo)) { lo = 0; hi = 1; }
  const pad = (hi - lo || 1) * 0.06;
  lo -= pad;
  hi += pad;
  const x = (i: number): number => MARGIN.left + (n <= 1 ? 0 : (i / (n - 1)) * plotW);
  const y = (v: number): number => top + (1 - (v - lo) / (hi - lo)) * plotH;
  const f = (v: number): string => v.toFixed(1);

  const parts: string[] = [];
  const ticks = niceTicks(lo, hi);
  const step = ticks.length > 1 ? ticks[1] - ticks[0] : 1;
  for (const t of ticks) {
    parts.push(`<line x1="${MARGIN.left}" x2="${width - MARGIN.right}" y1="${f(y(t))}" y2="${f(y(t))}" stroke="${GRID}" stroke-width="1"/>`);
    parts.push(`<text x="${MARGIN.left - 6}" y="${f(y(t) + 4)}" text-anchor="end" font-size="11" fill="${INK}">${escapeHtml(tickText(t, step))}</text>`);
  }
  const xTicks = n <= 1 ? [0] : [0, 0.25, 0.5, 0.75, 1].map((q) => Math.round(q * (n - 1)));
  xTicks.forEach((i, k) => {
    const anchor = k === 0 ? 'start' : k === xTicks.length - 1 ? 'end' : 'middle';
    parts.push(`<line x1="${f(x(i))}" x2="${f(x(i))}" y1="${height - MARGIN.bottom}" y2="${height - MARGIN.bottom + 4}" stroke="${AXIS}"/>`);
    parts.push(`<text x="${f(x(i))}" y="${height - MARGIN.bottom + 17}" text-anchor="${anchor}" font-size="11" fill="${INK}">${escapeHtml(spec.xLabels[i] ?? '')}</text>`);
  });
  parts.push(`<rect x="${MARGIN.left}" y="${top}" width="${plotW}" height="${plotH}" fill="none" stroke="${AXIS}" stroke-width="1"/>`);
  for (const r of spec.rules ?? []) {
    parts.push(`<line x1="${MARGIN.left}" x2="${width - MARGIN.right}" y1="${f(y(r.y))}" y2="${f(y(r.y))}" stroke="${r.colour}" stroke-width="1.2"${r.dashed ? ' stroke-dasharray="5 4"' : ''}/>`);
  }
  for (const l of spec.lines) {
    let d = '';
    let pen = false;
    for (const i of thinned(l.values, Math.floor(plotW))) {
      const v = l.values[i];
      if (v === null || !Number.isFinite(v)) { pen = false; continue; }
      d += `${pen ? 'L' : 'M'}${f(x(i))} ${f(y(v))}`;
      pen = true;
    }
    parts.push(`<path d="${d}" fill="none" stroke="${l.colour}" stroke-width="1.4" stroke-linejoin="round"/>`);
  }
  for (const item of legend) {
    const ly = 13 + 16 * item.row;
    parts.push(`<line x1="${item.x}" x2="${item.x + 18}" y1="${ly}" y2="${ly}" stroke="${item.colour}" stroke-width="2.5"${item.dashed ? ' stroke-dasharray="4 3"' : ''}/>`);
    parts.push(`<text x="${item.x + 23}" y="${ly + 4}" font-size="11.5" fill="${INK}">${escapeHtml(item.label)}</text>`);
  }
  return `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${width} ${height}" width="100%" role="img" aria-label="${escapeHtml(spec.title)}">` +
    `<title>${escapeHtml(spec.title)}</title>${parts.join('')}</svg>`;
}
