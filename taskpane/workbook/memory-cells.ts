/**
 * The cells of the in-memory workbook: sheets of stored values and formulas with their
 * formats, Excel tables over them, and the calculation that shows what each cell holds
 * (formulas evaluated, arrays spilled into the empty cells below and to the right, #SPILL!
 * when a filled cell is in the way). Results are cached until the next change, so reading
 * a block of MOOR formulas twice runs the engine once.
 */
import { cellAddress, parseRange, rangeAddress, type CellRange } from './a1-address';
import { evaluate, type FormulaWorld } from './formula-evaluator';
import { parseFormula } from './formula-parser';
import { FormulaError, gridOf, isMulti, type Evaluated, type Grid, type Reference, type Scalar } from './formula-values';
import type { CellContent, CellFormat } from './port';

/** What a cell stores: a value or a formula, and its format. */
export interface StoredCell {
  value: CellContent;
  formula?: string;
  format?: CellFormat;
}

/** An Excel table: its name, sheet and range (header row included). */
export interface MemoryTable {
  name: string;
  sheet: string;
  range: CellRange;
}

/** What a cell shows: its value or error code, and the error's message when there is one. */
export interface ShownCell {
  value: CellContent;
  error: string | null;
}

const key = (row: number, col: number): number => row * 16384 + col;

/** Sheets, tables and the calculation over them. */
export class MemoryCells {
  readonly sheets = new Map<string, Map<number, StoredCell>>();
  readonly tables: MemoryTable[] = [];
  private cache = new Map<string, Evaluated>();
  private evaluating = new Set<string>();

  /** The sheet's cells; throws naming the sheet when there is none. */
  sheet(name: string): Map<number, StoredCell> {
    const s = this.sheets.get(name);
    if (!s) throw new RangeError(`There is no sheet named '${name}'.`);
    return s;
  }

  /** The stored cell, or undefined when it is empty. */
  stored(sheet: string, row: number, col: number): StoredCell | undefined {
    return this.sheet(sheet).get(key(row, col));
  }

  /** Stores (or, with undefined, empties) a cell; every change drops the cached results. */
  put(sheet: string, row: number, col: number, cell: StoredCell | undefined): void {
    const s = this.sheet(sheet);
    if (cell === undefined || (cell.value === null && cell.formula === undefined && cell.format === undefined)) s.delete(key(row, col));
    else s.set(key(row, col), cell);
    this.changed();
  }

  /** Drops cached results (after any change to cells or tables). */
  changed(): void {
    this.cache.clear();
  }

  /** The table with this name (any case), or undefined. */
  table(name: string): MemoryTable | undefined {
    const n = name.toLowerCase();
    return this.tables.find((t) => t.name.toLowerCase() === n);
  }

  /** The table holding this cell, or undefined. */
  tableAt(sheet: string, row: number, col: number): MemoryTable | undefined {
    return this.tables.find((t) => t.sheet === sheet && row >= t.range.top && row <= t.range.bottom && col >= t.range.left && col <= t.range.right);
  }

  /** Whether the cell has stored content (a value or a formula). */
  isStoredFilled(sheet: string, row: number, col: number): boolean {
    const c = this.stored(sheet, row, col);
    return c !== undefined && (c.formula !== undefined || c.value !== null);
  }

  /** The full result of the formula stored at a cell (cached), or null when the cell holds no formula. */
  result(sheet: string, row: number, col: number): Evaluated | null {
    const cell = this.stored(sheet, row, col);
    if (cell?.formula === undefined) return null;
    const k = `${sheet}!${key(row, col)}`;
    const hit = this.cache.get(k);
    if (hit !== undefined) return hit;
    if (this.evaluating.has(k)) return new FormulaError('#REF!', `The formula in ${sheet}!${cellAddress({ row, col })} refers to itself.`);
    this.evaluating.add(k);
    let out: Evaluated;
    try {
      out = evaluate(parseFormula(cell.formula), this.world(sheet));
      if (isMulti(out)) {
        const grid = gridOf(out, (r) => this.read(r));
        out = grid.length === 1 && grid[0].length === 1 ? grid[0][0] : { kind: 'array', grid };
        if (isMulti(out) && this.spillBlocked(sheet, row, col, grid)) out = new FormulaError('#SPILL!', 'The spill range is not empty.');
      }
    } finally {
      this.evaluating.delete(k);
    }
    this.cache.set(k, out);
    return out;
  }

  private spillBlocked(sheet: string, row: number, col: number, grid: Grid): boolean {
    for (let r = 0; r < grid.length; r++) {
      for (let c = 0; c < grid[r].length; c++) {
        if ((r > 0 || c > 0) && this.isStoredFilled(sheet, row + r, col + c)) return true;
      }
    }
    return false;
  }

  /** What a cell shows: its value, its formula's result, or the part of a spill that lands on it. */
  shown(sheet: string, row: number, col: number): Scalar {
    const cell = this.stored(sheet, row, col);
    if (cell?.formula !== undefined) {
      const r = this.result(sheet, row, col)!;
      return isMulti(r) ? gridOf(r, (x) => this.read(x))[0][0] : r;
    }
    if (cell !== undefined && cell.value !== null) return cell.value;
    return this.spilledInto(sheet, row, col);
  }

  /** The value a spill from above or the left puts in this empty cell, or null. */
  private spilledInto(sheet: string, row: number, col: number): Scalar {
    for (const [k, c] of this.sheet(sheet)) {
      if (c.formula === undefined) continue;
      const r0 = Math.floor(k / 16384);
      const c0 = k % 16384;
      if (r0 > row || c0 > col || (r0 === row && c0 === col)) continue;
      if (this.evaluating.has(`${sheet}!${k}`)) continue;
      const res = this.result(sheet, r0, c0);
      if (res === null || !isMulti(res) || res.kind !== 'array') continue;
      const v = res.grid[row - r0]?.[col - c0];
      if (v !== undefined) return v;
    }
    return null;
  }

  /** The shown values of a range. */
  read(ref: Reference): Grid {
    const out: Grid = [];
    for (let r = ref.range.top; r <= ref.range.bottom; r++) {
      const row: Scalar[] = [];
      for (let c = ref.range.left; c <= ref.range.right; c++) row.push(this.shown(ref.sheet, r, c));
      out.push(row);
    }
    return out;
  }

  /** A cell's shown content for the port: error values as their codes ("#N/A"), with the message apart. */
  shownCell(sheet: string, row: number, col: number): ShownCell {
    const v = this.shown(sheet, row, col);
    if (v instanceof FormulaError) return { value: v.code, error: v.message || v.code };
    return { value: v, error: null };
  }

  /** A table's data rows over a run of its columns. */
  tableColumns(name: string, first: string, last: string): Reference | FormulaError {
    const t = this.table(name);
    if (!t) return new FormulaError('#REF!', `There is no table named ${name}.`);
    const headers: string[] = [];
    for (let c = t.range.left; c <= t.range.right; c++) headers.push(String(this.stored(t.sheet, t.range.top, c)?.value ?? '').toLowerCase());
    const a = headers.indexOf(first.toLowerCase());
    const b = headers.indexOf(last.toLowerCase());
    if (a < 0 || b < 0) return new FormulaError('#REF!', `Table ${t.name} has no column named ${a < 0 ? first : last}.`);
    return {
      kind: 'ref',
      sheet: t.sheet,
      range: { top: t.range.top + 1, bottom: t.range.bottom, left: t.range.left + Math.min(a, b), right: t.range.left + Math.max(a, b) },
    };
  }

  private world(sheet: string): FormulaWorld {
    return {
      sheet,
      hasSheet: (s) => this.sheets.has(s),
      read: (ref) => this.read(ref),
      spill: (s, row, col) => {
        // As in Excel, a spill reference to a formula that cannot spill is #REF!.
        const r = this.result(s, row, col);
        if (r === null) return new FormulaError('#REF!', `${s}!${cellAddress({ row, col })} holds no formula to spill.`);
        return r instanceof FormulaError && r.code === '#SPILL!' ? new FormulaError('#REF!', `The formula in ${s}!${cellAddress({ row, col })} cannot spill.`) : r;
      },
      tableColumns: (t, a, b) => this.tableColumns(t, a, b),
    };
  }

  /** The extent of what the formula at a cell spills over (the cell alone when it does not spill). */
  spillExtent(sheet: string, row: number, col: number): CellRange {
    const r = this.result(sheet, row, col);
    if (r === null || !isMulti(r) || r.kind !== 'array') return { top: row, left: col, bottom: row, right: col };
    return { top: row, left: col, bottom: row + r.grid.length - 1, right: col + (r.grid[0]?.length ?? 1) - 1 };
  }

  /** A range parsed with a message naming the sheet. */
  static range(sheet: string, address: string): CellRange {
    try {
      return parseRange(address);
    } catch {
      throw new RangeError(`'${address}' on sheet ${sheet} is not an address such as B2:H781.`);
    }
  }

  /** "B2:H781" of a range. */
  static address(r: CellRange): string {
    return rangeAddress(r);
  }
}
