/**
 * A vector autoregression fitted by least squares, one equation at a time:
 * y_t = c (+ d t) + A_1 y_{t-1} + ... + A_p y_{t-p} + u_t.
 * Because every equation has the same regressors, equation-by-equation OLS is the full
 * (Gaussian) estimator (Zellner 1962 and Lutkepohl 2005, from memory).
 *
 * Residual covariance two ways: Sigma_u = E'E / (n - Kp - d), the unbiased form the reference
 * library uses for coefficient standard errors and Wald tests, and
 * Sigma_ml = E'E / n, the maximum-likelihood form the lag-order criteria use.
 */
import { MooringInputError } from '../errors';
import { leastSquaresEach, type LeastSquaresFit } from '../regression/least-squares';
import { VAR_TRENDS, checkedBlock, checkedLagCount, varDesign, varLagRow, varTrendCount, type VarTrend } from './var-design';

/** Options of fitVar. */
export interface FitVarOptions {
  /** Deterministic terms; default a constant. */
  trend?: VarTrend;
  /**
   * First row (0-based) of the estimation sample; default `lags`, the longest sample. The
   * lag-order search sets it to the largest order tried, so every order uses the same rows.
   */
  sampleStart?: number;
  /** Names of the series, for messages and coefficient labels. */
  names?: readonly string[];
  /** Skip the coefficient covariances when only residuals are needed (the lag-order search). */
  withoutCovariance?: boolean;
}

/** A fitted VAR: coefficients, each equation's fit and the residual covariances. */
export interface VarFit {
  names: string[];
  /** Number of variables K. */
  variables: number;
  lags: number;
  trend: VarTrend;
  sampleStart: number;
  /** Rows in each equation: T - sampleStart. */
  nobs: number;
  /** Deterministic columns: 1 or 2. */
  deterministicCount: number;
  /** Label of each coefficient row. */
  regressorNames: string[];
  /** coefficients[r][e]: coefficient of regressor r in the equation of variable e. */
  coefficients: number[][];
  /** The least-squares fit of each equation (covariance sigma_e^2 (Z'Z)^{-1}, empty when withoutCovariance). */
  equations: LeastSquaresFit[];
  /** n - Kp - d: residual degrees of freedom of every equation. */
  dfResid: number;
  /** E'E / dfResid. */
  residualCovariance: number[][];
  /** E'E / n. */
  residualCovarianceMl: number[][];
}

/** Fits a VAR(lags) to the block (one array per series, all the same length). */
export function fitVar(block: readonly ArrayLike<number>[], lags: number, options: FitVarOptions = {}): VarFit {
  const trend = options.trend ?? 'const';
  if (!VAR_TRENDS.includes(trend)) {
    throw new MooringInputError(`Unknown deterministic terms '${String(trend)}' for a VAR: use 'const' or 'const-trend'.`);
  }
  const names = block.map((_, k) => options.names?.[k] ?? `series ${k + 1}`);
  const series = checkedBlock(block, names);
  checkedLagCount(lags, 'The number of VAR lags');
  const sampleStart = options.sampleStart ?? lags;
  checkedLagCount(sampleStart, 'The sample start');
  if (sampleStart < lags) {
    throw new MooringInputError(`The sample cannot start at row ${sampleStart + 1} with ${lags} lags: it must start at row ${lags + 1} or later.`);
  }
  const K = series.length;
  const T = series[0].length;
  const k = varTrendCount(trend) + K * lags;
  const n = T - sampleStart;
  if (n <= k) {
    const needed = sampleStart + k + 1;
    throw new MooringInputError(
      `A VAR with ${K} series and ${lags} lags has ${k} coefficients per equation and needs at least ${needed} rows here; the series have ${T}. Use fewer lags or a longer history.`,
    );
  }

  const design = varDesign(series, lags, trend, sampleStart, names);
  // One factorisation of the shared regressors serves every equation.
  const equations = leastSquaresEach(design.responses, design.columns, { names: design.columnNames, withoutCovariance: options.withoutCovariance });
  const coefficients = design.columns.map((_, r) => equations.map((eq) => eq.coefficients[r]));
  const dfResid = n - k;
  const cross = residualCrossProducts(equations);
  return {
    names,
    variables: K,
    lags,
    trend,
    sampleStart,
    nobs: n,
    deterministicCount: design.deterministicCount,
    regressorNames: design.columnNames,
    coefficients,
    equations,
    dfResid,
    residualCovariance: cross.map((row) => row.map((v) => v / dfResid)),
    residualCovarianceMl: cross.map((row) => row.map((v) => v / n)),
  };
}

/** E'E, the cross products of the equations' residuals. */
function residualCrossProducts(equations: readonly LeastSquaresFit[]): number[][] {
  const K = equations.length;
  const out = Array.from({ length: K }, () => new Array<number>(K).fill(0));
  for (let a = 0; a < K; a++) {
    for (let b = a; b < K; b++) {
      const ea = equations[a].residuals;
      const eb = equations[b].residuals;
      let s = 0;
      for (let i = 0; i < ea.length; i++) s += ea[i] * eb[i];
      out[a][b] = out[b][a] = s;
    }
  }
  return out;
}

/** Row of fit.coefficients holding lag `lag` (1-based) of the variable at index `variable`. */
export function coefficientRow(fit: VarFit, variable: number, lag: number): number {
  if (!Number.isInteger(lag) || lag < 1 || lag > fit.lags) {
    throw new MooringInputError(`Lag ${lag} is not in this VAR: it has lags 1 to ${fit.lags}.`);
  }
  if (!Number.isInteger(variable) || variable < 0 || variable >= fit.variables) {
    throw new MooringInputError(`Variable ${variable} is not in this VAR: it has ${fit.variables} series.`);
  }
  return varLagRow(fit.deterministicCount, fit.variables, variable, lag);
}
