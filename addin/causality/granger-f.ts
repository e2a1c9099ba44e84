/**
 * Granger's (1969) lead-lag test by comparing two regressions, for stationary series.
 *
 * For P lags, on its own sample t = P + 1..T (n = T - P): the unrestricted regression of the
 * effect on its own lags 1..P, the cause's lags 1..P and a constant; the restricted one without
 * the cause's lags. Three forms of the same comparison, as the reference library computes them:
 *   F   = ((SSR_r - SSR_u) / P) / (SSR_u / (T - 3P - 1)),   F(P, T - 3P - 1);
 *   chi = n (SSR_r - SSR_u) / SSR_u,                          chi-square(P);
 *   LR  = n ln(SSR_r / SSR_u) = -2 (llf_r - llf_u),           chi-square(P).
 * The F form is the headline; the other two go in `details`.
 *
 * Valid only when both series are stationary: on trending prices the F distribution no longer
 * applies (Sims, Stock & Watson 1990). leadLag chooses a valid form for the data.
 */
import { powerOfTwoScale, scaled } from '../linalg/power-of-two-scale';
import { MooringInputError } from '../errors';
import { chiSquareUpperP, fCriticalValues, fUpperP } from '../distributions';
import { leastSquares } from '../regression/least-squares';
import type { TestResult } from '../result';
import { checkedBlock, laggedColumn } from '../var/var-design';
import { resolveLags, liftedWarning, type LagChoice } from './causality-lags';
import { DEFAULT_PAIR_NAMES, leadLagHypotheses, possessive, type DataForm, type PairNames } from './causality-wording';

/** Options of grangerF. */
export interface GrangerFOptions {
  /** Lags of both series: a number, or 'aic'/'bic' to choose from a VAR of the pair (default 'aic'). */
  lags?: LagChoice;
  /** Ceiling of the lag search when lags is 'aic' or 'bic'. */
  maxLags?: number;
  /** Whether the arrays are values or changes; only the wording of the hypotheses depends on it. */
  form?: DataForm;
}

/** F test (with chi-square and likelihood-ratio forms) that the cause's past helps predict the effect. */
export function grangerF(cause: ArrayLike<number>, effect: ArrayLike<number>, options: GrangerFOptions = {}, names: PairNames = DEFAULT_PAIR_NAMES): TestResult {
  const [rawX, rawY] = checkedBlock([cause, effect], [names.cause, names.effect]);
  // F is free of units; the sums of squares are not (they overflow for prices of 1e300 and vanish
  // for 1e-300), so both series are brought to a size near one by a power of two, and the
  // sums of squares reported below are converted back to the effect's units.
  const fy = powerOfTwoScale(rawY);
  const x = scaled(rawX, powerOfTwoScale(rawX));
  const y = scaled(rawY, fy);
  const T = y.length;
  const resolved = resolveLags([x, y], options.lags, options.maxLags);
  const P = resolved.lags;
  if (T <= 3 * P + 1) {
    const most = Math.floor((T - 2) / 3);
    throw new MooringInputError(
      `A lead-lag F test with ${P} lags needs more than ${3 * P + 1} rows; the series have ${T}. ${most >= 1 ? `Use at most ${most} lags` : 'Use a longer history'}.`,
    );
  }
  const n = T - P;
  const own: Float64Array[] = [];
  const other: Float64Array[] = [];
  for (let j = 1; j <= P; j++) {
    own.push(laggedColumn(y, j, P, n));
    other.push(laggedColumn(x, j, P, n));
  }
  const response = y.slice(P);
  const constant = new Float64Array(n).fill(1);
  const ownNames = own.map((_, j) => `${names.effect} lag ${j + 1}`);
  const otherNames = other.map((_, j) => `${names.cause} lag ${j + 1}`);
  const restricted = leastSquares(response, [...own, constant], { names: [...ownNames, 'constant'], withoutCovariance: true });
  const unrestricted = leastSquares(response, [...own, ...other, constant], {
    names: [...ownNames, ...otherNames, 'constant'],
    withoutCovariance: true,
  });
  // A perfect fit leaves nothing to compare (the reference library refuses it too).
  if (!(unrestricted.ssr > 0) || unrestricted.rSquared > 1 - Number.EPSILON) {
    throw new MooringInputError(
      `${names.effect} is predicted exactly by its own past and ${possessive(names.cause)} past, so no test is possible: check that the series are not copies, shifts or exact combinations of each other.`,
    );
  }
  const ssrR = restricted.ssr;
  const ssrU = unrestricted.ssr;
  const dfDenom = unrestricted.dfResid;
  const fStatistic = ((ssrR - ssrU) / P) / (ssrU / dfDenom);
  const chiSquare = (n * (ssrR - ssrU)) / ssrU;
  const likelihoodRatio = n * Math.log(ssrR / ssrU);
  const form = options.form ?? 'values';
  const { nullHypothesis, alternative } = leadLagHypotheses(names, form);
  const warnings = liftedWarning(resolved);
  if (n < 30) warnings.push(`Only ${n} rows in the test regression: the test has little power this short.`);

  return {
    test: 'Granger F',
    title: `Lead-lag test (Granger F${form === 'changes' ? ' on changes' : ''}): does ${names.cause} lead ${names.effect}?`,
    statisticName: 'F',
    statistic: fStatistic,
    pValue: fUpperP(fStatistic, P, dfDenom),
    critical: fCriticalValues(P, dfDenom),
    rejectTail: 'upper',
    lags: P,
    lagRule: resolved.rule,
    nobs: n,
    deterministic: 'const',
    nullHypothesis,
    alternative,
    warnings,
    details: [
      { key: 'dfNumerator', label: 'F degrees of freedom, numerator (lags tested)', value: P },
      { key: 'dfDenominator', label: 'F degrees of freedom, denominator (T - 3P - 1)', value: dfDenom },
      { key: 'chiSquare', label: 'Chi-square form, n (SSR_r - SSR_u) / SSR_u', value: chiSquare },
      { key: 'chiSquarePValue', label: 'Chi-square form p-value', value: chiSquareUpperP(chiSquare, P) },
      { key: 'likelihoodRatio', label: 'Likelihood-ratio form, n ln(SSR_r / SSR_u)', value: likelihoodRatio },
      { key: 'likelihoodRatioPValue', label: 'Likelihood-ratio form p-value', value: chiSquareUpperP(likelihoodRatio, P) },
      { key: 'ssrRestricted', label: `Residual sum of squares without ${possessive(names.cause)} lags`, value: ssrR / fy / fy },
      { key: 'ssrUnrestricted', label: `Residual sum of squares with ${possessive(names.cause)} lags`, value: ssrU / fy / fy },
      { key: 'dataForm', label: 'Data tested', value: form },
    ],
  };
}
