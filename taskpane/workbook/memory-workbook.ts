/**
 * The in-memory workbook: the WorkbookPort for tests and the preview page, with the same
 * behaviour the Office adapter has inside Excel. It holds sheets of values and formulas,
 * Excel tables (appending rows grows the table), workbook-level names, recorded charts, a
 * selection and change watchers, and it calculates the formulas a results block writes
 * (memory-cells.ts), so a test can append rows and watch the block's numbers move.
 *
 * Test hooks beyond the port: setValues / setFormula / addTable / appendRows / select to
 * arrange a sheet, shownValue / cellAt / fillAt to look at it, and failNextWrite to make the
 * next block write break part-way; onAnyChange for a view of the whole workbook (the preview's
 * sheet). Deterministic: no timers; watchers fire on a microtask.
 */
import { MooringInputError } from '../../addin/errors';
import { cellAddress, cellsOf, overlaps, parseCell, rangeAddress, type CellRange } from './a1-address';
import { currentRegion } from './current-region';
import { MemoryCells, type MemoryTable, type StoredCell } from './memory-cells';
import { MemoryWatchers } from './memory-watchers';
import type {
  BlockToWrite, CellContent, CellGrid, ChartToAdd, DataRegion, FoundBlock, OccupiedCell, RegionChange, WorkbookPort, WriteOutcome,
} from './port';
import { regionOfGrid } from './region-of-grid';
import { blockRange, reservedRanges, uniqueName } from './block-geometry';

/** A workbook-level name over a block. */
interface MemoryName {
  name: string;
  sheet: string;
  range: CellRange;
  note: string | null;
}

/** How the next writeBlock should fail, for tests of the failure path. */
export interface InjectedFailure {
  /** Cells written before the failure. */
  afterCells: number;
  /** Whether putting the previous contents back fails too. */
  restoreFails?: boolean;
}

/** The in-memory WorkbookPort. */
export class MemoryWorkbook implements WorkbookPort {
  readonly cells = new MemoryCells();
  /** Charts added, in order (a chart added under an existing name replaces it). */
  readonly charts: ChartToAdd[] = [];
  /** Column widths set by blocks: sheet -> column index -> points. */
  readonly columnWidths = new Map<string, Map<number, number>>();
  private readonly names: MemoryName[] = [];
  private selection: { sheet: string; address: string } | null = null;
  private failure: InjectedFailure | null = null;
  private readonly viewers = new Set<() => void>();
  private viewNoticePending = false;
  private readonly watchers = new MemoryWatchers({
    table: (name) => this.cells.table(name) ?? null,
    regionAt: (sheet, row, col) => currentRegion((r, c) => this.cells.isStoredFilled(sheet, r, c), { row, col }) ?? { top: row, left: col, bottom: row, right: col },
  });

  constructor(sheets: string[] = ['Sheet1']) {
    for (const s of sheets) this.cells.sheets.set(s, new Map());
  }

  // ----- arranging a workbook (test hooks) -----

  /**
   * Calls back once after any change to cells, tables, names, charts or sheets (coalesced on a
   * microtask); returns a function that stops the calls. For a view of the whole workbook.
   */
  onAnyChange(listener: () => void): () => void {
    this.viewers.add(listener);
    return () => this.viewers.delete(listener);
  }

  private viewChanged(): void {
    if (this.viewNoticePending || this.viewers.size === 0) return;
    this.viewNoticePending = true;
    queueMicrotask(() => {
      this.viewNoticePending = false;
      for (const v of [...this.viewers]) v();
    });
  }

  /** Writes values (text stays text, even "=..."), row by row from `anchor`; rows typed just below a table grow it, as Excel does. */
  setValues(sheet: string, anchor: string, grid: CellGrid): void {
    const at = this.cellOf(sheet, anchor);
    grid.forEach((row, r) => row.forEach((v, c) => this.cells.put(sheet, at.row + r, at.col + c, v === null ? undefined : { value: v })));
    const range = { top: at.row, left: at.col, bottom: at.row + grid.length - 1, right: at.col + Math.max(0, ...grid.map((r) => r.length)) - 1 };
    for (const t of this.cells.tables) {
      if (t.sheet === sheet && range.top === t.range.bottom + 1 && range.left >= t.range.left && range.left <= t.range.right) {
        t.range = { ...t.range, bottom: range.bottom };
      }
    }
    this.cells.changed();
    this.watchers.touched(sheet, range);
    this.viewChanged();
  }

  /** Writes one formula. */
  setFormula(sheet: string, address: string, formula: string): void {
    const at = this.cellOf(sheet, address);
    this.cells.put(sheet, at.row, at.col, { value: null, formula });
    this.watchers.touched(sheet, { top: at.row, left: at.col, bottom: at.row, right: at.col });
    this.viewChanged();
  }

  /** Makes a table over a range whose first row is the header (synchronous form of makeTable). */
  addTable(sheet: string, address: string, name: string): MemoryTable {
    const range = this.rangeOf(sheet, address);
    const clash = this.cells.tables.find((t) => t.sheet === sheet && overlaps(t.range, range));
    if (clash) throw new MooringInputError(`${sheet}!${address} overlaps table ${clash.name}: pick cells outside it, or use that table.`, `${sheet}!${address}`);
    if (this.cells.table(name)) throw new MooringInputError(`A table named ${name} already exists.`);
    for (let c = range.left; c <= range.right; c++) {
      if (!this.cells.isStoredFilled(sheet, range.top, c)) this.cells.put(sheet, range.top, c, { value: `Column${c - range.left + 1}` });
    }
    const table = { name, sheet, range };
    this.cells.tables.push(table);
    this.cells.changed();
    this.viewChanged();
    return table;
  }

  /** Appends rows below a table, growing it; watchers hear of it on the next microtask. */
  appendRows(tableName: string, rows: CellGrid): void {
    const t = this.cells.table(tableName);
    if (!t) throw new MooringInputError(`There is no table named ${tableName}.`);
    this.setValues(t.sheet, cellAddress({ row: t.range.bottom + 1, col: t.range.left }), rows);
  }

  /** Sets the user's selection. */
  select(sheet: string, address: string): void {
    this.rangeOf(sheet, address);
    this.selection = { sheet, address };
  }

  /** Makes the next writeBlock fail after writing `afterCells` cells. */
  failNextWrite(failure: InjectedFailure): void {
    this.failure = failure;
  }

  // ----- looking at it (test hooks) -----

  /** What a cell shows (an error as its code, such as "#N/A"). */
  shownValue(sheet: string, address: string): CellContent {
    const at = this.cellOf(sheet, address);
    return this.cells.shownCell(sheet, at.row, at.col).value;
  }

  /** What a range shows, row by row. */
  shownValues(sheet: string, address: string): CellGrid {
    const r = this.rangeOf(sheet, address);
    const out: CellGrid = [];
    for (let row = r.top; row <= r.bottom; row++) {
      const line: CellContent[] = [];
      for (let col = r.left; col <= r.right; col++) line.push(this.cells.shownCell(sheet, row, col).value);
      out.push(line);
    }
    return out;
  }

  /** A cell's stored content and format, what it shows, and the message of an error it shows. */
  cellAt(sheet: string, address: string): { stored: StoredCell | undefined; shown: CellContent; error: string | null } {
    const at = this.cellOf(sheet, address);
    const shown = this.cells.shownCell(sheet, at.row, at.col);
    return { stored: this.cells.stored(sheet, at.row, at.col), shown: shown.value, error: shown.error };
  }

  /** The fill a cell shows: the first text rule its text begins with, else its fixed fill, else null. */
  fillAt(sheet: string, address: string): string | null {
    const { stored, shown } = this.cellAt(sheet, address);
    const text = shown === null ? '' : String(shown);
    const rule = stored?.format?.textFills?.find((f) => text.startsWith(f.startsWith));
    return rule?.fill ?? stored?.format?.fill ?? null;
  }

  /** The user's selection (sheet and address), or null. */
  selected(): { sheet: string; address: string } | null {
    return this.selection ? { ...this.selection } : null;
  }

  /** Names of the workbook-level names. */
  nameList(): string[] {
    return this.names.map((n) => n.name);
  }

  // ----- the port -----

  async regionAroundSelection(): Promise<DataRegion | null> {
    if (!this.selection) return null;
    const { sheet, address } = this.selection;
    const at = this.rangeOf(sheet, address);
    const table = this.cells.tableAt(sheet, at.top, at.left);
    if (table) return this.regionOf(sheet, table.range, table.name);
    const region = currentRegion((r, c) => this.cells.isStoredFilled(sheet, r, c), { row: at.top, col: at.left });
    return region ? this.regionOf(sheet, region, null) : null;
  }

  async readRegion(sheet: string, address: string): Promise<DataRegion> {
    const range = this.rangeOf(sheet, address);
    const table = this.cells.tableAt(sheet, range.top, range.left);
    const inside = table && range.bottom <= table.range.bottom && range.right <= table.range.right;
    return this.regionOf(sheet, range, inside ? table.name : null);
  }

  async readTable(name: string): Promise<DataRegion> {
    const t = this.cells.table(name);
    if (!t) throw new MooringInputError(`There is no table named ${name}: it may have been renamed or deleted.`, name);
    return this.regionOf(t.sheet, t.range, t.name);
  }

  async makeTable(sheet: string, address: string, suggestedName: string): Promise<string> {
    const name = uniqueName(suggestedName, 'Prices', (n) => this.cells.table(n) !== undefined || this.names.some((x) => x.name.toLowerCase() === n.toLowerCase()));
    this.addTable(sheet, address, name);
    return name;
  }

  async occupiedCells(block: BlockToWrite): Promise<OccupiedCell[]> {
    this.sheetOf(block.sheet);
    const out: OccupiedCell[] = [];
    for (const range of [blockRange(block), ...reservedRanges(block)]) {
      for (let row = range.top; row <= range.bottom; row++) {
        for (let col = range.left; col <= range.right; col++) {
          const stored = this.cells.stored(block.sheet, row, col);
          const shown = this.cells.shownCell(block.sheet, row, col).value;
          if (stored?.formula === undefined && shown === null) continue;
          out.push({ address: cellAddress({ row, col }), value: shown, ...(stored?.formula !== undefined ? { formula: stored.formula } : {}) });
        }
      }
    }
    return out;
  }

  async writeBlock(block: BlockToWrite): Promise<WriteOutcome> {
    this.sheetOf(block.sheet);
    const range = blockRange(block);
    const targets: { row: number; col: number; cell: StoredCell | undefined }[] = [];
    block.cells.forEach((line, r) => {
      for (let c = 0; c <= range.right - range.left; c++) {
        const b = line[c];
        const cell: StoredCell | undefined = b && (b.formula !== undefined || (b.value !== undefined && b.value !== null) || b.format)
          ? { value: b.formula !== undefined ? null : b.value ?? null, ...(b.formula !== undefined ? { formula: b.formula } : {}), ...(b.format ? { format: b.format } : {}) }
          : undefined;
        targets.push({ row: range.top + r, col: range.left + c, cell });
      }
    });
    for (const res of reservedRanges(block)) {
      for (let row = res.top; row <= res.bottom; row++) for (let col = res.left; col <= res.right; col++) {
        if (this.cells.stored(block.sheet, row, col)) targets.push({ row, col, cell: undefined });
      }
    }
    const before = targets.map((t) => this.cells.stored(block.sheet, t.row, t.col));
    const failure = this.failure;
    this.failure = null;
    const written: string[] = [];
    try {
      targets.forEach((t, i) => {
        if (failure && i === failure.afterCells) throw new Error(`the workbook refused the write at ${cellAddress(t)} (injected failure)`);
        this.cells.put(block.sheet, t.row, t.col, t.cell);
        written.push(cellAddress(t));
      });
    } catch (e) {
      const error = `Writing the block to ${block.sheet}!${rangeAddress(range)} failed after ${written.length} of ${targets.length} cells: ${(e as Error).message}.`;
      if (failure?.restoreFails) {
        this.watchers.touched(block.sheet, range);
        this.viewChanged();
        return { ok: false, written, error: `${error} Putting the previous contents back failed too: the cells listed were changed.`, restored: false };
      }
      for (let i = 0; i < written.length; i++) this.cells.put(block.sheet, targets[i].row, targets[i].col, before[i]);
      this.viewChanged();
      return { ok: false, written, error: `${error} The previous contents were put back.`, restored: true };
    }
    this.setName(block.name, block.sheet, range, block.note ?? null);
    if (block.columnWidths) {
      const widths = this.columnWidths.get(block.sheet) ?? new Map<number, number>();
      block.columnWidths.forEach((w, j) => widths.set(range.left + j, w));
      this.columnWidths.set(block.sheet, widths);
    }
    this.watchers.touched(block.sheet, range);
    this.viewChanged();
    return { ok: true, written };
  }

  async addChart(chart: ChartToAdd): Promise<void> {
    this.sheetOf(chart.sheet);
    for (const a of [chart.categories, chart.anchor, ...chart.series.map((s) => s.values)]) this.rangeOf(chart.sheet, a);
    const i = this.charts.findIndex((c) => c.name.toLowerCase() === chart.name.toLowerCase());
    if (i >= 0) this.charts.splice(i, 1);
    this.charts.push({ ...chart, series: chart.series.map((s) => ({ ...s })) });
    this.viewChanged();
  }

  async findBlock(name: string): Promise<FoundBlock | null> {
    const n = this.names.find((x) => x.name.toLowerCase() === name.toLowerCase());
    return n ? { sheet: n.sheet, address: rangeAddress(n.range), note: n.note } : null;
  }

  async removeBlock(name: string): Promise<void> {
    const i = this.names.findIndex((x) => x.name.toLowerCase() === name.toLowerCase());
    if (i < 0) return;
    const n = this.names[i];
    for (const a of cellsOf(n.range)) {
      const at = parseCell(a);
      this.cells.put(n.sheet, at.row, at.col, undefined);
    }
    this.names.splice(i, 1);
    for (let j = this.charts.length - 1; j >= 0; j--) if (this.charts[j].name.toLowerCase() === name.toLowerCase()) this.charts.splice(j, 1);
    this.watchers.touched(n.sheet, n.range);
    this.viewChanged();
  }

  async addSheet(suggestedName: string): Promise<string> {
    const name = uniqueName(suggestedName, 'Mooring', (n) => [...this.cells.sheets.keys()].some((s) => s.toLowerCase() === n.toLowerCase()), 31);
    this.cells.sheets.set(name, new Map());
    this.viewChanged();
    return name;
  }

  async watch(sheet: string, address: string, onChange: (change: RegionChange) => void): Promise<() => void> {
    const range = this.rangeOf(sheet, address);
    const table = this.cells.tableAt(sheet, range.top, range.left);
    return this.watchers.add(table ? { kind: 'table', table: table.name } : { kind: 'region', sheet, range }, onChange);
  }

  // ----- helpers -----

  private setName(name: string, sheet: string, range: CellRange, note: string | null): void {
    const i = this.names.findIndex((x) => x.name.toLowerCase() === name.toLowerCase());
    if (i >= 0) this.names.splice(i, 1);
    this.names.push({ name, sheet, range, note });
  }

  private regionOf(sheet: string, range: CellRange, tableName: string | null): DataRegion {
    return regionOfGrid(sheet, range, this.shownValues(sheet, rangeAddress(range)), tableName);
  }

  private sheetOf(sheet: string): void {
    if (!this.cells.sheets.has(sheet)) {
      throw new MooringInputError(`There is no sheet named '${sheet}': pick one of ${[...this.cells.sheets.keys()].join(', ')}.`, sheet);
    }
  }

  private rangeOf(sheet: string, address: string): CellRange {
    this.sheetOf(sheet);
    try {
      return MemoryCells.range(sheet, address);
    } catch (e) {
      throw new MooringInputError((e as Error).message, `${sheet}!${address}`);
    }
  }

  private cellOf(sheet: string, address: string): { row: number; col: number } {
    const r = this.rangeOf(sheet, address);
    return { row: r.top, col: r.left };
  }
}
