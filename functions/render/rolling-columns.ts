/**
 * A rolling relation as columns to spill, one row per window (oldest first) under a header:
 * where the window ends, its Engle-Granger p-value, its hedge ratio and its half-life, or one
 * of these alone. A window without a value (x does not move in it, its spread does not revert)
 * leaves an empty cell. Nothing here computes a statistic: each number is the engine's.
 */
import type { RollingRelation } from '../../addin/stability/rolling-relation';
import type { Orientation } from '../cells/range-input';
import type { RollingShow } from '../options/option-words';
import { spillCell } from './cell-number';

/** The header of each statistic's column. */
export const ROLLING_HEADERS = {
  pvalue: 'p-value (Engle-Granger)',
  beta: 'hedge ratio',
  halflife: 'half-life',
} as const;

/** The header of the first column of the whole table: a column of input is read by rows, a row of input by columns. */
export function windowEndHeader(orientation: Orientation): string {
  return orientation === 'row' ? 'window ends at column' : 'window ends at row';
}

/**
 * The table `show` asks for. `position` turns a window's last value (0-based in the cleaned
 * series) into its place in the input range (1-based), so a user finds the row it ends on.
 */
export function rollingColumns(result: RollingRelation, show: RollingShow, orientation: Orientation, position: (index: number) => number): (number | string)[][] {
  const stat = (which: keyof typeof ROLLING_HEADERS, k: number): number | string => {
    const column = which === 'pvalue' ? result.pValue : which === 'beta' ? result.beta : result.halfLife;
    return spillCell(column[k], `The ${ROLLING_HEADERS[which]} of window ${k + 1}`);
  };
  if (show !== 'all') return [[ROLLING_HEADERS[show]], ...result.endRow.map((_, k) => [stat(show, k)])];
  const rows: (number | string)[][] = [[windowEndHeader(orientation), ROLLING_HEADERS.pvalue, ROLLING_HEADERS.beta, ROLLING_HEADERS.halflife]];
  result.endRow.forEach((end, k) => rows.push([position(end), stat('pvalue', k), stat('beta', k), stat('halflife', k)]));
  return rows;
}
