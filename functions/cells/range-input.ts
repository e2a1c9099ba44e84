/**
 * Ranges as Excel hands them to a custom function, turned into cleaned series.
 *
 * Platform facts, from Microsoft's documentation and issue tracker:
 * - "Custom functions parameter options" (Range parameters): a range arrives as a
 *   two-dimensional array, row by row.
 * - "Autogenerate JSON metadata for custom functions" (Types): an `any` parameter is passed
 *   without conversion, so range parameters are typed `any[][]`. A `number[][]` parameter
 *   would turn blanks into numbers; a blank must stay a blank, never a price of 0.
 * - "Manually create JSON metadata for custom functions" (allowErrorForDataTypeAny): with that
 *   flag (the build sets it) `any` and `any[][]` parameters receive error values instead of
 *   the call being skipped, so the cleaner can name the cell that holds #N/A.
 * - Blank cells arrive as null in Excel on the web and, in current desktop builds, as null
 *   too; some desktop builds passed 0 (OfficeDev/office-js issues #4702 and #5262). The
 *   cleaner treats '' and null as blanks and 0 as a zero; see trailingZeroRun for the guard
 *   against the old behaviour.
 *
 * A series is one column or one row; a block holds one series per column. A whole-column
 * reference (A:A, 1,048,576 cells) is cut to its used part by a backward scan before any copy.
 */
import { MooringInputError } from '../../addin/errors';
import { alignAll } from '../../addin/series/align-series';
import { isBlankCell } from '../../addin/series/cell-kinds';
import { cleanSeries, type CleanSeries } from '../../addin/series/clean-series';
import { AS_GIVEN, cutWindow, type Preparation } from '../../addin/series/preparation';

/** How a range holds its series. */
export type Orientation = 'column' | 'row';

/** A series read from a range, with where it sat. */
export interface RangeSeries {
  series: CleanSeries;
  orientation: Orientation;
}

/** A dependent series and its companions (x may be several columns), lined up by row. */
export interface RangeRelation {
  y: CleanSeries;
  xs: CleanSeries[];
  orientation: Orientation;
}

/**
 * Fewest exact zeros at the end of a range that Mooring refuses to read as prices. A range
 * whose blank cells arrived as 0 ends in a run as long as its unused rows (a million for a
 * whole column); a real price history rarely ends with ten identical zeros, and a history that
 * does has a stale or broken feed that deserves a look anyway.
 */
export const TRAILING_ZERO_LIMIT = 10;

/**
 * The range as rows of cells: a lone value (a single cell passed as a scalar) becomes a 1 x 1
 * range, a flat list one row. Excel's ranges are rectangular, so only the first row is looked
 * at here: a whole column must cost one pass over its cells, not three.
 */
function gridOf(range: unknown, name: string): readonly (readonly unknown[])[] {
  if (!Array.isArray(range)) return [[range]];
  if (range.length === 0) throw new MooringInputError(`${name} is an empty range: select the cells with the prices.`);
  if (!Array.isArray(range[0])) return [range];
  return range as unknown[][];
}

/** Width of a rectangular range: the first row's (a hand-built ragged grid reads missing cells as blanks). */
function widthOf(grid: readonly (readonly unknown[])[]): number {
  const first = grid[0].length;
  const last = grid[grid.length - 1]?.length ?? 0;
  return Math.max(first, last);
}

/** The cell at row i, column j, or undefined where a hand-built grid has no such row or cell. */
function cellAt(grid: readonly (readonly unknown[])[], i: number, j: number): unknown {
  const row = grid[i];
  return Array.isArray(row) ? row[j] : undefined;
}

/**
 * Column j of the grid, cut after its last filled cell. The backward scan tests the two blank
 * forms Excel passes (null and '') inline before the general check, since a whole column
 * hands over about a million of them.
 */
function columnCells(grid: readonly (readonly unknown[])[], j: number): unknown[] {
  let end = grid.length;
  while (end > 0) {
    const c = cellAt(grid, end - 1, j);
    if (c === null || c === '' || c === undefined || (typeof c === 'string' && isBlankCell(c))) end--;
    else break;
  }
  const out = new Array<unknown>(end);
  for (let i = 0; i < end; i++) out[i] = cellAt(grid, i, j);
  return out;
}

/** Row i of the grid, cut after its last filled cell. */
function rowCells(grid: readonly (readonly unknown[])[], i: number): unknown[] {
  const row = grid[i];
  let end = row.length;
  while (end > 0 && isBlankCell(row[end - 1])) end--;
  return end === row.length ? (row as unknown[]) : row.slice(0, end);
}

/** Number of exact zeros the cells end with. */
export function trailingZeroRun(cells: readonly unknown[]): number {
  let run = 0;
  for (let i = cells.length - 1; i >= 0 && cells[i] === 0; i--) run++;
  return run;
}

function clean(cells: unknown[], name: string, orientation: Orientation, prep: Preparation): CleanSeries {
  const zeros = trailingZeroRun(cells);
  if (zeros >= TRAILING_ZERO_LIMIT) {
    throw new MooringInputError(
      `The last ${zeros} cells of ${name} are exactly 0. If they are empty, this version of Excel passes empty cells as 0: ` +
        'select only the rows that hold prices instead of a whole column. If they are real zeros, the history ends in a stale or broken feed: check it.');
  }
  const axis = orientation === 'column' ? 'row' : 'column';
  return cleanSeries(cells, { name, log: prep.log, skipGaps: prep.skipGaps, rowLabel: (index) => `${axis} ${index + 1} of its range` });
}

/** Whether a range holds more than one row and more than one column (a block of series, one per column). */
export function isBlockRange(range: unknown): boolean {
  return Array.isArray(range) && range.length > 1 && Array.isArray(range[0]) && widthOf(range as unknown[][]) > 1;
}

/** One series from a range that is one column or one row, prepared as `prep` says. */
export function readSeries(range: unknown, name: string, prep: Preparation = AS_GIVEN): RangeSeries {
  const grid = gridOf(range, name);
  const width = widthOf(grid);
  if (grid.length > 1 && width > 1) {
    throw new MooringInputError(`${name} covers ${grid.length} rows and ${width} columns: select one column (or one row) of prices.`);
  }
  const orientation: Orientation = grid.length === 1 && width > 1 ? 'row' : 'column';
  const cells = orientation === 'row' ? rowCells(grid, 0) : columnCells(grid, 0);
  const [series] = cutWindow([clean(cells, name, orientation, prep)], prep);
  return { series, orientation };
}

/** Several series from a range: one per column, or one per row when `orientation` is 'row'. */
export function readSeriesSet(range: unknown, name: string, orientation: Orientation, prep: Preparation = AS_GIVEN): CleanSeries[] {
  const grid = gridOf(range, name);
  const count = orientation === 'column' ? widthOf(grid) : grid.length;
  const label = (k: number) => (count === 1 ? name : `${name} (${orientation} ${k + 1})`);
  const out: CleanSeries[] = [];
  for (let k = 0; k < count; k++) {
    const cells = orientation === 'column' ? columnCells(grid, k) : rowCells(grid, k);
    out.push(clean(cells, label(k), orientation, prep));
  }
  return out;
}

/**
 * y and x lined up by row. y is one column or one row; x holds one or more series laid out
 * the same way (columns beside a column y, rows under a row y). Unequal lengths after the
 * blank ends are trimmed are refused, naming the longer series.
 */
export function readRelation(yRange: unknown, xRange: unknown, names: { y: string; x: string } = { y: 'y', x: 'x' }, prep: Preparation = AS_GIVEN): RangeRelation {
  // y is cleaned alone first (for its orientation), then rows are cut once, after the lining up.
  const y = readSeries(yRange, names.y, { ...AS_GIVEN, log: prep.log, skipGaps: prep.skipGaps });
  const xs = readSeriesSet(xRange, names.x, y.orientation, prep);
  const [ya, ...xa] = cutWindow(alignAll([y.series, ...xs]), prep);
  return { y: ya, xs: xa, orientation: y.orientation };
}

/** A block: one series per column, lined up by row, named "series 1", "series 2", ... */
export function readBlock(range: unknown, name = 'the block', prep: Preparation = AS_GIVEN): CleanSeries[] {
  const grid = gridOf(range, name);
  const width = widthOf(grid);
  const series: CleanSeries[] = [];
  for (let j = 0; j < width; j++) series.push(clean(columnCells(grid, j), `series ${j + 1}`, 'column', prep));
  return cutWindow(alignAll(series), prep);
}

/** Two series lined up by row, the second from a range that must hold exactly one series. */
export function readPair(yRange: unknown, xRange: unknown, names: { y: string; x: string }, purpose: string, prep: Preparation = AS_GIVEN): { y: CleanSeries; x: CleanSeries; orientation: Orientation } {
  const input = readRelation(yRange, xRange, names, prep);
  if (input.xs.length !== 1) {
    throw new MooringInputError(`${names.x} holds ${input.xs.length} series: ${purpose} pairs ${names.y} with one series; select one ${input.orientation} for ${names.x}.`);
  }
  return { y: input.y, x: input.xs[0], orientation: input.orientation };
}
