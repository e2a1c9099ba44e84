/**
 * What a spreadsheet cell holds, as far as a price series is concerned, and how to name it
 * in a message. Cells arrive the way Excel and the custom-functions runtime hand them over:
 * numbers, '' / null / undefined for blanks, text, booleans, and error values (as strings
 * like '#N/A' from range reads, or as objects from the custom-functions runtime).
 *
 * Only the slow path lives here: the cleaner handles finite numbers inline and calls these
 * helpers for everything else, so a column of numbers costs no calls at all.
 */

/** The kinds of cell the cleaner tells apart. */
export type CellKind = 'number' | 'blank' | 'nonfinite' | 'numericText' | 'text' | 'boolean' | 'error' | 'other';

/** Excel's error values, as range reads and CSV exports spell them. */
export const ERROR_CODES: ReadonlySet<string> = new Set([
  '#N/A', '#DIV/0!', '#VALUE!', '#REF!', '#NUM!', '#NAME?', '#NULL!',
  '#SPILL!', '#CALC!', '#FIELD!', '#BLOCKED!', '#CONNECT!', '#BUSY!', '#UNKNOWN!',
  '#GETTING_DATA', '#N/A!',
]);

/** Error type names of the runtime's error objects (both the custom-functions and the cell-value spellings), by code. */
const ERROR_TYPE_CODES: Readonly<Record<string, string>> = {
  notavailable: '#N/A', divisionbyzero: '#DIV/0!', div0: '#DIV/0!', invalidvalue: '#VALUE!', value: '#VALUE!',
  invalidreference: '#REF!', ref: '#REF!', invalidnumber: '#NUM!', num: '#NUM!', invalidname: '#NAME?', name: '#NAME?',
  nullreference: '#NULL!', null: '#NULL!', spill: '#SPILL!', calc: '#CALC!', busy: '#BUSY!', gettingdata: '#GETTING_DATA',
};

/**
 * True for a blank cell: undefined, null, the empty string, or a string of spaces only.
 * Written for speed: the empty-string and nullish checks come first, since the cleaner runs
 * this over up to a million trailing cells.
 */
export function isBlankCell(cell: unknown): boolean {
  if (cell === '' || cell === null || cell === undefined) return true;
  if (typeof cell !== 'string') return false;
  for (let i = 0; i < cell.length; i++) {
    const c = cell.charCodeAt(i);
    // space, tab, no-break space; anything else is content
    if (c !== 32 && c !== 9 && c !== 160) return false;
  }
  return true;
}

/** Decimal number grammar accepted in text: optional sign, digits with an optional point, optional exponent. */
const DECIMAL_TEXT = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/** The number a text holds when it is a plain decimal (surrounding spaces allowed), else null. */
export function decimalTextValue(text: string): number | null {
  const t = text.trim();
  if (!DECIMAL_TEXT.test(t)) return null;
  const v = Number(t);
  return Number.isFinite(v) ? v : null;
}

/**
 * The error code of an error cell ('#N/A', '#DIV/0!', ...), or null when the cell is no error.
 * Accepts the string spellings, Error instances, and objects shaped like the runtime's error
 * values ({ code: '#N/A' }, { type: 'Error', errorType: 'NotAvailable' }, { errorCode: ... }).
 */
export function errorCodeOf(cell: unknown): string | null {
  if (typeof cell === 'string') {
    const t = cell.trim().toUpperCase();
    return t.charCodeAt(0) === 35 /* # */ && ERROR_CODES.has(t) ? t : null;
  }
  if (cell === null || typeof cell !== 'object') return null;
  const o = cell as Record<string, unknown>;
  for (const key of ['code', 'errorCode', 'value']) {
    const v = o[key];
    if (typeof v === 'string' && ERROR_CODES.has(v.trim().toUpperCase())) return v.trim().toUpperCase();
  }
  if (typeof o.errorType === 'string') return ERROR_TYPE_CODES[o.errorType.toLowerCase()] ?? `#${o.errorType.toUpperCase()}`;
  if (typeof o.type === 'string' && o.type.toLowerCase() === 'error') return '#ERROR';
  if (cell instanceof Error) return '#ERROR';
  return null;
}

/** Classifies one cell. */
export function cellKind(cell: unknown): CellKind {
  if (typeof cell === 'number') return Number.isFinite(cell) ? 'number' : 'nonfinite';
  if (isBlankCell(cell)) return 'blank';
  if (typeof cell === 'boolean') return 'boolean';
  if (errorCodeOf(cell) !== null) return 'error';
  if (typeof cell === 'string') return decimalTextValue(cell) !== null ? 'numericText' : 'text';
  return 'other';
}

/** Longest stretch of a text quoted in a message. */
const QUOTE_LIMIT = 40;

/** A cell's content in words for a message: "text 'n/a'", "the error #N/A", "the logical value TRUE". */
export function describeCell(cell: unknown): string {
  switch (cellKind(cell)) {
    case 'number':
      return `the number ${String(cell)}`;
    case 'nonfinite':
      return Number.isNaN(cell) ? 'not a number (NaN)' : `${String(cell)} (not a finite number)`;
    case 'blank':
      return 'blank';
    case 'boolean':
      return `the logical value ${cell ? 'TRUE' : 'FALSE'}`;
    case 'error':
      return `the error ${errorCodeOf(cell)}`;
    case 'numericText':
      return `the number ${quote(String(cell).trim())} stored as text`;
    case 'text':
      return `text ${quote(String(cell))}`;
    default:
      return `a value of type ${Array.isArray(cell) ? 'array' : typeof cell}, not a number`;
  }
}

function quote(text: string): string {
  const t = text.length > QUOTE_LIMIT ? `${text.slice(0, QUOTE_LIMIT - 1)}…` : text;
  return `'${t}'`;
}
