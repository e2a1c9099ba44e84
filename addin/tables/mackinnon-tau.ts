/**
 * p-values and critical values for tau (t-ratio) statistics: the Dickey-Fuller / ADF
 * unit-root test (N = 1) and the residual-based Engle-Granger cointegration test with
 * N variables in the cointegrating regression (N ≥ 2).
 *
 * The numbers live in two data files beside this one (see README.md for provenance):
 * mackinnon1994-pvalues.json (asymptotic distribution functions) and
 * mackinnon2010-critical.json (finite-sample critical-value response surfaces).
 */
import { normalCdf } from '../distributions';
import { MooringInputError } from '../errors';
import tauPValueTable from './mackinnon1994-pvalues.json';
import tauCriticalTable from './mackinnon2010-critical.json';
import { polynomialAscending } from './polynomial';
import {
  requireCount,
  requireNotNaN,
  requireTableCase,
  TABLE_CASE_LABEL,
  type TableCase,
} from './table-case';

export { tableCaseOf, type TableCase } from './table-case';

/** One row of MacKinnon (1994): cut-offs and the two pieces of the fitted distribution function. */
interface TauPValueRow {
  N: number;
  tauMin: number;
  tauStar: number;
  /** null stands for +infinity (the cubic never turns down). */
  tauMax: number | null;
  smallP: number[];
  largeP: number[];
}

/** One row of MacKinnon (2010): [b0, b1, b2, b3] per lower-tail level. */
interface TauCriticalRow {
  N: number;
  '1%': number[];
  '5%': number[];
  '10%': number[];
}

const P_VALUE_ROWS: Record<TableCase, TauPValueRow[]> = tauPValueTable.tables;
const CRITICAL_ROWS: Record<TableCase, TauCriticalRow[]> = tauCriticalTable.tables;

/** Lower-tail critical values of a tau statistic at the 1%, 5% and 10% levels. */
export type TauCriticalValues = {
  '1%': number;
  '5%': number;
  '10%': number;
};

/**
 * Asymptotic p-value of a tau statistic, from MacKinnon (1994)'s fitted distribution
 * functions: p = Φ(g0 + g1·τ + g2·τ²) at or below τ*, p = Φ(g0 + g1·τ + g2·τ² + g3·τ³)
 * above it (Φ the standard normal distribution function), 0 below τmin and 1 above τmax.
 * The two pieces do not meet exactly at τ*, so p jumps there by up to about 0.004.
 *
 * `nVariables` is N: 1 for a unit-root test, the number of series in the cointegrating
 * regression for Engle-Granger. Returns null for N > 6, where the paper has no surface
 * (the caller should report the p-value as not available). -Infinity gives 0 and
 * +Infinity gives 1; NaN is refused.
 *
 * MacKinnon, J. G. (1994), Journal of Business & Economic Statistics 12(2), 167-176.
 */
export function mackinnonTauPValue(tau: number, regression: TableCase, nVariables: number): number | null {
  requireTableCase(regression);
  requireCount(nVariables, 'number of variables N');
  requireNotNaN(tau, 'tau statistic');
  const rows = P_VALUE_ROWS[regression];
  if (nVariables > rows.length) return null;
  const row = rows[nVariables - 1];
  if (tau < row.tauMin) return 0;
  if (tau === Infinity || (row.tauMax !== null && tau > row.tauMax)) return 1;
  const coefficients = tau <= row.tauStar ? row.smallP : row.largeP;
  return normalCdf(polynomialAscending(coefficients, tau));
}

/**
 * Lower-tail 1%, 5% and 10% critical values of a tau statistic for a sample of size T,
 * from the response surfaces crit(T) = b0 + b1/T + b2/T² + b3/T³ (b0 is the asymptotic
 * value, used when `nobs` is null). Reject the unit-root / no-cointegration null when
 * tau is below the value.
 *
 * Which T to pass is the caller's convention; the surfaces were fitted with T the
 * number of observations in the test regression. N = 1..12 for 'c', 'ct' and 'ctt';
 * the no-constant case 'n' exists only for N = 1.
 *
 * MacKinnon, J. G. (2010), Critical values for cointegration tests, Queen's Economics
 * Department Working Paper 1227 (cases c, ct, ctt); MacKinnon, J. G. (1996), Journal of
 * Applied Econometrics 11, 601-618 (case n).
 */
export function mackinnonCriticalValues(
  regression: TableCase,
  nVariables: number,
  nobs: number | null,
): TauCriticalValues {
  requireTableCase(regression);
  requireCount(nVariables, 'number of variables N');
  const rows = CRITICAL_ROWS[regression];
  if (nVariables > rows.length) {
    throw new MooringInputError(
      regression === 'n'
        ? `Critical values without a constant are published for a single series only (N = 1), ` +
          `not for N = ${nVariables}; include a constant in the cointegrating regression.`
        : `Critical values for the ${TABLE_CASE_LABEL[regression]} case are published for ` +
          `N = 1 to ${rows.length} variables; got N = ${nVariables}.`,
    );
  }
  if (nobs !== null && !(Number.isFinite(nobs) && nobs > 0)) {
    throw new MooringInputError(
      `The sample size for the critical values must be a positive number of observations; got ${nobs}.`,
    );
  }
  const row = rows[nVariables - 1];
  const at = (b: number[]): number => (nobs === null ? b[0] : polynomialAscending(b, 1 / nobs));
  return { '1%': at(row['1%']), '5%': at(row['5%']), '10%': at(row['10%']) };
}
