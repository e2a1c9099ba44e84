/**
 * Where the p-values and critical values of residual-based cointegration tests come from,
 * and what to say when a table has no entry. Dickey-Fuller (N = 1) tables are never used
 * for residuals: the residual of an estimated relation looks more stationary than a raw
 * series, so its statistic has a distribution of its own for each number of variables N
 * (Engle & Yoo 1987; Phillips & Ouliaris 1990; MacKinnon 1994, 2010).
 *
 * - tau (Engle-Granger, Phillips-Ouliaris Z-t): p-value MacKinnon (1994) for N = 2..6;
 *   critical values MacKinnon (2010) for N = 2..12 at the given sample size.
 * - z (Phillips-Ouliaris Z-alpha): p-value MacKinnon (1994) normalised-bias surfaces for
 *   N = 2..6; asymptotic critical values by inverting them.
 */
import type { Deterministic } from '../result';
import { mackinnonCriticalValues, mackinnonTauPValue, tableCaseOf } from '../tables/mackinnon-tau';
import { mackinnonZPValue, zCriticalValues } from '../tables/mackinnon-z';

/** The largest N with a MacKinnon (1994) p-value surface. */
export const MAX_P_VALUE_VARIABLES = 6;

/** The note carried instead of a p-value above MAX_P_VALUE_VARIABLES. */
export const NO_P_VALUE_NOTE = 'not available: no published p-value surface above 6 variables';

export interface TableAnswer<T> {
  value: T;
  /** Set when the table could not answer; a sentence for the result's warnings. */
  warning?: string;
}

/** MacKinnon (1994) p-value of a residual tau statistic with N variables, or null (with a note) above 6. */
export function residualTauPValue(tau: number, deterministic: Deterministic, nVariables: number): number | null {
  return mackinnonTauPValue(tau, tableCaseOf(deterministic), nVariables);
}

/** MacKinnon (1994) p-value of a residual normalised-bias statistic with N variables, or null above 6. */
export function residualZPValue(z: number, deterministic: Deterministic, nVariables: number): number | null {
  return mackinnonZPValue(z, tableCaseOf(deterministic), nVariables);
}

/**
 * MacKinnon (2010) critical values of a residual tau statistic with N variables for a
 * sample of `nobs`. Empty, with a warning, where no surface exists: the no-constant case
 * (published for N = 1 only) and N above 12.
 */
export function residualTauCritical(deterministic: Deterministic, nVariables: number, nobs: number): TableAnswer<Record<string, number>> {
  if (deterministic === 'none') {
    return {
      value: {},
      warning:
        'No critical values are published for a cointegrating regression without a constant and more than one series; the p-value (MacKinnon 1994) still applies. Include a constant to get critical values.',
    };
  }
  if (nVariables > 12) {
    return { value: {}, warning: `Critical values are published for up to 12 variables; this regression has ${nVariables}.` };
  }
  return { value: { ...mackinnonCriticalValues(tableCaseOf(deterministic), nVariables, nobs) } };
}

/** Asymptotic critical values of a residual normalised-bias statistic with N variables; empty, with a warning, above 6. */
export function residualZCritical(deterministic: Deterministic, nVariables: number): TableAnswer<Record<string, number>> {
  const cv = zCriticalValues(tableCaseOf(deterministic), nVariables);
  if (cv === null) {
    return { value: {}, warning: `Z-alpha critical values are available for up to ${MAX_P_VALUE_VARIABLES} variables; this regression has ${nVariables}.` };
  }
  return { value: { ...cv } };
}
