/**
 * Where the Johansen rank test takes its critical values and p-values from, case by case.
 *
 * Critical values: the published MacKinnon-Haug-Michelis (1999) quantiles for the cases
 * they cover ('none', 'constant', 'trend'; n - r up to 12); Mooring's seeded simulation of
 * the limiting distributions (addin/tables/johansen-simulated.json) for the two restricted
 * cases, which that table does not cover. p-values: the simulation, for all five cases.
 * Because the two sources are separate estimates, a statistic right at a published critical
 * value can have a simulated p-value a little either side of the level; the rank choice
 * goes by the p-value.
 */
import { pValueBoundNote, type PValueBound } from '../p-value-bound';
import { publishedJohansenCritical } from '../tables/johansen-published';
import type { JohansenCase, JohansenStatisticKind } from './deterministic-case';
import { johansenCriticalValues, johansenPValue } from './johansen-pvalue';

/** Which table a critical value came from. */
export type CriticalSource = 'published' | 'simulated';

/** The cases covered by the published table. */
export function hasPublishedTable(caseName: JohansenCase): caseName is 'none' | 'constant' | 'trend' {
  return caseName === 'none' || caseName === 'constant' || caseName === 'trend';
}

/**
 * The 10%, 5% and 1% upper-tail critical values for H0: rank <= r with nMinusR = n - r,
 * and where they came from (published where a published value exists, else simulated).
 */
export function rankCriticalValues(kind: JohansenStatisticKind, caseName: JohansenCase, nMinusR: number): { critical: Record<string, number>; source: CriticalSource } {
  if (hasPublishedTable(caseName)) {
    const cv = publishedJohansenCritical(kind, caseName, nMinusR);
    return { critical: { '10%': cv['10%'], '5%': cv['5%'], '1%': cv['1%'] }, source: 'published' };
  }
  const cv = johansenCriticalValues(kind, caseName, nMinusR);
  return { critical: { '10%': cv['10%'], '5%': cv['5%'], '1%': cv['1%'] }, source: 'simulated' };
}

/**
 * The asymptotic p-value of a rank statistic (upper tail) from the simulated table; beyond the
 * table's ends the value is the table's end probability and `bound` says which side the truth
 * lies on, with the note in words.
 */
export function rankPValue(statistic: number, kind: JohansenStatisticKind, caseName: JohansenCase, nMinusR: number): { pValue: number; bound: PValueBound; note?: string } {
  const { pValue, beyondTable } = johansenPValue(statistic, kind, caseName, nMinusR);
  if (beyondTable === null) return { pValue, bound: null };
  return { pValue, bound: beyondTable, note: pValueBoundNote(pValue, beyondTable) };
}
