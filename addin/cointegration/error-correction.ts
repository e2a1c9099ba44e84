/**
 * Error-correction model of a cointegrated pair (Engle & Granger 1987, two-step):
 *   Δy_t = c_y + alpha_y u_{t-1} + sum_{i=1..p} (a_i Δy_{t-i} + b_i Δx_{t-i}) + e_t,
 *   Δx_t = c_x + alpha_x u_{t-1} + sum_{i=1..p} (g_i Δy_{t-i} + h_i Δx_{t-i}) + v_t,
 * u the residual of the cointegrating regression of y on x (cointegrating-regression.ts).
 * Both equations are reported so the user sees which side does the adjusting: alpha_y < 0
 * means y falls back when it stands above the relation; x helps when beta alpha_x > 0. Each
 * side's effect on the gap u = y - beta x - ... per period is alpha_y and -beta alpha_x, and
 * the gap's own speed is their sum (its AR(1) coefficient minus 1 ignoring the lag terms).
 * Half-lives implied by the model: ln 2 / -ln|1 + speed| (spread/half-life.ts), for the combined
 * speed (ecmHalfLife: both prices adjusting) and for each equation's own (halfLifeAlone: as if
 * only that price moved). Neither is THE half-life of the pair, which every surface takes from
 * the spread's own AR(1) (spread/pair-spread.ts); these keep their own names so no surface
 * shows two different numbers under one name.
 *
 * Inference: given cointegration every regressor is stationary, so the t-ratios are
 * asymptotically standard; p-values are two-sided Student t with the equation's degrees of
 * freedom.
 *
 * Lags p: fixed, or 'aic' (default): the system AIC n ln det(Sigma) + 2 (coefficients in both
 * equations) over p = 0..pmax on the common sample pmax allows, from one QR factorisation
 * (the columns are ordered so each p nests the one before; on long series from one Cholesky of
 * the cross products instead, error-correction-long.ts), then the choice is refitted on
 * every row it can use, as the ADF lag search does. pmax defaults to Schwert's
 * 12 (T/100)^(1/4), capped so each equation keeps 10 residual degrees of freedom.
 */
import { studentTwoSidedP } from '../distributions';
import { MooringInputError } from '../errors';
import { HouseholderQr } from '../linalg/householder-qr';
import type { Deterministic } from '../result';
import { leastSquares, type LeastSquaresFit } from '../regression/least-squares';
import { schwertMaxLag } from '../unitroot/max-lag';
import { halfLifeFromSpeed } from '../spread/half-life';
import { cointegratingRegression, relationText } from './cointegrating-regression';
import { ECM_GRAM_WORK, chooseEcmLagsByGram, errorCorrectionFitByGram, type EcmEquationFit } from './error-correction-long';
import { formatCoefficient, formatPeriods, formatPValue, formatShareClosed } from './wording';

export interface ErrorCorrectionOptions {
  /** Deterministic terms of the cointegrating regression (default a constant). */
  deterministic?: Deterministic;
  /** Lagged changes of both series: a whole number or 'aic' (default). */
  lags?: number | 'aic';
  /** Largest p the AIC search tries. */
  maxLags?: number;
  /** The word for one row, for the verdict: 'day', 'week', ... (default 'period'). */
  period?: string;
}

export interface EcmCoefficient {
  name: string;
  value: number;
  standardError: number;
  tValue: number;
  pValue: number;
}

export interface AdjustmentEquation {
  /** Name of the series whose change this equation explains. */
  series: string;
  /** Coefficient on the lagged equilibrium error. */
  alpha: number;
  standardError: number;
  tValue: number;
  pValue: number;
  /** This equation's effect on the gap per period: alpha for y, -beta alpha for x (negative closes it). */
  gapSpeed: number;
  /** Half-life of the gap implied by this equation alone (as if only this series adjusted), or null. */
  halfLifeAlone: number | null;
  halfLifeAloneNote?: string;
  /** Every coefficient, the error term first. */
  coefficients: EcmCoefficient[];
  rSquared: number;
}

export interface ErrorCorrectionResult {
  lags: number;
  lagRule: 'fixed' | 'aic';
  maxLags: number | null;
  /** Rows of each equation: T - 1 - p. */
  nobs: number;
  beta: number;
  intercept: number | null;
  trendCoefficient: number | null;
  /** The equilibrium error in words, e.g. "Crude - 1.02 Brent - 3.1". */
  relation: string;
  y: AdjustmentEquation;
  x: AdjustmentEquation;
  /** alpha_y - beta alpha_x: how fast the gap closes with both sides adjusting. */
  combinedSpeed: number;
  /** Half-life implied by the error-correction model, both prices adjusting (from combinedSpeed), or null. */
  ecmHalfLife: number | null;
  ecmHalfLifeNote?: string;
  verdict: string;
  warnings: string[];
}

/** Residual degrees of freedom each equation must keep. */
const MIN_DEGREES_OF_FREEDOM = 10;

/** The largest p the data allow: T - 1 - p rows, 2 + 2p columns, 10 degrees of freedom to spare. */
export function largestEcmLag(T: number): number {
  return Math.floor((T - 3 - MIN_DEGREES_OF_FREEDOM) / 3);
}

interface EcmDesign {
  dy: Float64Array;
  dx: Float64Array;
  columns: Float64Array[];
  names: string[];
}

/** Rows t = from..T-1 (0-based) with p lags: [u_{t-1}, 1, Δy_{t-1}, Δx_{t-1}, ..., Δy_{t-p}, Δx_{t-p}]. */
function ecmDesign(y: ArrayLike<number>, x: ArrayLike<number>, u: ArrayLike<number>, p: number, from: number, names: { y: string; x: string }): EcmDesign {
  const T = y.length;
  const n = T - from;
  const dy = new Float64Array(n);
  const dx = new Float64Array(n);
  const error = new Float64Array(n);
  const lagged: Float64Array[] = [];
  const labels = ['equilibrium error (lag 1)', 'constant'];
  for (let i = 1; i <= p; i++) {
    lagged.push(new Float64Array(n), new Float64Array(n));
    labels.push(`change in ${names.y}, lag ${i}`, `change in ${names.x}, lag ${i}`);
  }
  for (let r = 0; r < n; r++) {
    const t = from + r;
    dy[r] = y[t] - y[t - 1];
    dx[r] = x[t] - x[t - 1];
    error[r] = u[t - 1];
    for (let i = 1; i <= p; i++) {
      lagged[2 * i - 2][r] = y[t - i] - y[t - i - 1];
      lagged[2 * i - 1][r] = x[t - i] - x[t - i - 1];
    }
  }
  return { dy, dx, columns: [error, new Float64Array(n).fill(1), ...lagged], names: labels };
}

/** System-AIC choice of p in 0..pmax on the common sample of pmax (from cross products on long series, error-correction-long.ts). */
function chooseEcmLags(y: ArrayLike<number>, x: ArrayLike<number>, u: ArrayLike<number>, pmax: number): number {
  if ((y.length - 1 - pmax) * (2 + 2 * pmax) ** 2 > ECM_GRAM_WORK) {
    const byGram = chooseEcmLagsByGram(y, x, u, pmax);
    if (byGram !== null) return byGram;
  }
  const d = ecmDesign(y, x, u, pmax, pmax + 1, { y: 'y', x: 'x' });
  const n = d.dy.length;
  const qr = new HouseholderQr(d.columns, n);
  const zy = qr.qtY(d.dy);
  const zx = qr.qtY(d.dx);
  // Residual cross products of the model with the first j columns are the tails of Q'y beyond j.
  const syy = new Float64Array(n + 1);
  const sxx = new Float64Array(n + 1);
  const sxy = new Float64Array(n + 1);
  for (let i = n - 1; i >= 0; i--) {
    syy[i] = syy[i + 1] + zy[i] * zy[i];
    sxx[i] = sxx[i + 1] + zx[i] * zx[i];
    sxy[i] = sxy[i + 1] + zy[i] * zx[i];
  }
  let best = 0;
  let bestAic = Infinity;
  for (let p = 0; p <= pmax; p++) {
    const size = 2 + 2 * p;
    const det = (syy[size] * sxx[size] - sxy[size] * sxy[size]) / (n * n);
    const aic = n * Math.log(det) + 2 * 2 * size;
    if (aic < bestAic) {
      bestAic = aic;
      best = p;
    }
  }
  return best;
}

function resolveLags(y: ArrayLike<number>, x: ArrayLike<number>, u: ArrayLike<number>, options: ErrorCorrectionOptions): { p: number; rule: 'fixed' | 'aic'; pmax: number | null } {
  const T = y.length;
  const cap = largestEcmLag(T);
  if (cap < 0) throw new MooringInputError(`${T} observations are too few for an error-correction model: it needs at least ${3 + MIN_DEGREES_OF_FREEDOM}.`);
  const lags = options.lags ?? 'aic';
  if (typeof lags === 'number') {
    if (!Number.isInteger(lags) || lags < 0) throw new MooringInputError(`The number of lags must be a whole number of 0 or more; got ${lags}.`);
    if (lags > cap) throw new MooringInputError(`${lags} lags are too many for ${T} observations: the largest allowed is ${cap}.`);
    return { p: lags, rule: 'fixed', pmax: null };
  }
  if (lags !== 'aic') throw new MooringInputError(`Unknown lag rule '${String(lags)}' for the error-correction model: use a whole number or aic.`);
  const pmax = options.maxLags ?? Math.min(schwertMaxLag(T), cap);
  if (!Number.isInteger(pmax) || pmax < 0) throw new MooringInputError(`The maximum lag must be a whole number of 0 or more; got ${pmax}.`);
  if (pmax > cap) throw new MooringInputError(`A maximum lag of ${pmax} is too large for ${T} observations: the largest allowed is ${cap}.`);
  return { p: chooseEcmLags(y, x, u, pmax), rule: 'aic', pmax };
}

function adjustmentEquation(series: string, fit: EcmEquationFit, names: string[], gapSpeed: number): AdjustmentEquation {
  const df = fit.dfResid;
  const coefficients = names.map((name, j) => ({
    name,
    value: fit.coefficients[j],
    standardError: fit.standardErrors[j],
    tValue: fit.tValues[j],
    pValue: studentTwoSidedP(fit.tValues[j], df),
  }));
  const life = halfLifeFromSpeed(gapSpeed);
  return {
    series,
    alpha: coefficients[0].value,
    standardError: coefficients[0].standardError,
    tValue: coefficients[0].tValue,
    pValue: coefficients[0].pValue,
    gapSpeed,
    halfLifeAlone: life.halfLife,
    ...(life.note ? { halfLifeAloneNote: life.note } : {}),
    coefficients,
    rSquared: fit.rSquared,
  };
}

export function errorCorrectionModel(
  y: ArrayLike<number>,
  x: ArrayLike<number>,
  options: ErrorCorrectionOptions = {},
  names: { y?: string; x?: string } = {},
): ErrorCorrectionResult {
  const resolved = { y: names.y ?? 'y', x: names.x ?? 'x' };
  const step1 = cointegratingRegression(y, [x], options.deterministic ?? 'const', { y: resolved.y, xs: [resolved.x] });
  if (step1.exactFit) {
    throw new MooringInputError(
      `${resolved.y} is an exact combination of ${resolved.x} (R² = ${step1.rSquared.toFixed(7)}): the equilibrium error is zero, so there is no adjustment to estimate. Check that one column is not a copy or a formula of another.`,
    );
  }
  const u = step1.residuals;
  const beta = step1.beta[0];
  const { p, rule, pmax } = resolveLags(y, x, u, options);
  const { fitY, fitX, names: columnNames } = chosenFits(y, x, u, p, resolved);
  const eqY = adjustmentEquation(resolved.y, fitY, columnNames, fitY.coefficients[0]);
  const eqX = adjustmentEquation(resolved.x, fitX, columnNames, -beta * fitX.coefficients[0]);
  const combinedSpeed = eqY.gapSpeed + eqX.gapSpeed;
  const combined = halfLifeFromSpeed(combinedSpeed);

  const warnings: string[] = [];
  if (eqY.alpha <= -1) {
    warnings.push(`${resolved.y}'s speed of adjustment is ${formatCoefficient(eqY.alpha)}: at or below -1 it overshoots, moving past the relation each ${options.period ?? 'period'}; check the data or the model.`);
  }
  if (combinedSpeed >= 0) {
    warnings.push('Neither series moves back toward the relation: the pair may not be cointegrated (run the Engle-Granger test).');
  }
  if (rule === 'aic' && p === pmax && p > 0) warnings.push(`The lag rule chose the largest lag searched (${pmax}); a larger maximum may fit better.`);

  return {
    lags: p,
    lagRule: rule,
    maxLags: pmax,
    nobs: fitY.nobs,
    beta,
    intercept: step1.intercept,
    trendCoefficient: step1.trendCoefficient,
    relation: relationText(step1),
    y: eqY,
    x: eqX,
    combinedSpeed,
    ecmHalfLife: combined.halfLife,
    ...(combined.note ? { ecmHalfLifeNote: combined.note } : {}),
    verdict: ecmVerdict(eqY, eqX, options.period ?? 'period'),
    warnings,
  };
}

/**
 * Both equations with p lags on every row they can use: by QR, or where the design would be
 * large (rows x columns^2 past ECM_GRAM_WORK) from its cross products with refinement
 * (error-correction-long.ts), which declines to QR where it cannot vouch for its answer.
 */
function chosenFits(y: ArrayLike<number>, x: ArrayLike<number>, u: ArrayLike<number>, p: number, names: { y: string; x: string }): { fitY: EcmEquationFit; fitX: EcmEquationFit; names: string[] } {
  const labels = ['equilibrium error (lag 1)', 'constant'];
  for (let i = 1; i <= p; i++) labels.push(`change in ${names.y}, lag ${i}`, `change in ${names.x}, lag ${i}`);
  if ((y.length - 1 - p) * (2 + 2 * p) ** 2 > ECM_GRAM_WORK) {
    const byGram = errorCorrectionFitByGram(y, x, u, p);
    if (byGram !== null) return { fitY: byGram.y, fitX: byGram.x, names: labels };
  }
  const d = ecmDesign(y, x, u, p, p + 1, names);
  return { fitY: leastSquares(d.dy, d.columns, { names: d.names }), fitX: leastSquares(d.dx, d.columns, { names: d.names }), names: d.names };
}

/** "Crude closes about 6% of a gap to its long-run relation each day (alone, that would halve the gap in about 11 days)." plus the other side. */
function ecmVerdict(eqY: AdjustmentEquation, eqX: AdjustmentEquation, period: string): string {
  const side = (eq: AdjustmentEquation, first: boolean): string => {
    const significance = eq.pValue < 0.05 ? '' : `, though not significantly at 5% (${formatPValue(eq.pValue)})`;
    if (eq.gapSpeed >= 0) {
      return `${eq.series} does not move back toward the relation (${formatPValue(eq.pValue)} for its adjustment coefficient ${formatCoefficient(eq.alpha)}).`;
    }
    const life = eq.halfLifeAlone === null ? ` (${eq.halfLifeAloneNote})` : ` (alone, that would halve the gap in about ${formatPeriods(eq.halfLifeAlone, period)})`;
    return `${eq.series} closes about ${formatShareClosed(eq.gapSpeed)} of ${first ? 'a gap to its long-run relation' : 'the gap'} each ${period}${life}${significance}.`;
  };
  return `${side(eqY, true)} ${side(eqX, false)}`;
}
