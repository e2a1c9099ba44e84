/**
 * Critical values and p-values of the tests on GLS-detrended data.
 *
 * - gls-unitroot-simulated.json: Mooring's own seeded simulation of the null distributions of
 *   the DF-GLS t-ratio (Elliott, Rothenberg & Stock 1996) and of MZa, MZt, MSB, MPT (Ng & Perron
 *   2001), stored per probability as a response surface q_p(T) = b0 + b1/T + b2/T^2; regenerate
 *   with `npm run tables:gls` (tests/tables/simulate-gls-unitroot.ts, seeds and counts in the
 *   file's provenance).
 * - ng-perron-2001-table1.json: Ng & Perron's (2001) Table 1, the asymptotic critical values
 *   of the M statistics (recalled, not read: see its transcribedFrom).
 *
 * A p-value is read between the two neighbouring quantiles, linearly in the normal score of
 * the probability (the quantile function is smooth in that scale); beyond the table's ends it
 * is held at 0.001 or 0.999 and flagged.
 */
import { normalCdf, normalQuantile } from '../distributions';
import type { PValueBound } from '../p-value-bound';
import simulated from './gls-unitroot-simulated.json';
import published from './ng-perron-2001-table1.json';

export type GlsCase = 'const' | 'trend';
export type GlsStatistic = 'tau' | 'MZa' | 'MZt' | 'MSB' | 'MPT';
export type CriticalLevels = { '1%': number; '5%': number; '10%': number };

/** The smallest sample size the simulation covers; shorter samples read the surface there. */
export const GLS_TABLE_SMALLEST_T: number = simulated.provenance.sampleSizes.reduce((low: number, t: number) => Math.min(low, t), Infinity);

const PROBABILITIES: readonly number[] = simulated.probabilities;
const SCORES: readonly number[] = PROBABILITIES.map((p) => normalQuantile(p));

/** The simulated quantiles at every tabulated probability, at T observations (null: the asymptotic ones). */
export function glsQuantiles(statistic: GlsStatistic, c: GlsCase, T: number | null): number[] {
  const rows = (simulated.surfaces as Record<GlsCase, Record<GlsStatistic, number[][]>>)[c][statistic];
  if (T === null) return rows.map((b) => b[0]);
  const size = Math.max(T, GLS_TABLE_SMALLEST_T);
  return rows.map((b) => b[0] + b[1] / size + b[2] / (size * size));
}

/** Lower-tail p-value of a statistic from the simulated surface at T (null: asymptotic). */
export function glsPValue(statistic: GlsStatistic, c: GlsCase, value: number, T: number | null): { pValue: number; bound: PValueBound } {
  const q = glsQuantiles(statistic, c, T);
  const last = q.length - 1;
  if (value < q[0]) return { pValue: PROBABILITIES[0], bound: 'below' };
  if (value > q[last]) return { pValue: PROBABILITIES[last], bound: 'above' };
  let i = 0;
  while (i < last - 1 && value > q[i + 1]) i++;
  const weight = q[i + 1] > q[i] ? (value - q[i]) / (q[i + 1] - q[i]) : 0;
  return { pValue: normalCdf(SCORES[i] + weight * (SCORES[i + 1] - SCORES[i])), bound: null };
}

/** The simulated 1%, 5% and 10% quantiles at T (null: asymptotic). */
export function glsCriticalValues(statistic: GlsStatistic, c: GlsCase, T: number | null): CriticalLevels {
  const q = glsQuantiles(statistic, c, T);
  const at = (p: number) => q[PROBABILITIES.indexOf(p)];
  return { '1%': at(0.01), '5%': at(0.05), '10%': at(0.1) };
}

/** Where the Ng-Perron critical values come from, and how they were transcribed (the table's own words). */
export const NG_PERRON_TABLE_SOURCE = `${published.source} ${published.transcribedFrom}`;

/** Ng & Perron (2001), Table 1: asymptotic critical values of an M statistic. */
export function ngPerronTableCritical(statistic: Exclude<GlsStatistic, 'tau'>, c: GlsCase): CriticalLevels {
  return { ...(published.critical as Record<GlsCase, Record<string, CriticalLevels>>)[c][statistic] };
}
