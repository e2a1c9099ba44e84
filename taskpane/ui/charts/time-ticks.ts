/**
 * Labels of a time axis that always carry the year where it is needed: ticks a year or more
 * apart show the year; ticks months apart show the month and its year ("Mar 2023"); closer
 * ticks show day and month, with the year on the first tick and wherever the year changes.
 * Dates are read in UTC, as the pane's axis makes them (data/excel-date.ts).
 */

const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];
const DAY = 86_400;

/** The labels of ticks at `splits` (Unix seconds) spaced `increment` seconds apart. */
export function timeTickLabels(splits: readonly number[], increment: number): string[] {
  let lastYear: number | null = null;
  return splits.map((t) => {
    const d = new Date(t * 1000);
    const year = d.getUTCFullYear();
    const month = MONTHS[d.getUTCMonth()];
    if (increment >= 360 * DAY) return String(year);
    if (increment >= 28 * DAY) return `${month} ${year}`;
    const label = `${d.getUTCDate()} ${month}${year !== lastYear ? ` ${year}` : ''}`;
    lastYear = year;
    return label;
  });
}
