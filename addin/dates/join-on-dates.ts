/**
 * Joins series kept on different calendars (two vendors, two exchanges) on their dates, so
 * every row of the result holds the prices of one date. Rows present in all series are kept
 * (an inner join); optionally a price is carried forward over at most N missing dates of its
 * own series, which is disclosed. The result says how many rows each series lost, so a
 * calendar mismatch never reaches a statistic unannounced.
 *
 * Each group holds the rows of one calendar: its dates, in date order without repeats (see
 * date-order.ts), and the series read against them.
 */
import { MooringInputError } from '../errors';

/** Series sharing one calendar. */
export interface DatedGroup<T> {
  /** Where the group came from, for messages ("a.csv", "columns A to C"). */
  source: string;
  /** Day numbers, strictly rising. */
  days: readonly number[];
  /** The series of the group, each one cell per date. */
  series: readonly { name: string; cells: readonly T[] }[];
}

/** One series of the join and what the join did to it. */
export interface JoinedSeries<T> {
  name: string;
  source: string;
  cells: T[];
  /** Rows of its own calendar that the join left out. */
  lost: number;
  /** Rows of the result whose price was carried forward from an earlier date. */
  filled: number;
}

/** The series on the dates they share. */
export interface JoinedDates<T> {
  days: number[];
  series: JoinedSeries<T>[];
  /** For each row of the result and each group, the index of the row in that group it came from (carried rows: the row carried). */
  sourceRows: number[][];
}

/**
 * The inner join of the groups on their dates; with `fillForward` N > 0 a series missing a
 * date takes its last price if it is at most N dates of the joined calendar old.
 */
export function joinOnDates<T>(groups: readonly DatedGroup<T>[], fillForward = 0): JoinedDates<T> {
  if (!Number.isInteger(fillForward) || fillForward < 0) throw new MooringInputError(`The rows to carry a price forward must be a whole number of 0 or more, not ${fillForward}.`);
  const all = new Set<number>();
  for (const g of groups) for (const d of g.days) all.add(d);
  const calendar = [...all].sort((a, b) => a - b);
  const positions = groups.map((g) => new Map(g.days.map((d, i) => [d, i])));
  const days: number[] = [];
  const sourceRows: number[][] = [];
  const filledRows: boolean[][] = [];
  const last: number[] = groups.map(() => -1);
  const age: number[] = groups.map(() => 0);
  for (const d of calendar) {
    const row: number[] = [];
    const filled: boolean[] = [];
    let keep = true;
    groups.forEach((_, g) => {
      const at = positions[g].get(d);
      if (at !== undefined) {
        last[g] = at;
        age[g] = 0;
        row.push(at);
        filled.push(false);
      } else {
        age[g]++;
        if (last[g] < 0 || age[g] > fillForward) keep = false;
        row.push(last[g]);
        filled.push(true);
      }
    });
    if (keep) {
      days.push(d);
      sourceRows.push(row);
      filledRows.push(filled);
    }
  }
  if (days.length === 0) {
    throw new MooringInputError(`${groups.map((g) => g.source).join(' and ')} share no dates: check that they cover the same period${fillForward > 0 ? '' : ', or carry prices forward over missing dates'}.`);
  }
  const series: JoinedSeries<T>[] = [];
  groups.forEach((g, k) => {
    const used = new Set<number>();
    let filled = 0;
    sourceRows.forEach((row, r) => {
      if (filledRows[r][k]) filled++;
      else used.add(row[k]);
    });
    for (const s of g.series) {
      series.push({ name: s.name, source: g.source, cells: sourceRows.map((row) => s.cells[row[k]]), lost: g.days.length - used.size, filled });
    }
  });
  return { days, series, sourceRows };
}
