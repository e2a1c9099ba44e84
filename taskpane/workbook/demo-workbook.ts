/**
 * The demo data as a workbook: the CSV of addin/demo/data (read by the same reader as the
 * command line's, addin/csv/read-csv.ts) laid out from A1 of a sheet and made an Excel
 * table, as a user who pasted it and pressed Ctrl+T would have it. Number fields become
 * numbers, empty fields empty cells, anything else (the dates) text.
 */
import { readCsv } from '../../addin/csv/read-csv';
import { cellAddress } from './a1-address';
import { MemoryWorkbook } from './memory-workbook';
import type { CellContent } from './port';

/** Where the demo data go. */
export const DEMO_SHEET = 'Prices';
export const DEMO_TABLE = 'QuennelPrices';

/** A CSV field as a cell. */
function cellOf(field: string): CellContent {
  const t = field.trim();
  if (t === '') return null;
  const n = Number(t);
  return Number.isFinite(n) && /^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(t) ? n : field;
}

/** Loads CSV text into `workbook` (a new one by default) as a table on its own sheet; returns the workbook. */
export function loadCsvTable(csvText: string, options: { sheet?: string; table?: string; workbook?: MemoryWorkbook } = {}): MemoryWorkbook {
  const sheet = options.sheet ?? DEMO_SHEET;
  const workbook = options.workbook ?? new MemoryWorkbook([sheet]);
  if (!workbook.cells.sheets.has(sheet)) workbook.cells.sheets.set(sheet, new Map());
  const csv = readCsv(csvText);
  const rows = csv.columns[0].length;
  const grid: CellContent[][] = [csv.header.slice()];
  for (let i = 0; i < rows; i++) grid.push(csv.columns.map((col) => cellOf(col[i])));
  workbook.setValues(sheet, 'A1', grid);
  workbook.addTable(sheet, `A1:${cellAddress({ row: rows, col: csv.header.length - 1 })}`, options.table ?? DEMO_TABLE);
  return workbook;
}
