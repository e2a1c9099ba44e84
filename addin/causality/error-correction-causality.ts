/**
 * Lead-lag tests in the error-correction form, for a cointegrated pair (Granger 1988; Engle &
 * Granger 1987). In the effect's equation
 *   d effect_t = c + alpha u_{t-1} + sum_{j=1..p} a_j d effect_{t-j} + sum_{j=1..p} b_j d cause_{t-j} + e_t,
 * with u the equilibrium error (the residual of the cointegrating regression):
 *   short run: F (and Wald chi-square) that b_1 = ... = b_p = 0, F(p, n - 2p - 2);
 *   long run:  t-test that alpha = 0, Student t(n - 2p - 2), two-sided.
 * Rows t = p + 2..T (n = T - p - 1): the p lagged changes use up p + 1 levels.
 * Every regressor is stationary when the pair is cointegrated, so the usual F and t apply.
 *
 * Without a given equilibrium error, u is the residual of OLS of the effect on a constant and the
 * cause over the whole sample (the first step of Engle & Granger 1987).
 */
import { powerOfTwoScale, scaled } from '../linalg/power-of-two-scale';
import { MooringInputError } from '../errors';
import { chiSquareUpperP, fCriticalValues, fUpperP, studentTwoSidedP } from '../distributions';
import { leastSquares } from '../regression/least-squares';
import type { TestResult } from '../result';
import { coefficientWald } from '../var/coefficient-wald';
import { checkedBlock, differences, laggedColumn } from '../var/var-design';
import { resolveLags, type LagChoice } from './causality-lags';
import { DEFAULT_PAIR_NAMES, longRunHypotheses, possessive, shortRunHypotheses, type PairNames } from './causality-wording';

/** Options of errorCorrectionCausality. */
export interface ErrorCorrectionOptions {
  /** p lagged changes of each series. A number, or 'aic'/'bic': the VAR order in levels less one (at least 1). Default 'aic'. */
  lags?: LagChoice;
  /** The equilibrium error u_t for every row of the pair (e.g. from Engle-Granger); default: OLS of effect on a constant and cause. */
  equilibriumError?: ArrayLike<number>;
  maxLags?: number;
}

/** Both error-correction tests, the long-run relation used and the adjustment coefficient. */
export interface ErrorCorrectionCausality {
  shortRun: TestResult;
  longRun: TestResult;
  /** The cointegrating regression effect = intercept + slope cause, when it was fitted here. */
  equilibrium: { intercept: number; slope: number } | null;
  /** alpha, the coefficient on u_{t-1}. */
  adjustment: number;
}

/** Short-run (lagged changes of the cause) and long-run (error-correction term) lead-lag tests. */
export function errorCorrectionCausality(cause: ArrayLike<number>, effect: ArrayLike<number>, options: ErrorCorrectionOptions = {}, names: PairNames = DEFAULT_PAIR_NAMES): ErrorCorrectionCausality {
  const [rawX, rawY] = checkedBlock([cause, effect], [names.cause, names.effect]);
  // The tests are free of units; the sums of squares are not (they overflow for prices of 1e300
  // and vanish for 1e-300): both series (and a given equilibrium error, in the effect's units)
  // are brought to a size near one by a power of two; the long-run line is converted back.
  const fx = powerOfTwoScale(rawX);
  const fy = powerOfTwoScale(rawY);
  const x = scaled(rawX, fx);
  const y = scaled(rawY, fy);
  const T = y.length;
  let p: number;
  let lagRule: 'fixed' | 'aic' | 'bic';
  if (options.lags === 'aic' || options.lags === 'bic' || options.lags === undefined) {
    const resolved = resolveLags([x, y], options.lags, options.maxLags);
    p = Math.max(1, resolved.lags - 1);
    lagRule = resolved.rule;
  } else {
    p = resolveLags([x, y], options.lags).lags;
    lagRule = 'fixed';
  }
  const n = T - p - 1;
  const k = 2 * p + 2;
  if (n <= k + 1) {
    throw new MooringInputError(
      `The error-correction test with ${p} lagged changes needs at least ${p + k + 3} rows; the series have ${T}. Use fewer lags or a longer history.`,
    );
  }

  let u: Float64Array;
  let equilibrium: ErrorCorrectionCausality['equilibrium'] = null;
  if (options.equilibriumError === undefined) {
    const step1 = leastSquares(y, [new Float64Array(T).fill(1), x], { names: ['constant', names.cause], withoutCovariance: true });
    u = step1.residuals;
    equilibrium = { intercept: step1.coefficients[0] / fy, slope: (step1.coefficients[1] * fx) / fy };
  } else {
    [u] = checkedBlock([options.equilibriumError], ['The equilibrium error']);
    u = scaled(u, fy);
    if (u.length !== T) {
      throw new MooringInputError(`The equilibrium error has ${u.length} values but the series have ${T}: give one value per row of the pair.`);
    }
  }

  // Changes: dx[i] = x[i + 1] - x[i], so the change at level row t is dx[t - 1].
  const dx = differences(x);
  const dy = differences(y);
  const start = p; // first change row used: level row p + 1
  const response = dy.slice(start);
  const columns: Float64Array[] = [new Float64Array(n).fill(1), laggedColumn(u, 0, start, n)];
  const columnNames = ['constant', 'equilibrium error, lag 1'];
  for (let j = 1; j <= p; j++) {
    columns.push(laggedColumn(dy, j, start, n));
    columnNames.push(`change in ${names.effect}, lag ${j}`);
  }
  const causeColumns: Float64Array[] = [];
  for (let j = 1; j <= p; j++) {
    causeColumns.push(laggedColumn(dx, j, start, n));
    columnNames.push(`change in ${names.cause}, lag ${j}`);
  }
  const full = leastSquares(response, [...columns, ...causeColumns], { names: columnNames });
  const restricted = leastSquares(response, columns, { names: columnNames.slice(0, columns.length), withoutCovariance: true });
  if (!(full.ssr > 0) || full.rSquared > 1 - Number.EPSILON) {
    throw new MooringInputError(`The changes in ${names.effect} are predicted exactly, so no test is possible: check that the series are not copies or shifts of each other.`);
  }

  const df = full.dfResid;
  const fStatistic = ((restricted.ssr - full.ssr) / p) / (full.ssr / df);
  const causePositions = causeColumns.map((_, j) => columns.length + j);
  const wald = coefficientWald(full, causePositions);
  const adjustment = full.coefficients[1];
  const tStatistic = full.tValues[1];
  const warnings: string[] = [];
  if (n < 30) warnings.push(`Only ${n} rows in the regression: the tests have little power this short.`);
  if (equilibrium !== null) {
    // Mooring's simulation (tests/causality/error-correction-monte-carlo.test.ts): 7.9% and 8.6% at T = 200 on two seeds.
    warnings.push(
      'The equilibrium error was estimated from the same data by a static regression; in samples of a few hundred rows this makes the short-run test reject a true null somewhat too often (8% to 9% instead of 5% in a simulation with 200 rows). Confirm with Toda-Yamamoto.',
    );
  }
  const longWarnings = [...warnings];
  if (equilibrium !== null && adjustment > 0) {
    longWarnings.push(
      `The error-correction coefficient is positive (${adjustment.toPrecision(3)}): ${names.effect} moves away from the long-run relation rather than back to it, which does not fit a cointegrated pair. Check the cointegration evidence.`,
    );
  }
  if (adjustment < -2) longWarnings.push('The error-correction coefficient is below -2: the adjustment overshoots, which suggests the model is misspecified.');
  const common = { lags: p, lagRule, nobs: n, deterministic: 'const' as const, critical: {} };
  const equilibriumRule = equilibrium === null ? 'given' : `OLS of ${names.effect} on a constant and ${names.cause}`;

  const shortRun: TestResult = {
    test: 'Error-correction short run',
    title: `Short-run lead-lag test (error-correction form): do changes in ${names.cause} lead ${names.effect}?`,
    statisticName: 'F',
    statistic: fStatistic,
    pValue: fUpperP(fStatistic, p, df),
    rejectTail: 'upper',
    ...common,
    critical: fCriticalValues(p, df),
    ...shortRunHypotheses(names),
    warnings,
    details: [
      { key: 'dfNumerator', label: 'F degrees of freedom, numerator (lags tested)', value: p },
      { key: 'dfDenominator', label: 'F degrees of freedom, denominator', value: df },
      { key: 'waldChiSquare', label: `Wald chi-square on ${possessive(names.cause)} lagged changes`, value: wald.statistic },
      { key: 'waldPValue', label: 'Wald chi-square p-value', value: chiSquareUpperP(wald.statistic, p) },
      { key: 'equilibriumError', label: 'Equilibrium error', value: equilibriumRule },
    ],
  };
  const longRun: TestResult = {
    test: 'Error-correction long run',
    title: `Long-run lead-lag test (error-correction term): does ${names.effect} adjust to its relation with ${names.cause}?`,
    statisticName: 't',
    statistic: tStatistic,
    pValue: studentTwoSidedP(tStatistic, df),
    rejectTail: 'lower',
    ...common,
    ...longRunHypotheses(names),
    warnings: longWarnings,
    details: [
      { key: 'adjustment', label: 'Error-correction coefficient (share of the gap closed per period, negative when closing)', value: adjustment },
      { key: 'adjustmentStandardError', label: 'Its standard error', value: full.standardErrors[1] },
      { key: 'df', label: 'Student t degrees of freedom', value: df },
      { key: 'equilibriumError', label: 'Equilibrium error', value: equilibriumRule },
      ...(equilibrium === null
        ? []
        : [
            { key: 'equilibriumIntercept', label: 'Long-run relation: intercept', value: equilibrium.intercept },
            { key: 'equilibriumSlope', label: `Long-run relation: slope on ${names.cause}`, value: equilibrium.slope },
          ]),
    ],
  };
  return { shortRun, longRun, equilibrium, adjustment };
}
