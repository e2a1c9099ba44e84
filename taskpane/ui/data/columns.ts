/**
 * What the columns of a detected region hold, so the first step can offer the columns of
 * prices and leave out the rest with a reason: a column counts as numbers when more than half
 * of its filled cells are numbers (the command line's rule), and a date column is never a
 * series (prices beside a second date column are joined on their dates: prepare-data.ts).
 */
import { headerNamesDate } from '../../../addin/csv/date-column';
import { calendarsOf } from '../../block/joined-region';
import type { DataRegion } from '../../workbook/port';

/** One column of the region as the first step offers it. */
export interface ColumnInfo {
  /** Index into the region's headers. */
  index: number;
  /** The header as the sheet has it (shown as text). */
  header: string;
  /** Filled cells below the header. */
  filled: number;
  /** Of those, cells holding numbers. */
  numbers: number;
  /** Whether the column can be a series. */
  usable: boolean;
  /** Why a column is not offered, in words; null when it is. */
  note: string | null;
}

/** The columns of a region, left to right, each with whether it can be a series. */
export function describeColumns(region: DataRegion): ColumnInfo[] {
  const dateColumns = new Set(calendarsOf(region).map((c) => c.date));
  return region.headers.map((raw, index) => {
    const header = String(raw ?? '').trim() || `column ${index + 1}`;
    let filled = 0;
    let numbers = 0;
    for (const row of region.rows) {
      const cell = row[index];
      if (cell === null || cell === undefined || cell === '') continue;
      filled++;
      if (typeof cell === 'number' && Number.isFinite(cell)) numbers++;
    }
    let note: string | null = null;
    if (index === region.dateColumn) note = 'the date column: it labels the rows';
    else if (dateColumns.has(index) || headerNamesDate(header)) note = 'another date column: prices to its right are joined with the others on the dates they share';
    else if (filled === 0) note = 'empty';
    else if (numbers * 2 <= filled) note = `mostly not numbers (${numbers} of ${filled} cells)`;
    return { index, header, filled, numbers, usable: note === null, note };
  });
}

/** The columns picked at first: the first two usable ones (the user adds more). */
export function defaultPick(columns: readonly ColumnInfo[]): number[] {
  return columns.filter((c) => c.usable).slice(0, 2).map((c) => c.index);
}
