/**
 * Reads a comma-separated file into named text columns. Semicolon- and tab-separated files are
 * read too (found from the header line, or forced), with decimal commas where the file uses
 * them (see dialect.ts); numbers are then rewritten with decimal points, so later steps see one
 * dialect, and the table carries a notice naming the dialect read.
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
import { decimalCommaField, describeDialect, findDialect, toPointDecimal, type CsvDialect, type DialectChoice } from './dialect';

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
  /** The field separator and decimal mark the file was read with. */
  dialect?: CsvDialect;
  /** What a reader should be told about how the file was read (a dialect other than commas and points). */
  notices?: string[];
  /** A label per data record, when the records came from several files (see addin/csv/dated-table.ts). */
  rowLabels?: string[];
}

/** Parses CSV text; see the file comment for what is accepted and what is refused. */
export function readCsv(text: string, choice: DialectChoice = {}): CsvTable {
  if (typeof text !== 'string') throw new MooringInputError('The CSV input is not text.');
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const dialect = findDialect(body, choice);
  const plain = plainColumns(body, dialect.delimiter.charCodeAt(0));
  if (plain !== null) return finishTable(plain.header, plain.columns, plain.lines, dialect);
  const { records, lines } = parseRecords(body, dialect.delimiter.charCodeAt(0));
  while (records.length > 0 && isBlankRecord(records[records.length - 1])) {
    records.pop();
    lines.pop();
  }
  if (records.length === 0) throw new MooringInputError('The file is empty: a CSV needs a header line and at least one line of data.');
  const rawHeader = records[0];
  if (dialect.delimiter === ',' && rawHeader.length === 1 && (rawHeader[0].includes(';') || rawHeader[0].includes('\t'))) {
    const sep = rawHeader[0].includes(';') ? 'semicolons' : 'tabs';
    throw new MooringInputError(`Line 1 is separated by ${sep}, not commas: give --delimiter ${sep === 'tabs' ? 'tab' : 'semicolon'}, or leave --delimiter out to have it found.`);
  }
  // A quoted header may hold line breaks; as a series name they would split report lines, so they become spaces.
  const header = rawHeader.map((h, j) => h.replace(/[\r\n\u2028\u2029]+/g, ' ').trim() || `column ${j + 1}`);
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
    const sep = dialect.delimiter === ',' ? 'comma' : dialect.delimiter === ';' ? 'semicolon' : 'tab';
    const split = dialect.delimiter === ',' && rec.length > width && rec.some((f, j) => j > 0 && /^\d+$/.test(f.trim()) && /\d$/.test(rec[j - 1].trim()));
    const hint = split
      ? 'the numbers look like decimal commas (such as 1,5) splitting the fields: save the file with semicolons between fields, or quote the numbers and give --decimal comma.'
      : `look for a missing or extra ${sep} (text that contains ${sep}s must be in double quotes).`;
    throw new MooringInputError(`Line ${line} has ${rec.length} field${rec.length === 1 ? '' : 's'} but the header has ${width}${more}: ${hint}`, `line ${line}`);
  }

  const columns: string[][] = header.map(() => new Array<string>(records.length - 1));
  for (let r = 1; r < records.length; r++) {
    const rec = records[r];
    for (let j = 0; j < width; j++) columns[j][r - 1] = rec[j];
  }
  return finishTable(header, columns, lines.slice(1), dialect);
}

/** The date column found, numbers rewritten to decimal points (or a decimal comma refused), the notices. */
function finishTable(header: string[], columns: string[][], dataLines: number[], dialect: CsvDialect): CsvTable {
  const dateIndex = findDateColumn(header, columns);
  columns.forEach((fields, j) => {
    if (j === dateIndex) return;
    if (dialect.decimal === ',') {
      for (let i = 0; i < fields.length; i++) fields[i] = toPointDecimal(fields[i]);
      return;
    }
    const at = fields.findIndex(decimalCommaField);
    if (at >= 0) {
      throw new MooringInputError(
        `Line ${dataLines[at]} of ${header[j]} holds '${fields[at].trim()}', a number with a decimal comma, in a file read with decimal points: ` +
          `give --decimal comma (and --delimiter semicolon if the fields are separated by semicolons), or save the file with decimal points.`, `line ${dataLines[at]}`);
    }
  });
  const notices = dialect.delimiter === ',' && dialect.decimal === '.' ? [] : [`Read as ${describeDialect(dialect)}${dialect.found ? ' (found from the file)' : ''}.`];
  return { header, columns, dateColumn: dateIndex >= 0 ? header[dateIndex] : null, dateIndex, lines: dataLines, dialect, notices };
}

/**
 * The common case read straight into columns, without a record object per line: no double quote
 * anywhere, at least two columns, every line with the header's number of fields, no empty line
 * (a trailing line break ends the last record). Anything else returns null and the full parser
 * reads the file, so every refusal and its message stays that parser's.
 */
function plainColumns(text: string, separator: number): { header: string[]; columns: string[][]; lines: number[] } | null {
  if (text.indexOf('"') >= 0) return null;
  const n = text.length;
  let end = 0;
  while (end < n && text.charCodeAt(end) !== LF && text.charCodeAt(end) !== CR) end++;
  const header = text.slice(0, end).split(String.fromCharCode(separator)).map((h, j) => h.replace(/[\u2028\u2029]+/g, ' ').trim() || `column ${j + 1}`);
  const width = header.length;
  if (width < 2) return null;
  const columns: string[][] = header.map(() => []);
  const lines: number[] = [];
  let i = end;
  let line = 1;
  for (;;) {
    // the record break: CRLF, LF or CR
    if (i >= n) break;
    if (text.charCodeAt(i) === CR && text.charCodeAt(i + 1) === LF) i += 2;
    else i++;
    line++;
    if (i >= n) break;
    lines.push(line);
    for (let j = 0; j < width; j++) {
      const from = i;
      let c = 0;
      while (i < n) {
        c = text.charCodeAt(i);
        if (c === separator || c === LF || c === CR) break;
        i++;
      }
      const last = j === width - 1;
      // A field count other than the header's (or an empty line) is left to the full parser.
      if (last ? i < n && c === separator : i >= n || c !== separator) return null;
      columns[j].push(text.slice(from, i));
      if (!last) i++;
    }
  }
  if (lines.length === 0) return null;
  return { header, columns, lines };
}

function isBlankRecord(rec: string[]): boolean {
  return rec.length === 1 && rec[0].trim() === '';
}

const QUOTE = 34;
const LF = 10;
const CR = 13;

/** Splits text into records of fields at the separator (a character code), with the starting line of each record. */
function parseRecords(text: string, separator: number): { records: string[][]; lines: number[] } {
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
          if (c !== separator && c !== LF && c !== CR) {
            throw new MooringInputError(`Line ${line} has text after the closing quote of field ${fields.length}: put the whole field inside the quotes.`, `line ${line}`);
          }
        }
      } else {
        const from = i;
        while (i < n) {
          const c = text.charCodeAt(i);
          if (c === separator || c === LF || c === CR) break;
          i++;
        }
        fields.push(text.slice(from, i));
      }
      if (i < n && text.charCodeAt(i) === separator) {
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
