/**
 * The order of a column of dates. Prices must reach a test oldest first: a test run on rows in
 * the wrong order answers a different question, and its "latest" value is the oldest one.
 * Dates that fall steadily (newest first, a common export) are put in date order and the
 * caller says so; dates that repeat or go back and forth cannot be ordered safely (which of
 * two prices on one date is the right one, or was the file sorted by another column?) and are
 * refused, naming the first rows at fault and what would work.
 */
import { MooringInputError } from '../errors';

/** How the dates run. */
export type DateDirection = 'oldest first' | 'newest first';

/**
 * Checks that the dates run steadily one way; returns which way. `label` names a row by its
 * index (a CSV line, a sheet row); `what` names the column or file in messages.
 */
export function dateDirection(days: readonly number[], label: (index: number) => string, what: string): DateDirection {
  if (days.length < 2) return 'oldest first';
  for (let i = 1; i < days.length; i++) {
    if (days[i] === days[i - 1]) {
      throw new MooringInputError(
        `${capital(label(i))} repeats the date of ${label(i - 1)} in ${what}: each date may appear once; remove or merge the repeated rows.`, label(i));
    }
  }
  const falling = days[1] < days[0];
  for (let i = 2; i < days.length; i++) {
    if ((days[i] < days[i - 1]) !== falling) {
      const seen = new Map<number, number>();
      days.forEach((d, k) => {
        if (!seen.has(d)) seen.set(d, k);
      });
      const twice = days.findIndex((d, k) => seen.get(d) !== k);
      if (twice >= 0) {
        throw new MooringInputError(
          `${capital(label(twice))} repeats the date of ${label(seen.get(days[twice]) as number)} in ${what}: each date may appear once; remove or merge the repeated rows.`, label(twice));
      }
      throw new MooringInputError(
        `The dates in ${what} are not in order: ${label(i)} goes ${falling ? 'forward' : 'back'} in time after ${label(i - 1)}, ` +
          `though the rows before run ${falling ? 'newest' : 'oldest'} first; sort the rows by date (oldest or newest first).`, label(i));
    }
  }
  return falling ? 'newest first' : 'oldest first';
}

function capital(text: string): string {
  return text.length > 0 ? text[0].toUpperCase() + text.slice(1) : text;
}
