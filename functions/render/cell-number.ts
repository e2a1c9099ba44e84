/**
 * A single number for a cell, or the reason there is none. A missing value (null) or an
 * infinite one becomes #N/A with the reason (NoValue); NaN means a fault upstream and is
 * refused as such. No cell ever holds a number standing in for "no answer".
 */
import { NoValue } from '../cells/no-value';

/** The number, if it is a finite one; otherwise NoValue naming `what` and `why`. */
export function cellNumber(value: number | null | undefined, what: string, why?: string): number {
  if (value === null || value === undefined) throw new NoValue(why ?? `${what} is not available for these data.`);
  if (Number.isNaN(value)) throw new Error(`${what} came out as NaN`);
  if (!Number.isFinite(value)) {
    throw new NoValue(`${what} is ${value > 0 ? 'plus' : 'minus'} infinity, which a cell cannot hold${why ? `: ${why}` : '.'}`);
  }
  return value;
}

/**
 * Values for a spilled column or row placed at their source rows: value k goes to position
 * rows[k] of the range, and every row the analysis did not use (blanks before the prices, gaps
 * skipped, rows outside the window) is an empty cell, so the spill lines up with the range it
 * was read from. null (no value at that row) is an empty cell too.
 */
export function spillByRow(values: ArrayLike<number | null>, rows: ArrayLike<number>, what: string): (number | string)[] {
  let length = 0;
  for (let k = 0; k < rows.length; k++) if (rows[k] + 1 > length) length = rows[k] + 1;
  const out: (number | string)[] = new Array(length).fill('');
  for (let k = 0; k < values.length; k++) {
    const v = values[k];
    if (v === null) continue;
    if (!Number.isFinite(v)) throw new Error(`${what} value ${k + 1} came out as ${String(v)}`);
    out[rows[k]] = v;
  }
  return out;
}

/** One cell of a spilled table: a finite number as it is, null (no value there) as an empty cell; NaN or an infinity is a fault upstream. */
export function spillCell(value: number | null, what: string): number | string {
  if (value === null) return '';
  if (Number.isFinite(value)) return value;
  throw new Error(`${what} came out as ${String(value)}`);
}
