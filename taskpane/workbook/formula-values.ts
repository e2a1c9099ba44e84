/**
 * What the in-memory workbook's formulas compute with: a scalar (number, text, logical, blank
 * or an error value), an array of scalars (what a range or a spilling function gives), or a
 * reference (a range not yet read, so ROWS and ROW can ask for its shape). Arithmetic on
 * arrays goes element by element, a single value or a single column stretched to fit, as in
 * Excel's dynamic arrays.
 */
import type { CellRange } from './a1-address';

/** Excel's error values that the block's formulas can meet. */
export type ErrorCode = '#VALUE!' | '#N/A' | '#REF!' | '#NAME?' | '#SPILL!' | '#DIV/0!' | '#CALC!' | '#NUM!';

/** An error value in a cell, with the message a custom function attached to it. */
export class FormulaError {
  constructor(readonly code: ErrorCode, readonly message: string = '') {}
}

/** One cell's worth. */
export type Scalar = number | string | boolean | null | FormulaError;

/** Rows of scalars. */
export type Grid = Scalar[][];

/** A range not yet read. */
export interface Reference {
  kind: 'ref';
  sheet: string;
  range: CellRange;
}

/** An array of values. */
export interface ArrayValue {
  kind: 'array';
  grid: Grid;
}

/** What any sub-expression evaluates to. */
export type Evaluated = Scalar | ArrayValue | Reference;

/** True for an array or a reference. */
export function isMulti(v: Evaluated): v is ArrayValue | Reference {
  return typeof v === 'object' && v !== null && !(v instanceof FormulaError);
}

/** An array value from a grid; a 1 x 1 grid stays an array (a function's spill of one cell). */
export function arrayOf(grid: Grid): ArrayValue {
  return { kind: 'array', grid };
}

/** The grid of an array, a read reference, or a scalar as 1 x 1. */
export function gridOf(v: Evaluated, read: (ref: Reference) => Grid): Grid {
  if (!isMulti(v)) return [[v]];
  return v.kind === 'array' ? v.grid : read(v);
}

/** A single value: a scalar as it is, the top-left of an array (Excel's implicit choice for one cell). */
export function scalarOf(v: Evaluated, read: (ref: Reference) => Grid): Scalar {
  if (!isMulti(v)) return v;
  const g = gridOf(v, read);
  return g.length > 0 && g[0].length > 0 ? g[0][0] : null;
}

/** Applies f element by element over arrays of matching shape (a 1 x 1, 1 x n or n x 1 one stretched). */
export function elementwise(values: Evaluated[], read: (ref: Reference) => Grid, f: (xs: Scalar[]) => Scalar): Evaluated {
  if (!values.some(isMulti)) return f(values as Scalar[]);
  const grids = values.map((v) => gridOf(v, read));
  const rows = Math.max(...grids.map((g) => g.length));
  const cols = Math.max(...grids.map((g) => (g[0] ?? []).length));
  const pick = (g: Grid, r: number, c: number): Scalar => {
    const rr = g.length === 1 ? 0 : r;
    const cc = (g[0] ?? []).length === 1 ? 0 : c;
    if (rr >= g.length || cc >= (g[rr] ?? []).length) return new FormulaError('#N/A', 'Arrays of different sizes were combined.');
    return g[rr][cc];
  };
  const out: Grid = [];
  for (let r = 0; r < rows; r++) {
    const row: Scalar[] = [];
    for (let c = 0; c < cols; c++) row.push(f(grids.map((g) => pick(g, r, c))));
    out.push(row);
  }
  return arrayOf(out);
}

/** The first error among the values, if any. */
export function firstError(xs: Scalar[]): FormulaError | null {
  for (const x of xs) if (x instanceof FormulaError) return x;
  return null;
}

/** A scalar as a number for arithmetic (blank 0, TRUE 1, numeric text read), or #VALUE!. */
export function toNumber(x: Scalar): number | FormulaError {
  if (x instanceof FormulaError) return x;
  if (x === null) return 0;
  if (typeof x === 'number') return x;
  if (typeof x === 'boolean') return x ? 1 : 0;
  const t = x.trim();
  const n = t === '' ? NaN : Number(t);
  return Number.isFinite(n) ? n : new FormulaError('#VALUE!', `'${x}' is text, not a number.`);
}

/** A scalar as text for &: numbers as Excel's general format would show them, roughly. */
export function toText(x: Scalar): string | FormulaError {
  if (x instanceof FormulaError) return x;
  if (x === null) return '';
  if (typeof x === 'boolean') return x ? 'TRUE' : 'FALSE';
  if (typeof x === 'number') return String(Number(x.toPrecision(15)));
  return x;
}

/** A scalar as a logical for IF, or #VALUE!. */
export function toBoolean(x: Scalar): boolean | FormulaError {
  if (x instanceof FormulaError) return x;
  if (typeof x === 'boolean') return x;
  if (x === null) return false;
  if (typeof x === 'number') return x !== 0;
  const t = x.toUpperCase();
  if (t === 'TRUE' || t === 'FALSE') return t === 'TRUE';
  return new FormulaError('#VALUE!', `'${x}' is text, not TRUE or FALSE.`);
}

/** Excel's comparison: numbers before text before logicals; text without case. */
export function compare(a: Scalar, b: Scalar): number {
  const rank = (x: Scalar) => (typeof x === 'number' || x === null ? 0 : typeof x === 'string' ? 1 : 2);
  const ra = rank(a);
  const rb = rank(b);
  if (ra !== rb) return ra - rb;
  if (ra === 0) return (a === null ? 0 : (a as number)) - (b === null ? 0 : (b as number));
  if (ra === 1) {
    const x = (a as string).toLowerCase();
    const y = (b as string).toLowerCase();
    return x < y ? -1 : x > y ? 1 : 0;
  }
  return Number(a) - Number(b);
}

/** The numbers among an aggregate's arguments: numbers in ranges and arrays; text, logicals and blanks there are skipped. */
export function numbersIn(grid: Grid): number[] | FormulaError {
  const out: number[] = [];
  for (const row of grid) {
    for (const x of row) {
      if (x instanceof FormulaError) return x;
      if (typeof x === 'number') out.push(x);
    }
  }
  return out;
}
