/**
 * The view of "Choose prices": where the data were found (sheet, range, table), its header
 * row and date column, the columns that can be series (and why the others cannot), and how
 * many rows the choices leave, which were dropped and why. Built from the detected region
 * and the prepared input before any test runs, so the user sees the sample first.
 */
import { calendarsOf } from '../../block/joined-region';
import type { DataRegion } from '../../workbook/port';
import type { ColumnInfo } from '../data/columns';
import type { PreparedData } from '../data/prepare-data';
import { dateCellText } from '../data/excel-date';

/** One column offered as a series, or shown as left out. */
export interface ColumnChoiceView {
  index: number;
  header: string;
  usable: boolean;
  picked: boolean;
  note: string | null;
}

/** The data step's view. */
export interface DataStepView {
  /** "Found a table 'Prices' on Sheet1, A1:G781." */
  found: string;
  dateColumn: string;
  columns: ColumnChoiceView[];
  /** Rows used, in one sentence; null when the input could not be prepared. */
  rowsSentence: string | null;
  /** One line per dropped cell: series, row, reason. */
  dropped: string[];
  /** The refusal to show, when the choices do not make a valid input. */
  problem: string | null;
  /** Whether the run can start. */
  ready: boolean;
  /** Placeholder texts for the window inputs: the first and last date (or sheet row). */
  firstKey: string;
  lastKey: string;
}

/** How many dropped cells are listed before "and N more". */
export const DROPPED_LISTED = 20;

/** The data step's view of a region, the columns picked and the prepared data (or the refusal). */
export function dataStepView(region: DataRegion, columns: readonly ColumnInfo[], picked: readonly number[], prepared: PreparedData | null, problem: string | null): DataStepView {
  const where = `${region.sheet}, ${region.address}`;
  const found = region.tableName ? `Found the table '${region.tableName}' on ${where}.` : `Found a block of cells on ${where} (not a table).`;
  const calendars = calendarsOf(region);
  const dateColumn = calendars.length > 1
    ? `Dates from the columns ${calendars.map((c) => `'${columns[c.date]?.header ?? ''}'`).join(', ')}: each dates the prices to its right, and prices on different dates are joined on the dates they share.`
    : region.dateColumn === null ? 'No date column: rows are named by their sheet row.' : `Dates from the column '${columns[region.dateColumn]?.header ?? ''}'.`;
  const dropped = prepared ? prepared.dropped.map((d) => `${d.series}, ${d.row}: ${d.reason}`) : [];
  const shown = dropped.length > DROPPED_LISTED ? [...dropped.slice(0, DROPPED_LISTED), `and ${dropped.length - DROPPED_LISTED} more`] : dropped;
  let rowsSentence: string | null = null;
  if (prepared) {
    const parts = [`${prepared.usedRows} of ${prepared.regionRows} rows used, ${prepared.firstUsed} to ${prepared.lastUsed}.`];
    const gaps = prepared.regionRows - prepared.cleanRows;
    if (gaps > 0) parts.push(`${gaps} row${gaps === 1 ? '' : 's'} left out (a gap in a series, or blank at the ends).`);
    if (prepared.outsideWindow > 0) parts.push(`${prepared.outsideWindow} row${prepared.outsideWindow === 1 ? '' : 's'} outside the sample window.`);
    if (prepared.dropped.length > 0) parts.push(`${prepared.dropped.length} cell${prepared.dropped.length === 1 ? '' : 's'} dropped (listed below).`);
    rowsSentence = parts.join(' ');
  }
  const firstDate = firstOrLast(region, 'first');
  const lastDate = firstOrLast(region, 'last');
  return {
    found,
    dateColumn,
    columns: columns.map((c) => ({ index: c.index, header: c.header, usable: c.usable, picked: picked.includes(c.index), note: c.note })),
    rowsSentence,
    dropped: shown,
    problem,
    ready: prepared !== null && problem === null,
    firstKey: firstDate,
    lastKey: lastDate,
  };
}

function firstOrLast(region: DataRegion, which: 'first' | 'last'): string {
  const n = region.rows.length;
  if (region.dateColumn === null) return String(which === 'first' ? region.firstDataRow : region.firstDataRow + n - 1);
  const j = region.dateColumn;
  const order = which === 'first' ? region.rows : [...region.rows].reverse();
  for (const row of order) {
    const cell = row[j];
    const text = dateCellText(cell ?? null);
    if (text !== null) return text;
  }
  return '';
}
