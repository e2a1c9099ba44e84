/**
 * DF-GLS unit-root test (Elliott, Rothenberg & Stock 1996). The series is detrended by GLS
 * (gls-detrend.ts: c = -7 with a constant, -13.5 with a trend), then the augmented Dickey-Fuller
 * regression runs on the detrended series with no deterministic terms; the statistic is the
 * OLS t-ratio of the lagged level (s^2 = SSR / (n - k)). Null: a unit root; small values reject.
 * Against stationary alternatives near the unit root it is markedly more powerful than ADF.
 *
 * Critical values and p-values: Mooring's simulated response surfaces at the sample's size
 * (tables/gls-unitroot-table.ts). Lags: the modified AIC of Ng & Perron (2001) by default
 * (its size stays near the nominal level where AIC's does not; the size and power study is in
 * tests/unitroot/gls-size-and-power.test.ts), or aic, bic, or a fixed number.
 */
import { DETERMINISTIC_LABEL, type TestResult } from '../result';
import { glsCriticalValues, glsPValue, GLS_TABLE_SMALLEST_T } from '../tables/gls-unitroot-table';
import { glsCore, type GlsTestOptions } from './gls-core';
import type { GlsLagRule } from './gls-lag-search';
import { unitRootHypotheses } from './hypotheses';

/** The lag rule the GLS tests use when none is given. */
export const GLS_DEFAULT_LAG_RULE: GlsLagRule = 'maic';

export function dfglsTest(series: ArrayLike<number>, options: GlsTestOptions = {}, name = 'the series'): TestResult {
  const core = glsCore(series, options, GLS_DEFAULT_LAG_RULE, 'tau');
  const { deterministic, regression, choice } = core;
  const T = series.length;
  const p = glsPValue('tau', deterministic, regression.tau, T);
  const warnings = glsWarnings(core.maxLags, choice?.lags ?? null, T, regression.nobs);
  const { nullHypothesis, alternative } = unitRootHypotheses(name, deterministic);
  return {
    test: 'DF-GLS',
    title: `Unit-root test (DF-GLS) on ${name}`,
    statisticName: 'tau',
    statistic: regression.tau,
    pValue: p.pValue,
    ...(p.bound ? { pValueBound: p.bound, pValueNote: boundNote(p.bound) } : {}),
    critical: glsCriticalValues('tau', deterministic, T),
    rejectTail: 'lower',
    lags: regression.lags,
    lagRule: core.lagRule,
    nobs: regression.nobs,
    deterministic,
    nullHypothesis,
    alternative,
    warnings,
    details: [
      { key: 'detrending', label: 'Terms removed by GLS before the test', value: DETERMINISTIC_LABEL[deterministic] },
      { key: 'cbar', label: 'GLS non-centrality c (a = 1 + c/T)', value: core.detrended.cbar },
      { key: 'maxLags', label: 'Largest lag searched', value: choice ? core.maxLags : null },
      { key: 'criterion', label: `Lag criterion at the choice (${core.lagRule})`, value: choice ? choice.criterion : null },
      { key: 'gamma', label: 'Coefficient on the lagged detrended level (rho - 1)', value: regression.gamma },
      { key: 'tableSource', label: 'Critical values and p-value', value: `Mooring's simulation at ${Math.max(T, GLS_TABLE_SMALLEST_T)} observations` },
    ],
  };
}

/** Warnings shared by the GLS tests. */
export function glsWarnings(maxLags: number, chosen: number | null, T: number, nobs: number): string[] {
  const warnings: string[] = [];
  if (chosen !== null && chosen === maxLags && maxLags > 0) {
    warnings.push(`The lag rule chose the largest lag searched (${maxLags}); a larger maximum may fit better.`);
  }
  if (T < GLS_TABLE_SMALLEST_T) {
    warnings.push(`Only ${T} observations: the simulated table starts at ${GLS_TABLE_SMALLEST_T}, so its values there are used.`);
  }
  if (nobs < 50) warnings.push(`Only ${nobs} observations in the test regression: unit-root tests have little power in short samples.`);
  return warnings;
}

export function boundNote(bound: 'below' | 'above'): string {
  return bound === 'below'
    ? 'below 0.001: the statistic lies beyond the simulated table\'s lowest quantile'
    : 'above 0.999: the statistic lies beyond the simulated table\'s highest quantile';
}
