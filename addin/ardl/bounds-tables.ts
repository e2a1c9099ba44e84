/**
 * Critical value bounds and p-values of the bounds test.
 *
 * - Samples of more than SMALL_SAMPLE_LIMIT rows (or more regressors than the simulation
 *   covers): the paper's asymptotic bounds, Pesaran, Shin & Smith (2001) Tables CI(i)-(v)
 *   for F and CII(i), (iii), (v) for t (addin/tables/pss2001-bounds.json).
 * - Samples up to SMALL_SAMPLE_LIMIT rows: Mooring's own seeded simulation at the sample's
 *   size (addin/tables/ardl-bounds-simulated.json, interpolated in 1/n between the simulated
 *   sizes), because the asymptotic bounds are too low there and reject too often (the gap is
 *   the reason Narayan 2005 tabulated n = 30..80).
 * - p-values: always from the simulation, at the sample's size up to the largest simulated
 *   size (250 rows), which stands in for larger samples. The paper gives no p-values.
 * Every answer names the table it used.
 */
import { MooringInputError } from '../errors';
import type { PValueBound } from '../p-value-bound';
import paper from '../tables/pss2001-bounds.json';
import simulated from '../tables/ardl-bounds-simulated.json';
import type { BoundsCase } from './bounds-case';
import { BOUNDS_MAX_SIMULATED_K, BOUNDS_PROBABILITIES, BOUNDS_SIZES } from './bounds-table-layout';

export type BoundsStatistic = 'F' | 't';

/** The four levels the paper tabulates. */
export const BOUNDS_LEVELS = ['10%', '5%', '2.5%', '1%'] as const;
export type BoundsLevel = (typeof BOUNDS_LEVELS)[number];
const LEVEL_ALPHA: Record<BoundsLevel, number> = { '10%': 0.1, '5%': 0.05, '2.5%': 0.025, '1%': 0.01 };

/** Largest number of regressors the paper's tables cover. */
export const BOUNDS_MAX_K = 10;
/** Up to this many regression rows the critical values come from the simulation at the sample's size. */
export const SMALL_SAMPLE_LIMIT = 100;

export interface BoundPair {
  lower: number;
  upper: number;
}

export interface CriticalBounds {
  critical: Record<BoundsLevel, BoundPair>;
  /** Where the numbers come from, in words. */
  source: string;
  kind: 'paper' | 'simulated';
}

export interface BoundsPValue {
  /** With every regressor I(0). */
  lower: number;
  lowerBound: PValueBound | null;
  /** With every regressor I(1). */
  upper: number;
  upperBound: PValueBound | null;
  source: string;
}

type SimCell = { F: { i0: number[]; i1: number[] }; t: { i0: number[]; i1: number[] } | null };
const simCases = simulated.cases as unknown as Record<string, Record<string, Record<string, SimCell>>>;
const paperTables = paper.tables as unknown as Record<BoundsStatistic, Record<string, { table: string; rows: Record<BoundsLevel, BoundPair>[] }>>;

/** True where the paper tabulates the statistic (t: cases 1, 3 and 5 only). */
export function boundsTabulated(statistic: BoundsStatistic, boundsCase: BoundsCase): boolean {
  return statistic === 'F' || boundsCase === 1 || boundsCase === 3 || boundsCase === 5;
}

/** The paper's asymptotic bounds for the case and k regressors (0..10). */
export function paperBounds(statistic: BoundsStatistic, boundsCase: BoundsCase, k: number): CriticalBounds | null {
  const table = paperTables[statistic][String(boundsCase)];
  if (!table || k < 0 || k > BOUNDS_MAX_K) return null;
  return {
    critical: table.rows[k],
    source: `Pesaran, Shin & Smith (2001), Table ${table.table}, k = ${k} (asymptotic)`,
    kind: 'paper',
  };
}

/** Quantile vectors of the simulation at n rows (interpolated in 1/n; clamped to the grid). */
function simulatedQuantiles(statistic: BoundsStatistic, boundsCase: BoundsCase, k: number, n: number): { i0: number[]; i1: number[]; size: number } | null {
  const cells = simCases[String(boundsCase)]?.[String(k)];
  if (!cells) return null;
  const sizes = BOUNDS_SIZES;
  const at = (size: number) => cells[String(size)][statistic];
  const clamped = Math.min(Math.max(n, sizes[0]), sizes[sizes.length - 1]);
  const hi = sizes.findIndex((s) => s >= clamped);
  if (sizes[hi] === clamped) {
    const cell = at(clamped);
    return cell ? { ...cell, size: clamped } : null;
  }
  const lo = hi - 1;
  const a = at(sizes[lo]);
  const b = at(sizes[hi]);
  if (!a || !b) return null;
  const w = (1 / clamped - 1 / sizes[hi]) / (1 / sizes[lo] - 1 / sizes[hi]);
  const mix = (u: number[], v: number[]) => u.map((x, i) => w * x + (1 - w) * v[i]);
  return { i0: mix(a.i0, b.i0), i1: mix(a.i1, b.i1), size: clamped };
}

/** The simulated size in words, saying when it differs from the sample's. */
function sizeWords(size: number, n: number): string {
  if (size === n || (n > BOUNDS_SIZES[0] && n < BOUNDS_SIZES[BOUNDS_SIZES.length - 1])) return `${n} rows`;
  return n > size ? `${size} rows (the largest simulated size, standing in for ${n})` : `${size} rows (the smallest simulated size; the sample has ${n})`;
}

/** The quantile at probability p from a tabulated vector (p is on the grid). */
function quantileAt(q: number[], p: number): number {
  const i = BOUNDS_PROBABILITIES.findIndex((g) => Math.abs(g - p) < 1e-12);
  return q[i];
}

/** Simulated bounds at the sample's size, or null where the simulation does not cover k. */
export function simulatedBounds(statistic: BoundsStatistic, boundsCase: BoundsCase, k: number, n: number): CriticalBounds | null {
  if (k > BOUNDS_MAX_SIMULATED_K || !boundsTabulated(statistic, boundsCase)) return null;
  const q = simulatedQuantiles(statistic, boundsCase, k, n);
  if (!q) return null;
  const critical = {} as Record<BoundsLevel, BoundPair>;
  for (const level of BOUNDS_LEVELS) {
    const p = statistic === 'F' ? 1 - LEVEL_ALPHA[level] : LEVEL_ALPHA[level];
    critical[level] = { lower: quantileAt(q.i0, p), upper: quantileAt(q.i1, p) };
  }
  return { critical, source: `Mooring's simulation for ${sizeWords(q.size, n)}, k = ${k} (seeded; addin/tables/ardl-bounds-simulated.json)`, kind: 'simulated' };
}

/**
 * The critical value bounds used for a sample of n rows: the simulation at n when n is at
 * most SMALL_SAMPLE_LIMIT and k is simulated, else the paper's asymptotic table. Null where
 * the paper has no table (t in cases 2 and 4).
 */
export function criticalBounds(statistic: BoundsStatistic, boundsCase: BoundsCase, k: number, n: number): CriticalBounds | null {
  if (k < 1 || k > BOUNDS_MAX_K) {
    throw new MooringInputError(`The bounds test's tables cover 1 to ${BOUNDS_MAX_K} regressors; got ${k}. Use fewer x series.`);
  }
  if (!boundsTabulated(statistic, boundsCase)) return null;
  if (n <= SMALL_SAMPLE_LIMIT) {
    const small = simulatedBounds(statistic, boundsCase, k, n);
    if (small) return small;
  }
  return paperBounds(statistic, boundsCase, k);
}

/** P(statistic's null distribution beyond the value) from one tabulated quantile vector. */
function tailProbability(q: number[], value: number, upperTail: boolean): { p: number; bound: PValueBound | null } {
  const P = BOUNDS_PROBABILITIES;
  const last = P.length - 1;
  let cdf: number;
  let bound: PValueBound | null = null;
  if (value <= q[0]) {
    cdf = P[0];
    bound = upperTail ? 'above' : 'below';
  } else if (value >= q[last]) {
    cdf = P[last];
    bound = upperTail ? 'below' : 'above';
  } else {
    let i = 0;
    while (q[i + 1] < value) i++;
    const span = q[i + 1] - q[i];
    cdf = span > 0 ? P[i] + ((value - q[i]) / span) * (P[i + 1] - P[i]) : P[i + 1];
  }
  const p = upperTail ? 1 - cdf : cdf;
  return { p: Number(p.toFixed(6)), bound };
}

/**
 * p-values of the statistic with all regressors I(0) (lower) and all I(1) (upper), from the
 * simulation at the sample's size (250 rows standing in for larger samples). Null where the
 * simulation does not cover k or the paper has no t table for the case.
 */
export function boundsPValue(statistic: BoundsStatistic, boundsCase: BoundsCase, k: number, n: number, value: number): BoundsPValue | null {
  if (k > BOUNDS_MAX_SIMULATED_K || !boundsTabulated(statistic, boundsCase)) return null;
  const q = simulatedQuantiles(statistic, boundsCase, k, n);
  if (!q) return null;
  const upperTail = statistic === 'F';
  const lower = tailProbability(q.i0, value, upperTail);
  const upper = tailProbability(q.i1, value, upperTail);
  return {
    lower: lower.p,
    lowerBound: lower.bound,
    upper: upper.p,
    upperBound: upper.bound,
    source: `Mooring's simulation for ${sizeWords(q.size, n)}`,
  };
}
