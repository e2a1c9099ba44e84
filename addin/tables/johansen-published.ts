/**
 * Published asymptotic critical values of Johansen's trace and maximum-eigenvalue
 * statistics for the cointegration rank. Data: johansen-critical.json (values computed
 * by the method of MacKinnon, Haug & Michelis 1999); see README.md.
 */
import { MooringInputError } from '../errors';
import johansenTable from './johansen-critical.json';
import { requireCount } from './table-case';

/** Which rank statistic: the trace statistic or the maximum-eigenvalue (λ-max) statistic. */
export type JohansenStatisticKind = 'trace' | 'maxEigen';

/**
 * Deterministic case of the vector error-correction model the table is for:
 * 'none' no deterministic terms; 'constant' an unrestricted constant (linear trends in
 * the data, none in the cointegrating relations; case 3 of the usual five); 'trend' an
 * unrestricted linear trend (quadratic trends allowed in the data; case 5).
 */
export type JohansenCaseName = 'none' | 'constant' | 'trend';

/** Upper-tail critical values at the 10%, 5% and 1% levels (the 90/95/99% quantiles). */
export type JohansenCriticalValues = {
  '10%': number;
  '5%': number;
  '1%': number;
};

/** The table's deterministic-order keys for each case (see README.md, Johansen section). */
const ORDER_OF_CASE: Record<JohansenCaseName, '-1' | '0' | '1'> = { none: '-1', constant: '0', trend: '1' };

/**
 * Asymptotic critical values for testing H0: rank ≤ r in a system of n variables, looked
 * up by nMinusR = n − r (1..12). Reject when the statistic exceeds the value.
 *
 * The 'trend' values belong to the unrestricted-trend model (trend partialled out of
 * both the differenced and the lagged-level regressions); they do not fit a statistic
 * computed by removing a linear trend from the levels first. Neither the
 * restricted-constant nor the restricted-trend case is covered.
 *
 * MacKinnon, J. G., Haug, A. A. & Michelis, L. (1999), Journal of Applied Econometrics
 * 14, 563-577 (method); Johansen (1995) for the deterministic cases.
 */
export function publishedJohansenCritical(
  kind: JohansenStatisticKind,
  caseName: JohansenCaseName,
  nMinusR: number,
): JohansenCriticalValues {
  if (kind !== 'trace' && kind !== 'maxEigen') {
    throw new MooringInputError(`Unknown Johansen statistic '${kind}': use 'trace' or 'maxEigen'.`);
  }
  if (!Object.hasOwn(ORDER_OF_CASE, caseName)) {
    throw new MooringInputError(
      `Unknown Johansen deterministic case '${caseName}': use 'none', 'constant' or 'trend'.`,
    );
  }
  requireCount(nMinusR, 'number of variables minus the rank (n - r)');
  const order = ORDER_OF_CASE[caseName];
  const rows = (kind === 'trace' ? johansenTable.trace : johansenTable.maxEigenvalue)[order];
  const row = rows.find((candidate) => candidate.nMinusR === nMinusR);
  if (row === undefined) {
    throw new MooringInputError(
      `Johansen critical values are published for n - r = 1 to ${rows.length}; got ${nMinusR}.`,
    );
  }
  return { '10%': row.q90, '5%': row.q95, '1%': row.q99 };
}
