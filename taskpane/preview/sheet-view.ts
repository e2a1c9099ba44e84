/**
 * The preview's sheet: the in-memory workbook beside the pane, so the block the pane writes,
 * its chart and its live formulas can be seen. A bar names the selected cell and shows its
 * formula (or value); a tool row appends the next rows of the demo scenario to the data table
 * and says which; tabs above the grid switch sheets (a block written to a new sheet opens its tab). Clicking
 * a cell selects it, as in a workbook, so the pane's "Use the data around my selection" sees
 * it; Delete blanks the selected cell (to make a gap); the arrow keys move the selection.
 */
import { el } from '../ui/dom';
import { cellAddress, parseCell } from '../workbook/a1-address';
import type { MemoryWorkbook } from '../workbook/memory-workbook';
import { placeCharts, renderGrid, type RenderedGrid } from './sheet-grid';
import { shownText } from './sheet-format';

/** Where appended rows come from: the next `count` rows of a story, and the table they go to. */
export interface RowSource {
  table: string;
  /** The next rows (dates first), continuing from the rows already appended. */
  next(count: number): (string | number)[][];
}

/** The mounted sheet, for tests and the preview entry. */
export interface SheetView {
  /** The sheet shown now. */
  sheet(): string;
  /** Shows a sheet by name. */
  show(sheet: string): void;
}

/** Mounts the sheet into `root` over `workbook`; `rows` feeds the append control. */
export function mountSheetView(root: HTMLElement, workbook: MemoryWorkbook, rows: RowSource): SheetView {
  let current = workbook.selected()?.sheet ?? [...workbook.cells.sheets.keys()][0];
  let selected = workbook.selected()?.address.split(':')[0] ?? 'A1';
  let fresh = new Set<number>();
  let grid: RenderedGrid | null = null;
  /** Where each named block was at the last look: name -> sheet. */
  let blockSheets = new Map<string, string>();

  const nameBox = el('span', { class: 'cell-name', 'data-role': 'sheet-address', 'aria-label': 'Selected cell' });
  const formulaBar = el('output', { class: 'formula-bar', 'data-role': 'formula-bar', 'aria-label': 'Formula or value of the selected cell' });
  const count = el('input', { type: 'number', min: 1, max: 250, value: 12, class: 'append-count', 'data-role': 'append-count', 'aria-label': 'How many rows to append' }) as HTMLInputElement;
  const append = el('button', { type: 'button', class: 'append-button', 'data-role': 'append-rows' }, 'Append the next rows');
  const status = el('p', { class: 'append-status', role: 'status', 'data-role': 'append-status' });
  const scroller = el('div', { class: 'sheet-scroll', tabindex: 0, 'data-role': 'sheet-grid', 'aria-label': 'Sheet cells: arrows move, Delete blanks the cell' });
  const tabs = el('div', { class: 'sheet-tabs', role: 'tablist', 'aria-label': 'Sheets' });

  root.classList.add('sheet');
  root.append(
    el('div', { class: 'sheet-tools' },
      el('label', { class: 'append-label' }, 'Rows to append ', count),
      append,
      el('span', { class: 'sheet-hint' }, 'Select a cell and press Delete to blank it.')),
    status,
    tabs,
    el('div', { class: 'sheet-bar' }, nameBox, el('span', { class: 'fx', 'aria-hidden': 'true' }, 'holds'), formulaBar),
    scroller,
  );

  function showBar(): void {
    nameBox.textContent = selected;
    const at = workbook.cellAt(current, selected);
    const spill = grid?.spills.get(selected);
    formulaBar.classList.toggle('spilled', false);
    if (at.stored?.formula !== undefined) formulaBar.textContent = at.stored.formula;
    else if (at.stored && at.stored.value !== null) formulaBar.textContent = shownText(at.stored.value);
    else if (spill) {
      const from = workbook.cellAt(current, spill.from).stored?.formula ?? '';
      formulaBar.textContent = `${from}   (spilled from ${spill.from})`;
      formulaBar.classList.toggle('spilled', true);
    } else formulaBar.textContent = '';
    for (const old of scroller.querySelectorAll('td.selected')) old.classList.remove('selected');
    scroller.querySelector(`td[data-cell="${selected}"]`)?.classList.add('selected');
  }

  function renderTabs(): void {
    tabs.replaceChildren(...[...workbook.cells.sheets.keys()].map((name) => {
      const tab = el('button', { type: 'button', role: 'tab', class: 'sheet-tab', 'data-sheet': name, 'aria-selected': name === current ? 'true' : 'false' }, name);
      tab.addEventListener('click', () => show(name));
      return tab;
    }));
  }

  function render(): void {
    const top = scroller.scrollTop;
    const left = scroller.scrollLeft;
    grid = renderGrid(workbook, current, fresh);
    scroller.replaceChildren(grid.element);
    placeCharts(grid.element);
    scroller.scrollTop = top;
    scroller.scrollLeft = left;
    renderTabs();
    const table = workbook.cells.table(rows.table);
    append.toggleAttribute('disabled', !table);
    showBar();
  }

  function show(sheet: string): void {
    if (sheet === current) return;
    current = sheet;
    selected = 'A1';
    fresh = new Set();
    scroller.scrollTop = 0;
    scroller.scrollLeft = 0;
    render();
  }

  function select(address: string, scroll = false): void {
    selected = address;
    workbook.select(current, address);
    showBar();
    if (scroll) scroller.querySelector(`td[data-cell="${address}"]`)?.scrollIntoView({ block: 'nearest', inline: 'nearest' });
  }

  scroller.addEventListener('click', (e) => {
    const td = (e.target as HTMLElement).closest<HTMLElement>('td[data-cell]');
    if (td?.dataset.cell) select(td.dataset.cell);
  });
  scroller.addEventListener('keydown', (e) => {
    const at = parseCell(selected);
    const moves: Record<string, [number, number]> = { ArrowUp: [-1, 0], ArrowDown: [1, 0], ArrowLeft: [0, -1], ArrowRight: [0, 1] };
    if (e.key in moves) {
      const [dr, dc] = moves[e.key];
      const row = Math.max(0, Math.min((grid?.rows ?? 1) - 1, at.row + dr));
      const col = Math.max(0, Math.min((grid?.columns ?? 1) - 1, at.col + dc));
      select(cellAddress({ row, col }), true);
      e.preventDefault();
    } else if (e.key === 'Delete' || e.key === 'Backspace') {
      workbook.setValues(current, selected, [[null]]);
      e.preventDefault();
    }
  });

  append.addEventListener('click', () => {
    const table = workbook.cells.table(rows.table);
    if (!table) return;
    const n = Math.max(1, Math.min(250, Math.round(Number(count.value) || 12)));
    const added = rows.next(n);
    const first = table.range.bottom + 2;
    workbook.appendRows(rows.table, added);
    fresh = new Set(added.map((_, i) => first + i));
    status.textContent = `Added ${added.length} rows to ${rows.table} (sheet rows ${first} to ${first + added.length - 1}, ${added[0][0]} to ${added[added.length - 1][0]}). The pane and the block follow.`;
    if (table.sheet !== current) show(table.sheet);
    scroller.scrollLeft = 0;
    queueMicrotask(() => scroller.querySelector(`tr.fresh:last-child, tr.fresh`)?.scrollIntoView({ block: 'center' }));
  });

  workbook.onAnyChange(() => {
    render();
    void followNewBlocks();
  });

  /** A block written under a new name, or moved to another sheet, opens its sheet, so the user sees it appear. */
  async function followNewBlocks(): Promise<void> {
    const now = new Map<string, string>();
    for (const name of workbook.nameList()) {
      const found = await workbook.findBlock(name);
      if (found) now.set(name, found.sheet);
    }
    const moved = [...now].filter(([name, sheet]) => blockSheets.get(name) !== sheet);
    blockSheets = now;
    const target = moved.length > 0 ? moved[moved.length - 1][1] : null;
    if (target && target !== current) show(target);
  }

  render();
  void followNewBlocks();
  return { sheet: () => current, show };
}
