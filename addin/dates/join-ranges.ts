/**
 * Price histories as spreadsheet ranges (each a grid whose first column holds dates and whose
 * other columns hold prices) joined on the dates they share: the one route MOOR.COMMONDATES and
 * the pane take, so a block's formulas and the pane join the same cells to the same rows. Each
 * range is read as the command line reads a date column (spreadsheet day numbers or date text),
 * blank rows at its foot are left out, a newest-first range is put in date order, repeated or
 * shuffled dates are refused naming the row, and the ranges are joined by joinOnDates.
 */
import { isBlankCell } from '../series/cell-kinds';
import { MooringInputError } from '../errors';
import { dateDirection } from './date-order';
import { joinOnDates, type DatedGroup } from './join-on-dates';
import { readDateColumn } from './read-dates';

/** Days from 1970-01-01 to the spreadsheet's serial 0 (30 December 1899, the 1900 date system). */
const SERIAL_EPOCH = 25569;

/** One range to join. */
export interface DatedRange {
  /** The cells, row by row: dates in the first column, prices in the others. */
  grid: unknown;
  /** How messages name the range ("first", "'Date B' and its prices"). */
  name: string;
  /** Names of its price columns (default "<name> column 2", ...). */
  series?: readonly string[];
  /** How messages name its row i (0-based; default "<name> row i+1"). */
  rowLabel?: (i: number) => string;
}

/** The ranges on the dates they share. */
export interface JoinedRanges {
  /** One row per shared date, oldest first: the date (a day number when the first range held day numbers, else ISO text), then every price column. */
  rows: unknown[][];
  /** ISO text of each row's date. */
  iso: string[];
  /** The price columns in order, each with the rows of its own range that the join left out. */
  series: { name: string; source: string; lost: number }[];
  /** For each joined row and each range, the 0-based row of that range's grid it came from. */
  sourceRows: number[][];
}

interface Calendar {
  group: DatedGroup<unknown>;
  serial: boolean;
  iso: string[];
  /** Grid row of each calendar row (after ordering). */
  gridRows: number[];
}

function calendarOf(range: DatedRange): Calendar {
  const { grid: raw, name } = range;
  if (!Array.isArray(raw) || raw.length === 0 || !Array.isArray(raw[0])) {
    throw new MooringInputError(`${name} is not a range: select the dates in its first column and the prices beside them.`);
  }
  const grid = raw as unknown[][];
  const width = grid[0].length;
  if (width < 2) throw new MooringInputError(`${name} has one column: put the dates in the first column and the prices beside them.`);
  let end = grid.length;
  while (end > 0 && grid[end - 1].every((c) => isBlankCell(c))) end--;
  const rows = grid.slice(0, end);
  if (rows.length === 0) throw new MooringInputError(`${name} is empty: select the dates and the prices.`);
  const label = range.rowLabel ?? ((i: number) => `${name} row ${i + 1}`);
  const fields = rows.map((r) => (r[0] === null || r[0] === undefined ? '' : String(r[0])));
  const serial = rows.some((r) => typeof r[0] === 'number');
  const dates = readDateColumn(fields, { serial, name, rowLabel: label, orderHint: 'write them as dates the sheet understands' });
  let order = rows.map((_, i) => i);
  if (dateDirection(dates.days, (i) => `${label(i)} (${dates.iso[i]})`, name) === 'newest first') order = order.reverse();
  const series = Array.from({ length: width - 1 }, (_, j) => ({ name: range.series?.[j] ?? `${name} column ${j + 2}`, cells: order.map((i) => rows[i][j + 1]) }));
  return { group: { source: name, days: order.map((i) => dates.days[i]), series }, serial, iso: order.map((i) => dates.iso[i]), gridRows: order };
}

/** The inner join of the ranges on their dates; `fillForward` as in joinOnDates. */
export function joinDatedRanges(ranges: readonly DatedRange[], fillForward = 0): JoinedRanges {
  const calendars = ranges.map(calendarOf);
  const join = joinOnDates(calendars.map((c) => c.group), fillForward);
  const serial = calendars[0].serial;
  const iso = join.days.map((day, r) => {
    const k = Math.max(0, calendars.findIndex((c, g) => c.group.days[join.sourceRows[r][g]] === day));
    return calendars[k].iso[join.sourceRows[r][k]];
  });
  const rows = join.days.map((day, r) => {
    const date = serial ? Math.round((day + SERIAL_EPOCH) * 1e6) / 1e6 : iso[r];
    return [date, ...join.series.map((s) => (isBlankCell(s.cells[r]) ? '' : s.cells[r]))];
  });
  return {
    rows,
    iso,
    series: join.series.map((s) => ({ name: s.name, source: s.source, lost: s.lost })),
    sourceRows: join.sourceRows.map((row) => row.map((at, g) => calendars[g].gridRows[at])),
  };
}
