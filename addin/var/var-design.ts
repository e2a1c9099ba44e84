/**
 * The regressors of a VAR and the checks on the block it is built from.
 *
 * Column order: the deterministic terms first (constant, then the trend), then lag 1 of every
 * variable, lag 2 of every variable, and so on. This is the row order of the reference library's
 * coefficient matrix, so a coefficient found here sits at the same row there, and the Wald
 * restrictions of the lead-lag tests can be written as plain row numbers.
 */
import { MooringInputError } from '../errors';

/** Deterministic terms of a VAR: a constant, or a constant and a linear trend. */
export type VarTrend = 'const' | 'const-trend';

/** The accepted trend words, for checks and messages. */
export const VAR_TRENDS: readonly VarTrend[] = ['const', 'const-trend'];

/** Number of deterministic columns for a trend choice. */
export function varTrendCount(trend: VarTrend): number {
  return trend === 'const' ? 1 : 2;
}

/**
 * Checks that every series is present, equally long and made of finite numbers, and copies it
 * into a Float64Array. Names are used in the messages; defaults are "series 1", "series 2", ...
 */
export function checkedBlock(block: readonly ArrayLike<number>[], names?: readonly string[]): Float64Array[] {
  if (!Array.isArray(block) || block.length === 0) {
    throw new MooringInputError('No series were given: pass one column of numbers per series.');
  }
  const nameOf = (k: number): string => names?.[k] ?? `series ${k + 1}`;
  const length = block[0]?.length ?? 0;
  return block.map((series, k) => {
    if (series === null || series === undefined || typeof series.length !== 'number') {
      throw new MooringInputError(`${nameOf(k)} is missing: pass a column of numbers.`);
    }
    if (series.length !== length) {
      throw new MooringInputError(
        `${nameOf(k)} has ${series.length} values but ${nameOf(0)} has ${length}: the series must cover the same rows (align them by date first).`,
      );
    }
    const out = new Float64Array(length);
    for (let i = 0; i < length; i++) {
      const v = series[i];
      if (typeof v !== 'number' || !Number.isFinite(v)) {
        throw new MooringInputError(
          `${nameOf(k)}, row ${i + 1}, is not a finite number (${String(v)}): clean the series first (drop or fill the gap).`,
          `row ${i + 1}`,
        );
      }
      out[i] = v;
    }
    return out;
  });
}

/** Checks that a lag count is a whole number in [min, max]; the message names the option. */
export function checkedLagCount(value: unknown, option: string, min = 0): number {
  if (typeof value !== 'number' || !Number.isInteger(value) || value < min) {
    throw new MooringInputError(`${option} must be a whole number of at least ${min}; got ${String(value)}.`);
  }
  return value;
}

/** x[t - lag] for t = start .. start + n - 1 (0-based rows of x). */
export function laggedColumn(x: ArrayLike<number>, lag: number, start: number, n: number): Float64Array {
  const out = new Float64Array(n);
  const from = start - lag;
  for (let i = 0; i < n; i++) out[i] = x[from + i];
  return out;
}

/** First differences x[t] - x[t-1], one value shorter than x. */
export function differences(x: ArrayLike<number>): Float64Array {
  const out = new Float64Array(Math.max(x.length - 1, 0));
  for (let i = 0; i < out.length; i++) out[i] = x[i + 1] - x[i];
  return out;
}

/** Responses and regressor columns of a VAR on one sample. */
export interface VarDesign {
  /** Responses, one per variable: y_k[t] for t = sampleStart .. T - 1. */
  responses: Float64Array[];
  /** Regressor columns in the order described at the top of this file. */
  columns: Float64Array[];
  /** A plain name for every column, for messages and tables. */
  columnNames: string[];
  nobs: number;
  deterministicCount: number;
}

/**
 * The VAR(lags) regression on rows sampleStart .. T - 1. The trend counts the rows of the whole
 * block from 1, so it means the same thing whatever the sample start (only the constant moves).
 */
export function varDesign(block: readonly Float64Array[], lags: number, trend: VarTrend, sampleStart: number, names: readonly string[]): VarDesign {
  const total = block[0].length;
  const n = total - sampleStart;
  const columns: Float64Array[] = [new Float64Array(n).fill(1)];
  const columnNames = ['constant'];
  if (trend === 'const-trend') {
    const t = new Float64Array(n);
    for (let i = 0; i < n; i++) t[i] = sampleStart + i + 1;
    columns.push(t);
    columnNames.push('trend');
  }
  for (let lag = 1; lag <= lags; lag++) {
    block.forEach((series, k) => {
      columns.push(laggedColumn(series, lag, sampleStart, n));
      columnNames.push(`${names[k]} lag ${lag}`);
    });
  }
  const responses = block.map((series) => series.slice(sampleStart));
  return { responses, columns, columnNames, nobs: n, deterministicCount: varTrendCount(trend) };
}

/** Row of the coefficient matrix that holds lag `lag` (1-based) of variable `variable` (0-based). */
export function varLagRow(deterministicCount: number, variables: number, variable: number, lag: number): number {
  return deterministicCount + (lag - 1) * variables + variable;
}
