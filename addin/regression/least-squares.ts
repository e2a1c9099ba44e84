/**
 * Ordinary least squares by Householder QR, with everything a reported statistic needs:
 * coefficients, residuals, SSR, sigma^2 = SSR/(n - k), the coefficient covariance
 * sigma^2 (R'R)^{-1}, standard errors, t-ratios, the Gaussian log-likelihood and the
 * information criteria AIC = -2 llf + 2k, BIC = -2 llf + k ln n, HQ = -2 llf + 2k ln ln n
 * (k counting every column, as the reference library counts them).
 *
 * One step of iterative refinement (Golub & Van Loan 2013, sec. 5.3.8) recovers the digits
 * that ill-conditioned designs such as the NIST Longley data lose in the first solve.
 *
 * The response and each column are first brought to a largest |value| in [1, 2) by a power of
 * two (linalg/power-of-two-scale.ts), the fit is made on those, and the answers that carry
 * units are converted back. Prices of 1e300 or 1e-300 then fit as prices of 1 do (no sum of
 * squares overflows or underflows, so no column looks constant), and for ordinary prices the
 * numbers are those of the unscaled fit to the last bit. What is a ratio (t-values, R^2) needs
 * no conversion; SSR, sigma^2 and the covariance carry squared units and can pass the range of
 * doubles for extreme prices even when every statistic above is fine.
 */
import { MooringInputError } from '../errors';
import { HouseholderQr, assertFullRank } from '../linalg/householder-qr';
import { powerOfTwoScale, scaled } from '../linalg/power-of-two-scale';

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
  return leastSquaresEach([y], columns, options)[0];
}

/**
 * Fits each response on the same columns from one factorisation (the equations of a VAR share
 * their regressors); each fit is the one leastSquares makes for that response alone.
 */
export function leastSquaresEach(responses: readonly ArrayLike<number>[], columns: readonly ArrayLike<number>[], options: LeastSquaresOptions = {}): LeastSquaresFit[] {
  const n = responses[0].length;
  const k = columns.length;
  for (const c of [...columns, ...responses]) {
    if (c.length !== n) throw new MooringInputError('Internal: regression columns differ in length from the response.');
  }
  if (n <= k) {
    throw new MooringInputError(`Too few observations (${n}) for ${k} regressors: add rows or use fewer lags.`);
  }
  const columnScales = columns.map((c) => powerOfTwoScale(c));
  const unitColumns = columns.map((c, j) => (columnScales[j] === 1 ? c : scaled(c, columnScales[j])));
  const qr = new HouseholderQr(unitColumns, n);
  assertFullRank(qr, options.names);
  return responses.map((y) => {
    const yScale = powerOfTwoScale(y);
    const fit = fitScaled(qr, yScale === 1 ? y : scaled(y, yScale), unitColumns, options);
    return yScale === 1 && columnScales.every((f) => f === 1) ? fit : inOriginalUnits(fit, yScale, columnScales);
  });
}

/**
 * A fit on y * yScale and columns * columnScales[j], in the units of y and the columns: each
 * coefficient (and its standard error) times columnScales[j] / yScale, residuals over yScale,
 * SSR and sigma^2 over yScale^2; t-values and R^2 are ratios and stay.
 */
function inOriginalUnits(fit: LeastSquaresFit, yScale: number, columnScales: readonly number[]): LeastSquaresFit {
  const k = fit.k;
  const unit = columnScales.map((c) => c / yScale);
  const coefficients = fit.coefficients.map((b, j) => b * unit[j]);
  const standardErrors = fit.standardErrors.map((se, j) => se * unit[j]);
  const covariance = fit.covariance.map((row, i) => row.map((v, j) => v * unit[i] * unit[j]));
  const residuals = fit.residuals.map((r) => r / yScale);
  const ssr = fit.ssr / yScale / yScale;
  // The log-likelihood from the scaled SSR, moved by n ln(yScale): finite even when SSR is not.
  const logLikelihood = Number.isFinite(ssr) && ssr >= 2 ** -1022 ? gaussianLogLikelihood(ssr, fit.nobs) : fit.logLikelihood + fit.nobs * Math.log(yScale);
  const n = fit.nobs;
  return {
    ...fit,
    coefficients,
    standardErrors,
    covariance,
    residuals,
    ssr,
    sigma2: fit.sigma2 / yScale / yScale,
    logLikelihood,
    aic: -2 * logLikelihood + 2 * k,
    bic: -2 * logLikelihood + k * Math.log(n),
    hqic: -2 * logLikelihood + 2 * k * Math.log(Math.log(n)),
  };
}

/** The least-squares fit proper, on the response and columns as given and the columns' factorisation (see the file comment). */
function fitScaled(qr: HouseholderQr, y: ArrayLike<number>, columns: readonly ArrayLike<number>[], options: LeastSquaresOptions): LeastSquaresFit {
  const n = y.length;
  const k = columns.length;

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
