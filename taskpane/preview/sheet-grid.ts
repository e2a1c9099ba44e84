/**
 * One sheet of the in-memory workbook as a grid for the preview: what every used cell shows
 * (values, formula results and the parts of spills), with the block's number formats, fills,
 * bold and italic, and the charts placed at their anchor cells. Reads the workbook; never
 * changes it.
 */
import { cellAddress, columnLetters, parseCell } from '../workbook/a1-address';
import { FormulaError, isMulti } from '../workbook/formula-values';
import type { MemoryWorkbook } from '../workbook/memory-workbook';
import type { CellContent, CellFormat } from '../workbook/port';
import { drawSheetChart } from './sheet-chart';
import { alignsRight, shownText } from './sheet-format';

/** Pixel sizes of the grid (fixed, so a chart can be placed at a cell). */
export const GRID = { rowHeight: 22, headerHeight: 22, rowHeaderWidth: 46, columnWidth: 92 } as const;

/** What the grid knows of a cell beyond what it shows: where a spilled value comes from. */
export interface SpillSource {
  /** The cell whose formula spills into this one. */
  from: string;
}

/** A rendered sheet: its element and where each spilled cell comes from. */
export interface RenderedGrid {
  element: HTMLElement;
  spills: Map<string, SpillSource>;
  rows: number;
  columns: number;
}

const key = (row: number, col: number) => row * 16384 + col;

/** Column width in pixels: the block's widths (points) scaled down to the preview's grid, else the default. */
function columnWidth(workbook: MemoryWorkbook, sheet: string, col: number): number {
  const points = workbook.columnWidths.get(sheet)?.get(col);
  return points === undefined ? GRID.columnWidth : Math.max(60, Math.min(270, Math.round(points * 0.75)));
}

function spillValue(v: unknown): { value: CellContent; error: string | null } {
  if (v instanceof FormulaError) return { value: v.code, error: v.message || v.code };
  return { value: (v ?? null) as CellContent, error: null };
}

/** Renders `sheet`, marking `fresh` rows (sheet rows, 1-based) as just added. */
export function renderGrid(workbook: MemoryWorkbook, sheet: string, fresh: ReadonlySet<number> = new Set()): RenderedGrid {
  const stored = workbook.cells.sheet(sheet);
  let lastRow = 0;
  let lastCol = 0;
  const spilled = new Map<number, { value: CellContent; error: string | null; from: string }>();
  for (const [k, cell] of stored) {
    const row = Math.floor(k / 16384);
    const col = k % 16384;
    lastRow = Math.max(lastRow, row);
    lastCol = Math.max(lastCol, col);
    if (cell.formula === undefined) continue;
    const result = workbook.cells.result(sheet, row, col);
    if (result === null || !isMulti(result) || result.kind !== 'array') continue;
    const from = cellAddress({ row, col });
    result.grid.forEach((line, r) => line.forEach((v, c) => {
      if (r === 0 && c === 0) return;
      spilled.set(key(row + r, col + c), { ...spillValue(v), from });
      lastRow = Math.max(lastRow, row + r);
      lastCol = Math.max(lastCol, col + c);
    }));
  }
  const rows = Math.max(lastRow + 1 + 3, 30);
  const columns = Math.max(lastCol + 1 + 2, 12);
  const widths = Array.from({ length: columns }, (_, c) => columnWidth(workbook, sheet, c));

  const table = document.createElement('table');
  table.className = 'grid';
  table.setAttribute('role', 'grid');
  table.setAttribute('aria-label', `Sheet ${sheet}`);
  const colgroup = document.createElement('colgroup');
  const corner = document.createElement('col');
  corner.style.width = `${GRID.rowHeaderWidth}px`;
  colgroup.appendChild(corner);
  for (const w of widths) {
    const c = document.createElement('col');
    c.style.width = `${w}px`;
    colgroup.appendChild(c);
  }
  table.appendChild(colgroup);
  table.style.width = `${GRID.rowHeaderWidth + widths.reduce((a, b) => a + b, 0)}px`;

  const head = document.createElement('thead');
  const headRow = document.createElement('tr');
  headRow.appendChild(document.createElement('th'));
  for (let c = 0; c < columns; c++) {
    const th = document.createElement('th');
    th.scope = 'col';
    th.textContent = columnLetters(c);
    headRow.appendChild(th);
  }
  head.appendChild(headRow);
  table.appendChild(head);

  const spills = new Map<string, SpillSource>();
  const body = document.createElement('tbody');
  for (let r = 0; r < rows; r++) {
    const tr = document.createElement('tr');
    if (fresh.has(r + 1)) tr.className = 'fresh';
    const th = document.createElement('th');
    th.scope = 'row';
    th.textContent = String(r + 1);
    tr.appendChild(th);
    for (let c = 0; c < columns; c++) {
      const td = document.createElement('td');
      const address = cellAddress({ row: r, col: c });
      td.dataset.cell = address;
      const cell = stored.get(key(r, c));
      let shown: { value: CellContent; error: string | null };
      let format: CellFormat | undefined = cell?.format;
      if (cell?.formula !== undefined) shown = workbook.cells.shownCell(sheet, r, c);
      else if (cell !== undefined && cell.value !== null) shown = { value: cell.value, error: null };
      else {
        const s = spilled.get(key(r, c));
        shown = s ?? { value: null, error: null };
        if (s) {
          spills.set(address, { from: s.from });
          const origin = parseCell(s.from);
          format = stored.get(key(origin.row, origin.col))?.format;
        }
      }
      if (shown.value !== null) {
        td.textContent = shown.error !== null ? String(shown.value) : shownText(shown.value, format?.numberFormat);
        if (shown.error !== null) {
          td.classList.add('error');
          td.title = shown.error;
        } else if (alignsRight(shown.value)) td.classList.add('num');
      }
      if (cell?.formula !== undefined) td.classList.add('formula');
      const fill = cell ? workbook.fillAt(sheet, address) : null;
      if (fill) td.style.backgroundColor = fill;
      if (format?.bold) td.classList.add('bold');
      if (format?.italic) td.classList.add('italic');
      if (format?.heading === 1) td.classList.add('heading');
      if (format?.fontColor) td.style.color = format.fontColor;
      tr.appendChild(td);
    }
    body.appendChild(tr);
  }
  table.appendChild(body);

  const element = document.createElement('div');
  element.className = 'grid-holder';
  element.appendChild(table);
  for (const chart of workbook.charts.filter((ch) => ch.sheet === sheet)) {
    const { row, col } = parseCell(chart.anchor);
    const holder = document.createElement('figure');
    holder.className = 'sheet-chart';
    holder.dataset.chart = chart.name;
    holder.dataset.row = String(row);
    holder.dataset.col = String(col);
    holder.style.left = `${GRID.rowHeaderWidth + widths.slice(0, col).reduce((a, b) => a + b, 0)}px`;
    holder.style.top = `${GRID.headerHeight + row * GRID.rowHeight}px`;
    holder.appendChild(drawSheetChart(chart, (address) => workbook.shownValues(sheet, address)));
    element.appendChild(holder);
  }
  return { element, spills, rows, columns };
}

/** Moves each chart onto its anchor cell as laid out (the widths above are the plan; borders may add a pixel a column). */
export function placeCharts(holder: HTMLElement): void {
  const heads = holder.querySelectorAll<HTMLElement>('thead th');
  const rows = holder.querySelectorAll<HTMLElement>('tbody tr');
  for (const chart of holder.querySelectorAll<HTMLElement>('.sheet-chart')) {
    const head = heads[Number(chart.dataset.col) + 1];
    const row = rows[Number(chart.dataset.row)];
    if (head) chart.style.left = `${head.offsetLeft}px`;
    if (row) chart.style.top = `${row.offsetTop}px`;
  }
}
