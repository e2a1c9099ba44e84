/**
 * Finds the date columns of a CSV table. A column holds dates when its header is a date word
 * (date, time, datetime, timestamp, day, period; any case), when its header names a date
 * ("Trade Date", "date_utc", "Settlement day") and its fields read as dates, including
 * spreadsheet serial day numbers, or when its first filled fields are dates written as text
 * (2024-03-15, 15/03/2024, 3/15/2024, optionally with a time). The user may also name them
 * (--dates NAME). A date column labels rows, orders and joins them, and is never read as a
 * price. Year and quarter columns of plain numbers under other headers stay ordinary columns.
 */
import { MooringInputError } from '../errors';
import { looksLikeDateText } from '../dates/read-dates';

/** Header words that mark a date column (compared without case). */
export const DATE_HEADER_WORDS: readonly string[] = ['date', 'time', 'datetime', 'timestamp', 'day', 'period'];

/** An ISO 8601 calendar date, optionally followed by a time and a zone. */
const ISO_DATE = /^\d{4}-\d{2}-\d{2}([T ]\d{2}:\d{2}(:\d{2}(\.\d+)?)?(Z|[+-]\d{2}:?\d{2})?)?$/;

/** A spreadsheet serial day number (whole or with a time fraction). */
const SERIAL = /^\d{2,6}(\.\d+)?$/;

/** How many filled fields must look like dates for a column to count as dates by content. */
const SAMPLE = 3;

/** True when the text is an ISO 8601 date (with optional time). */
export function isIsoDate(text: string): boolean {
  return ISO_DATE.test(text.trim());
}

/** Whether a header names a date: one of its words is a date word, or it ends in "date". */
export function headerNamesDate(header: string): boolean {
  const words = header.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase().split(/[^a-z]+/).filter((w) => w !== '');
  return words.some((w) => DATE_HEADER_WORDS.includes(w) || w === 'dates') || /date$/i.test(header.trim());
}

function sampleOf(fields: readonly string[]): string[] {
  const out: string[] = [];
  for (const f of fields) {
    if (f.trim() === '') continue;
    out.push(f.trim());
    if (out.length === SAMPLE) break;
  }
  return out;
}

/** Whether the column counts as dates (see the file comment). */
function isDateColumn(header: string, fields: readonly string[]): boolean {
  if (DATE_HEADER_WORDS.includes(header.trim().toLowerCase())) return true;
  const sample = sampleOf(fields);
  if (sample.length === 0) return false;
  if (sample.every((t) => looksLikeDateText(t))) return true;
  return headerNamesDate(header) && fields.every((f) => f.trim() === '' || SERIAL.test(f.trim()) || looksLikeDateText(f));
}

/** Indices of every date column, in order; `named` (from --dates) are taken as dates whatever they hold. */
export function findDateColumns(header: readonly string[], columns: readonly (readonly string[])[], named: readonly string[] = []): number[] {
  const forced = named.map((name) => {
    let j = header.indexOf(name);
    if (j < 0) j = header.findIndex((h) => h.toLowerCase() === name.trim().toLowerCase());
    if (j < 0) throw new MooringInputError(`--dates names '${name}', but no column has that name; the columns are: ${header.join(', ')}.`);
    return j;
  });
  const found = header.flatMap((h, j) => (forced.includes(j) || isDateColumn(h, columns[j]) ? [j] : []));
  return found;
}

/** Index of the first date column, or -1. */
export function findDateColumn(header: readonly string[], columns: readonly (readonly string[])[]): number {
  const all = findDateColumns(header, columns);
  return all.length > 0 ? all[0] : -1;
}
