/**
 * How many lags a lead-lag test uses: a number given by the user, or the order AIC or BIC
 * chooses for a VAR of the pair (chooseVarLags: every order on a common sample, a constant,
 * default ceiling round(12 (T/100)^(1/4))). A causality test needs at least one lag, so a
 * criterion that prefers none is lifted to 1, and the result says so.
 */
import { MooringInputError } from '../errors';
import { chooseVarLags } from '../var/choose-var-lags';

/** A fixed number of lags, or the criterion that picks them. */
export type LagChoice = number | 'aic' | 'bic';

/** The lag count a test will use and how it was found. */
export interface ResolvedLags {
  lags: number;
  /** "fixed", "aic" or "bic" (the TestResult's lagRule). */
  rule: 'fixed' | 'aic' | 'bic';
  /** Set when the criterion chose 0 and the test uses 1. */
  liftedFromZero: boolean;
  /** Largest order searched, when a criterion chose. */
  maxLags?: number;
}

/** Resolves a lag choice on the given pair (already checked), lifting a criterion's 0 to 1. */
export function resolveLags(pair: readonly Float64Array[], choice: LagChoice | undefined, maxLags?: number): ResolvedLags {
  const wanted = choice ?? 'aic';
  if (wanted === 'aic' || wanted === 'bic') {
    const sel = chooseVarLags(pair, { maxLags });
    const chosen = sel[wanted];
    return { lags: Math.max(1, chosen), rule: wanted, liftedFromZero: chosen === 0, maxLags: sel.maxLags };
  }
  if (typeof wanted !== 'number' || !Number.isInteger(wanted) || wanted < 1) {
    throw new MooringInputError(`The lags must be a whole number of at least 1, or 'aic' or 'bic'; got ${String(wanted)}.`);
  }
  return { lags: wanted, rule: 'fixed', liftedFromZero: false };
}

/** The warning that goes with a lifted choice, or none. */
export function liftedWarning(resolved: ResolvedLags): string[] {
  if (!resolved.liftedFromZero) return [];
  return [
    `${resolved.rule.toUpperCase()} preferred no lags at all (neither series' past helps much); the test uses 1 lag, the fewest it can.`,
  ];
}
