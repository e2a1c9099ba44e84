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

/** Values for a spilled column or row; null (no value at that position) becomes an empty cell. */
export function spillValues(values: ArrayLike<number | null>, what: string, leadingBlanks = 0): (number | string)[] {
  const out: (number | string)[] = new Array(leadingBlanks).fill('');
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (v === null) out.push('');
    else if (Number.isFinite(v)) out.push(v);
    else throw new Error(`${what} value ${i + 1} came out as ${String(v)}`);
  }
  return out;
}

/** One cell of a spilled table: a finite number as it is, null (no value there) as an empty cell; NaN or an infinity is a fault upstream. */
export function spillCell(value: number | null, what: string): number | string {
  if (value === null) return '';
  if (Number.isFinite(value)) return value;
  throw new Error(`${what} came out as ${String(value)}`);
}
