/**
 * The dialect of a delimited text file: what separates fields (comma, semicolon or tab) and
 * what marks decimals (point or comma). Much of Europe exports spreadsheets with semicolons
 * between fields and decimal commas, since the comma is the decimal mark there. Found from the
 * file unless the user says: the separator from the header line (the one of the three that
 * occurs most often outside quotes; commas on a tie), the decimal mark from the numbers (comma
 * when the separator is not a comma and a number is written with a decimal comma).
 */
import { MooringInputError } from '../errors';

/** Separator and decimal mark. */
export interface CsvDialect {
  delimiter: ',' | ';' | '\t';
  decimal: '.' | ',';
  /** True when found from the file rather than given. */
  found: boolean;
}

/** What a user may force. */
export interface DialectChoice {
  delimiter?: ',' | ';' | '\t';
  decimal?: '.' | ',';
}

/** A number with a decimal comma, optionally with points between thousands: 1,5 or 1.234,56. */
const DECIMAL_COMMA = /^[+-]?(\d{1,3}(\.\d{3})+|\d+),\d+([eE][+-]?\d+)?$/;
/** A whole number with points between thousands: 1.234.567 (decimal-comma files only). */
const THOUSANDS = /^[+-]?\d{1,3}(\.\d{3})+$/;

/** Whether a field is a number written with a decimal comma. */
export function decimalCommaField(field: string): boolean {
  return DECIMAL_COMMA.test(field.trim());
}

/** A field of a decimal-comma file with a decimal point instead (other text unchanged). */
export function toPointDecimal(field: string): string {
  const t = field.trim();
  if (DECIMAL_COMMA.test(t)) return t.replace(/\./g, '').replace(',', '.');
  if (THOUSANDS.test(t)) return t.replace(/\./g, '');
  return field;
}

/** The dialect in words: "semicolon-separated values with decimal commas". */
export function describeDialect(d: CsvDialect): string {
  const sep = d.delimiter === ',' ? 'comma' : d.delimiter === ';' ? 'semicolon' : 'tab';
  return `${sep}-separated values with decimal ${d.decimal === ',' ? 'commas' : 'points'}`;
}

/** The dialect of the text: the choices given, the rest found from the file. */
export function findDialect(text: string, choice: DialectChoice = {}): CsvDialect {
  const delimiter = choice.delimiter ?? separatorOf(firstLine(text));
  // A decimal comma with comma separators is allowed: the numbers are then quoted ("1,5").
  if (choice.decimal !== undefined) {
    return { delimiter, decimal: choice.decimal, found: choice.delimiter === undefined };
  }
  const decimal = delimiter !== ',' && hasDecimalComma(text, delimiter) ? ',' : '.';
  return { delimiter, decimal, found: true };
}

/** Reads --delimiter's word. */
export function delimiterChoice(word: string | undefined, option = '--delimiter'): CsvDialect['delimiter'] | undefined {
  if (word === undefined) return undefined;
  const w = word.trim().toLowerCase();
  if (w === ',' || w === 'comma') return ',';
  if (w === ';' || w === 'semicolon') return ';';
  if (w === 'tab' || w === '\\t' || w === '\t') return '\t';
  throw new MooringInputError(`${option} must be comma, semicolon or tab, not '${word}'.`);
}

/** Reads --decimal's word. */
export function decimalChoice(word: string | undefined, option = '--decimal'): CsvDialect['decimal'] | undefined {
  if (word === undefined) return undefined;
  const w = word.trim().toLowerCase();
  if (w === '.' || w === 'point' || w === 'dot') return '.';
  if (w === ',' || w === 'comma') return ',';
  throw new MooringInputError(`${option} must be point or comma, not '${word}'.`);
}

function firstLine(text: string): string {
  const end = text.search(/[\r\n]/);
  return end < 0 ? text : text.slice(0, end);
}

/** The separator occurring most often outside double quotes in the line; commas on a tie. */
function separatorOf(line: string): CsvDialect['delimiter'] {
  const counts = { ',': 0, ';': 0, '\t': 0 };
  let quoted = false;
  for (const c of line) {
    if (c === '"') quoted = !quoted;
    else if (!quoted && (c === ',' || c === ';' || c === '\t')) counts[c]++;
  }
  if (counts[';'] > counts[','] && counts[';'] >= counts['\t']) return ';';
  if (counts['\t'] > counts[',']) return '\t';
  return ',';
}

/** Whether any field of the first lines (up to 200) is a number with a decimal comma. */
function hasDecimalComma(text: string, delimiter: string): boolean {
  const lines = text.split(/\r\n|\n|\r/, 201).slice(1);
  return lines.some((l) => l.split(delimiter).some((f) => decimalCommaField(f.replace(/^"|"$/g, ''))));
}
