/**
 * Finds the date column of a CSV table, if it has one: the first column whose header is a
 * date word (date, time, datetime, timestamp, day, period; any case) or whose first filled
 * fields are ISO 8601 dates (2024-03-15, optionally with a time). At most one column is the
 * date column; it labels rows in messages and reports and is never read as numbers.
 * Year and quarter columns holding plain numbers are not dates: they stay ordinary columns.
 */

/** Header words that mark a date column (compared without case). */
export const DATE_HEADER_WORDS: readonly string[] = ['date', 'time', 'datetime', 'timestamp', 'day', 'period'];

/** An ISO 8601 calendar date, optionally followed by a time and a zone. */
const ISO_DATE = /^\d{4}-\d{2}-\d{2}([T ]\d{2}:\d{2}(:\d{2}(\.\d+)?)?(Z|[+-]\d{2}:?\d{2})?)?$/;

/** How many filled fields must look like ISO dates for a column to count as dates. */
const SAMPLE = 3;

/** True when the text is an ISO 8601 date (with optional time). */
export function isIsoDate(text: string): boolean {
  return ISO_DATE.test(text.trim());
}

/** Index of the date column, or -1. */
export function findDateColumn(header: readonly string[], columns: readonly (readonly string[])[]): number {
  for (let j = 0; j < header.length; j++) {
    if (DATE_HEADER_WORDS.includes(header[j].trim().toLowerCase())) return j;
  }
  for (let j = 0; j < columns.length; j++) {
    let seen = 0;
    let dates = 0;
    for (const field of columns[j]) {
      if (field.trim() === '') continue;
      seen++;
      if (isIsoDate(field)) dates++;
      if (seen === SAMPLE) break;
    }
    if (seen > 0 && dates === seen) return j;
  }
  return -1;
}
