/**
 * The spread of a pair under a hedge ratio: s_t = y_t - intercept - beta x_t, the
 * equilibrium error that a pairs trade holds (long one unit of y, short beta units of x).
 */
import { MooringInputError } from '../errors';
import { requireAlignedSeries } from '../cointegration/cointegrating-regression';

export function spreadSeries(y: ArrayLike<number>, x: ArrayLike<number>, beta: number, intercept = 0, names = { y: 'y', x: 'x' }): Float64Array {
  if (!Number.isFinite(beta)) throw new MooringInputError(`The hedge ratio must be a finite number; got ${beta}.`);
  if (!Number.isFinite(intercept)) throw new MooringInputError(`The intercept must be a finite number; got ${intercept}.`);
  const n = requireAlignedSeries([y, x], [names.y, names.x]);
  const out = new Float64Array(n);
  for (let t = 0; t < n; t++) out[t] = y[t] - intercept - beta * x[t];
  return out;
}
