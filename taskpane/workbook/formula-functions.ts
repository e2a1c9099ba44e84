/**
 * The functions the in-memory workbook can evaluate: every MOOR.* custom function, called
 * through the very implementations functions/functions.ts registers with Excel (so a test
 * of the block exercises the same code a user's cell runs), and the handful of Excel
 * built-ins the results block uses (IF, ISNUMBER, NA, ABS, AVERAGE, STDEV.S, COUNT, ROWS,
 * ROW, INDEX, HSTACK, CHOOSECOLS, ISNA, MATCH). Any other name is #NAME?, as in Excel for an unknown function.
 */
import { screenCell } from '../../functions/analyses/screen-cells';
import { answer } from '../../functions/cells/answer';
import * as registered from '../../functions/functions';
import {
  FormulaError,
  arrayOf,
  elementwise,
  firstError,
  gridOf,
  isMulti,
  numbersIn,
  scalarOf,
  toBoolean,
  toNumber,
  type Evaluated,
  type Grid,
  type Reference,
  type Scalar,
} from './formula-values';

/** What a function sees: its evaluated arguments (null for one left out) and a way to read a reference. */
export interface CallContext {
  args: (Evaluated | undefined)[];
  read: (ref: Reference) => Grid;
}

type Builtin = (call: CallContext) => Evaluated;

/** A cell as a custom function receives it: blanks null, errors as objects carrying their code. */
function forCustomFunction(v: Evaluated | undefined, read: (ref: Reference) => Grid): unknown {
  if (v === undefined) return null;
  if (!isMulti(v)) return v;
  return gridOf(v, read).map((row) => row.map((x) => (x === '' ? null : x)));
}

/** A custom function's thrown error as the cell's error value. */
function errorValue(e: unknown): FormulaError {
  const o = e as { code?: unknown; message?: unknown };
  const code = o && (o.code === '#N/A' || o.code === '#VALUE!') ? o.code : '#VALUE!';
  return new FormulaError(code, typeof o?.message === 'string' ? o.message : String(e));
}

/** A custom function's answer: a matrix becomes an array (it spills), anything else a scalar. */
function fromCustomFunction(out: unknown): Evaluated {
  if (Array.isArray(out)) return arrayOf(out.map((row: unknown[]) => row.map((x) => x as Scalar)));
  return out as Scalar;
}

/** MOOR.<ID> for every function exported by functions/functions.ts (ids are the upper-cased export names). */
const MOOR_FUNCTIONS: Record<string, (...args: unknown[]) => unknown> = Object.fromEntries(
  Object.entries(registered)
    .filter(([, f]) => typeof f === 'function')
    .map(([name, f]) => [`MOOR.${name.toUpperCase()}`, f as (...args: unknown[]) => unknown]),
);
// This evaluator is synchronous, so MOOR.SCREEN runs on this thread here even where the browser has
// Web Workers (the registered function would answer with a Promise); the cells are the same either
// way (tests/screen/screen-in-workers.test.ts, tests/e2e/screen-workers.e2e.test.ts).
MOOR_FUNCTIONS['MOOR.SCREEN'] = (block, alpha, show, prep) => answer(() => screenCell(block, alpha, show, prep));

function callMoor(name: string, call: CallContext): Evaluated {
  const f = MOOR_FUNCTIONS[name];
  try {
    return fromCustomFunction(f(...call.args.map((a) => forCustomFunction(a, call.read))));
  } catch (e) {
    return errorValue(e);
  }
}

function arg(call: CallContext, i: number): Evaluated {
  return call.args[i] ?? null;
}

function aggregate(call: CallContext, f: (xs: number[]) => Scalar): Scalar {
  const all: number[] = [];
  for (const a of call.args) {
    if (a === undefined) continue;
    const xs = numbersIn(gridOf(a, call.read));
    if (xs instanceof FormulaError) return xs;
    for (const x of xs) all.push(x); // not push(...xs): a column of a million cells would overflow the call stack
  }
  return f(all);
}

function mean(xs: number[]): number {
  return xs.reduce((s, x) => s + x, 0) / xs.length;
}

const BUILTINS: Record<string, Builtin> = {
  IF: (call) =>
    elementwise([arg(call, 0), arg(call, 1), call.args[2] === undefined ? false : arg(call, 2)], call.read, ([c, a, b]) => {
      const t = toBoolean(c);
      return t instanceof FormulaError ? t : t ? a : b;
    }),
  ISNUMBER: (call) => elementwise([arg(call, 0)], call.read, ([x]) => typeof x === 'number'),
  ISNA: (call) => elementwise([arg(call, 0)], call.read, ([x]) => x instanceof FormulaError && x.code === '#N/A'),
  NA: () => new FormulaError('#N/A'),
  ABS: (call) =>
    elementwise([arg(call, 0)], call.read, ([x]) => {
      const n = toNumber(x);
      return n instanceof FormulaError ? n : Math.abs(n);
    }),
  AVERAGE: (call) => aggregate(call, (xs) => (xs.length === 0 ? new FormulaError('#DIV/0!') : mean(xs))),
  'STDEV.S': (call) =>
    aggregate(call, (xs) => {
      if (xs.length < 2) return new FormulaError('#DIV/0!');
      const m = mean(xs);
      return Math.sqrt(xs.reduce((s, x) => s + (x - m) ** 2, 0) / (xs.length - 1));
    }),
  COUNT: (call) => aggregate(call, (xs) => xs.length),
  ROWS: (call) => {
    const a = arg(call, 0);
    if (a instanceof FormulaError) return a;
    if (isMulti(a) && a.kind === 'ref') return a.range.bottom - a.range.top + 1;
    return gridOf(a, call.read).length;
  },
  ROW: (call) => {
    const a = arg(call, 0);
    if (!isMulti(a) || a.kind !== 'ref') return new FormulaError('#VALUE!', 'ROW needs a reference.');
    const rows: Grid = [];
    for (let r = a.range.top; r <= a.range.bottom; r++) rows.push([r + 1]);
    return rows.length === 1 ? rows[0][0] : arrayOf(rows);
  },
  INDEX: (call) => {
    if (arg(call, 0) instanceof FormulaError) return arg(call, 0);
    const grid = gridOf(arg(call, 0), call.read);
    const r = toNumber(scalarOf(arg(call, 1), call.read));
    const c = call.args[2] === undefined ? 1 : toNumber(scalarOf(arg(call, 2), call.read));
    const bad = firstError([r, c]);
    if (bad) return bad;
    const row = grid[(r as number) - 1];
    if (!Number.isInteger(r) || !Number.isInteger(c) || row === undefined || (c as number) < 1 || (c as number) > row.length) {
      return new FormulaError('#REF!', 'INDEX points outside the array.');
    }
    return row[(c as number) - 1];
  },
  // MATCH(value, array, 0): the position of the first exact match (the block looks for TRUE in ISNUMBER(...)).
  MATCH: (call) => {
    const want = scalarOf(arg(call, 0), call.read);
    const mode = call.args[2] === undefined ? 1 : toNumber(scalarOf(arg(call, 2), call.read));
    if (want instanceof FormulaError) return want;
    if (mode !== 0) return new FormulaError('#N/A', 'The in-memory workbook evaluates MATCH with match type 0 only.');
    const cells = gridOf(arg(call, 1), call.read).flat();
    const k = cells.findIndex((x) => x === want);
    return k < 0 ? new FormulaError('#N/A', 'MATCH found no such value.') : k + 1;
  },
  // CHOOSECOLS(array, k, ...): the k-th columns of the array, in the order given (negative k counts from the right).
  CHOOSECOLS: (call) => {
    if (arg(call, 0) instanceof FormulaError) return arg(call, 0);
    const grid = gridOf(arg(call, 0), call.read);
    const width = grid[0]?.length ?? 0;
    const picks: number[] = [];
    for (let i = 1; i < call.args.length; i++) {
      const k = toNumber(scalarOf(arg(call, i), call.read));
      if (k instanceof FormulaError) return k;
      const at = k < 0 ? width + k + 1 : k;
      if (!Number.isInteger(k) || at < 1 || at > width) return new FormulaError('#VALUE!', 'CHOOSECOLS asks for a column outside the array.');
      picks.push(at - 1);
    }
    if (picks.length === 0) return new FormulaError('#VALUE!', 'CHOOSECOLS needs at least one column number.');
    return arrayOf(grid.map((row) => picks.map((c) => row[c])));
  },
  HSTACK: (call) => {
    const grids = call.args.map((a) => gridOf(a ?? null, call.read));
    const rows = Math.max(...grids.map((g) => g.length));
    const out: Grid = [];
    for (let r = 0; r < rows; r++) out.push(grids.flatMap((g) => g[r] ?? g[0].map(() => new FormulaError('#N/A'))));
    return arrayOf(out);
  },
};

/** Calls a function by its upper-case name. */
export function callFunction(name: string, call: CallContext): Evaluated {
  if (name in MOOR_FUNCTIONS) return callMoor(name, call);
  const builtin = BUILTINS[name];
  if (!builtin) return new FormulaError('#NAME?', `${name} is not a function the in-memory workbook knows.`);
  return builtin(call);
}

/** The names the in-memory workbook evaluates (for messages and tests). */
export function knownFunctions(): string[] {
  return [...Object.keys(MOOR_FUNCTIONS), ...Object.keys(BUILTINS)].sort();
}
