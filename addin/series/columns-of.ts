/**
 * Turns a 2-D cell grid, row-major as Excel passes ranges, into series. A single row is a
 * series too: a 1 x n range selected across the sheet is read as one series, not n series
 * of one value.
 */
import { MooringInputError } from '../errors';

/** How a grid holds its series: one per column, one per row, or decided by shape. */
export type Orientation = 'columns' | 'rows' | 'auto';

/**
 * The series of a grid. 'auto' (the default) reads a single row as one series and anything
 * else by columns. Rows shorter than the longest are padded with blanks (Excel ranges are
 * rectangular; a hand-built grid may not be), which the cleaner then treats as blanks.
 */
export function columnsOf(grid: readonly (readonly unknown[])[], orientation: Orientation = 'auto'): unknown[][] {
  if (!Array.isArray(grid)) throw new MooringInputError('Expected a range of cells (rows of values).');
  if (orientation !== 'columns' && orientation !== 'rows' && orientation !== 'auto') {
    throw new MooringInputError(`Unknown orientation '${String(orientation)}': use columns, rows or auto.`);
  }
  if (grid.length === 0) return [];
  let width = 0;
  for (let i = 0; i < grid.length; i++) {
    const row = grid[i];
    if (!Array.isArray(row)) {
      throw new MooringInputError(`Row ${i + 1} of the range is not a row of cells: pass the range as rows of values.`);
    }
    if (row.length > width) width = row.length;
  }
  if (orientation === 'rows' || (orientation === 'auto' && grid.length === 1)) {
    return grid.map((row) => {
      const out = row.slice();
      out.length = width;
      return out;
    });
  }
  const columns: unknown[][] = [];
  for (let j = 0; j < width; j++) {
    const column = new Array<unknown>(grid.length);
    for (let i = 0; i < grid.length; i++) column[i] = grid[i][j];
    columns.push(column);
  }
  return columns;
}
