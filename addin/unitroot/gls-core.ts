/**
 * The part shared by DF-GLS and Ng-Perron: detrend by GLS (gls-detrend.ts), resolve the lag
 * option, search if asked, and fit the chosen regression
 *   Δy~_t = gamma y~_{t-1} + sum_{i=1..k} b_i Δy~_{t-i} + e_t   (no deterministic terms)
 * by QR on every row it can use (T - 1 - k), as the ADF test refits its chosen lag. Where only
 * tau and gamma are needed (DF-GLS) and the series is long with many lags (rows x columns^2
 * past ADF_GRAM_WORK), they come from the regression's cross products with refinement
 * (adf-tau-gram.ts), as the ADF test's chosen regression does, with QR wherever that declines.
 */
import { MooringInputError } from '../errors';
import type { AdfStatistic } from './adf-core';
import { adfRegression, type AdfRegression } from './adf-regression';
import { ADF_GRAM_WORK, adfTauByGram } from './adf-tau-gram';
import { checkGlsDeterministic, glsDetrend, type GlsDeterministic, type GlsDetrended } from './gls-detrend';
import { chooseGlsLags, GLS_LAG_RULES, type GlsLagChoice, type GlsLagOption, type GlsLagRule } from './gls-lag-search';
import { resolveMaxLag } from './max-lag';

export interface GlsTestOptions {
  deterministic?: GlsDeterministic;
  lags?: GlsLagOption;
  maxLags?: number;
}

/** R: the full QR fit (Ng-Perron reads its coefficients and SSR), or only tau and gamma (DF-GLS). */
export interface GlsCore<R extends AdfStatistic = AdfRegression> {
  deterministic: GlsDeterministic;
  detrended: GlsDetrended;
  regression: R;
  lagRule: 'fixed' | GlsLagRule;
  maxLags: number;
  choice: GlsLagChoice | null;
}

export function glsCore(series: ArrayLike<number>, options: GlsTestOptions, defaultRule: GlsLagRule): GlsCore;
export function glsCore(series: ArrayLike<number>, options: GlsTestOptions, defaultRule: GlsLagRule, need: 'tau'): GlsCore<AdfStatistic>;
export function glsCore(series: ArrayLike<number>, options: GlsTestOptions, defaultRule: GlsLagRule, need: 'fit' | 'tau' = 'fit'): GlsCore<AdfStatistic> {
  const fitChosen = (values: Float64Array, lags: number): AdfStatistic => (need === 'tau' ? tauRegression(values, lags) : adfRegression(values, lags, 'none'));
  const deterministic = checkGlsDeterministic(options.deterministic ?? 'const');
  const lags = options.lags ?? defaultRule;
  const T = series.length;
  if (typeof lags === 'number') {
    if (options.maxLags !== undefined) {
      throw new MooringInputError(`A largest lag applies only when a rule chooses the lags (aic, bic or maic); with ${lags} lags leave it out.`);
    }
    const fixed = resolveMaxLag(T, deterministic, lags, 'number of lags');
    const detrended = glsDetrend(series, deterministic);
    return { deterministic, detrended, regression: fitChosen(detrended.values, fixed), lagRule: 'fixed', maxLags: fixed, choice: null };
  }
  if (!GLS_LAG_RULES.includes(lags)) {
    throw new MooringInputError(`Unknown lag rule '${String(lags)}': use a whole number or one of ${GLS_LAG_RULES.join(', ')}.`);
  }
  const maxLags = resolveMaxLag(T, deterministic, options.maxLags);
  const detrended = glsDetrend(series, deterministic);
  const choice = chooseGlsLags(detrended.values, maxLags, lags);
  return { deterministic, detrended, regression: fitChosen(detrended.values, choice.lags), lagRule: lags, maxLags, choice };
}

/** tau and gamma of the chosen regression on the detrended series (no deterministic terms): QR, or the cross-product route on long series. */
function tauRegression(detrended: Float64Array, lags: number): AdfStatistic {
  const n = detrended.length - 1 - lags;
  const k = 1 + lags;
  if (n > 0 && n * k * k > ADF_GRAM_WORK) {
    const fast = adfTauByGram(detrended, lags, 'none');
    if (fast !== null) return { tau: fast.tau, gamma: fast.gamma, lags, nobs: fast.nobs };
  }
  return adfRegression(detrended, lags, 'none');
}
