/**
 * MOOR.COMMONDATES: price histories kept on different calendars (two vendors, two exchanges),
 * each a range whose first column holds dates and whose other columns hold prices, joined on
 * the dates they share (nest it for a third) and spilled as one block: the dates, then every price column, one row
 * per shared date, oldest first. The other MOOR functions then read the block's columns as
 * series on one calendar. The engine's rules apply: dates are read as the command line reads
 * them (spreadsheet day numbers or date text), newest-first ranges are put in date order,
 * repeated or shuffled dates are refused naming the row, and a price may be carried forward
 * over at most `fillForward` missing dates of its own range.
 */
import { dateDirection } from '../../addin/dates/date-order';
import { joinOnDates, type DatedGroup } from '../../addin/dates/join-on-dates';
import { readDateColumn } from '../../addin/dates/read-dates';
import { MooringInputError } from '../../addin/errors';
import { isBlankCell } from '../../addin/series/cell-kinds';
import { wholeNumber } from '../options/option-values';

/** Days from 1970-01-01 to the spreadsheet's serial 0 (30 December 1899, the 1900 date system). */
const SERIAL_EPOCH = 25569;

interface Calendar {
  group: DatedGroup<unknown>;
  /** Whether the dates arrived as spreadsheet day numbers (then they are spilled as numbers). */
  serial: boolean;
  iso: string[];
}

function calendarOf(range: unknown, name: string): Calendar {
  if (!Array.isArray(range) || range.length === 0 || !Array.isArray(range[0])) {
    throw new MooringInputError(`${name} is not a range: select the dates in its first column and the prices beside them.`);
  }
  const grid = range as unknown[][];
  const width = grid[0].length;
  if (width < 2) throw new MooringInputError(`${name} has one column: put the dates in the first column and the prices beside them.`);
  let end = grid.length;
  while (end > 0 && grid[end - 1].every((c) => isBlankCell(c))) end--;
  const rows = grid.slice(0, end);
  if (rows.length === 0) throw new MooringInputError(`${name} is empty: select the dates and the prices.`);
  const label = (i: number) => `${name} row ${i + 1}`;
  const fields = rows.map((r) => (r[0] === null || r[0] === undefined ? '' : String(r[0])));
  const serial = rows.some((r) => typeof r[0] === 'number');
  const dates = readDateColumn(fields, { serial, name, rowLabel: label, orderHint: 'write them as dates the sheet understands' });
  let order = rows.map((_, i) => i);
  if (dateDirection(dates.days, (i) => `${label(i)} (${dates.iso[i]})`, name) === 'newest first') order = order.reverse();
  const series = Array.from({ length: width - 1 }, (_, j) => ({ name: `${name} column ${j + 2}`, cells: order.map((i) => rows[i][j + 1]) }));
  return { group: { source: name, days: order.map((i) => dates.days[i]), series }, serial, iso: order.map((i) => dates.iso[i]) };
}

/** The joined block: dates (as day numbers when they came as day numbers), then every price column. */
export function commonDatesCell(first: unknown, second: unknown, fillForward?: unknown): unknown[][] {
  const calendars = [calendarOf(first, 'first'), calendarOf(second, 'second')];
  const carry = wholeNumber('fillforward', fillForward, 0, 'missing dates to carry a price over');
  const join = joinOnDates(calendars.map((c) => c.group), carry);
  const serial = calendars[0].serial;
  return join.days.map((day, r) => {
    const date = serial ? Math.round((day + SERIAL_EPOCH) * 1e6) / 1e6 : isoOf(calendars, join.sourceRows[r], day);
    return [date, ...join.series.map((s) => (isBlankCell(s.cells[r]) ? '' : s.cells[r]))];
  });
}

function isoOf(calendars: Calendar[], row: number[], day: number): string {
  const k = calendars.findIndex((c, g) => c.group.days[row[g]] === day);
  return calendars[Math.max(0, k)].iso[row[Math.max(0, k)]];
}
