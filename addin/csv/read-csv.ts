/**
 * Reads a comma-separated file into named text columns.
 *
 * Grammar: RFC 4180 (Shafranovich 2005): fields separated by commas, records by CRLF, a field
 * in double quotes may hold commas, line breaks and doubled quotes (""). Also accepted: LF or
 * a lone CR as the record break, a UTF-8 byte-order mark before the header (Excel writes one
 * when saving "CSV UTF-8"), and blank lines at the end of the file. A double quote inside an
 * unquoted field is kept as a character rather than refused, since hand-edited files have them.
 *
 * Everything else that does not fit is refused with the line number, counting the header as
 * line 1: a ragged record (more or fewer fields than the header), an interior empty line, a
 * quoted field that never closes, text after a closing quote.
 */
import { MooringInputError } from '../errors';
import { findDateColumn } from './date-column';

/** A CSV file as named text columns. */
export interface CsvTable {
  /** Column names from the header, trimmed; an empty name becomes "column N". */
  header: string[];
  /** The fields of each column, one per data record, as written (quotes removed). */
  columns: string[][];
  /** Name of the date column, or null when none was found. Never offered as a series. */
  dateColumn: string | null;
  /** Index of the date column in `header`, or -1. */
  dateIndex: number;
  /** The line on which each data record starts (the header is line 1). */
  lines: number[];
}

/** Parses CSV text; see the file comment for what is accepted and what is refused. */
export function readCsv(text: string): CsvTable {
  if (typeof text !== 'string') throw new MooringInputError('The CSV input is not text.');
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const { records, lines } = parseRecords(body);
  while (records.length > 0 && isBlankRecord(records[records.length - 1])) {
    records.pop();
    lines.pop();
  }
  if (records.length === 0) throw new MooringInputError('The file is empty: a CSV needs a header line and at least one line of data.');
  const rawHeader = records[0];
  if (rawHeader.length === 1 && (rawHeader[0].includes(';') || rawHeader[0].includes('\t'))) {
    const sep = rawHeader[0].includes(';') ? 'semicolons' : 'tabs';
    throw new MooringInputError(`Line 1 is separated by ${sep}, not commas: save the file as comma-separated values.`);
  }
  const header = rawHeader.map((h, j) => h.trim() || `column ${j + 1}`);
  const width = header.length;
  if (records.length === 1) throw new MooringInputError('The file has a header but no data lines: add the prices below the header.');

  let firstRagged = -1;
  let raggedCount = 0;
  for (let r = 1; r < records.length; r++) {
    if (records[r].length !== width) {
      if (firstRagged < 0) firstRagged = r;
      raggedCount++;
    }
  }
  if (firstRagged >= 0) {
    const rec = records[firstRagged];
    const more = raggedCount > 1 ? ` (${raggedCount - 1} more line${raggedCount === 2 ? ' also differs' : 's also differ'})` : '';
    const line = lines[firstRagged];
    if (width > 1 && isBlankRecord(rec)) {
      throw new MooringInputError(`Line ${line} is empty but lies between data lines${more}: delete it, or write the commas of a row left blank on purpose.`, `line ${line}`);
    }
    throw new MooringInputError(
      `Line ${line} has ${rec.length} field${rec.length === 1 ? '' : 's'} but the header has ${width}${more}: ` +
        'look for a missing or extra comma (text that contains commas must be in double quotes).', `line ${line}`);
  }

  const columns: string[][] = header.map(() => new Array<string>(records.length - 1));
  for (let r = 1; r < records.length; r++) {
    const rec = records[r];
    for (let j = 0; j < width; j++) columns[j][r - 1] = rec[j];
  }
  const dateIndex = findDateColumn(header, columns);
  return { header, columns, dateColumn: dateIndex >= 0 ? header[dateIndex] : null, dateIndex, lines: lines.slice(1) };
}

function isBlankRecord(rec: string[]): boolean {
  return rec.length === 1 && rec[0].trim() === '';
}

const QUOTE = 34;
const COMMA = 44;
const LF = 10;
const CR = 13;

/** Splits text into records of fields, with the starting line of each record. */
function parseRecords(text: string): { records: string[][]; lines: number[] } {
  const records: string[][] = [];
  const lines: number[] = [];
  const n = text.length;
  let i = 0;
  let line = 1;
  if (n === 0) return { records, lines };
  while (i <= n) {
    const fields: string[] = [];
    lines.push(line);
    for (;;) {
      if (i < n && text.charCodeAt(i) === QUOTE) {
        const openLine = line;
        let value = '';
        let from = ++i;
        for (;;) {
          if (i >= n) throw new MooringInputError(`Line ${openLine} opens a quoted field that never closes: add the closing double quote.`, `line ${openLine}`);
          const c = text.charCodeAt(i);
          if (c === QUOTE) {
            if (i + 1 < n && text.charCodeAt(i + 1) === QUOTE) {
              value += text.slice(from, i + 1);
              i += 2;
              from = i;
              continue;
            }
            value += text.slice(from, i);
            i++;
            break;
          }
          if (c === LF || (c === CR && text.charCodeAt(i + 1) !== LF)) line++;
          i++;
        }
        fields.push(value);
        if (i < n) {
          const c = text.charCodeAt(i);
          if (c !== COMMA && c !== LF && c !== CR) {
            throw new MooringInputError(`Line ${line} has text after the closing quote of field ${fields.length}: put the whole field inside the quotes.`, `line ${line}`);
          }
        }
      } else {
        const from = i;
        while (i < n) {
          const c = text.charCodeAt(i);
          if (c === COMMA || c === LF || c === CR) break;
          i++;
        }
        fields.push(text.slice(from, i));
      }
      if (i < n && text.charCodeAt(i) === COMMA) {
        i++;
        continue;
      }
      break;
    }
    records.push(fields);
    if (i >= n) break;
    // record break: CRLF, LF or CR
    if (text.charCodeAt(i) === CR && text.charCodeAt(i + 1) === LF) i += 2;
    else i++;
    line++;
    if (i >= n) break;
  }
  return { records, lines };
}
