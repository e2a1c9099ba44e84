/**
 * Hedge ratios of a pair: how many units of x offset one unit of y, as the line
 * y ≈ intercept + beta x, by four estimators.
 *
 * - OLS of y on x (with a constant): the Engle-Granger step-1 line.
 * - OLS of x on y, turned round: x ≈ a + b y gives beta = 1/b, intercept = -a/b. The two OLS
 *   lines bracket the relation; they differ by the share of each series' own noise.
 * - Total least squares (orthogonal regression): the line through the means along the
 *   largest principal axis of the centred 2x2 covariance matrix, i.e. normal to the
 *   eigenvector (v_x, v_y) of its smallest eigenvalue: beta = -v_x / v_y. Symmetric in the two
 *   series, but it depends on their units (rescaling one series turns the line).
 * - Dynamic OLS (Stock & Watson 1993): see dynamic-ols.ts; the only one with a valid
 *   standard error.
 *
 * Each slope is also turned into units of x to hold per unit of y at the latest prices
 * (hedge-units.ts): the slope itself in prices, slope * P_y / P_x when the series are logs
 * (where the slope is an elasticity).
 *
 * Standard errors of the static lines are left out on purpose: when both series wander
 * (are I(1)), the static regression's t-ratio has no standard distribution and its
 * residuals are serially correlated, so a printed standard error would mislead.
 */
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import { MooringInputError } from '../errors';
import { powerOfTwoScale } from '../linalg/power-of-two-scale';
import { leastSquares } from '../regression/least-squares';
import { requireAlignedSeries } from './cointegrating-regression';
import { dynamicOls, dynamicOlsStandardErrorText, type DynamicOlsFit, type DynamicOlsOptions } from './dynamic-ols';
import { hedgeUnits, type HedgeUnits } from './hedge-units';
import { formatCoefficient } from './wording';
import { roundingNoiseOf } from '../spread/rounding-noise';
import { spreadSeries } from '../spread/spread-series';

export type HedgeRatioMethod = 'ols' | 'reverse-ols' | 'total-least-squares' | 'dynamic-ols';

export interface HedgeRatio {
  method: HedgeRatioMethod;
  /** Plain name of the estimator. */
  label: string;
  /** Units of x per unit of y: y ≈ intercept + beta x. */
  beta: number;
  intercept: number;
  /** Standard error of beta where it is meaningful (dynamic OLS), else null. */
  standardError: number | null;
  tValue: number | null;
  /** Two-sided p-value of beta = 0 where meaningful, else null. */
  pValue: number | null;
  /** Why the standard error is missing, or how the line was obtained. */
  note?: string;
}

export interface HedgeRatios {
  ols: HedgeRatio;
  reverseOls: HedgeRatio;
  totalLeastSquares: HedgeRatio;
  dynamicOls: HedgeRatio;
  /** The full dynamic-OLS fit (leads and lags chosen, bandwidth, rows). */
  dynamicOlsFit: DynamicOlsFit;
  /** Each line's slope as units of x to hold per unit of y at the latest prices. */
  units: { ols: HedgeUnits; reverseOls: HedgeUnits; totalLeastSquares: HedgeUnits; dynamicOls: HedgeUnits };
  /** Whether the series are natural logs (the slopes are then elasticities). */
  logged: boolean;
  names: { y: string; x: string };
  verdict: string;
}

const STATIC_NOTE = 'no standard error: with wandering (I(1)) series the static regression t-ratio has no standard distribution; use dynamic OLS for inference';

function requirePair(y: ArrayLike<number>, x: ArrayLike<number>, names = { y: 'y', x: 'x' }): void {
  requireAlignedSeries([y, x], [names.y, names.x]);
  if (y.length < 3) throw new MooringInputError(`${y.length} observations are too few for a hedge ratio: it needs at least 3.`);
}

/** OLS of y on x and a constant. */
export function olsHedgeRatio(y: ArrayLike<number>, x: ArrayLike<number>): HedgeRatio {
  requirePair(y, x);
  const fit = leastSquares(y, [x, new Float64Array(y.length).fill(1)], { names: ['x', 'constant'], withoutCovariance: true });
  return { method: 'ols', label: 'OLS of y on x', beta: fit.coefficients[0], intercept: fit.coefficients[1], standardError: null, tValue: null, pValue: null, note: STATIC_NOTE };
}

/** OLS of x on y and a constant, expressed as y ≈ intercept + beta x. */
export function reverseOlsHedgeRatio(y: ArrayLike<number>, x: ArrayLike<number>): HedgeRatio {
  requirePair(y, x);
  const fit = leastSquares(x, [y, new Float64Array(y.length).fill(1)], { names: ['y', 'constant'], withoutCovariance: true });
  const [b, a] = fit.coefficients;
  if (b === 0) throw new MooringInputError('x does not move with y at all (zero slope of x on y), so the reverse regression gives no hedge ratio.');
  return {
    method: 'reverse-ols',
    label: 'OLS of x on y, turned round',
    beta: 1 / b,
    intercept: -a / b,
    standardError: null,
    tValue: null,
    pValue: null,
    note: `from x ≈ ${formatCoefficient(a)} + ${formatCoefficient(b)} y; ${STATIC_NOTE}`,
  };
}

/** Total least squares (orthogonal regression) from the smallest eigenvector of the centred covariance. */
export function totalLeastSquaresHedgeRatio(y: ArrayLike<number>, x: ArrayLike<number>): HedgeRatio {
  requirePair(y, x);
  const n = y.length;
  // One power of two for both series (the line depends on their relative units, not on a common
  // one): the sums below then neither overflow for prices of 1e300 nor vanish for 1e-300.
  const f = powerOfTwoScale(y, x);
  let mx = 0;
  let my = 0;
  for (let i = 0; i < n; i++) {
    mx += x[i] * f;
    my += y[i] * f;
  }
  mx /= n;
  my /= n;
  let sxx = 0;
  let syy = 0;
  let sxy = 0;
  for (let i = 0; i < n; i++) {
    const dx = x[i] * f - mx;
    const dy = y[i] * f - my;
    sxx += dx * dx;
    syy += dy * dy;
    sxy += dx * dy;
  }
  const cov = new Matrix([
    [sxx / n, sxy / n],
    [sxy / n, syy / n],
  ]);
  const eig = new EigenvalueDecomposition(cov, { assumeSymmetric: true });
  const values = eig.realEigenvalues;
  const smallest = values[0] <= values[1] ? 0 : 1;
  const vx = eig.eigenvectorMatrix.get(0, smallest);
  const vy = eig.eigenvectorMatrix.get(1, smallest);
  if (!(Math.abs(vy) > 1e-12 * Math.abs(vx))) {
    throw new MooringInputError('x hardly moves compared with y, so the orthogonal line is vertical (x nearly constant along it) and gives no hedge ratio.');
  }
  const beta = vx === 0 ? 0 : -vx / vy; // no signed zero for a flat y
  return { method: 'total-least-squares', label: 'Total least squares (orthogonal regression)', beta, intercept: (my - beta * mx) / f, standardError: null, tValue: null, pValue: null, note: `depends on the units of both series; ${STATIC_NOTE}` };
}

/**
 * Dynamic OLS with a HAC standard error, as a HedgeRatio. When y is an exact line in x the
 * residuals are rounding noise and so would be the standard error (about 1e-30, t about 1e30):
 * it is left out, with the one sentence of spread/rounding-noise.ts as the note.
 */
export function dynamicOlsHedgeRatio(y: ArrayLike<number>, x: ArrayLike<number>, options: DynamicOlsOptions = {}, names = { y: 'y', x: 'x' }): { ratio: HedgeRatio; fit: DynamicOlsFit } {
  requirePair(y, x);
  const fit = dynamicOls(y, x, options);
  const line = olsHedgeRatio(y, x);
  const noise = roundingNoiseOf(y, spreadSeries(y, x, line.beta, line.intercept), { y: names.y, xs: [names.x] });
  if (noise) {
    return {
      ratio: {
        method: 'dynamic-ols',
        label: `Dynamic OLS (${fit.leadsLags} leads and lags of the change in x)`,
        beta: fit.beta,
        intercept: fit.intercept,
        standardError: null,
        tValue: null,
        pValue: null,
        note: `no standard error: ${noise.message}`,
      },
      fit,
    };
  }
  return {
    ratio: {
      method: 'dynamic-ols',
      label: `Dynamic OLS (${fit.leadsLags} leads and lags of the change in x)`,
      beta: fit.beta,
      intercept: fit.intercept,
      standardError: fit.standardError,
      tValue: fit.tValue,
      pValue: fit.pValue,
      note: `standard error ${dynamicOlsStandardErrorText(fit)}; p-value two-sided normal`,
    },
    fit,
  };
}

/**
 * All four hedge ratios of y on x with a one-sentence summary. `names` are the prices' own
 * names; with `logged` the series are their natural logs, the slopes are elasticities, and
 * the summary gives the units to hold at the latest prices.
 */
export function hedgeRatios(
  y: ArrayLike<number>,
  x: ArrayLike<number>,
  options: DynamicOlsOptions = {},
  names: { y?: string; x?: string } = {},
  logged = false,
): HedgeRatios {
  const resolved = { y: names.y ?? 'y', x: names.x ?? 'x' };
  requirePair(y, x, resolved);
  const dols = dynamicOlsHedgeRatio(y, x, options, resolved);
  const ols = olsHedgeRatio(y, x);
  const reverseOls = reverseOlsHedgeRatio(y, x);
  const tls = totalLeastSquaresHedgeRatio(y, x);
  const d = dols.ratio;
  const unitsOf = (r: HedgeRatio): HedgeUnits => hedgeUnits(r.beta, y, x, logged, resolved);
  const units = { ols: unitsOf(ols), reverseOls: unitsOf(reverseOls), totalLeastSquares: unitsOf(tls), dynamicOls: unitsOf(d) };
  const se = d.standardError === null ? (d.note ?? 'no standard error') : `standard error ${formatCoefficient(d.standardError)} ${dynamicOlsStandardErrorText(dols.fit)}`;
  const others = `OLS of ${resolved.y} on ${resolved.x} gives ${formatCoefficient(ols.beta)}, the reverse regression ${formatCoefficient(reverseOls.beta)}, the orthogonal line ${formatCoefficient(tls.beta)}.`;
  const verdict = logged
    ? `Dynamic OLS of ln ${resolved.y} on ln ${resolved.x}: ${units.dynamicOls.text}; ${se}. In logs, ${others}`
    : `Hedge about ${formatCoefficient(d.beta)} units of ${resolved.x} per unit of ${resolved.y} (dynamic OLS, ${se}); ${others}`;
  return { ols, reverseOls, totalLeastSquares: tls, dynamicOls: d, dynamicOlsFit: dols.fit, units, logged, names: resolved, verdict };
}
