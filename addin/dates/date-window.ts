/**
 * The sample window from a first and a last date (or, without dates, sheet rows) as typed by
 * a user, turned into positions among the cleaned rows. The pane's first step and the command
 * line's --from and --to call this one function, so a window means the same rows everywhere;
 * both ends are included. A date bound without a time covers its whole day.
 */
import { MooringInputError } from '../errors';
import { isoDayNumber } from './read-dates';

/** The first and last date (or row) as typed; null or '' for the start or the end. */
export interface WindowBounds {
  from: string | null;
  to: string | null;
}

/** How the bounds are named in messages on each surface. */
export interface WindowWords {
  /** "The first date", "--from" ... */
  first: string;
  last: string;
}

const PANE_WORDS: WindowWords = { first: 'The first', last: 'The last' };

/**
 * The window [start, end) among cleaned rows, or undefined for all of them. `sourceRows` are
 * the source indices of the cleaned rows; `dates` the ISO date of every source index (null
 * without a date column); `firstRow` the sheet row of source index 0.
 */
export function windowFromBounds(bounds: WindowBounds, sourceRows: readonly number[], dates: readonly (string | null)[] | null, firstRow: number,
  words: WindowWords = PANE_WORDS): { start: number; end: number } | undefined {
  const from = bounds.from?.trim() || null;
  const to = bounds.to?.trim() || null;
  if (from === null && to === null) return undefined;
  const n = sourceRows.length;
  const keyOf = (k: number): number => (dates ? (isoDayNumber(dates[sourceRows[k]] ?? '') ?? NaN) : firstRow + sourceRows[k]);
  const bound = (text: string, which: 'first' | 'last'): number => {
    const what = which === 'first' ? words.first : words.last;
    if (dates) {
      const day = isoDayNumber(text);
      if (day === null) throw new MooringInputError(`${what} date '${text}' is not a date: type it as 2024-03-15.`);
      // A last date without a time takes in the whole day.
      return which === 'last' && !/[T ]\d/.test(text) ? day + 1 - 1e-9 : day;
    }
    const row = Number(text);
    if (!Number.isInteger(row)) throw new MooringInputError(`${what} row '${text}' is not a row number: type a sheet row such as ${firstRow}.`);
    return row;
  };
  const lo = from === null ? null : bound(from, 'first');
  const hi = to === null ? null : bound(to, 'last');
  if (lo !== null && hi !== null && hi < lo) throw new MooringInputError(`The window runs from ${from} back to ${to}: make the last date at least the first.`);
  let start = 0;
  while (start < n && lo !== null && !(keyOf(start) >= lo)) start++;
  let end = n;
  while (end > start && hi !== null && !(keyOf(end - 1) <= hi)) end--;
  if (end <= start) {
    throw new MooringInputError(`No rows lie between ${from ?? 'the start'} and ${to ?? 'the end'}: widen the sample.`);
  }
  return start === 0 && end === n ? undefined : { start, end };
}
