/**
 * Augmented Dickey-Fuller unit-root test (Dickey & Fuller 1979; Said & Dickey 1984).
 * Null: the series has a unit root. The statistic is the t-ratio on the lagged level in the
 * ADF regression; small (very negative) values reject.
 * p-values: MacKinnon (1994) approximate asymptotic surfaces, N = 1.
 * Critical values: MacKinnon (2010) finite-sample response surfaces at T = observations in
 * the test regression.
 */
import { MooringInputError } from '../errors';
import { DETERMINISTIC_WORDS, type Deterministic, type TestResult } from '../result';
import { mackinnonCriticalValues, mackinnonTauPValue, tableCaseOf } from '../tables/mackinnon-tau';
import { adfCore, type LagOption } from './adf-core';
import { unitRootHypotheses } from './hypotheses';

export interface AdfOptions {
  deterministic?: Deterministic;
  lags?: LagOption;
  maxLags?: number;
}

export function adfTest(series: ArrayLike<number>, options: AdfOptions = {}, name = 'the series'): TestResult {
  const deterministic = options.deterministic ?? 'const';
  if (!DETERMINISTIC_WORDS.includes(deterministic)) {
    throw new MooringInputError(`Unknown deterministic terms '${String(deterministic)}': use one of ${DETERMINISTIC_WORDS.join(', ')}.`);
  }
  const core = adfCore(series, { deterministic, lags: options.lags, maxLags: options.maxLags });
  const { tau, lags, nobs } = core.regression;
  const tableCase = tableCaseOf(deterministic);
  const warnings: string[] = [];
  if (core.choice && core.choice.lags === core.maxLags && core.maxLags > 0) {
    warnings.push(`The lag rule chose the largest lag searched (${core.maxLags}); a larger maximum may fit better.`);
  }
  if (nobs < 50) warnings.push(`Only ${nobs} observations in the test regression: unit-root tests have little power in short samples.`);
  const { nullHypothesis, alternative } = unitRootHypotheses(name, deterministic);
  return {
    test: 'ADF',
    title: `Unit-root test (ADF) on ${name}`,
    statisticName: 'tau',
    statistic: tau,
    pValue: mackinnonTauPValue(tau, tableCase, 1),
    critical: mackinnonCriticalValues(tableCase, 1, nobs),
    rejectTail: 'lower',
    lags,
    lagRule: core.lagRule,
    nobs,
    deterministic,
    nullHypothesis,
    alternative,
    warnings,
    details: [
      { key: 'maxLags', label: 'Largest lag searched', value: core.choice ? core.maxLags : null },
      { key: 'criterion', label: `Lag criterion at the choice (${core.lagRule})`, value: core.choice ? core.choice.criterion : null },
      { key: 'gamma', label: 'Coefficient on the lagged level (rho - 1)', value: core.regression.gamma },
    ],
  };
}
