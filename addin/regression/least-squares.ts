/**
 * Ordinary least squares by Householder QR, with everything a reported statistic needs:
 * coefficients, residuals, SSR, sigma^2 = SSR/(n - k), the coefficient covariance
 * sigma^2 (R'R)^{-1}, standard errors, t-ratios, the Gaussian log-likelihood and the
 * information criteria AIC = -2 llf + 2k, BIC = -2 llf + k ln n, HQ = -2 llf + 2k ln ln n
 * (k counting every column, as the reference library counts them).
 *
 * One step of iterative refinement (Golub & Van Loan 2013, sec. 5.3.8) recovers the digits
 * that ill-conditioned designs such as the NIST Longley data lose in the first solve.
 */
import { MooringInputError } from '../errors';
import { HouseholderQr, assertFullRank } from '../linalg/householder-qr';

export interface LeastSquaresFit {
  coefficients: Float64Array;
  standardErrors: Float64Array;
  tValues: Float64Array;
  /** Coefficient covariance sigma^2 (X'X)^{-1}, as rows. */
  covariance: number[][];
  residuals: Float64Array;
  ssr: number;
  /** SSR / (n - k). */
  sigma2: number;
  nobs: number;
  /** Number of columns. */
  k: number;
  dfResid: number;
  logLikelihood: number;
  aic: number;
  bic: number;
  hqic: number;
  /** Centred R^2 when a constant column is present, else uncentred. */
  rSquared: number;
}

export interface LeastSquaresOptions {
  /** Column names for error messages. */
  names?: readonly string[];
  /** Skip the covariance (and so standard errors and t-ratios) when only fits are needed. */
  withoutCovariance?: boolean;
}

/** Gaussian log-likelihood of a regression with n observations and residual sum of squares ssr. */
export function gaussianLogLikelihood(ssr: number, n: number): number {
  return -0.5 * n * (Math.log(2 * Math.PI) + Math.log(ssr / n) + 1);
}

/** Fits y on the given columns (each of length n). Refuses rank-deficient designs with a clear error. */
export function leastSquares(y: ArrayLike<number>, columns: readonly ArrayLike<number>[], options: LeastSquaresOptions = {}): LeastSquaresFit {
  const n = y.length;
  const k = columns.length;
  for (const c of columns) {
    if (c.length !== n) throw new MooringInputError('Internal: regression columns differ in length from the response.');
  }
  if (n <= k) {
    throw new MooringInputError(`Too few observations (${n}) for ${k} regressors: add rows or use fewer lags.`);
  }
  const qr = new HouseholderQr(columns, n);
  assertFullRank(qr, options.names);

  const z = qr.qtY(y);
  const coefficients = qr.backSubstitute(z);
  const residuals = residualsOf(y, columns, coefficients);
  // One refinement step: solve for the correction from the residuals of the first solve.
  const correction = qr.backSubstitute(qr.qtY(residuals));
  let moved = false;
  for (let j = 0; j < k; j++) {
    if (correction[j] !== 0) moved = true;
    coefficients[j] += correction[j];
  }
  const finalResiduals = moved ? residualsOf(y, columns, coefficients) : residuals;

  let ssr = 0;
  for (let i = 0; i < n; i++) ssr += finalResiduals[i] * finalResiduals[i];
  const dfResid = n - k;
  const sigma2 = ssr / dfResid;

  let covariance: number[][] = [];
  const standardErrors = new Float64Array(k);
  const tValues = new Float64Array(k);
  if (!options.withoutCovariance) {
    const rInv = qr.rInverse();
    covariance = Array.from({ length: k }, () => new Array<number>(k).fill(0));
    for (let i = 0; i < k; i++) {
      for (let j = i; j < k; j++) {
        let s = 0;
        for (let m = j; m < k; m++) s += rInv[i][m] * rInv[j][m];
        covariance[i][j] = covariance[j][i] = sigma2 * s;
      }
      standardErrors[i] = Math.sqrt(covariance[i][i]);
      tValues[i] = coefficients[i] / standardErrors[i];
    }
  }

  const logLikelihood = gaussianLogLikelihood(ssr, n);
  return {
    coefficients,
    standardErrors,
    tValues,
    covariance,
    residuals: finalResiduals,
    ssr,
    sigma2,
    nobs: n,
    k,
    dfResid,
    logLikelihood,
    aic: -2 * logLikelihood + 2 * k,
    bic: -2 * logLikelihood + k * Math.log(n),
    hqic: -2 * logLikelihood + 2 * k * Math.log(Math.log(n)),
    rSquared: rSquaredOf(y, ssr, columns),
  };
}

function residualsOf(y: ArrayLike<number>, columns: readonly ArrayLike<number>[], b: ArrayLike<number>): Float64Array {
  const n = y.length;
  const out = Float64Array.from(y as ArrayLike<number>);
  for (let j = 0; j < columns.length; j++) {
    const c = columns[j];
    const bj = b[j];
    for (let i = 0; i < n; i++) out[i] -= bj * c[i];
  }
  return out;
}

function rSquaredOf(y: ArrayLike<number>, ssr: number, columns: readonly ArrayLike<number>[]): number {
  const n = y.length;
  const hasConstant = columns.some((c) => {
    const first = c[0];
    if (first === 0) return false;
    for (let i = 1; i < n; i++) if (c[i] !== first) return false;
    return true;
  });
  let tss = 0;
  if (hasConstant) {
    let mean = 0;
    for (let i = 0; i < n; i++) mean += y[i];
    mean /= n;
    for (let i = 0; i < n; i++) tss += (y[i] - mean) ** 2;
  } else {
    for (let i = 0; i < n; i++) tss += y[i] * y[i];
  }
  return tss > 0 ? 1 - ssr / tss : 0;
}
