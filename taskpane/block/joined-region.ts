/**
 * A selection laid out as several price histories side by side, each with its own dates
 * (Date A | Price A | Date B | Price B), made into one region on the dates every chosen series
 * shares. The join is the engine's (addin/dates/join-ranges.ts, the route MOOR.COMMONDATES
 * takes), so the pane, the report of a refresh and the results block's formulas all see the
 * same rows. The joined region is an ordinary DataRegion (its first column the shared dates as
 * ISO text, then the prices of every joined calendar, row i being the i-th shared date), so the
 * cleaner, the window and the block's preparation work on it unchanged; `join` says where it
 * came from.
 *
 * Price columns belong to the nearest date column on their left (the command line's rule for
 * several date columns, addin/csv/dated-table.ts); each calendar is the range from its date
 * column to the column before the next date column, the layout MOOR.COMMONDATES reads.
 */
import { findDateColumns } from '../../addin/csv/date-column';
import { joinDatedRanges } from '../../addin/dates/join-ranges';
import { MooringInputError } from '../../addin/errors';
import type { DataRegion } from '../workbook/port';

/** One calendar of the source region: its date column and the price columns after it. */
export interface CalendarColumns {
  date: number;
  /** Price columns, left to right (date + 1 up to the column before the next date column). */
  series: number[];
}

/** Where a joined region came from and what the join did. */
export interface JoinInfo {
  /** The region as it stands on the sheet. */
  source: DataRegion;
  /** The calendars joined, left to right. */
  calendars: CalendarColumns[];
  /** What the join did, in words, for the result's warnings. */
  notices: string[];
  /** Each joined row named by its date and the sheet rows it came from. */
  rowLabels: string[];
  /** Rows each joined series lost, in the order of the joined headers after the date. */
  lost: { name: string; lost: number }[];
}

/** A region on one calendar made by joining several. */
export interface JoinedRegion extends DataRegion {
  join: JoinInfo;
}

/** The header of the joined region's date column. */
export const SHARED_DATE_HEADER = 'Shared date';

/** Whether a region came from a join. */
export function isJoined(region: DataRegion): region is JoinedRegion {
  return (region as Partial<JoinedRegion>).join !== undefined;
}

/** The calendars of a region: every date column with the price columns after it (none when it has fewer than two date columns). */
export function calendarsOf(region: DataRegion): CalendarColumns[] {
  const text = region.headers.map((_, j) => region.rows.map((row) => (row[j] === null || row[j] === undefined ? '' : String(row[j]))));
  const dates = findDateColumns(region.headers, text);
  if (dates.length < 2) return [];
  return dates.map((d, k) => {
    const next = dates[k + 1] ?? region.headers.length;
    return { date: d, series: Array.from({ length: next - d - 1 }, (_, i) => d + 1 + i) };
  });
}

/**
 * The region on the dates the named series share, or null when they sit on one calendar (then
 * the region is used as it is). Refuses a named column that belongs to no calendar.
 */
export function joinedRegionFor(region: DataRegion, names: readonly string[]): JoinedRegion | null {
  const calendars = calendarsOf(region);
  if (calendars.length === 0) return null;
  const where = `${region.sheet}!${region.address}`;
  const used = new Set<number>();
  for (const name of names) {
    const j = region.headers.indexOf(name);
    if (j < 0) throw new MooringInputError(`There is no column headed '${name}' in ${where}: pick one of ${region.headers.join(', ')}.`);
    const k = calendars.findIndex((c) => c.series.includes(j));
    if (k < 0) {
      if (calendars.some((c) => c.date === j)) throw new MooringInputError(`'${name}' is a date column of ${where}: pick columns of prices.`);
      throw new MooringInputError(`'${name}' sits left of the first date column of ${where}, so it has no dates of its own: put each price column to the right of its dates.`);
    }
    used.add(k);
  }
  if (used.size < 2) return null;
  const chosen = calendars.filter((_, k) => used.has(k));
  const sheetRow = (i: number) => region.firstDataRow + i;
  const ranges = chosen.map((c) => ({
    grid: region.rows.map((row) => [row[c.date], ...c.series.map((j) => row[j])]),
    name: `the dates in '${region.headers[c.date]}'`,
    series: c.series.map((j) => region.headers[j]),
    rowLabel: (i: number) => `${region.sheet} row ${sheetRow(i)}`,
  }));
  const join = joinDatedRanges(ranges);
  const headers = [SHARED_DATE_HEADER, ...join.series.map((s) => s.name)];
  const rows = join.rows.map((row, r) => [join.iso[r], ...row.slice(1).map((v) => (v === '' || v === undefined ? null : (v as DataRegion['rows'][number][number])))]);
  const rowLabels = join.sourceRows.map((at, r) => {
    const sheetRows = [...new Set(at.map(sheetRow))];
    return `${join.iso[r]} (${region.sheet} row${sheetRows.length === 1 ? '' : 's'} ${sheetRows.join(' and ')})`;
  });
  const n = rows.length;
  const lost = join.series.map((s) => ({ name: s.name, lost: s.lost }));
  const dateNames = chosen.map((c) => `'${region.headers[c.date]}'`);
  const notices = [
    `Joined on dates: the prices dated by ${dateNames.slice(0, -1).join(', ')} and ${dateNames[dateNames.length - 1]} share ${n} date${n === 1 ? '' : 's'}, ${join.iso[0]} to ${join.iso[n - 1]}; ${lost.map((l) => `${l.name} lost ${l.lost} of its row${l.lost === 1 ? '' : 's'}`).join(', ')}. Every test uses the shared dates only.`,
  ];
  return {
    sheet: region.sheet,
    address: region.address,
    headers,
    rows,
    dateColumn: 0,
    tableName: region.tableName,
    firstDataRow: 1,
    join: { source: region, calendars: chosen, notices, rowLabels, lost },
  };
}
