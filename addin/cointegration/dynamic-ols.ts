/**
 * Dynamic OLS (Saikkonen 1991; Stock & Watson 1993): the long-run coefficient of y on x from
 *   y_t = c + beta x_t + sum_{j=-k..k} d_j Δx_{t-j} + e_t,
 * whose leads and lags of Δx soak up the correlation between the equilibrium error and the
 * changes in x, so that beta's t-ratio is asymptotically normal once its standard error uses
 * the long-run variance of e instead of its variance (Hamilton 1994, sec. 19.3):
 *   se_HAC(beta) = se_OLS(beta) * lambda / s,
 * lambda^2 the Bartlett (Newey-West 1987) long-run variance of e, s^2 = SSR / (n - k). p-values
 * are two-sided standard normal.
 *
 * The bandwidth: 'auto' (the default, and the one estimator every surface shows) is Andrews'
 * (1991) AR(1) plug-in for the Bartlett kernel (regression/persistent-bandwidth.ts), fitted to
 * the DOLS residual. That residual is the persistent equilibrium error of the pair (an AR(1)
 * coefficient near 0.94 on daily prices), and the Newey-West (1994) automatic rule, which
 * starts from only n^(2/9) autocovariances, picks a bandwidth far too short there, so the
 * standard error came out too small (0.033 against 0.051 on the demo's tight pair). A whole
 * number fixes the bandwidth as given.
 *
 * Leads and lags k: 'aic' (default) minimises AIC over k = 0..kmax on the common sample kmax
 * allows, from one QR factorisation (the columns are ordered so each k nests the one
 * before: [x, 1, Δx_t, Δx_{t-1}, Δx_{t+1}, ..., Δx_{t-k}, Δx_{t+k}]), then refits the choice
 * on every row it can use, as the ADF lag search does. On long series both steps come from the
 * design's cross products instead (dynamic-ols-long.ts: the choice from one Cholesky, the fit
 * refined from the true residuals and checked, else QR). kmax defaults to floor(T^(1/3))
 * (a common rule of thumb: it grows with T slowly enough for the asymptotics of Saikkonen
 * 1991), capped so the regression keeps at least 10 residual degrees of freedom.
 */
import { normalCdf } from '../distributions';
import { MooringInputError } from '../errors';
import { HouseholderQr } from '../linalg/householder-qr';
import { powerOfTwoScale, scaled } from '../linalg/power-of-two-scale';
import { gaussianLogLikelihood, leastSquares } from '../regression/least-squares';
import { bartlettLongRunVariance } from '../regression/long-run-variance';
import { persistentBandwidth } from '../regression/persistent-bandwidth';
import { DOLS_GRAM_WORK, chooseLeadsLagsByGram, dynamicOlsByGram } from './dynamic-ols-long';

export interface DynamicOlsOptions {
  /** Leads and lags of Δx on each side: a whole number or 'aic' (default). */
  leadsLags?: number | 'aic';
  /** Largest k the AIC search tries (default floor(T^(1/3)), capped). */
  maxLeadsLags?: number;
  /** Bartlett bandwidth of the long-run variance: a whole number or 'auto' (Andrews' AR(1) plug-in on the residual, default). */
  bandwidth?: number | 'auto';
}

export interface DynamicOlsFit {
  beta: number;
  intercept: number;
  /** HAC standard error of beta (Bartlett long-run variance of the residual). */
  standardError: number;
  tValue: number;
  /** Two-sided standard-normal p-value of beta = 0. */
  pValue: number;
  /** Ordinary (non-HAC) standard error of beta, for comparison only. */
  olsStandardError: number;
  leadsLags: number;
  leadsLagsRule: 'fixed' | 'aic';
  maxLeadsLags: number | null;
  bandwidth: number;
  /** How the bandwidth was set: Andrews' AR(1) plug-in ('auto') or as given ('fixed'). */
  bandwidthRule: 'auto' | 'fixed';
  /** Rows in the regression: T - 1 - 2k. */
  nobs: number;
  residuals: Float64Array;
}

/** Residual degrees of freedom the largest model must keep. */
const MIN_DEGREES_OF_FREEDOM = 10;

/** The largest k the data allow: T - 1 - 2k rows must exceed 3 + 2k columns by MIN_DEGREES_OF_FREEDOM. */
export function largestLeadsLags(T: number): number {
  return Math.floor((T - 4 - MIN_DEGREES_OF_FREEDOM) / 4);
}

/** The standard error's estimator in words, for every surface that shows it beside the number. */
export function dynamicOlsStandardErrorText(fit: Pick<DynamicOlsFit, 'bandwidth' | 'bandwidthRule'>): string {
  const rule = fit.bandwidthRule === 'auto' ? "by Andrews' AR(1) plug-in rule" : 'as given';
  return `from the residual's long-run variance, Bartlett kernel with ${fit.bandwidth} lags ${rule}`;
}

/** Default kmax: floor(T^(1/3)), capped at largestLeadsLags(T). */
export function defaultMaxLeadsLags(T: number): number {
  return Math.min(Math.floor(Math.cbrt(T)), largestLeadsLags(T));
}

/** Design of the DOLS regression with k leads and lags over rows t = from..to (0-based). */
function dynamicOlsDesign(y: ArrayLike<number>, x: ArrayLike<number>, k: number, from: number, to: number): { response: Float64Array; columns: Float64Array[]; names: string[] } {
  const n = to - from + 1;
  const response = new Float64Array(n);
  const level = new Float64Array(n);
  const ones = new Float64Array(n).fill(1);
  const shifts = [0];
  for (let j = 1; j <= k; j++) shifts.push(j, -j); // lag j, then lead j
  const changes = shifts.map(() => new Float64Array(n));
  for (let r = 0; r < n; r++) {
    const t = from + r;
    response[r] = y[t];
    level[r] = x[t];
    shifts.forEach((s, c) => {
      changes[c][r] = x[t - s] - x[t - s - 1];
    });
  }
  const names = ['x', 'constant', ...shifts.map((s) => (s === 0 ? 'change' : s > 0 ? `change lag ${s}` : `change lead ${-s}`))];
  return { response, columns: [level, ones, ...changes], names };
}

/** AIC choice of k in 0..kmax on the common sample of kmax (from cross products on long series, dynamic-ols-long.ts). */
function chooseLeadsLags(y: ArrayLike<number>, x: ArrayLike<number>, kmax: number): number {
  const T = y.length;
  if ((T - 1 - 2 * kmax) * (3 + 2 * kmax) ** 2 > DOLS_GRAM_WORK) {
    const byGram = chooseLeadsLagsByGram(y, x, kmax);
    if (byGram !== null) return byGram;
  }
  const { response, columns } = dynamicOlsDesign(y, x, kmax, kmax + 1, T - 1 - kmax);
  const n = response.length;
  const ssr = new HouseholderQr(columns, n).nestedSsr(response);
  let best = 0;
  let bestAic = Infinity;
  for (let k = 0; k <= kmax; k++) {
    const size = 3 + 2 * k;
    const aic = -2 * gaussianLogLikelihood(ssr[size], n) + 2 * size;
    if (aic < bestAic) {
      bestAic = aic;
      best = k;
    }
  }
  return best;
}

/**
 * Dynamic OLS of y on x. The fit runs on y and x each brought to a size near one by a power of
 * two (linalg/power-of-two-scale.ts), so the lead-and-lag choice and the long-run variance
 * neither overflow for prices of 1e300 nor vanish for 1e-300; the slope, intercept, standard
 * errors and residuals are converted back to the prices' units, the t-value needs nothing.
 */
export function dynamicOls(y: ArrayLike<number>, x: ArrayLike<number>, options: DynamicOlsOptions = {}): DynamicOlsFit {
  const fy = powerOfTwoScale(y);
  const fx = powerOfTwoScale(x);
  const fit = dynamicOlsInUnits(scaled(y, fy), scaled(x, fx), options);
  const slope = fx / fy;
  return {
    ...fit,
    beta: fit.beta * slope,
    intercept: fit.intercept / fy,
    standardError: fit.standardError * slope,
    olsStandardError: fit.olsStandardError * slope,
    residuals: fit.residuals.map((e) => e / fy),
  };
}

function dynamicOlsInUnits(y: ArrayLike<number>, x: ArrayLike<number>, options: DynamicOlsOptions): DynamicOlsFit {
  const T = y.length;
  const cap = largestLeadsLags(T);
  if (cap < 0) throw new MooringInputError(`${T} observations are too few for dynamic OLS: it needs at least ${4 + MIN_DEGREES_OF_FREEDOM}.`);
  const requested = options.leadsLags ?? 'aic';
  let k: number;
  let kmax: number | null = null;
  if (typeof requested === 'number') {
    if (!Number.isInteger(requested) || requested < 0) throw new MooringInputError(`The number of leads and lags must be a whole number of 0 or more; got ${requested}.`);
    if (requested > cap) throw new MooringInputError(`${requested} leads and lags are too many for ${T} observations: the largest allowed is ${cap}.`);
    k = requested;
  } else if (requested === 'aic') {
    kmax = options.maxLeadsLags ?? defaultMaxLeadsLags(T);
    if (!Number.isInteger(kmax) || kmax < 0) throw new MooringInputError(`The largest number of leads and lags must be a whole number of 0 or more; got ${kmax}.`);
    if (kmax > cap) throw new MooringInputError(`A largest number of leads and lags of ${kmax} is too large for ${T} observations: the largest allowed is ${cap}.`);
    k = chooseLeadsLags(y, x, kmax);
  } else {
    throw new MooringInputError(`Unknown leads-and-lags rule '${String(requested)}': use a whole number or aic.`);
  }

  const fit = chosenFit(y, x, k);
  const e = fit.residuals;
  const bw = options.bandwidth ?? 'auto';
  if (bw !== 'auto' && typeof bw !== 'number') throw new MooringInputError(`Unknown bandwidth '${String(bw)}': use a whole number or auto.`);
  const bandwidth = bw === 'auto' ? persistentBandwidth(e).bandwidth : bw;
  const lambda2 = bartlettLongRunVariance(e, bandwidth);
  const olsSe = fit.olsStandardError;
  // A negative long-run variance cannot arise with the Bartlett kernel (its weights keep it positive semi-definite).
  const standardError = olsSe * Math.sqrt(lambda2 / fit.sigma2);
  const beta = fit.beta;
  const tValue = beta / standardError;
  return {
    beta,
    intercept: fit.intercept,
    standardError,
    tValue,
    pValue: 2 * (1 - normalCdf(Math.abs(tValue))),
    olsStandardError: olsSe,
    leadsLags: k,
    leadsLagsRule: typeof requested === 'number' ? 'fixed' : 'aic',
    maxLeadsLags: kmax,
    bandwidth,
    bandwidthRule: bw === 'auto' ? 'auto' : 'fixed',
    nobs: fit.nobs,
    residuals: e,
  };
}

/**
 * The regression with k leads and lags on every row it can use: by QR, or on long series by the
 * refined cross-product route (dynamic-ols-long.ts), which falls back to QR where it cannot vouch
 * for its answer.
 */
function chosenFit(y: ArrayLike<number>, x: ArrayLike<number>, k: number): { beta: number; intercept: number; olsStandardError: number; sigma2: number; residuals: Float64Array; nobs: number } {
  const T = y.length;
  if ((T - 1 - 2 * k) * (3 + 2 * k) ** 2 > DOLS_GRAM_WORK) {
    const byGram = dynamicOlsByGram(y, x, k);
    if (byGram !== null) return byGram;
  }
  const design = dynamicOlsDesign(y, x, k, k + 1, T - 1 - k);
  const fit = leastSquares(design.response, design.columns, { names: design.names });
  return { beta: fit.coefficients[0], intercept: fit.coefficients[1], olsStandardError: fit.standardErrors[0], sigma2: fit.sigma2, residuals: fit.residuals, nobs: fit.nobs };
}
