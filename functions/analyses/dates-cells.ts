/**
 * MOOR.COMMONDATES: price histories kept on different calendars (two vendors, two exchanges),
 * each a range whose first column holds dates and whose other columns hold prices, joined on
 * the dates they share (nest it for a third) and spilled as one block: the dates, then every price column, one row
 * per shared date, oldest first. The other MOOR functions then read the block's columns as
 * series on one calendar. The engine's rules apply: dates are read as the command line reads
 * them (spreadsheet day numbers or date text), newest-first ranges are put in date order,
 * repeated or shuffled dates are refused naming the row, and a price may be carried forward
 * over at most `fillForward` missing dates of its own range. The reading and the join live in
 * addin/dates/join-ranges.ts, which the pane uses too.
 */
import { joinDatedRanges } from '../../addin/dates/join-ranges';
import { wholeNumber } from '../options/option-values';

/** The joined block: dates (as day numbers when they came as day numbers), then every price column. */
export function commonDatesCell(first: unknown, second: unknown, fillForward?: unknown): unknown[][] {
  const carry = wholeNumber('fillforward', fillForward, 0, 'missing dates to carry a price over');
  return joinDatedRanges([{ grid: first, name: 'first' }, { grid: second, name: 'second' }], carry).rows;
}
