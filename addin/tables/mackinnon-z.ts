/**
 * p-values and critical values for the normalised-bias statistic z = T(ρ̂ − 1) and its
 * serial-correlation-corrected forms, which share its limit: N = 1 for a unit-root test
 * (such as Phillips-Perron Z-alpha), N ≥ 2 for a residual-based cointegration test with
 * N variables (such as Phillips-Ouliaris Z-alpha).
 *
 * Data: mackinnon1994-z-pvalues.json (MacKinnon 1994, Tables 5 and 6); see README.md.
 */
import { normalCdf } from '../distributions';
import { MooringInputError } from '../errors';
import zPValueTable from './mackinnon1994-z-pvalues.json';
import { polynomialAscending } from './polynomial';
import { requireCount, requireNotNaN, requireTableCase, type TableCase } from './table-case';

/** One row of MacKinnon (1994) Tables 5-6: the switch point z* and the two fitted pieces. */
interface ZPValueRow {
  N: number;
  zStar: number;
  /** Coefficients on powers of ln|z|, used at or below z*. */
  smallP: number[];
  /** Coefficients on powers of z, used above z*. */
  largeP: number[];
}

const Z_ROWS: Record<TableCase, ZPValueRow[]> = zPValueTable.tables;

/**
 * Switch points we use instead of the table's z*, each with its reason.
 *
 * Constant, N = 2: with the transcribed z* = -14.3 the fitted p-value falls from 0.171 to
 * 0.086 as z crosses -14.3 upwards, and the upper piece stays far too low up to about
 * z = -8 (0.198 at z = -12, where a simulation of the statistic gives about 0.25). The
 * lower piece matches Phillips & Ouliaris's (1990) asymptotic 1/5/10% points and the
 * simulation over that stretch, and the two pieces meet at z ≈ -7.84, so we switch
 * there. The table's numbers are left as transcribed; the checks are in
 * tests/tables/mackinnon-z.test.ts and the story is in README.md.
 */
const SWITCH_POINT_CORRECTIONS: Partial<Record<TableCase, Record<number, number>>> = {
  c: { 2: -7.84 },
};

/** The switch point used for this case and N: the table's z* unless corrected above. */
export function zSwitchPoint(regression: TableCase, nVariables: number): number {
  requireTableCase(regression);
  requireCount(nVariables, 'number of variables N');
  const row = Z_ROWS[regression][nVariables - 1];
  if (row === undefined) {
    throw new MooringInputError(
      `The z-statistic surfaces cover N = 1 to ${Z_ROWS[regression].length} variables; got N = ${nVariables}.`,
    );
  }
  return SWITCH_POINT_CORRECTIONS[regression]?.[nVariables] ?? row.zStar;
}

/**
 * Asymptotic p-value (lower tail) of a normalised-bias statistic z, from MacKinnon
 * (1994)'s fitted distribution functions: at or below the switch point z*,
 * p = Φ(d0 + d1·L + d2·L² + d3·L³) with L = ln|z|; above it,
 * p = Φ(d0 + d1·z + d2·z² + d3·z³ + d4·z⁴) (Φ the standard normal distribution function).
 * The pieces meet to within about 0.001 at z* (one switch point is corrected; see
 * SWITCH_POINT_CORRECTIONS).
 *
 * Returns null for N > 6, where there is no surface. -Infinity gives 0, +Infinity 1;
 * NaN is refused.
 *
 * MacKinnon, J. G. (1994), Journal of Business & Economic Statistics 12(2), 167-176,
 * Tables 5 and 6.
 */
export function mackinnonZPValue(z: number, regression: TableCase, nVariables: number): number | null {
  requireTableCase(regression);
  requireCount(nVariables, 'number of variables N');
  requireNotNaN(z, 'z statistic');
  const rows = Z_ROWS[regression];
  if (nVariables > rows.length) return null;
  if (z === -Infinity) return 0;
  if (z === Infinity) return 1;
  const row = rows[nVariables - 1];
  return z <= zSwitchPoint(regression, nVariables)
    ? normalCdf(polynomialAscending(row.smallP, Math.log(Math.abs(z))))
    : normalCdf(polynomialAscending(row.largeP, z));
}

/** Lower-tail critical values of a z statistic at the 1%, 5% and 10% levels. */
export type ZCriticalValues = {
  '1%': number;
  '5%': number;
  '10%': number;
};

/** Where the search for a critical value starts: far enough out that p is below 1e-20 for every surface. */
const SEARCH_LOWER = -5000;
const SEARCH_UPPER = 0;

/**
 * Asymptotic 1%, 5% and 10% critical values of a z statistic, found by inverting
 * mackinnonZPValue numerically: bisection for the z with p(z) = level, on [-5000, 0].
 * Our tables hold no published critical-value surface for z, so these are derived from
 * the MacKinnon (1994) p-value functions, not read from a printed table; they are
 * asymptotic (no sample-size correction). If a level fell inside the small jump at a
 * switch point, the answer is that switch point. Returns null for N > 6.
 */
export function zCriticalValues(regression: TableCase, nVariables: number): ZCriticalValues | null {
  requireTableCase(regression);
  requireCount(nVariables, 'number of variables N');
  if (nVariables > Z_ROWS[regression].length) return null;
  const p = (z: number): number => mackinnonZPValue(z, regression, nVariables) as number;
  return {
    '1%': invertByBisection(p, 0.01),
    '5%': invertByBisection(p, 0.05),
    '10%': invertByBisection(p, 0.1),
  };
}

/** The z with p(z) = level for a non-decreasing p, by halving [SEARCH_LOWER, SEARCH_UPPER] to 1e-10. */
function invertByBisection(p: (z: number) => number, level: number): number {
  let lo = SEARCH_LOWER;
  let hi = SEARCH_UPPER;
  for (let i = 0; i < 200 && hi - lo > 1e-10; i++) {
    const mid = 0.5 * (lo + hi);
    if (p(mid) < level) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}
