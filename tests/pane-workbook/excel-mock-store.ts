/**
 * The state behind the mock Excel of the Office adapter tests: cells (a formula or constant
 * and a number format, with fonts, fills and conditional fills), tables, names, charts,
 * column widths and the log of calls, plus the surrounding-region rule. No Office.js and no
 * evaluation: the adapter under test only writes and reads these.
 */
import { cellAddress, parseRange, rangeAddress, type CellRange } from '../../taskpane/workbook/a1-address';
import { currentRegion } from '../../taskpane/workbook/current-region';

/** One cell of the mock workbook. */
export interface MockCell {
  formula: string | number | boolean;
  numberFormat: string;
  bold?: boolean;
  italic?: boolean;
  fill?: string;
  fontColor?: string;
  size?: number;
  wrap?: boolean;
  textFills: { startsWith: string; fill: string }[];
}

/** A chart as the mock recorded it. */
export interface MockChart {
  sheet: string;
  name: string;
  type: string;
  source: string;
  seriesBy: string;
  title: string;
  series: { name: string; values: string; x: string | null }[];
  position: string | null;
}

/** Everything the mock Excel holds. */
export class MockStore {
  readonly sheets = new Map<string, Map<string, MockCell>>();
  readonly tables: { name: string; sheet: string; address: string }[] = [];
  readonly names: { name: string; sheet: string; address: string; comment: string }[] = [];
  readonly charts: MockChart[] = [];
  readonly columnWidths = new Map<string, number>();
  readonly calls: string[] = [];
  selection = { sheet: 'Prices', address: 'A1' };

  constructor(sheets: string[]) {
    for (const s of sheets) this.sheets.set(s, new Map());
  }

  /** The cell (created empty when asked to). */
  cell(sheet: string, row: number, col: number): MockCell | undefined {
    return this.sheet(sheet).get(cellAddress({ row, col }));
  }

  sheet(name: string): Map<string, MockCell> {
    const s = this.sheets.get(name);
    if (!s) throw new Error(`ItemNotFound: worksheet ${name}`);
    return s;
  }

  /** Writes one cell's formula (or constant); "" empties it but keeps its formats. */
  setFormula(sheet: string, row: number, col: number, formula: string | number | boolean): void {
    const s = this.sheet(sheet);
    const a = cellAddress({ row, col });
    const c = s.get(a) ?? { formula: '', numberFormat: 'General', textFills: [] };
    c.formula = formula;
    s.set(a, c);
  }

  /** Mutates (creating) one cell. */
  edit(sheet: string, row: number, col: number, f: (c: MockCell) => void): void {
    const s = this.sheet(sheet);
    const a = cellAddress({ row, col });
    const c = s.get(a) ?? { formula: '', numberFormat: 'General', textFills: [] };
    f(c);
    s.set(a, c);
  }

  /** Writes a grid of constants from a top-left cell. */
  put(sheet: string, anchor: string, grid: (string | number | boolean | null)[][]): void {
    const at = parseRange(anchor);
    grid.forEach((row, i) => row.forEach((v, j) => this.setFormula(sheet, at.top + i, at.left + j, v ?? '')));
  }

  /** Formulas of a range (constants as themselves, empty as ""). */
  formulas(sheet: string, r: CellRange): (string | number | boolean)[][] {
    return this.grid(r, (row, col) => this.cell(sheet, row, col)?.formula ?? '');
  }

  /** Values as the mock reports them: constants as themselves, a formula as 0 (the mock does not calculate). */
  values(sheet: string, r: CellRange): (string | number | boolean)[][] {
    return this.grid(r, (row, col) => {
      const f = this.cell(sheet, row, col)?.formula ?? '';
      return typeof f === 'string' && f.startsWith('=') ? 0 : f;
    });
  }

  numberFormats(sheet: string, r: CellRange): string[][] {
    return this.grid(r, (row, col) => this.cell(sheet, row, col)?.numberFormat ?? 'General');
  }

  grid<T>(r: CellRange, f: (row: number, col: number) => T): T[][] {
    const out: T[][] = [];
    for (let row = r.top; row <= r.bottom; row++) {
      const line: T[] = [];
      for (let col = r.left; col <= r.right; col++) line.push(f(row, col));
      out.push(line);
    }
    return out;
  }

  /** The surrounding region of a cell, as getSurroundingRegion finds it (the cell itself when all is empty). */
  surrounding(sheet: string, r: CellRange): string {
    const filled = (row: number, col: number) => {
      const f = this.cell(sheet, row, col)?.formula;
      return f !== undefined && f !== '';
    };
    const region = currentRegion(filled, { row: r.top, col: r.left }) ?? { top: r.top, left: r.left, bottom: r.top, right: r.left };
    return rangeAddress(region);
  }

  /** A snapshot of every sheet's filled or formatted cells, to compare before and after. */
  snapshot(): string {
    const out: Record<string, Record<string, MockCell>> = {};
    const blank = (c: MockCell) => c.formula === '' && c.numberFormat === 'General' && c.textFills.length === 0 && Object.keys(c).length === 3;
    for (const [s, cells] of this.sheets) out[s] = Object.fromEntries([...cells.entries()].filter(([, c]) => !blank(c)).sort());
    return JSON.stringify(out);
  }
}
