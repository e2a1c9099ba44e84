/**
 * The part shared by DF-GLS and Ng-Perron: detrend by GLS (gls-detrend.ts), resolve the lag
 * option, search if asked, and fit the chosen regression
 *   Δy~_t = gamma y~_{t-1} + sum_{i=1..k} b_i Δy~_{t-i} + e_t   (no deterministic terms)
 * by QR on every row it can use (T - 1 - k), as the ADF test refits its chosen lag.
 */
import { MooringInputError } from '../errors';
import { adfRegression, type AdfRegression } from './adf-regression';
import { checkGlsDeterministic, glsDetrend, type GlsDeterministic, type GlsDetrended } from './gls-detrend';
import { chooseGlsLags, GLS_LAG_RULES, type GlsLagChoice, type GlsLagOption, type GlsLagRule } from './gls-lag-search';
import { resolveMaxLag } from './max-lag';

export interface GlsTestOptions {
  deterministic?: GlsDeterministic;
  lags?: GlsLagOption;
  maxLags?: number;
}

export interface GlsCore {
  deterministic: GlsDeterministic;
  detrended: GlsDetrended;
  regression: AdfRegression;
  lagRule: 'fixed' | GlsLagRule;
  maxLags: number;
  choice: GlsLagChoice | null;
}

export function glsCore(series: ArrayLike<number>, options: GlsTestOptions, defaultRule: GlsLagRule): GlsCore {
  const deterministic = checkGlsDeterministic(options.deterministic ?? 'const');
  const lags = options.lags ?? defaultRule;
  const T = series.length;
  if (typeof lags === 'number') {
    if (options.maxLags !== undefined) {
      throw new MooringInputError(`A largest lag applies only when a rule chooses the lags (aic, bic or maic); with ${lags} lags leave it out.`);
    }
    const fixed = resolveMaxLag(T, deterministic, lags, 'number of lags');
    const detrended = glsDetrend(series, deterministic);
    return { deterministic, detrended, regression: adfRegression(detrended.values, fixed, 'none'), lagRule: 'fixed', maxLags: fixed, choice: null };
  }
  if (!GLS_LAG_RULES.includes(lags)) {
    throw new MooringInputError(`Unknown lag rule '${String(lags)}': use a whole number or one of ${GLS_LAG_RULES.join(', ')}.`);
  }
  const maxLags = resolveMaxLag(T, deterministic, options.maxLags);
  const detrended = glsDetrend(series, deterministic);
  const choice = chooseGlsLags(detrended.values, maxLags, lags);
  return { deterministic, detrended, regression: adfRegression(detrended.values, choice.lags, 'none'), lagRule: lags, maxLags, choice };
}
