/**
 * The moving hedge ratio: the Kalman filter's intercept and slope of y on x, row by row, for a
 * relation allowed to drift (diffuse-filter.ts for the model and its references). One engine
 * call gives every surface (the kalman command, MOOR.MOVINGHEDGE, the report's section) the
 * same result:
 * - the filtered path (what a trader knew on each day, from the rows up to it) with its standard
 *   deviation, and the smoothed path (every row's best estimate with hindsight);
 * - the filtered spread v_t = y_t - a_t - b_t x_t, the one-step-ahead error on the line known the
 *   day before, and its standardised form v_t / sqrt(F_t): the signal practitioners trade;
 * - Q and R by maximum likelihood (variance-search.ts) or as given, with the log-likelihood;
 * - the latest ratio with its 95% band, and how far the fixed least-squares ratio sits from the
 *   smoothed path, in words.
 * The rows of the diffuse period (the first two, generically) have no filtered value with a
 * finite variance and no standardised spread: they are null.
 */
import { requireAlignedSeries } from '../cointegration/cointegrating-regression';
import { olsHedgeRatio } from '../cointegration/hedge-ratio';
import { formatCoefficient } from '../cointegration/wording';
import { normalQuantile } from '../distributions';
import { MooringInputError } from '../errors';
import { diffuseFilter } from './diffuse-filter';
import { diffuseSmoother } from './diffuse-smoother';
import { estimateVariances } from './variance-search';

/** What the filter assumes, in words, beside every moving hedge ratio a surface shows. */
export const MOVING_HEDGE_ASSUMPTIONS =
  'The filter assumes that the intercept and the slope each take an independent random step every row, both with one variance (Q), ' +
  'that the noise around the line is normal with one variance (R), and that nothing is known of the line before the first row (its first two rows only set it up). ' +
  'It follows a ratio that moves; it does not test whether the pair is tied.';

/** Why a drifting ratio matters, in words. */
export const DRIFT_MEANING =
  'A ratio that drifts is itself evidence that the fixed relation is unstable: a spread built on one fixed line then mixes that drift with the gap it is meant to measure.';

export interface MovingHedgeOptions {
  /** Q and R as given; both or neither. Default: both by maximum likelihood. */
  stateVar?: number;
  obsVar?: number;
}

export interface MovingHedge {
  names: { y: string; x: string };
  rows: number;
  stateVar: number;
  obsVar: number;
  /** 'estimated' (maximum likelihood) or 'given'. */
  variances: 'estimated' | 'given';
  /** The exact diffuse log-likelihood at (Q, R) (Durbin & Koopman 2012, section 7.2). */
  logLikelihood: number;
  /** Rows of the diffuse period (null filtered values there). */
  diffuseRows: number;
  /** Filtered (from the rows up to each one), null in the diffuse period. */
  beta: (number | null)[];
  intercept: (number | null)[];
  betaStd: (number | null)[];
  interceptStd: (number | null)[];
  /** Smoothed (from every row). */
  betaSmoothed: number[];
  betaSmoothedStd: number[];
  /** The smoothed slope's 95% band, row by row. */
  betaSmoothedLow: number[];
  betaSmoothedHigh: number[];
  interceptSmoothed: number[];
  interceptSmoothedStd: number[];
  /** One-step-ahead spread y_t - a_t - b_t x_t on the line known the row before, and that over its standard deviation. */
  spread: (number | null)[];
  spreadStandardised: (number | null)[];
  latest: { beta: number; betaStd: number; low: number; high: number; text: string };
  /** The fixed least-squares slope, for comparison, and the share of rows where it lies outside the smoothed 95% band. */
  fixedBeta: number;
  shareOutsideBand: number;
  smoothedRange: { low: number; high: number };
  driftText: string;
  assumptions: string;
  driftMeaning: string;
  warnings: string[];
}

function positive(value: number | undefined, what: string): number | undefined {
  if (value === undefined) return undefined;
  if (!Number.isFinite(value) || value < 0) throw new MooringInputError(`${what} must be a number of 0 or more; got ${String(value)}.`);
  return value;
}

/** The Kalman filter and smoother of y = a_t + b_t x + e with random-walk a_t, b_t. */
export function movingHedge(y: ArrayLike<number>, x: ArrayLike<number>, names: { y: string; x: string }, options: MovingHedgeOptions = {}): MovingHedge {
  requireAlignedSeries([y, x], [names.y, names.x]);
  const n = y.length;
  if (n < 10) throw new MooringInputError(`${n} rows are too few for a moving hedge ratio: it needs at least 10.`);
  const givenQ = positive(options.stateVar, 'The state variance (--state-var)');
  const givenR = positive(options.obsVar, 'The observation variance (--obs-var)');
  if ((givenQ === undefined) !== (givenR === undefined)) {
    throw new MooringInputError('Give both variances (the state variance and the observation variance) or neither; with neither, both are estimated by maximum likelihood.');
  }
  if (givenR === 0) throw new MooringInputError('The observation variance must be above 0: with no noise the line would pass through every point.');
  const estimate = givenQ === undefined ? estimateVariances(y, x) : null;
  const stateVar = estimate ? estimate.stateVar : (givenQ as number);
  const obsVar = estimate ? estimate.obsVar : (givenR as number);

  const path = diffuseFilter({ y, x, stateVar, obsVar });
  const smooth = diffuseSmoother(path, x);
  const d = path.diffuseRows;
  if (d >= n - 2) throw new MooringInputError(`The x column takes too few distinct values for a moving line: the set-up period ran to row ${d} of ${n}.`);
  // A filtered value has a finite variance from the last row of the diffuse period on.
  const filtered = (t: number): boolean => t >= d - 1;
  const root = (v: number): number => Math.sqrt(Math.max(v, 0));
  // Each per-row array is made from its length (Array.from on an array-like allocates it once)
  // rather than from the typed array's iterator, which grows it step by step: on a million rows
  // that left a few hundred megabytes of discarded copies at the report's peak.
  const perRow = <T>(value: (t: number) => T): T[] => Array.from({ length: n }, (_, t) => value(t));
  const beta = perRow((t) => (filtered(t) ? path.filteredB[t] : null));
  const intercept = perRow((t) => (filtered(t) ? path.filteredA[t] : null));
  const betaStd = perRow((t) => (filtered(t) ? root(path.filteredStar[3 * t + 2]) : null));
  const interceptStd = perRow((t) => (filtered(t) ? root(path.filteredStar[3 * t]) : null));
  const spread = perRow((t) => (t >= d ? path.v[t] : null));
  const spreadStandardised = perRow((t) => (t >= d ? path.v[t] / Math.sqrt(path.F[t]) : null));
  const betaSmoothed = perRow((t) => smooth.slope[t]);
  const betaSmoothedStd = perRow((t) => root(smooth.slopeVar[t]));
  const interceptSmoothed = perRow((t) => smooth.intercept[t]);
  const interceptSmoothedStd = perRow((t) => root(smooth.interceptVar[t]));

  const z = normalQuantile(0.975);
  const betaSmoothedLow = perRow((t) => betaSmoothed[t] - z * betaSmoothedStd[t]);
  const betaSmoothedHigh = perRow((t) => betaSmoothed[t] + z * betaSmoothedStd[t]);
  const last = n - 1;
  const latestBeta = path.filteredB[last];
  const latestStd = betaStd[last] as number;
  const latest = {
    beta: latestBeta,
    betaStd: latestStd,
    low: latestBeta - z * latestStd,
    high: latestBeta + z * latestStd,
    text: `latest hedge ratio ${formatCoefficient(latestBeta)}, likely between ${formatCoefficient(latestBeta - z * latestStd)} and ${formatCoefficient(latestBeta + z * latestStd)} (95%, from the rows up to the last)`,
  };
  const fixedBeta = olsHedgeRatio(y, x).beta;
  let outside = 0;
  let low = Number.POSITIVE_INFINITY;
  let high = Number.NEGATIVE_INFINITY;
  for (let t = 0; t < n; t++) {
    if (Math.abs(fixedBeta - betaSmoothed[t]) > z * betaSmoothedStd[t]) outside++;
    if (betaSmoothed[t] < low) low = betaSmoothed[t];
    if (betaSmoothed[t] > high) high = betaSmoothed[t];
  }
  const shareOutsideBand = outside / n;
  const warnings: string[] = [];
  if (estimate?.atLowerEnd) warnings.push('The state variance came out at zero: the data show no measurable drift, and the filter\'s line is the fixed least-squares line, learned row by row.');
  const driftText =
    `With hindsight the ratio ran from ${formatCoefficient(low)} to ${formatCoefficient(high)}; the fixed least-squares ratio ${formatCoefficient(fixedBeta)} ` +
    `lies outside the smoothed path's 95% band on ${Math.round(shareOutsideBand * 100)}% of the rows. ` +
    'This describes the path; it is not a test of stability (with a moving intercept the slope also trades off against the level).';
  return {
    names, rows: n, stateVar, obsVar, variances: estimate ? 'estimated' : 'given',
    logLikelihood: path.logLikelihood, diffuseRows: d,
    beta, intercept, betaStd, interceptStd, betaSmoothed, betaSmoothedStd, betaSmoothedLow, betaSmoothedHigh, interceptSmoothed, interceptSmoothedStd,
    spread, spreadStandardised, latest, fixedBeta, shareOutsideBand, smoothedRange: { low, high }, driftText,
    assumptions: MOVING_HEDGE_ASSUMPTIONS, driftMeaning: DRIFT_MEANING, warnings,
  };
}
