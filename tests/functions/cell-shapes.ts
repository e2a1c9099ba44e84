/**
 * Inputs shaped the way Excel hands them to a custom function (a range is rows of cells;
 * "Custom functions parameter options", Range parameters), and a check of the cell error a
 * call ends in. CustomFunctions is not loaded under Node, so errors are CellErrors carrying
 * the code the cell would show.
 */
import { expect } from 'vitest';
import { CellError } from '../../functions/cells/cell-error';

/** Rows in a whole-column reference such as B:B. */
export const SHEET_ROWS = 1_048_576;

/** A column range: one cell per row. */
export function column(values: readonly unknown[]): unknown[][] {
  return values.map((v) => [v]);
}

/** A row range: one row of cells. */
export function row(values: readonly unknown[]): unknown[][] {
  return [values.slice()];
}

/** A block of columns side by side (shorter columns padded with blanks). */
export function block(columns: readonly (readonly unknown[])[], blank: unknown = null): unknown[][] {
  const height = Math.max(...columns.map((c) => c.length));
  return Array.from({ length: height }, (_, i) => columns.map((c) => (i < c.length ? c[i] : blank)));
}

/** A whole-column reference: the values at the top, then blanks down to row 1,048,576. */
export function wholeColumn(values: readonly unknown[], blank: unknown = null): unknown[][] {
  const out = new Array<unknown[]>(SHEET_ROWS);
  for (let i = 0; i < SHEET_ROWS; i++) out[i] = [i < values.length ? values[i] : blank];
  return out;
}

/** The error a call throws, checked to be a cell error with the given code; returns its message. */
export function cellErrorOf(call: () => unknown, code: '#VALUE!' | '#N/A'): string {
  let thrown: unknown;
  try {
    call();
  } catch (e) {
    thrown = e;
  }
  expect(thrown, 'the call should end in a cell error').toBeInstanceOf(CellError);
  expect((thrown as CellError).code).toBe(code);
  return (thrown as CellError).message;
}

/** The single number of a 1 x 1 answer. */
export function only(answer: unknown): unknown {
  expect(Array.isArray(answer) && answer.length === 1 && Array.isArray(answer[0]) && answer[0].length === 1, 'a 1 x 1 answer').toBe(true);
  return (answer as unknown[][])[0][0];
}

/** The value beside a label in a two-column "all" table. */
export function tableValue(table: unknown, label: string | RegExp): unknown {
  const rows = table as unknown[][];
  const hit = rows.find((r) => (typeof label === 'string' ? r[0] === label : label.test(String(r[0]))));
  if (!hit) throw new Error(`no row labelled ${String(label)} (labels: ${rows.map((r) => r[0]).join(' | ')})`);
  return hit[1];
}
