/**
 * Critical values and p-values for the KPSS stationarity statistic (eta), read from the
 * asymptotic table of Kwiatkowski, Phillips, Schmidt & Shin (1992), Table 1.
 * Data: kpss1992-critical.json; see README.md.
 */
import { MooringInputError } from '../errors';
import kpssTable from './kpss1992-critical.json';
import { requireNotNaN } from './table-case';
import { interpolateLinearly, type TablePValue } from './table-interpolation';

/** Stationary around a constant ('const', eta_mu) or around a linear trend ('trend', eta_tau). */
export type KpssKind = 'const' | 'trend';

/** Upper-tail critical values of the KPSS statistic at the 10%, 5%, 2.5% and 1% levels. */
export type KpssCriticalValues = {
  '10%': number;
  '5%': number;
  '2.5%': number;
  '1%': number;
};

const TABLE_KEY: Record<KpssKind, 'level' | 'trend'> = { const: 'level', trend: 'trend' };

function requireKind(kind: string): asserts kind is KpssKind {
  if (kind !== 'const' && kind !== 'trend') {
    throw new MooringInputError(`Unknown KPSS case '${kind}': use 'const' (level) or 'trend'.`);
  }
}

/**
 * Asymptotic upper-tail critical values of the KPSS statistic: reject stationarity when
 * the statistic is above the value. Level case 0.347 / 0.463 / 0.574 / 0.739, trend case
 * 0.119 / 0.146 / 0.176 / 0.216 at 10 / 5 / 2.5 / 1%.
 * Kwiatkowski, Phillips, Schmidt & Shin (1992), Journal of Econometrics 54, Table 1.
 */
export function kpssCriticalValues(kind: KpssKind): KpssCriticalValues {
  requireKind(kind);
  const row = kpssTable[TABLE_KEY[kind]];
  return { '10%': row['10%'], '5%': row['5%'], '2.5%': row['2.5%'], '1%': row['1%'] };
}

/**
 * p-value of a KPSS statistic by linear interpolation of the upper-tail probability
 * (0.10, 0.05, 0.025, 0.01) against the four critical values of Table 1 of
 * Kwiatkowski et al. (1992). The table spans only 0.01-0.10, so beyond it the p-value is
 * held at the end and flagged: a statistic below the 10% point gives 0.10 with
 * beyondTable 'above' (the true p-value is larger), one beyond the 1% point gives 0.01
 * with 'below' (the true p-value is smaller). A negative statistic or NaN is refused
 * (the statistic is a ratio of sums of squares).
 */
export function kpssPValue(stat: number, kind: KpssKind): TablePValue {
  requireKind(kind);
  requireNotNaN(stat, 'KPSS statistic');
  if (stat < 0) {
    throw new MooringInputError(`A KPSS statistic cannot be negative; got ${stat}.`);
  }
  const { value, end } = interpolateLinearly(
    stat,
    kpssTable.ordered[TABLE_KEY[kind]],
    kpssTable.upperTailProbabilities,
  );
  return { pValue: value, beyondTable: end === 'left' ? 'above' : end === 'right' ? 'below' : null };
}
