/**
 * The spread of a pair under a hedge ratio: s_t = y_t - intercept - beta x_t, the
 * equilibrium error that a pairs trade holds (long one unit of y, short beta units of x).
 */
import { MooringInputError } from '../errors';
import { requireAlignedSeries } from '../cointegration/cointegrating-regression';
import { formatValue } from '../series/clean-series';

export function spreadSeries(
  y: ArrayLike<number>, x: ArrayLike<number>, beta: number, intercept = 0,
  names: { y: string; x: string; rowLabel?: (position: number) => string } = { y: 'y', x: 'x' },
): Float64Array {
  if (!Number.isFinite(beta)) throw new MooringInputError(`The hedge ratio must be a finite number; got ${beta}.`);
  if (!Number.isFinite(intercept)) throw new MooringInputError(`The intercept must be a finite number; got ${intercept}.`);
  const n = requireAlignedSeries([y, x], [names.y, names.x]);
  const out = new Float64Array(n);
  for (let t = 0; t < n; t++) out[t] = y[t] - intercept - beta * x[t];
  for (let t = 0; t < n; t++) if (!Number.isFinite(out[t])) refuseOverflow(y[t], x[t], beta, intercept, names, t);
  return out;
}

/**
 * A spread value past the largest double (about 1.8e308) comes from a hedge ratio or an
 * intercept far out of scale with the prices: named with the row, the terms, and the scale
 * that would fit.
 */
function refuseOverflow(yt: number, xt: number, beta: number, intercept: number, names: { y: string; x: string; rowLabel?: (position: number) => string }, t: number): never {
  const where = names.rowLabel ? names.rowLabel(t) : `position ${t + 1}`;
  const minus = (v: number) => (v < 0 ? ` + ${formatValue(-v)}` : ` - ${formatValue(v)}`);
  const terms = `${formatValue(yt)}${intercept !== 0 ? minus(intercept) : ''}${minus(beta)} × ${formatValue(xt)}`;
  const ratio = xt !== 0 ? ` (there ${names.y} / ${names.x} is ${formatValue(Number((yt / xt).toPrecision(4)))})` : '';
  throw new MooringInputError(
    `The spread ${names.y} - ${intercept !== 0 ? 'intercept - ' : ''}beta × ${names.x} at ${where} is ${terms}, beyond the largest number a double holds (about 1.8e308): ` +
      `the ${Math.abs(beta * xt) >= Math.abs(intercept) ? `hedge ratio ${formatValue(beta)}` : `intercept ${formatValue(intercept)}`} is far out of scale with the prices${ratio}; give one on their scale.`, where);
}
