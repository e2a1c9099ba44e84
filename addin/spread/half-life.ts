/**
 * Half-life of deviations from a mean or from a long-run relation.
 *
 * From a speed of adjustment lambda (the share of a gap that closes each period, with sign:
 * Δs_t = lambda s_{t-1} + ...), a gap evolves as s_t = (1 + lambda) s_{t-1}, so its size halves
 * after ln 2 / -ln|1 + lambda| periods when -2 < lambda < 0. For -2 < lambda < -1 the gap
 * overshoots and flips sign each period while its size still shrinks; at lambda = -1 it
 * closes in one period (half-life 0). lambda >= 0: no mean reversion; lambda <= -2: the
 * overshoot grows. In both cases there is no half-life: null with a note, never a negative
 * or infinite number.
 *
 * halfLife(spread) estimates lambda by the AR(1) regression Δs_t = c + lambda s_{t-1} + e_t
 * (Dickey-Fuller form with a constant).
 */
import { MooringInputError } from '../errors';
import { requireAlignedSeries } from '../cointegration/cointegrating-regression';
import { formatPeriods, formatShareClosed } from '../cointegration/wording';
import { adfRegression } from '../unitroot/adf-regression';
import { halfLifeInterval, type HalfLifeInterval } from './half-life-interval';

export interface HalfLifeAnswer {
  /** Periods for a gap to halve, or null when there is no mean reversion. */
  halfLife: number | null;
  /** Why halfLife is null, or that the gap overshoots. */
  note?: string;
}

export const NO_MEAN_REVERSION = 'no mean reversion: a gap does not shrink (the speed of adjustment is zero or positive)';
export const EXPLOSIVE_OVERSHOOT = 'no half-life: the gap overshoots by more than its own size each period, so it grows';
export const OVERSHOOT_NOTE = 'the gap overshoots: it changes sign each period while its size shrinks';

/** Half-life ln 2 / -ln|1 + lambda| of a gap closing at speed lambda, or null with a note. */
export function halfLifeFromSpeed(lambda: number): HalfLifeAnswer {
  if (Number.isNaN(lambda)) throw new MooringInputError('The speed of adjustment is not a number; check the data for gaps.');
  if (lambda >= 0) return { halfLife: null, note: NO_MEAN_REVERSION };
  if (lambda <= -2) return { halfLife: null, note: EXPLOSIVE_OVERSHOOT };
  const halfLife = Math.log(2) / -Math.log(Math.abs(1 + lambda));
  return lambda < -1 ? { halfLife, note: OVERSHOOT_NOTE } : { halfLife };
}

export interface SpreadHalfLife extends HalfLifeAnswer {
  /** Speed of adjustment: the coefficient on the lagged spread. */
  lambda: number;
  /** AR(1) coefficient of the spread, 1 + lambda. */
  phi: number;
  standardError: number;
  tValue: number;
  constant: number;
  /** Rows of the AR(1) regression: T - 1. */
  nobs: number;
  /** The half-life's 95% interval (half-life-interval.ts). */
  interval: HalfLifeInterval;
  verdict: string;
}

/** AR(1) half-life of a spread: Δs_t = c + lambda s_{t-1} + e_t. */
export function halfLife(spread: ArrayLike<number>, period = 'period'): SpreadHalfLife {
  requireAlignedSeries([spread], ['the spread']);
  if (spread.length < 10) throw new MooringInputError(`${spread.length} values are too few for a half-life: it needs at least 10.`);
  const { fit, gamma: lambda, nobs } = adfRegression(spread, 0, 'const');
  const answer = halfLifeFromSpeed(lambda);
  const interval = halfLifeInterval(lambda, fit.standardErrors[0], spread.length, period);
  const verdict =
    answer.halfLife === null
      ? `The spread shows ${answer.note}.`
      : `The spread closes about ${formatShareClosed(lambda)} of a gap to its mean each ${period}: half the gap in about ${formatPeriods(answer.halfLife, period)}.`;
  return {
    ...answer,
    lambda,
    phi: 1 + lambda,
    standardError: fit.standardErrors[0],
    tValue: fit.tValues[0],
    constant: fit.coefficients[1],
    nobs,
    interval,
    verdict,
  };
}
