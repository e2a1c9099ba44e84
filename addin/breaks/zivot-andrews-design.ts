/**
 * The regression behind the Zivot & Andrews (1992) test, with p lagged changes and a break
 * after observation TB (0-based indexes into the series x of T values):
 *   Δx_t = a x_{t-1} + sum_{i=1..p} c_i Δx_{t-i} + m + b t [+ θ DU_t] [+ γ DT_t] + e_t,
 *   DU_t = 1 for t > TB, DT_t = t - TB for t > TB (both 0 before),
 * for t = p+1 .. T-1 (T - 1 - p rows). The paper's model A adds DU ('level'), model B adds
 * DT ('slope'), model C adds both ('both'); constant and trend are in all three (Zivot &
 * Andrews 1992, eqs. 1-3 in their regression form).
 *
 * Candidate dates follow the reference library so break dates compare exactly: with
 * h = floor(trim T), TB runs over h .. T-h-1 for 'level' and 'both' and over h-1 .. T-h-2
 * for 'slope'; the library reports TB for 'level' and 'both' and TB + 1 for 'slope'.
 */
import type { BreakColumnKind } from './break-t-scan';

/** Which part of the deterministic path may break: the level (model A), the trend slope (B), or both (C). */
export type ZivotAndrewsBreak = 'level' | 'slope' | 'both';

export const ZIVOT_ANDREWS_BREAKS: readonly ZivotAndrewsBreak[] = ['level', 'slope', 'both'];

/** The break columns each model adds: DU is a step, DT a ramp. */
export const BREAK_COLUMNS: Record<ZivotAndrewsBreak, readonly BreakColumnKind[]> = {
  level: ['step'],
  slope: ['ramp'],
  both: ['step', 'ramp'],
};

/** The regression's columns that do not depend on the break date. */
export interface ZivotAndrewsDesign {
  /** Δx_t, t = p+1 .. T-1. */
  response: Float64Array;
  /** x_{t-1} less the mean of x: the column whose t-ratio is the statistic. */
  laggedLevel: Float64Array;
  /** Lagged changes 1..p, then the constant, then the trend 1..n. */
  fixed: Float64Array[];
  fixedNames: string[];
  lags: number;
  /** Rows: T - 1 - p. */
  n: number;
}

/** Builds the break-free columns of the Zivot-Andrews regression with `lags` lagged changes. */
export function zivotAndrewsDesign(x: ArrayLike<number>, lags: number): ZivotAndrewsDesign {
  const T = x.length;
  const n = T - 1 - lags;
  const response = new Float64Array(n);
  const laggedLevel = new Float64Array(n);
  const lagColumns = Array.from({ length: lags }, () => new Float64Array(n));
  const constant = new Float64Array(n).fill(1);
  const trend = new Float64Array(n);
  // The level enters less its mean: the shift lies in the span of the constant, so no
  // coefficient but the constant's and no t-ratio changes, and a price far from zero (say
  // 1e6 moving by 0.01) keeps its digits instead of cancelling against the constant.
  let mean = 0;
  for (let t = 0; t < T; t++) mean += x[t];
  mean /= T;
  for (let r = 0; r < n; r++) {
    const t = lags + 1 + r;
    response[r] = x[t] - x[t - 1];
    laggedLevel[r] = x[t - 1] - mean;
    for (let i = 1; i <= lags; i++) lagColumns[i - 1][r] = x[t - i] - x[t - i - 1];
    trend[r] = r + 1;
  }
  return {
    response,
    laggedLevel,
    fixed: [...lagColumns, constant, trend],
    fixedNames: [...lagColumns.map((_, i) => `change lag ${i + 1}`), 'constant', 'trend'],
    lags,
    n,
  };
}

/** The first regression row the break columns touch for a break after observation TB: the row of t = TB + 1. */
export function firstBreakRow(lastBefore: number, lags: number): number {
  return lastBefore - lags;
}

/** The candidate range of TB (last observation before the break) for T observations and h = floor(trim T). */
export function candidateBreaks(model: ZivotAndrewsBreak, T: number, h: number): { first: number; last: number } {
  return model === 'slope' ? { first: h - 1, last: T - h - 2 } : { first: h, last: T - h - 1 };
}

/** The reference library's reported break index for a break after observation TB. */
export function referenceBreakIndex(model: ZivotAndrewsBreak, lastBefore: number): number {
  return model === 'slope' ? lastBefore + 1 : lastBefore;
}
