/**
 * Phillips-Ouliaris (1990) residual-based cointegration tests Z-t and Z-alpha.
 * Step 1 is the Engle-Granger cointegrating regression. On its residual u, the AR(1)
 * regression without deterministic terms, Δu_t = gamma u_{t-1} + k_t (gamma = rho - 1,
 * n = T - 1 rows), and a Bartlett long-run variance lambda^2 of k correct for serial
 * correlation exactly as in the Phillips-Perron test (phillipsPerronStatistics with 'none'):
 *   Z-alpha = n gamma - (n^2 se^2 / s^2) (lambda^2 - g0) / 2,
 *   Z-t     = sqrt(g0/lambda^2) t - (lambda^2 - g0) n se / (2 lambda s),
 * g0 = SSR/n the short-run variance. With bandwidth 0 (lambda^2 = g0) they reduce to
 * n(rho - 1) and the Dickey-Fuller t on the residual, which the tests check.
 *
 * Bandwidth: fixed, or the Newey-West (1994) automatic rule on k ('auto', the default).
 * Z-t shares the residual-ADF limit: MacKinnon (1994) tau p-values and MacKinnon (2010)
 * critical values with N variables at T - 1 observations (as for Engle-Granger). Z-alpha
 * takes MacKinnon's (1994) normalised-bias surfaces for N variables, with asymptotic
 * critical values from inverting them. The headline statistic is Z-t.
 */
import { MooringInputError } from '../errors';
import type { Deterministic, TestResult } from '../result';
import { phillipsPerronStatistics } from '../unitroot/phillips-perron';
import {
  cointegratingRegression,
  cointegrationHypotheses,
  type SeriesNames,
} from './cointegrating-regression';
import { coefficientDetails, exactFitVerdict, exactFitWarning, residualTestVerdict } from './residual-test-report';
import { NO_P_VALUE_NOTE, residualTauCritical, residualTauPValue, residualZCritical, residualZPValue } from './residual-tables';
import { listText } from './wording';

export interface PhillipsOuliarisOptions {
  deterministic?: Deterministic;
  /** Bartlett bandwidth: a whole number, or 'auto' for Newey-West (1994) (default). */
  bandwidth?: number | 'auto';
}

export interface PhillipsOuliarisResult {
  /** Headline Z-t with its p-value; Z-alpha and its p-value among the details. */
  test: TestResult;
  zt: number;
  zAlpha: number;
  zAlphaPValue: number | null;
  /** Asymptotic 1/5/10% points of Z-alpha for N variables (empty above 6). */
  zAlphaCritical: Record<string, number>;
  bandwidth: number;
  beta: number[];
  intercept: number | null;
  trendCoefficient: number | null;
  residuals: Float64Array;
  nVariables: number;
  verdict: string;
}

export function phillipsOuliaris(
  y: ArrayLike<number>,
  xs: ArrayLike<number>[],
  options: PhillipsOuliarisOptions = {},
  names?: Partial<SeriesNames>,
): PhillipsOuliarisResult {
  const deterministic = options.deterministic ?? 'const';
  const requested = options.bandwidth ?? 'auto';
  if (requested !== 'auto' && typeof requested !== 'number') {
    throw new MooringInputError(`Unknown bandwidth '${String(requested)}': use a whole number or auto.`);
  }
  const step1 = cointegratingRegression(y, xs, deterministic, names);
  const T = step1.nobs;
  const N = step1.nVariables;
  const warnings: string[] = [];
  let zt = -Infinity;
  let zAlpha = -Infinity;
  let bandwidth = typeof requested === 'number' ? requested : 0;
  if (step1.exactFit) {
    warnings.push(exactFitWarning(step1));
  } else {
    const stats = phillipsPerronStatistics(step1.residuals, 'none', requested);
    zt = stats.zTau;
    zAlpha = stats.zAlpha;
    bandwidth = stats.bandwidth;
  }
  if (T < 50) warnings.push(`Only ${T} observations: the Phillips-Ouliaris corrections are unreliable in short samples.`);

  const nobs = T - 1;
  const pValue = residualTauPValue(zt, deterministic, N);
  const zAlphaPValue = residualZPValue(zAlpha, deterministic, N);
  const critical = residualTauCritical(deterministic, N, nobs);
  const zAlphaCritical = residualZCritical(deterministic, N);
  for (const w of [critical.warning, zAlphaCritical.warning]) if (w) warnings.push(w);
  const { nullHypothesis, alternative } = cointegrationHypotheses(step1);
  const test: TestResult = {
    test: 'Phillips-Ouliaris',
    title: `Cointegration test (Phillips-Ouliaris) of ${step1.names.y} on ${listText(step1.names.xs)}`,
    statisticName: 'Z-t',
    statistic: zt,
    pValue,
    ...(pValue === null ? { pValueNote: NO_P_VALUE_NOTE } : {}),
    critical: critical.value,
    rejectTail: 'lower',
    lags: null,
    bandwidth,
    nobs,
    deterministic,
    nullHypothesis,
    alternative,
    warnings,
    details: [
      { key: 'zAlpha', label: 'Z-alpha (normalised bias)', value: zAlpha },
      { key: 'zAlphaPValue', label: 'p-value of Z-alpha', value: zAlphaPValue },
      ...Object.entries(zAlphaCritical.value).map(([level, v]) => ({ key: `zAlphaCritical${level.replace('%', '')}`, label: `Z-alpha ${level} critical value (asymptotic)`, value: v })),
      { key: 'bandwidthRule', label: 'Bandwidth rule', value: requested === 'auto' ? 'Newey-West (1994) automatic' : 'fixed' },
      ...coefficientDetails(step1),
    ],
  };
  return {
    test,
    zt,
    zAlpha,
    zAlphaPValue,
    zAlphaCritical: zAlphaCritical.value,
    bandwidth,
    beta: step1.beta,
    intercept: step1.intercept,
    trendCoefficient: step1.trendCoefficient,
    residuals: step1.residuals,
    nVariables: N,
    verdict: step1.exactFit ? exactFitVerdict(step1) : residualTestVerdict(test, step1, 0.05),
  };
}
