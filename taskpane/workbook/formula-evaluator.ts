/**
 * Evaluates a parsed formula against a workbook that can read cells, follow a spill (J3#) and
 * find a table's columns. Operators follow Excel: arithmetic and comparisons go element by
 * element over arrays, an error in an operand is the result, text joins with &.
 */
import { parseRange, type CellRange } from './a1-address';
import { callFunction } from './formula-functions';
import type { FormulaNode } from './formula-parser';
import {
  FormulaError,
  compare,
  elementwise,
  firstError,
  toNumber,
  toText,
  type Evaluated,
  type Grid,
  type Reference,
  type Scalar,
} from './formula-values';

/** What the evaluator needs from the workbook. */
export interface FormulaWorld {
  /** Sheet of the formula being evaluated (references without a sheet are on it). */
  sheet: string;
  /** Whether a sheet of this name exists. */
  hasSheet(sheet: string): boolean;
  /** The values of a range, formulas evaluated and spills filled in. */
  read(ref: Reference): Grid;
  /** The whole spilled result of the formula anchored at this cell, or #REF! when it holds none. */
  spill(sheet: string, row: number, col: number): Evaluated;
  /** The data rows of a run of a table's columns, or an error naming what is missing. */
  tableColumns(table: string, first: string, last: string): Reference | FormulaError;
}

function arithmetic(op: string, a: Scalar, b: Scalar): Scalar {
  const x = toNumber(a);
  const y = toNumber(b);
  const bad = firstError([x, y]);
  if (bad) return bad;
  const p = x as number;
  const q = y as number;
  switch (op) {
    case '+':
      return p + q;
    case '-':
      return p - q;
    case '*':
      return p * q;
    default:
      return q === 0 ? new FormulaError('#DIV/0!') : p / q;
  }
}

function comparison(op: string, a: Scalar, b: Scalar): Scalar {
  const bad = firstError([a, b]);
  if (bad) return bad;
  const c = compare(a, b);
  switch (op) {
    case '=':
      return c === 0;
    case '<>':
      return c !== 0;
    case '<':
      return c < 0;
    case '>':
      return c > 0;
    case '<=':
      return c <= 0;
    default:
      return c >= 0;
  }
}

function binary(op: string, a: Scalar, b: Scalar): Scalar {
  if (op === '&') {
    const x = toText(a);
    const y = toText(b);
    const bad = firstError([x, y]);
    return bad ?? (x as string) + (y as string);
  }
  if (['+', '-', '*', '/'].includes(op)) return arithmetic(op, a, b);
  return comparison(op, a, b);
}

/** Evaluates a node; references stay references until an operator or function reads them. */
export function evaluate(node: FormulaNode, world: FormulaWorld): Evaluated {
  switch (node.kind) {
    case 'number':
    case 'text':
    case 'boolean':
      return node.value;
    case 'range': {
      const sheet = node.sheet ?? world.sheet;
      if (!world.hasSheet(sheet)) return new FormulaError('#REF!', `There is no sheet named ${sheet}.`);
      const range: CellRange = parseRange(node.address);
      if (node.spill) return world.spill(sheet, range.top, range.left);
      return { kind: 'ref', sheet, range };
    }
    case 'column':
      return world.tableColumns(node.table, node.first, node.last);
    case 'unary': {
      const v = evaluate(node.arg, world);
      return node.op === '+' ? v : elementwise([v], (r) => world.read(r), ([x]) => arithmetic('*', x, -1));
    }
    case 'binary': {
      const a = evaluate(node.left, world);
      const b = evaluate(node.right, world);
      return elementwise([a, b], (r) => world.read(r), ([x, y]) => binary(node.op, x, y));
    }
    case 'call':
      return callFunction(node.name, {
        args: node.args.map((a) => (a === null ? undefined : evaluate(a, world))),
        read: (r) => world.read(r),
      });
  }
}
