/**
 * The labelled rows of a result as a two-column block for a cell to spill: label, value.
 */
import type { TestResult } from '../../addin/result';
import { resultRows, type ResultRow, type RowExtras, type RowValue } from './result-rows';

/** Rows laid out as [label, value]. */
export function tableOf(rows: readonly ResultRow[]): RowValue[][] {
  return rows.map((row) => [row.label, row.value]);
}

/** A result as rows of [label, value], ending with the caution. */
export function resultTable(result: TestResult, extras: RowExtras = {}): RowValue[][] {
  return tableOf(resultRows(result, extras));
}
