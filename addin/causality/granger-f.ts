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
import { HouseholderQr, assertFullRank } from '../linalg/householder-qr';
import type { TestResult } from '../result';
import { checkedBlock, laggedColumn } from '../var/var-design';
import { resolveLags, liftedWarning, type LagChoice, type ResolvedLags } from './causality-lags';
import { DEFAULT_PAIR_NAMES, leadLagHypotheses, possessive, type DataForm, type PairNames } from './causality-wording';

/** Smallest share of its own size a cause lag's pivot may keep for SSR_r - SSR_u to come from R_22 b_2. */
const PIVOT_FLOOR = 1e-4;

/** Options of grangerF. */
export interface GrangerFOptions {
  /** Lags of both series: a number, or 'aic'/'bic' to choose from a VAR of the pair (default 'aic'). */
  lags?: LagChoice;
  /** Ceiling of the lag search when lags is 'aic' or 'bic'. */
  maxLags?: number;
  /** Whether the arrays are values or changes; only the wording of the hypotheses depends on it. */
  form?: DataForm;
  /** The lags already resolved on this pair (leadLag chooses them once for both directions). */
  resolved?: ResolvedLags;
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
  const resolved = options.resolved ?? resolveLags([x, y], options.lags, options.maxLags);
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
  // One Householder QR of X = [own lags, constant, cause's lags] = QR serves both regressions.
  // The unrestricted fit is solved with one step of refinement and SSR_u summed from its explicit
  // residuals, as leastSquares does. The restricted regression is the leading block, so with
  // z = Q'y its SSR exceeds SSR_u by the squares of z over the cause's P columns, and there
  // z_2 = R_22 b_2 (R_22 the trailing P x P block of R, b_2 the cause's coefficients;
  // Golub & Van Loan 2013, sec. 5.3.3): SSR_r - SSR_u = |R_22 b_2|^2, with the refined b_2.
  // Where a lag of the cause is nearly a combination of the columns before it (its pivot keeps
  // less than PIVOT_FLOOR of its size), b_2 is poorly determined and that product loses digits;
  // there the restricted regression is solved on its own from the same factorisation.
  const design = [...own, constant, ...other];
  const qr = new HouseholderQr(design, n);
  assertFullRank(qr, [...ownNames, 'constant', ...otherNames]);
  const k = 2 * P + 1;
  const unrestricted = refinedFit(qr, design, k, response);
  const ssrU = unrestricted.ssr;
  let reduction = 0;
  if (causeLagsSeparate(qr, design, P + 1, k)) {
    for (let i = P + 1; i < k; i++) {
      let s = 0;
      for (let j = i; j < k; j++) s += qr.r(i, j) * unrestricted.b[j];
      reduction += s * s;
    }
  } else {
    reduction = refinedFit(qr, design, P + 1, response).ssr - ssrU;
  }
  const ssrR = ssrU + reduction;
  let mean = 0;
  for (let i = 0; i < n; i++) mean += response[i];
  mean /= n;
  let tss = 0;
  for (let i = 0; i < n; i++) tss += (response[i] - mean) * (response[i] - mean);
  // A perfect fit leaves nothing to compare (the reference library refuses it too).
  if (!(ssrU > 0) || (tss > 0 && 1 - ssrU / tss > 1 - Number.EPSILON)) {
    throw new MooringInputError(
      `${names.effect} is predicted exactly by its own past and ${possessive(names.cause)} past, so no test is possible: check that the series are not copies, shifts or exact combinations of each other.`,
    );
  }
  const dfDenom = n - (2 * P + 1);
  const fStatistic = (reduction / P) / (ssrU / dfDenom);
  const chiSquare = (n * reduction) / ssrU;
  const likelihoodRatio = n * Math.log1p(reduction / ssrU);
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

/**
 * Least squares of y on the first m columns of the factorised design: coefficients from R's
 * leading block and Q'y, one refinement step from the residuals (Golub & Van Loan 2013,
 * sec. 5.3.8), and the SSR summed from the explicit residuals.
 */
function refinedFit(qr: HouseholderQr, columns: readonly Float64Array[], m: number, y: Float64Array): { b: Float64Array; ssr: number } {
  const b = leadingSolve(qr, m, qr.qtY(y));
  const r = residualsOn(columns, m, b, y);
  const c = leadingSolve(qr, m, qr.qtY(r));
  let moved = false;
  for (let j = 0; j < m; j++) {
    if (c[j] !== 0) moved = true;
    b[j] += c[j];
  }
  const final = moved ? residualsOn(columns, m, b, y) : r;
  let ssr = 0;
  for (let i = 0; i < final.length; i++) ssr += final[i] * final[i];
  return { b, ssr };
}

/** Solves R_m b = z[0..m) with R_m the leading m x m block of R. */
function leadingSolve(qr: HouseholderQr, m: number, z: Float64Array): Float64Array {
  const b = new Float64Array(m);
  for (let i = m - 1; i >= 0; i--) {
    let s = z[i];
    for (let j = i + 1; j < m; j++) s -= qr.r(i, j) * b[j];
    b[i] = s / qr.r(i, i);
  }
  return b;
}

/** y - (first m columns) b. */
function residualsOn(columns: readonly Float64Array[], m: number, b: Float64Array, y: Float64Array): Float64Array {
  const out = Float64Array.from(y);
  for (let j = 0; j < m; j++) {
    const c = columns[j];
    const bj = b[j];
    for (let i = 0; i < out.length; i++) out[i] -= bj * c[i];
  }
  return out;
}

/** Whether every column from..to-1 keeps at least PIVOT_FLOOR of its norm in its pivot |R_jj|. */
function causeLagsSeparate(qr: HouseholderQr, columns: readonly Float64Array[], from: number, to: number): boolean {
  for (let j = from; j < to; j++) {
    const c = columns[j];
    let norm2 = 0;
    for (let i = 0; i < c.length; i++) norm2 += c[i] * c[i];
    if (!(Math.abs(qr.r(j, j)) >= PIVOT_FLOOR * Math.sqrt(norm2))) return false;
  }
  return true;
}
