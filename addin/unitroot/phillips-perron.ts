/**
 * Phillips-Perron unit-root test (Phillips & Perron 1988). From the Dickey-Fuller regression
 * without lags, Δx_t = gamma x_{t-1} + deterministic + u_t (n rows, s^2 = SSR/(n-k),
 * se = standard error of gamma, t = gamma/se), the short-run variance g0 = SSR/n and the
 * Bartlett long-run variance lambda^2 of u correct for serial correlation:
 *   Z-alpha = n gamma - (n^2 se^2 / s^2) (lambda^2 - g0) / 2,
 *   Z-tau   = sqrt(g0/lambda^2) t - (lambda^2 - g0) n se / (2 lambda s)
 * (Hamilton 1994, eqs. 17.6.8 and 17.6.12). Z-tau shares the ADF tau distribution, so it takes
 * the MacKinnon (1994) tau p-values and MacKinnon (2010) critical values; Z-alpha takes the
 * MacKinnon (1994) normalised-bias p-value surfaces (N = 1).
 */
import { MooringInputError } from '../errors';
import { DETERMINISTIC_WORDS, type Deterministic, type TestResult } from '../result';
import { bartlettLongRunVariance, neweyWestBandwidth } from '../regression/long-run-variance';
import { mackinnonCriticalValues, mackinnonTauPValue, tableCaseOf } from '../tables/mackinnon-tau';
import { mackinnonZPValue } from '../tables/mackinnon-z';
import { toUnitScale } from '../linalg/power-of-two-scale';
import { adfRegression } from './adf-regression';
import { unitRootHypotheses } from './hypotheses';

export interface PhillipsPerronOptions {
  deterministic?: Deterministic;
  bandwidth?: number | 'auto';
}

export interface PhillipsPerronStatistics {
  zTau: number;
  zAlpha: number;
  bandwidth: number;
  nobs: number;
}

/**
 * Z-tau and Z-alpha from the lag-0 Dickey-Fuller regression of x. Both are free of units, so x is
 * first brought to a size near one (linalg/power-of-two-scale.ts): the variances below would
 * overflow for prices of 1e300 and vanish for prices of 1e-300.
 */
export function phillipsPerronStatistics(x: ArrayLike<number>, deterministic: Deterministic, bandwidth: number | 'auto'): PhillipsPerronStatistics {
  const { fit, gamma, tau, nobs: n } = adfRegression(toUnitScale(x).values, 0, deterministic);
  const u = fit.residuals;
  const L = bandwidth === 'auto' ? neweyWestBandwidth(u) : bandwidth;
  const lambda2 = bartlettLongRunVariance(u, L);
  const g0 = fit.ssr / n;
  const se = fit.standardErrors[0];
  const s2 = fit.sigma2;
  const zAlpha = n * gamma - ((n * n * se * se) / s2) * (lambda2 - g0) / 2;
  const zTau = Math.sqrt(g0 / lambda2) * tau - ((lambda2 - g0) * n * se) / (2 * Math.sqrt(lambda2) * Math.sqrt(s2));
  return { zTau, zAlpha, bandwidth: L, nobs: n };
}

export function phillipsPerronTest(series: ArrayLike<number>, options: PhillipsPerronOptions = {}, name = 'the series'): TestResult {
  const deterministic = options.deterministic ?? 'const';
  if (!DETERMINISTIC_WORDS.includes(deterministic)) {
    throw new MooringInputError(`Unknown deterministic terms '${String(deterministic)}': use one of ${DETERMINISTIC_WORDS.join(', ')}.`);
  }
  const requested = options.bandwidth ?? 'auto';
  if (requested !== 'auto' && typeof requested !== 'number') {
    throw new MooringInputError(`Unknown bandwidth '${String(requested)}': use a whole number or auto.`);
  }
  const stats = phillipsPerronStatistics(series, deterministic, requested);
  const tableCase = tableCaseOf(deterministic);
  const { nullHypothesis, alternative } = unitRootHypotheses(name, deterministic);
  const warnings: string[] = [];
  if (stats.nobs < 50) warnings.push(`Only ${stats.nobs} observations: the Phillips-Perron corrections are unreliable in short samples.`);
  return {
    test: 'PP',
    title: `Unit-root test (Phillips-Perron) on ${name}`,
    statisticName: 'Z-tau',
    statistic: stats.zTau,
    pValue: mackinnonTauPValue(stats.zTau, tableCase, 1),
    critical: mackinnonCriticalValues(tableCase, 1, stats.nobs),
    rejectTail: 'lower',
    lags: null,
    bandwidth: stats.bandwidth,
    nobs: stats.nobs,
    deterministic,
    nullHypothesis,
    alternative,
    warnings,
    details: [
      { key: 'zAlpha', label: 'Z-alpha (normalised bias)', value: stats.zAlpha },
      { key: 'zAlphaPValue', label: 'p-value of Z-alpha', value: mackinnonZPValue(stats.zAlpha, tableCase, 1) },
      { key: 'bandwidthRule', label: 'Bandwidth rule', value: requested === 'auto' ? 'Newey-West (1994) automatic' : 'fixed' },
    ],
  };
}
