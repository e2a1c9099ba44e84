/**
 * Forecasts from the error-correction model: Johansen's maximum-likelihood VECM (the estimates
 * the johansen command reports) run forward H steps, with 95% intervals, and the path of the
 * first long-run relation's spread back towards equilibrium with its band.
 *
 * Estimation, for rank r, K lagged changes and one of the five deterministic cases
 * (johansen-design.ts): beta and the coefficients of a restricted constant or trend are the
 * first r relations of johansenTest; alpha, the short-run matrices Gamma_j and the unrestricted
 * constant and trend are then the least-squares fit of
 *   Δx_t = alpha (beta' x_{t-1} + beta_d' d_t) + sum_j Gamma_j Δx_{t-j} + mu_0 + mu_1 t + e_t,
 * which given beta is the maximum-likelihood estimate (Johansen 1995, ch. 6, from memory). The
 * residual covariance is the maximum-likelihood one, e'e / n (n the rows of the fit), as the
 * reference library computes it.
 *
 * Forecast: the recursion above with e = 0 from the last row. Intervals: the model in levels
 * x_t = sum_{i=1}^{K+1} A_i x_{t-i} + ..., A_1 = I + alpha beta' + Gamma_1, A_i = Gamma_i -
 * Gamma_{i-1}, A_{K+1} = -Gamma_K, gives Psi_0 = I, Psi_h = sum_i A_i Psi_{h-i} and the h-step
 * error covariance sum_{j<h} Psi_j Sigma Psi_j' (Lütkepohl 2005, section 3.5, from memory);
 * forecast +- z(0.975) sqrt(diagonal). Parameter uncertainty is ignored, so the bands are too
 * narrow by that much: said beside every fan.
 */
import { johansenTest, type JohansenCase } from '../johansen/johansen';
import { johansenDesign } from '../johansen/johansen-design';
import { normalQuantile } from '../distributions';
import { MooringInputError } from '../errors';
import { HouseholderQr } from '../linalg/householder-qr';

/** What every surface says beside the fan. */
export const FORECAST_BAND_NOTE =
  '95% intervals from the fitted model\'s residual covariance (maximum likelihood, divided by the rows of the fit), ignoring the uncertainty of the estimated coefficients, so they are somewhat too narrow. ' +
  'A forecast assumes the relation holds; relations break.';

export interface VecmForecastOptions {
  case?: JohansenCase;
  lags?: number;
  /** Number of long-run relations; default: the trace test's choice at `alpha`. */
  rank?: number;
  alpha?: number;
  horizon: number;
}

export interface VecmForecast {
  names: string[];
  case: JohansenCase;
  lags: number;
  rank: number;
  rankChosenBy: 'given' | 'trace test';
  horizon: number;
  /** forecast[h][i]: series i, h + 1 steps ahead; lower and upper its 95% interval. */
  forecast: number[][];
  lower: number[][];
  upper: number[][];
  standardError: number[][];
  /** The ML residual covariance (divided by the rows of the fit). */
  residualCovariance: number[][];
  /** The first relation, beta' x_t + beta_d d_{t+1}, and its implied path with band; null when the rank is 0. */
  spread: {
    weights: number[];
    deterministic: number | null;
    text: string;
    /** The spread's value on each data row (the equilibrium is its mean over the fit). */
    history: number[];
    mean: number;
    path: number[];
    lower: number[];
    upper: number[];
  } | null;
  bandNote: string;
  warnings: string[];
}

type Matrix = number[][];
const zeros = (a: number, b: number): Matrix => Array.from({ length: a }, () => new Array<number>(b).fill(0));
const identity = (m: number): Matrix => zeros(m, m).map((row, i) => row.map((_, j) => (i === j ? 1 : 0)));
function mul(a: Matrix, b: Matrix): Matrix {
  const out = zeros(a.length, b[0].length);
  for (let i = 0; i < a.length; i++) for (let k = 0; k < b.length; k++) { const v = a[i][k]; if (v !== 0) for (let j = 0; j < b[0].length; j++) out[i][j] += v * b[k][j]; }
  return out;
}
const transpose = (a: Matrix): Matrix => a[0].map((_, j) => a.map((row) => row[j]));
const plus = (a: Matrix, b: Matrix, sign = 1): Matrix => a.map((row, i) => row.map((v, j) => v + sign * b[i][j]));

/** The VECM's forecast of the block (oldest row first) for `horizon` steps. */
export function vecmForecast(block: ArrayLike<number>[], names: string[], options: VecmForecastOptions): VecmForecast {
  const horizon = options.horizon;
  if (!Number.isInteger(horizon) || horizon < 1 || horizon > 1000) throw new MooringInputError(`The horizon must be a whole number of steps from 1 to 1000; got ${String(horizon)}.`);
  const test = johansenTest(block, { case: options.case, lags: options.lags, alpha: options.alpha }, names);
  const m = block.length;
  const K = test.lags;
  const rank = options.rank ?? test.rank.trace;
  if (!Number.isInteger(rank) || rank < 0 || rank >= m) throw new MooringInputError(`The rank must be a whole number from 0 to ${m - 1} (the number of long-run relations among ${m} series); got ${String(rank)}.`);
  const T = block[0].length;
  const design = johansenDesign(block, K, test.case, names);
  const n = design.nobs;
  const inRelation = design.inRelation;
  const detInRelation = test.deterministicInRelation ?? [];
  // beta' x_{t-1} (+ beta_d d_t) for the first `rank` relations, on the fit's rows.
  const ect = Array.from({ length: rank }, (_, j) => {
    const col = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      let s = 0;
      for (let k = 0; k < m; k++) s += test.beta[k][j] * design.levels[k][i];
      if (inRelation) s += detInRelation[j] * design.levels[m][i];
      col[i] = s;
    }
    return col;
  });
  const regressors = [...ect, ...design.shortRun];
  const alphaHat = zeros(m, rank);
  const gamma: Matrix[] = Array.from({ length: K }, () => zeros(m, m));
  const mu0 = new Array<number>(m).fill(0);
  const mu1 = new Array<number>(m).fill(0);
  const residuals: Float64Array[] = [];
  // One Householder QR of the regressors serves every equation (they share them), with one step of
  // iterative refinement per equation as in least-squares.ts.
  const qr = regressors.length === 0 ? null : new HouseholderQr(regressors, n);
  if (qr && !qr.isFullRank()) throw new MooringInputError('The error-correction model cannot be fitted: one series copies or mixes others, so its terms cannot be told apart. Remove the series responsible.');
  const solve = (y: ArrayLike<number>): { coefficients: Float64Array; residuals: Float64Array } => {
    const residual = (b: Float64Array) => {
      const e = Float64Array.from(y);
      regressors.forEach((col, j) => { const bj = b[j]; for (let i = 0; i < n; i++) e[i] -= bj * col[i]; });
      return e;
    };
    const k = regressors.length;
    const first = (qr as HouseholderQr).backSubstitute((qr as HouseholderQr).qtY(y).subarray(0, k));
    const correction = (qr as HouseholderQr).backSubstitute((qr as HouseholderQr).qtY(residual(first)).subarray(0, k));
    const coefficients = first.map((b, j) => b + correction[j]);
    return { coefficients, residuals: residual(coefficients) };
  };
  for (let s = 0; s < m; s++) {
    const fit = qr === null ? null : solve(design.changes[s]);
    const b = fit?.coefficients ?? new Float64Array(0);
    for (let j = 0; j < rank; j++) alphaHat[s][j] = b[j];
    for (let lag = 0; lag < K; lag++) for (let q = 0; q < m; q++) gamma[lag][s][q] = b[rank + lag * m + q];
    const base = rank + K * m;
    if (design.unrestrictedCount >= 1) mu0[s] = b[base];
    if (design.unrestrictedCount === 2) mu1[s] = b[base + 1];
    residuals.push(fit ? fit.residuals : Float64Array.from(design.changes[s]));
  }
  const sigma = zeros(m, m);
  for (let a = 0; a < m; a++) for (let c = 0; c < m; c++) { let v = 0; for (let i = 0; i < n; i++) v += residuals[a][i] * residuals[c][i]; sigma[a][c] = v / n; }

  const betaR: Matrix = Array.from({ length: m }, (_, k) => test.beta[k].slice(0, rank));
  const pi = rank === 0 ? zeros(m, m) : mul(alphaHat, transpose(betaR));
  // Restricted term's effect on each change: alpha beta_d, times d_t.
  const restricted = new Array<number>(m).fill(0);
  for (let s = 0; s < m; s++) for (let j = 0; j < rank; j++) restricted[s] += alphaHat[s][j] * (inRelation ? detInRelation[j] : 0);
  // Deterministic terms at data row t (0-based): trend = t - K, as in the design.
  const trendAt = (t: number) => t - K;
  const dAt = (t: number) => (inRelation === 'trend' ? trendAt(t) : 1);

  // The recursion reads only the last K + 2 rows of data, so only those are copied into rows
  // (a row array per data row cost some 100 MB at a million rows); levels[t - first] is row t.
  const first = Math.max(0, T - K - 2);
  const levels: number[][] = Array.from({ length: T - first }, (_, r) => Array.from({ length: m }, (__, k) => block[k][first + r]));
  for (let h = 1; h <= horizon; h++) {
    const t = T - 1 + h;
    const prev = levels[t - 1 - first];
    const next = prev.slice();
    for (let s = 0; s < m; s++) {
      let change = mu0[s] + mu1[s] * trendAt(t) + restricted[s] * (inRelation ? dAt(t) : 0);
      for (let q = 0; q < m; q++) change += pi[s][q] * prev[q];
      for (let lag = 1; lag <= K; lag++) {
        const a = levels[t - lag - first];
        const b = levels[t - lag - 1 - first];
        for (let q = 0; q < m; q++) change += gamma[lag - 1][s][q] * (a[q] - b[q]);
      }
      next[s] = prev[s] + change;
    }
    levels.push(next);
  }

  // The levels form and its moving-average weights for the error covariance.
  const A: Matrix[] = [];
  A.push(plus(plus(identity(m), pi), K > 0 ? gamma[0] : zeros(m, m)));
  for (let i = 2; i <= K; i++) A.push(plus(gamma[i - 1], gamma[i - 2], -1));
  if (K > 0) A.push(gamma[K - 1].map((row) => row.map((v) => -v)));
  const psi: Matrix[] = [identity(m)];
  for (let h = 1; h < horizon; h++) {
    let sum = zeros(m, m);
    for (let i = 1; i <= Math.min(h, A.length); i++) sum = plus(sum, mul(A[i - 1], psi[h - i]));
    psi.push(sum);
  }
  const mse: Matrix[] = [];
  let acc = zeros(m, m);
  for (let h = 0; h < horizon; h++) {
    acc = plus(acc, mul(mul(psi[h], sigma), transpose(psi[h])));
    mse.push(acc);
  }
  const z = normalQuantile(0.975);
  const forecast = levels.slice(T - first);
  const standardError = mse.map((M) => M.map((row, i) => Math.sqrt(Math.max(row[i], 0))));
  const lower = forecast.map((row, h) => row.map((v, i) => v - z * standardError[h][i]));
  const upper = forecast.map((row, h) => row.map((v, i) => v + z * standardError[h][i]));

  let spread: VecmForecast['spread'] = null;
  if (rank > 0) {
    const w = betaR.map((row) => row[0]);
    const dw = inRelation ? detInRelation[0] : null;
    const value = (x: ArrayLike<number>, t: number) => w.reduce((s, wi, i) => s + wi * x[i], 0) + (dw === null ? 0 : dw * dAt(t + 1));
    // Each data row's value read from the columns directly (the same sum in the same order).
    const row = new Float64Array(m);
    const history = Array.from({ length: T }, (_, t) => {
      for (let k = 0; k < m; k++) row[k] = block[k][t];
      return value(row, t);
    });
    const fitted = history.slice(K, K + n);
    const mean = fitted.reduce((a, b) => a + b, 0) / fitted.length;
    const path = forecast.map((x, h) => value(x, T + h));
    const band = mse.map((M) => Math.sqrt(Math.max(w.reduce((s, wi, i) => s + wi * w.reduce((t2, wk, k) => t2 + M[i][k] * wk, 0), 0), 0)));
    const term = dw === null ? '' : ` ${dw < 0 ? '-' : '+'} ${Math.abs(dw).toPrecision(4)}${inRelation === 'trend' ? ' x trend' : ''}`;
    spread = {
      weights: w,
      deterministic: dw,
      text: `${w.map((wi, i) => `${i === 0 ? '' : wi < 0 ? ' - ' : ' + '}${i === 0 ? (wi === 1 ? '' : wi.toPrecision(4) + ' ') : Math.abs(wi).toPrecision(4) + ' '}${names[i]}`).join('')}${term}`,
      history,
      mean,
      path,
      lower: path.map((v, h) => v - z * band[h]),
      upper: path.map((v, h) => v + z * band[h]),
    };
  }
  const warnings = [...test.warnings];
  if (rank === 0) warnings.push('With no long-run relation (rank 0) the model is a VAR in changes: nothing pulls the series back together, and there is no spread to forecast.');
  return {
    names, case: test.case, lags: K, rank, rankChosenBy: options.rank === undefined ? 'trace test' : 'given', horizon,
    forecast, lower, upper, standardError, residualCovariance: sigma, spread, bandNote: FORECAST_BAND_NOTE, warnings,
  };
}
