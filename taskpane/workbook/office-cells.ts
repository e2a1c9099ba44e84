/**
 * Conversions between the port's cells and what Office.js reads and writes, with no Office
 * call of their own (so they are testable anywhere): a block as the formulas and number
 * formats of one range write, read values back as port cells, date serials as ISO dates.
 *
 * Text stays text: a text cell gets the number format "@" before its value is written, so
 * Excel stores "=SUM(A1)", "1-2" or "<b>x</b>" exactly as given instead of reading it as a
 * formula, a date or anything else.
 */
import type { BlockCell, BlockToWrite, CellContent, CellGrid } from './port';

/** Excel's text number format. */
export const TEXT_FORMAT = '@';

/** Excel's default number format. */
export const GENERAL_FORMAT = 'General';

/** The width of the block's widest row. */
export function blockWidth(block: BlockToWrite): number {
  return Math.max(1, ...block.cells.map((r) => r.length));
}

/** One cell as a `formulas` entry: its formula, its value, or "" for empty. */
export function formulaEntry(cell: BlockCell | undefined): string | number | boolean {
  if (!cell) return '';
  if (cell.formula !== undefined) return cell.formula;
  const v = cell.value;
  return v === null || v === undefined ? '' : v;
}

/** One cell's number format: its own, "@" for text, else General. */
export function numberFormatEntry(cell: BlockCell | undefined): string {
  if (cell?.format?.numberFormat) return cell.format.numberFormat;
  if (cell && cell.formula === undefined && typeof cell.value === 'string') return TEXT_FORMAT;
  return GENERAL_FORMAT;
}

/** The block as the two grids of one write (rows padded to the block's width). */
export function blockGrids(block: BlockToWrite): { formulas: (string | number | boolean)[][]; numberFormat: string[][] } {
  const width = blockWidth(block);
  const rows: BlockCell[][] = block.cells.length === 0 ? [[]] : block.cells;
  const pad = <T>(row: BlockCell[], f: (c: BlockCell | undefined) => T): T[] => Array.from({ length: width }, (_, j) => f(row[j]));
  return {
    formulas: rows.map((r) => pad(r, formulaEntry)),
    numberFormat: rows.map((r) => pad(r, numberFormatEntry)),
  };
}

/** A number format that shows a date (it has d, m or y outside quotes and brackets). */
export function isDateFormat(format: string): boolean {
  const bare = format.replace(/"[^"]*"/g, '').replace(/\[[^\]]*\]/g, '');
  return /[dy]/i.test(bare) || /m/i.test(bare.replace(/General/gi, ''));
}

/** An Excel date serial (1900 system) as yyyy-mm-dd. */
export function serialToIsoDate(serial: number): string {
  const ms = Date.UTC(1899, 11, 30) + Math.round(serial * 86400000);
  return new Date(ms).toISOString().slice(0, 10);
}

/** Read values as port cells: "" is empty, numbers under a date format become ISO dates. */
export function cellsFromRead(values: unknown[][], numberFormat: unknown[][] | null): CellGrid {
  return values.map((row, i) =>
    row.map((v, j): CellContent => {
      if (v === '' || v === null || v === undefined) return null;
      const f = numberFormat?.[i]?.[j];
      if (typeof v === 'number' && typeof f === 'string' && isDateFormat(f)) return serialToIsoDate(v);
      if (typeof v === 'number' || typeof v === 'string' || typeof v === 'boolean') return v;
      return String(v);
    }),
  );
}

/** Whether a cell read back (value and formula) is filled. */
export function isFilledRead(value: unknown, formula: unknown): boolean {
  return !(value === '' || value === null || value === undefined) || !(formula === '' || formula === null || formula === undefined);
}
