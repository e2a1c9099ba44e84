/**
 * Asymptotic p-values and critical values of the Johansen trace and maximum-eigenvalue
 * statistics, read from Mooring's simulated quantile tables
 * (addin/tables/johansen-simulated.json; generator tests/tables/simulate-johansen.ts),
 * which cover all five deterministic cases of Johansen (1995) for n - r = 1..12.
 */
import { normalCdf, normalQuantile } from '../distributions';
import { MooringInputError } from '../errors';
import type { BeyondTable } from '../tables/table-interpolation';
import simulated from '../tables/johansen-simulated.json';
import {
  type JohansenCase,
  type JohansenStatisticKind,
  requireCommonTrends,
  requireJohansenCase,
  requireStatisticKind,
} from './deterministic-case';

/** Upper-tail critical values at the 10%, 5% and 1% levels (the 90/95/99% quantiles). */
export interface JohansenSimulatedCriticalValues {
  '10%': number;
  '5%': number;
  '1%': number;
}

/** A p-value read from the simulated table, flagged when the statistic lies beyond it. */
export interface JohansenPValue {
  /** Upper-tail probability P(statistic > observed) under H0. */
  pValue: number;
  /**
   * null inside the table; 'below' when the statistic exceeds the largest tabulated
   * quantile (the true p-value is below the one reported); 'above' when it is under the
   * smallest (the true p-value is above the one reported).
   */
  beyondTable: BeyondTable;
}

interface SimulatedRow {
  nMinusR: number;
  quantiles: number[];
}

const PROBABILITIES: readonly number[] = simulated.probabilities;
const CASES = simulated.cases as unknown as Record<JohansenCase, Record<JohansenStatisticKind, SimulatedRow[]>>;
/** Upper-tail probabilities 1 - p_i of the grid, rounded to its precision (0.05, not 0.050000000000000044). */
const TAILS: readonly number[] = PROBABILITIES.map((p) => Number((1 - p).toFixed(6)));
/** Normal scores Φ^{-1}(p_i) of the grid, increasing along it. */
const SCORES: readonly number[] = PROBABILITIES.map((p) => normalQuantile(p));

function quantileRow(kind: JohansenStatisticKind, caseName: JohansenCase, nMinusR: number): readonly number[] {
  requireStatisticKind(kind);
  requireJohansenCase(caseName);
  requireCommonTrends(nMinusR);
  const row = CASES[caseName][kind].find((r) => r.nMinusR === nMinusR);
  // the table is generated for every case and n - r = 1..12; a gap is a broken data file
  if (row === undefined) throw new Error(`johansen-simulated.json has no row for ${caseName}/${kind}/n - r = ${nMinusR}`);
  return row.quantiles;
}

/**
 * The asymptotic p-value P(S > statistic) of a Johansen rank statistic under H0: rank = r,
 * nMinusR = n - r, from the simulated quantiles q_i at lower-tail probabilities p_i.
 *
 * Interpolation on the normal-score scale: between neighbouring quantiles q_i <= s <= q_{i+1}
 * the score z = Φ^{-1}(F(s)) is taken linear in s, z(s) = z_i + w (z_{i+1} - z_i) with
 * w = (s - q_i)/(q_{i+1} - q_i) and z_i = Φ^{-1}(p_i), and the p-value is 1 - Φ(z(s)),
 * written as (1 - p_i) - (p_{i+1} - p_i) (Φ(z(s)) - Φ(z_i)) / (Φ(z_{i+1}) - Φ(z_i)) so that
 * it equals 1 - p_i exactly at every q_i. Why this scale: these laws are near normal for
 * large n - r and chi-square-like for small n - r; on either, the normal score bends far
 * less between grid points than the probability does in the tails, so a straight line
 * there is closer to the truth. The p-value falls as the statistic rises.
 *
 * Beyond the table the p-value is held at the end probability (0.001 above the largest
 * quantile, 0.999 below the smallest) and `beyondTable` says which way the truth lies.
 */
export function johansenPValue(statistic: number, kind: JohansenStatisticKind, caseName: JohansenCase, nMinusR: number): JohansenPValue {
  const q = quantileRow(kind, caseName, nMinusR);
  if (typeof statistic !== 'number' || !Number.isFinite(statistic)) {
    throw new MooringInputError(`The Johansen ${kind} statistic must be a finite number; got ${String(statistic)}.`);
  }
  const last = q.length - 1;
  if (statistic < q[0]) return { pValue: TAILS[0], beyondTable: 'above' };
  if (statistic > q[last]) return { pValue: TAILS[last], beyondTable: 'below' };
  let i = 0;
  while (i < last - 1 && statistic > q[i + 1]) i++;
  const w = (statistic - q[i]) / (q[i + 1] - q[i]);
  if (w === 1) return { pValue: TAILS[i + 1], beyondTable: null }; // exact at the node, free of a - (a - b) rounding
  const lower = normalCdf(SCORES[i]);
  const upper = normalCdf(SCORES[i + 1]);
  const share = (normalCdf(SCORES[i] + w * (SCORES[i + 1] - SCORES[i])) - lower) / (upper - lower);
  return { pValue: TAILS[i] - (TAILS[i] - TAILS[i + 1]) * share, beyondTable: null };
}

/**
 * The simulated asymptotic critical values at the 10%, 5% and 1% levels: the 90%, 95% and
 * 99% quantiles of the null distribution (reject H0: rank <= r when the statistic exceeds).
 */
export function johansenCriticalValues(kind: JohansenStatisticKind, caseName: JohansenCase, nMinusR: number): JohansenSimulatedCriticalValues {
  const q = quantileRow(kind, caseName, nMinusR);
  const at = (p: number) => q[PROBABILITIES.indexOf(p)];
  return { '10%': at(0.9), '5%': at(0.95), '1%': at(0.99) };
}

/** The lower-tail probabilities at which the simulated table gives quantiles. */
export function johansenTableProbabilities(): readonly number[] {
  return PROBABILITIES;
}
