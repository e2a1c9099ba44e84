/**
 * A1 addresses: column letters, cells and rectangular ranges, as the port and both adapters
 * spell them. "B2", "$B$2", "B2:H781" and "Prices!B2:H781" (a sheet name in single quotes when
 * it holds anything but letters, digits and underscores, a quote inside doubled) are read;
 * ranges are written without dollar signs unless asked for.
 */

/** A cell position, 0-based row and column. */
export interface CellPosition {
  row: number;
  col: number;
}

/** A rectangle of cells, 0-based and inclusive at both ends. */
export interface CellRange {
  top: number;
  left: number;
  bottom: number;
  right: number;
}

/** Excel's last column (XFD) and row, 0-based. */
export const MAX_COL = 16383;
export const MAX_ROW = 1048575;

/** "A" for 0, "Z" for 25, "AA" for 26. */
export function columnLetters(col: number): string {
  if (!Number.isInteger(col) || col < 0 || col > MAX_COL) throw new RangeError(`Column ${col + 1} is outside the sheet.`);
  let out = '';
  let n = col + 1;
  while (n > 0) {
    const r = (n - 1) % 26;
    out = String.fromCharCode(65 + r) + out;
    n = Math.floor((n - 1) / 26);
  }
  return out;
}

/** 0 for "A", 26 for "AA"; case-insensitive. */
export function columnIndex(letters: string): number {
  let n = 0;
  for (const ch of letters.toUpperCase()) n = n * 26 + (ch.charCodeAt(0) - 64);
  return n - 1;
}

const CELL = /^\$?([A-Za-z]{1,3})\$?(\d{1,7})$/;

/** Reads "B2" or "$B$2"; throws on anything else. */
export function parseCell(text: string): CellPosition {
  const m = CELL.exec(text.trim());
  if (!m) throw new RangeError(`'${text}' is not a cell address such as B2.`);
  const pos = { row: Number(m[2]) - 1, col: columnIndex(m[1]) };
  if (pos.row < 0 || pos.row > MAX_ROW || pos.col > MAX_COL) throw new RangeError(`'${text}' is outside the sheet.`);
  return pos;
}

/** "B2" (or "$B$2" when absolute). */
export function cellAddress(pos: CellPosition, absolute = false): string {
  const d = absolute ? '$' : '';
  return `${d}${columnLetters(pos.col)}${d}${pos.row + 1}`;
}

/** Splits "Sheet!B2:C3" into its sheet (unquoted) and the address, or null sheet when none is given. */
export function splitSheet(text: string): { sheet: string | null; address: string } {
  const bang = text.lastIndexOf('!');
  if (bang < 0) return { sheet: null, address: text };
  let sheet = text.slice(0, bang);
  if (sheet.startsWith("'") && sheet.endsWith("'")) sheet = sheet.slice(1, -1).replace(/''/g, "'");
  return { sheet, address: text.slice(bang + 1) };
}

/** Reads "B2:H781" or a single cell "B2" (sheet prefix allowed and ignored). */
export function parseRange(text: string): CellRange {
  const { address } = splitSheet(text);
  const [a, b] = address.split(':');
  const p = parseCell(a);
  const q = b === undefined ? p : parseCell(b);
  return { top: Math.min(p.row, q.row), left: Math.min(p.col, q.col), bottom: Math.max(p.row, q.row), right: Math.max(p.col, q.col) };
}

/** "B2:H781", or "B2" for a single cell. */
export function rangeAddress(r: CellRange, absolute = false): string {
  const a = cellAddress({ row: r.top, col: r.left }, absolute);
  if (r.top === r.bottom && r.left === r.right) return a;
  return `${a}:${cellAddress({ row: r.bottom, col: r.right }, absolute)}`;
}

/** The sheet name as a formula must write it: bare when plain, else in single quotes. */
export function quoteSheet(sheet: string): string {
  return /^[A-Za-z_][A-Za-z0-9_]*$/.test(sheet) && !CELL.test(sheet) ? sheet : `'${sheet.replace(/'/g, "''")}'`;
}

/** "Prices!$B$2:$B$781": a sheet-qualified address. */
export function qualified(sheet: string, r: CellRange, absolute = true): string {
  return `${quoteSheet(sheet)}!${rangeAddress(r, absolute)}`;
}

/** Rows and columns of a range. */
export function rangeSize(r: CellRange): { rows: number; cols: number } {
  return { rows: r.bottom - r.top + 1, cols: r.right - r.left + 1 };
}

/** Whether two ranges share a cell. */
export function overlaps(a: CellRange, b: CellRange): boolean {
  return a.left <= b.right && b.left <= a.right && a.top <= b.bottom && b.top <= a.bottom;
}

/** Every cell address of a range, row by row. */
export function cellsOf(r: CellRange): string[] {
  const out: string[] = [];
  for (let row = r.top; row <= r.bottom; row++) for (let col = r.left; col <= r.right; col++) out.push(cellAddress({ row, col }));
  return out;
}
