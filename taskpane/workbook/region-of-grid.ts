/**
 * A DataRegion from the cells of a range as an adapter read them: the first row is the
 * header (every header is text, shown as written: "<b>x</b>" stays those eight characters;
 * an empty header becomes "column N"), the rest are the rows, and the date column is the
 * first whose header is a date word or whose first filled cells are ISO dates (the CSV
 * reader's rule, addin/csv/date-column.ts), so the pane and the command line agree on it.
 */
import { MooringInputError } from '../../addin/errors';
import { findDateColumn } from '../../addin/csv/date-column';
import { rangeAddress, type CellRange } from './a1-address';
import type { CellContent, CellGrid, DataRegion } from './port';

/** A header cell as text. */
export function headerText(cell: CellContent, j: number): string {
  if (cell === null) return `column ${j + 1}`;
  const t = String(cell).trim();
  return t === '' ? `column ${j + 1}` : t;
}

/** A cell as the date finder reads it. */
function asText(cell: CellContent): string {
  return cell === null ? '' : String(cell);
}

/** The region of `grid` (header row first), read from `range` on `sheet`. */
export function regionOfGrid(sheet: string, range: CellRange, grid: CellGrid, tableName: string | null): DataRegion {
  if (grid.length < 2) {
    throw new MooringInputError(
      `The range ${sheet}!${rangeAddress(range)} has no rows below its header: select a block with a header row and the prices beneath it.`,
      `${sheet}!${rangeAddress(range)}`,
    );
  }
  const headers = grid[0].map(headerText);
  const rows = grid.slice(1).map((row) => headers.map((_, j) => (row[j] === undefined || row[j] === '' ? null : row[j])));
  const columns = headers.map((_, j) => rows.map((row) => asText(row[j])));
  const d = findDateColumn(headers, columns);
  return {
    sheet,
    address: rangeAddress(range),
    headers,
    rows,
    dateColumn: d >= 0 ? d : null,
    tableName,
    firstDataRow: range.top + 2,
  };
}
