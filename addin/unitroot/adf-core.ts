/**
 * The part of the augmented Dickey-Fuller test shared by the unit-root test and the
 * Engle-Granger residual test: resolve the lag option, search if asked, and fit the chosen
 * regression on all the observations it can use (the reference library re-estimates the
 * chosen lag on its full sample too, so statistics and nobs compare exactly).
 */
import { MooringInputError } from '../errors';
import type { Deterministic } from '../result';
import { deterministicCount } from '../regression/deterministic-terms';
import { adfRegression, type AdfRegression } from './adf-regression';
import { ADF_GRAM_WORK, adfTauByGram } from './adf-tau-gram';
import { chooseAdfLags, LAG_RULES, type LagChoice, type LagRule } from './adf-lag-search';
import { resolveMaxLag } from './max-lag';
import { dickeyFullerGram, type DickeyFullerGram } from '../regression/lagged-difference-gram';

/** A fixed number of lagged changes, or a rule that chooses it. */
export type LagOption = number | LagRule;

export interface AdfCoreOptions {
  deterministic: Deterministic;
  lags?: LagOption;
  maxLags?: number;
  /** Deterministic count used for the maximum-lag cap (the Engle-Granger residual test caps at T/2 - 1). */
  capDeterministic?: Deterministic;
}

/** What the tests read of the chosen regression; the full QR fit only where it was made. */
export type AdfStatistic = Pick<AdfRegression, 'tau' | 'gamma' | 'lags' | 'nobs'> & { fit?: AdfRegression['fit'] };

export interface AdfCore {
  regression: AdfStatistic;
  lagRule: 'fixed' | LagRule;
  maxLags: number;
  choice: LagChoice | null;
}

export function adfCore(x: ArrayLike<number>, options: AdfCoreOptions): AdfCore {
  const lags = options.lags ?? 'aic';
  const cap = options.capDeterministic ?? options.deterministic;
  if (typeof lags === 'number') {
    const fixed = resolveMaxLag(x.length, cap, lags, 'number of lags');
    return { regression: chosenRegression(x, fixed, options.deterministic), lagRule: 'fixed', maxLags: fixed, choice: null };
  }
  if (!LAG_RULES.includes(lags)) {
    throw new MooringInputError(`Unknown lag rule '${String(lags)}': use a whole number or one of ${LAG_RULES.join(', ')}.`);
  }
  const maxLags = resolveMaxLag(x.length, cap, options.maxLags);
  // The search's cross products are built once: where it chooses its largest lag, the chosen
  // regression has the same sample and columns, and reads them again.
  const gram = dickeyFullerGram(x, options.deterministic, maxLags);
  const choice = chooseAdfLags(x, options.deterministic, maxLags, lags, gram);
  return { regression: chosenRegression(x, choice.lags, options.deterministic, choice.lags === maxLags ? gram : undefined), lagRule: lags, maxLags, choice };
}

/**
 * The chosen regression: by QR, or for long series with many lags (rows x columns^2 past
 * ADF_GRAM_WORK) from its O(n p) cross products (adf-tau-gram.ts), with QR wherever those
 * are not numerically safe.
 */
function chosenRegression(x: ArrayLike<number>, lags: number, deterministic: Deterministic, gram?: DickeyFullerGram): AdfStatistic {
  const n = x.length - 1 - lags;
  const k = 1 + lags + deterministicCount(deterministic);
  if (n > 0 && n * k * k > ADF_GRAM_WORK) {
    const fast = adfTauByGram(x, lags, deterministic, gram);
    if (fast !== null) return { tau: fast.tau, gamma: fast.gamma, lags, nobs: fast.nobs };
  }
  return adfRegression(x, lags, deterministic);
}
