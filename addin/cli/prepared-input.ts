/**
 * The rows every command of the command line works on, prepared once before the command
 * runs: the files read (dialect found or forced), their dates read and put in date order,
 * several calendars joined on their dates (addin/csv/dated-table.ts), and the --from/--to
 * window cut through the same function the pane uses (addin/dates/date-window.ts). The
 * spacing of the dates, found once here, is the unit of every half-life, lag and window.
 */
import { datedTable, type SourceTable } from '../csv/dated-table';
import type { CsvTable } from '../csv/read-csv';
import { windowFromBounds } from '../dates/date-window';
import { MooringInputError } from '../errors';
import { rowPeriod, type RowPeriod } from '../report/row-period';
import { AS_GIVEN, describePreparation } from '../series/preparation';
import type { ParsedArguments } from './arguments';
import { choiceValue, wholeNumberValue } from './option-values';

/** The table a command receives, and what was done to reach it. */
export interface PreparedInput {
  table: CsvTable;
  notices: string[];
  period: RowPeriod;
  /** The window as the shared preparation words ("from row 261, to row 520"); '' for all rows. */
  window: string;
}

/** Reads the date, calendar and window options and prepares the rows (see the file comment). */
export function preparedInput(sources: readonly SourceTable[], args: ParsedArguments): PreparedInput {
  const dates = args.values.get('dates')?.split(',').map((s) => s.trim()).filter((s) => s !== '');
  const dateOrder = choiceValue('date-order', args.values.get('date-order'), ['dmy', 'mdy'] as const);
  const fillForward = wholeNumberValue('fill-forward', args.values.get('fill-forward'), 'rows') ?? 0;
  const prepared = datedTable(sources, { dates, dateOrder, fillForward });
  if (fillForward > 0 && sources.length === 1 && !prepared.table.rowLabels) {
    throw new MooringInputError('--fill-forward carries prices over missing dates when calendars are joined: give several files, or a file with several date columns.');
  }
  let table = prepared.table;
  const notices = prepared.notices.slice();
  const from = args.values.get('from') ?? null;
  const to = args.values.get('to') ?? null;
  let window = '';
  if (from !== null || to !== null) {
    if (!prepared.dated) {
      throw new MooringInputError(`--from and --to need dates, and ${sources.map((s) => s.file).join(', ')} has no date column that reads as dates: name it with --dates NAME.`);
    }
    const dateTexts = table.columns[table.dateIndex];
    const all = dateTexts.map((_, i) => i);
    const range = windowFromBounds({ from, to }, all, dateTexts, 1, { first: '--from: the', last: '--to: the' });
    if (range) {
      const { start, end } = range;
      window = describePreparation({ ...AS_GIVEN, fromRow: start > 0 ? start + 1 : null, toRow: end < all.length ? end : null });
      table = sliceTable(table, start, end);
      notices.push(`Window ${from ?? 'from the start'}${to ? ` to ${to}` : ' to the end'}: ${end - start} rows, ${dateTexts[start]} to ${dateTexts[end - 1]} (rows ${start + 1} to ${end} of the dated rows).`);
    }
  }
  const period = rowPeriod(prepared.dated ? table.columns[table.dateIndex] : null);
  return { table, notices, period, window };
}

/** The table's rows [start, end). */
function sliceTable(table: CsvTable, start: number, end: number): CsvTable {
  return {
    ...table,
    columns: table.columns.map((c) => c.slice(start, end)),
    lines: table.lines.slice(start, end),
    rowLabels: table.rowLabels?.slice(start, end),
  };
}
