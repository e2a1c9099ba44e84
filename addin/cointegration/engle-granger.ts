/**
 * Engle-Granger (1987) two-step cointegration test.
 * Step 1: least squares of y on the xs and the deterministic terms (cointegrating-regression.ts).
 * Step 2: augmented Dickey-Fuller test on the step-1 residual with no deterministic terms
 * (the residual already has mean zero, and a trend too when step 1 had one), by the same
 * lag rules as the unit-root test (adfCore with 'none'), the largest lag at most T/2 - 1.
 * Null: no cointegration (the residual has a unit root); very negative tau rejects.
 *
 * p-value: MacKinnon (1994) with the step-1 deterministic case and N = y plus the xs (null
 * above 6 variables, with a note). Critical values: MacKinnon (2010) with N and T - 1
 * observations, T the length of the series (the reference library's count).
 *
 * When y is an exact combination of the xs (R^2 >= 1 - 100 sqrt(eps), the reference
 * library's rule), the residual is rounding noise and an ADF on it means nothing. We then
 * report tau = -Infinity and p = 0 with a warning, rather than refusing: the finding (the
 * series move as one up to scale) is true and is the strongest cointegration there is, and
 * a refusal would turn it into a cell error; the warning names the usual cause (one column
 * copied or computed from another). The reference library does the same (-inf, p = 0).
 */
import { MooringInputError } from '../errors';
import type { Deterministic, ResultDetail, TestResult } from '../result';
import { adfCore, type LagOption } from '../unitroot/adf-core';
import { LAG_RULES } from '../unitroot/adf-lag-search';
import { resolveMaxLag } from '../unitroot/max-lag';
import { cointegratingRegression, cointegrationHypotheses, type SeriesNames } from './cointegrating-regression';
import { NO_P_VALUE_NOTE, residualTauCritical, residualTauPValue } from './residual-tables';
import { coefficientDetails, exactFitVerdict, exactFitWarning, residualTestVerdict } from './residual-test-report';
import { listText } from './wording';

export interface EngleGrangerOptions {
  /** Deterministic terms in the step-1 regression (default a constant). */
  deterministic?: Deterministic;
  /** Lagged changes in the residual ADF: a whole number or a rule (default 'aic'). */
  lags?: LagOption;
  /** Largest lag a rule searches (default Schwert's 12 (T/100)^(1/4), capped at T/2 - 1). */
  maxLags?: number;
}

export interface EngleGrangerResult {
  test: TestResult;
  /** Coefficients on the xs, in order. */
  beta: number[];
  intercept: number | null;
  trendCoefficient: number | null;
  /** Step-1 residuals: the estimated equilibrium error. */
  residuals: Float64Array;
  /** N: y plus the xs. */
  nVariables: number;
  rSquared: number;
  /** One sentence at the 5% level. */
  verdict: string;
}

export function engleGranger(
  y: ArrayLike<number>,
  xs: ArrayLike<number>[],
  options: EngleGrangerOptions = {},
  names?: Partial<SeriesNames>,
): EngleGrangerResult {
  const deterministic = options.deterministic ?? 'const';
  const step1 = cointegratingRegression(y, xs, deterministic, names);
  const T = step1.nobs;
  const N = step1.nVariables;
  const warnings: string[] = [];
  const details: ResultDetail[] = coefficientDetails(step1);

  let tau: number;
  let lags: number | null;
  let nobs: number;
  let lagRule: string | undefined;
  if (step1.exactFit) {
    checkLagOptions(T, options);
    tau = -Infinity;
    lags = null;
    nobs = T - 1;
    warnings.push(exactFitWarning(step1));
  } else {
    const core = adfCore(step1.residuals, { deterministic: 'none', lags: options.lags, maxLags: options.maxLags });
    tau = core.regression.tau;
    lags = core.regression.lags;
    nobs = core.regression.nobs;
    lagRule = core.lagRule;
    if (core.choice && core.choice.lags === core.maxLags && core.maxLags > 0) {
      warnings.push(`The lag rule chose the largest lag searched (${core.maxLags}); a larger maximum may fit better.`);
    }
    details.push(
      { key: 'maxLags', label: 'Largest lag searched', value: core.choice ? core.maxLags : null },
      { key: 'criterion', label: `Lag criterion at the choice (${core.lagRule})`, value: core.choice ? core.choice.criterion : null },
      { key: 'gamma', label: 'Coefficient on the lagged residual (rho - 1)', value: core.regression.gamma },
    );
  }
  if (T < 50) warnings.push(`Only ${T} observations: cointegration tests have little power in short samples.`);

  const pValue = residualTauPValue(tau, deterministic, N);
  const critical = residualTauCritical(deterministic, N, T - 1);
  if (critical.warning) warnings.push(critical.warning);
  const { nullHypothesis, alternative } = cointegrationHypotheses(step1);
  const test: TestResult = {
    test: 'Engle-Granger',
    title: `Cointegration test (Engle-Granger) of ${step1.names.y} on ${listText(step1.names.xs)}`,
    statisticName: 'tau',
    statistic: tau,
    pValue,
    ...(pValue === null ? { pValueNote: NO_P_VALUE_NOTE } : {}),
    critical: critical.value,
    rejectTail: 'lower',
    lags,
    ...(lagRule ? { lagRule } : {}),
    nobs,
    deterministic,
    nullHypothesis,
    alternative,
    warnings,
    details,
  };
  return {
    test,
    beta: step1.beta,
    intercept: step1.intercept,
    trendCoefficient: step1.trendCoefficient,
    residuals: step1.residuals,
    nVariables: N,
    rSquared: step1.rSquared,
    verdict: step1.exactFit ? exactFitVerdict(step1) : residualTestVerdict(test, step1, 0.05),
  };
}

/** Validates the lag options the residual ADF would have used, so an exact fit still refuses a bad request. */
function checkLagOptions(T: number, options: EngleGrangerOptions): void {
  const lags = options.lags ?? 'aic';
  if (typeof lags === 'number') {
    resolveMaxLag(T, 'none', lags, 'number of lags');
    return;
  }
  if (!LAG_RULES.includes(lags)) {
    throw new MooringInputError(`Unknown lag rule '${String(lags)}': use a whole number or one of ${LAG_RULES.join(', ')}.`);
  }
  resolveMaxLag(T, 'none', options.maxLags);
}
