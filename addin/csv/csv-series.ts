/**
 * Picks series out of a CSV table by header name and runs them through the shared cleaner.
 * CSV fields are all text, so plain decimal fields become numbers here, before the cleaner
 * sees them; anything else stays text and meets the cleaner's rules (a gap, or refused).
 * Messages name rows by their CSV line (header = line 1), with the date where there is one.
 */
import { MooringInputError } from '../errors';
import { decimalTextValue } from '../series/cell-kinds';
import { cleanBlock } from '../series/clean-block';
import { cleanSeries, type CleanOptions, type CleanSeries } from '../series/clean-series';
import type { CsvTable } from './read-csv';

/** How CSV input lets a user skip gaps: the command line's option, named in the cleaner's messages. */
export const CSV_SKIP_GAPS_WORDS = 'give --skip-gaps';

/** Options for a CSV series: the cleaner's, less the naming and labelling the table supplies. */
export type CsvSeriesOptions = Omit<CleanOptions, 'name' | 'rowLabel' | 'firstRow'>;

/** The names a user may pick as series: every column but the date column. */
export function seriesNames(csv: CsvTable): string[] {
  return csv.header.filter((_, j) => j !== csv.dateIndex);
}

/**
 * Index of the column with this name: an exact match first, else the one match ignoring case.
 * Unknown or ambiguous names, and the date column, are refused with the available names.
 */
export function findColumn(csv: CsvTable, name: string): number {
  const available = `the series are: ${seriesNames(csv).join(', ')}`;
  let hits = csv.header.flatMap((h, j) => (h === name ? [j] : []));
  if (hits.length === 0) {
    const lower = name.trim().toLowerCase();
    hits = csv.header.flatMap((h, j) => (h.toLowerCase() === lower ? [j] : []));
  }
  if (hits.length === 0) throw new MooringInputError(`No column is named '${name}'; ${available}.`);
  if (hits.length > 1) {
    throw new MooringInputError(`${hits.length} columns are named '${csv.header[hits[0]]}' (columns ${hits.map((j) => j + 1).join(' and ')}): rename them so each is unique.`);
  }
  if (hits[0] === csv.dateIndex) throw new MooringInputError(`'${csv.header[hits[0]]}' is the date column, not a series; ${available}.`);
  return hits[0];
}

/** The row label of data record `index`: "line 37", or "line 37 (2024-03-15)" when there is a date column. */
export function csvRowLabel(csv: CsvTable): (index: number) => string {
  const labels = csv.rowLabels;
  if (labels) return (index: number) => labels[index] ?? `row ${index + 1}`;
  const dates = csv.dateIndex >= 0 ? csv.columns[csv.dateIndex] : null;
  return (index: number) => {
    const line = `line ${csv.lines[index] ?? index + 2}`;
    const date = dates?.[index]?.trim();
    return date ? `${line} (${date})` : line;
  };
}

/** Text that spells a non-finite number: NaN, Inf, Infinity (any case and sign). */
const NON_FINITE_TEXT = /^[+-]?(nan|inf|infinity)$/i;

/**
 * The fields of a column as cells: '' for blank, numbers for plain decimals, text otherwise.
 * "NaN" and "Infinity" become those numbers, so the cleaner's one rule for them applies (refused
 * even when gaps are skipped: they come from a calculation gone wrong, not a missing price).
 */
export function csvCells(fields: readonly string[]): unknown[] {
  const cells = new Array<unknown>(fields.length);
  for (let i = 0; i < fields.length; i++) {
    const f = fields[i];
    const v = decimalTextValue(f);
    const t = f.trim();
    cells[i] = v !== null ? v : t === '' ? '' : NON_FINITE_TEXT.test(t) ? nonFinite(t) : t;
  }
  return cells;
}

function nonFinite(text: string): number {
  const t = text.toLowerCase();
  return t.includes('nan') ? NaN : t.startsWith('-') ? -Infinity : Infinity;
}

/** One series of the table, by header name, cleaned. */
export function csvSeries(csv: CsvTable, name: string, options: CsvSeriesOptions = {}): CleanSeries {
  const j = findColumn(csv, name);
  return cleanSeries(csvCells(csv.columns[j]), { skipGapsWords: CSV_SKIP_GAPS_WORDS, ...options, name: csv.header[j], rowLabel: csvRowLabel(csv) });
}

/** Several series of the table, by header name, cleaned and aligned by row (see cleanBlock). */
export function csvBlock(csv: CsvTable, names: readonly string[], options: CsvSeriesOptions = {}): CleanSeries[] {
  const indices = names.map((n) => findColumn(csv, n));
  const rowLabel = csvRowLabel(csv);
  return cleanBlock(indices.map((j) => csvCells(csv.columns[j])), indices.map((j) => csv.header[j]), { skipGapsWords: CSV_SKIP_GAPS_WORDS, ...options, rowLabel });
}
