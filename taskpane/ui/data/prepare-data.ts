/**
 * From the detected region and the first step's choices to the engine's input: the chosen
 * columns go through the shared series cleaner together (so their rows line up), dates come
 * from the date column, and the sample window is turned from the dates (or sheet rows) the
 * user typed into positions among the cleaned rows. Every refusal is the engine's
 * MooringInputError, whose message the pane shows as it is.
 */
import { windowFromBounds } from '../../../addin/dates/date-window';
import { MooringInputError } from '../../../addin/errors';
import type { DiagnosticOptions } from '../../../addin/report/check-input';
import { prepareDiagnosticInput, type DiagnosticInput } from '../../../addin/report/prepare-input';
import type { DroppedRow } from '../../../addin/report/report-types';
import { dateDirection } from '../../../addin/dates/date-order';
import { isoDayNumber } from '../../../addin/dates/read-dates';
import { cleanBlock } from '../../../addin/series/clean-block';
import { AS_GIVEN, describePreparation, windowPositions, type Preparation } from '../../../addin/series/preparation';
import type { DataRegion } from '../../workbook/port';
import { isJoined, joinedRegionFor } from '../../block/joined-region';
import { describeColumns } from './columns';
import { dateCellText } from './excel-date';

/** The first step's choices. */
export interface DataChoice {
  /** Indices into the region's headers of the series to compare. */
  columns: number[];
  /** Take natural logs of the prices. */
  log: boolean;
  /** Drop blank or text cells inside a series (listed) instead of refusing them. */
  skipGaps: boolean;
  /** First date (or sheet row, without dates) of the sample, as typed; null or '' for the start. */
  from: string | null;
  /** Last date (or sheet row) of the sample; null or '' for the end. */
  to: string | null;
  /** Level of every decision. */
  alpha: number;
}

/** The engine's input and what the first step reports about it. */
export interface PreparedData {
  input: DiagnosticInput;
  /** The window among the cleaned rows, for the engine's options; undefined for all rows. */
  window: DiagnosticOptions['window'];
  /** Data rows in the region (below the header). */
  regionRows: number;
  /** Rows the cleaned series share, before the window. */
  cleanRows: number;
  /** Rows inside the window: what the diagnosis uses. */
  usedRows: number;
  /** First and last row used, as labels ("row 5 (2022-01-03)"). */
  firstUsed: string;
  lastUsed: string;
  /** Cells dropped by the cleaner, with their reasons. */
  dropped: DroppedRow[];
  /** Rows left out by the window. */
  outsideWindow: number;
  /** Names of the series, as the headers have them. */
  names: string[];
  /**
   * The choices as one preparation (logs, gaps, the window as rows of the region), the value
   * the results block hands to every formula; its text goes to the engine with the options.
   */
  prep: Preparation;
  /** The preparation in words ("log, skip gaps, from row 260"). */
  prepText: string;
  /**
   * The region the analysis reads: the detected one, or, when the chosen series sit on several
   * calendars (a date column each), those calendars joined on their dates (joined-region.ts).
   * Rows and the window count in this region.
   */
  region: DataRegion;
}

/**
 * Cleans the chosen columns of the region and cuts the sample window. Series chosen from
 * several calendars are first joined on their dates, and the join is said in the notices.
 */
export function prepareData(sheetRegion: DataRegion, sheetChoice: DataChoice): PreparedData {
  if (sheetChoice.columns.length < 2) {
    throw new MooringInputError('Choose at least two series: the diagnosis compares prices in pairs.');
  }
  const sheetColumns = describeColumns(sheetRegion);
  const chosenNames = sheetChoice.columns.map((j) => sheetColumns[j]?.header ?? `column ${j + 1}`);
  const joined = joinedRegionFor(sheetRegion, chosenNames);
  const region = joined ?? sheetRegion;
  const choice = joined ? { ...sheetChoice, columns: chosenNames.map((n) => joined.headers.indexOf(n)) } : sheetChoice;
  const columns = joined ? joined.headers.map((header, index) => ({ index, header })) : sheetColumns;
  const names = choice.columns.map((j) => columns[j]?.header ?? `column ${j + 1}`);
  const n = region.rows.length;
  const first = region.firstDataRow;
  const sheetDates = region.dateColumn === null ? null : region.rows.map((row) => dateCellText(row[region.dateColumn as number] ?? null));
  const sheetLabel = (i: number): string => {
    if (isJoined(region)) return `shared date ${region.join.rowLabels[i]}`;
    return sheetDates?.[i] ? `row ${first + i} (${sheetDates[i]})` : `row ${first + i}`;
  };
  // Rows that run newest first are read bottom up, so every test sees them oldest first; the
  // preparation says so ("newest first") and the block's formulas read them the same way.
  const newestFirst = runsNewestFirst(sheetDates, sheetLabel, region);
  const sheetIndex = (i: number): number => (newestFirst ? n - 1 - i : i);
  const inTimeOrder = <T>(xs: T[]): T[] => (newestFirst ? xs.slice().reverse() : xs);
  const cells = choice.columns.map((j) => inTimeOrder(region.rows.map((row) => row[j] ?? null)));
  const dates = sheetDates && inTimeOrder(sheetDates);
  const label = (i: number): string => sheetLabel(sheetIndex(i));
  const block = cleanBlock(cells, names, { log: choice.log, skipGaps: choice.skipGaps, firstRow: first, rowLabel: label });
  const input = prepareDiagnosticInput(block, {
    dateOf: (i) => dates?.[i] ?? null,
    source: `${region.sheet}!${region.address}`,
  });
  if (newestFirst) input.notices = [`The rows of ${region.sheet}!${region.address} run newest first; Mooring reads them oldest first.`];
  if (isJoined(region)) input.notices = region.join.notices.slice();
  const timeRows = Array.from(block[0].rows);
  const range = windowFromBounds({ from: choice.from, to: choice.to }, timeRows, dates, first);
  // The window as rows of the region (positions from the top), read back through the one
  // window rule every formula uses.
  const firstIn = range && range.start > 0 ? sheetIndex(timeRows[range.start]) + 1 : null;
  const lastIn = range && range.end < timeRows.length ? sheetIndex(timeRows[range.end - 1]) + 1 : null;
  const prep: Preparation = {
    ...AS_GIVEN,
    log: choice.log,
    skipGaps: choice.skipGaps,
    newestFirst,
    fromRow: newestFirst ? lastIn : firstIn,
    toRow: newestFirst ? firstIn : lastIn,
  };
  const sourceRows = timeRows.map(sheetIndex);
  const { start, end } = newestFirst
    ? reversedWindow(windowPositions(sourceRows.slice().reverse(), prep, 1), sourceRows.length)
    : windowPositions(sourceRows, prep, 1);
  const window = start === 0 && end === sourceRows.length ? undefined : { start, end };
  return {
    input,
    window,
    regionRows: region.rows.length,
    cleanRows: sourceRows.length,
    usedRows: end - start,
    firstUsed: sheetLabel(sourceRows[start]),
    lastUsed: sheetLabel(sourceRows[end - 1]),
    dropped: input.dropped ?? [],
    outsideWindow: sourceRows.length - (end - start),
    names,
    prep,
    prepText: describePreparation(prep),
    region,
  };
}

/** Whether the region's dates run newest first (repeated or shuffled dates are refused, naming the rows). */
function runsNewestFirst(dates: (string | null)[] | null, label: (i: number) => string, region: DataRegion): boolean {
  if (!dates) return false;
  const known: number[] = [];
  const at: number[] = [];
  dates.forEach((d, i) => {
    const day = d ? isoDayNumber(d) : null;
    if (day !== null) {
      known.push(day);
      at.push(i);
    }
  });
  return dateDirection(known, (k) => label(at[k]), `${region.sheet}!${region.address}`) === 'newest first';
}

/** A window over positions in sheet order, as positions in time order. */
function reversedWindow(w: { start: number; end: number }, n: number): { start: number; end: number } {
  return { start: n - w.end, end: n - w.start };
}
