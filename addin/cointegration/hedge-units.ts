/**
 * The quantity of x to hold against one unit of y, from the slope b of a line y = a + b x.
 *
 * In prices the slope is that quantity already: a move dx in x goes with b dx in y, so a
 * position long one unit of y and short b units of x does not move with x.
 *
 * In natural logs the slope is an elasticity: ln y = a + b ln x gives dy / y = b dx / x, so a
 * 1% move in x goes with about b% in y, and dy = b (P_y / P_x) dx. At the latest prices P_y and
 * P_x (the last row, in prices: exp of the last logged values) the position that does not move
 * with x holds b P_y / P_x units of x per unit of y. That quantity drifts as the prices move,
 * which is why the words say "at the latest prices".
 *
 * One function for every surface (the hedge command, the report's relation, the pane), so the
 * number and its words are the same wherever they appear.
 */
import { MooringInputError } from '../errors';
import { formatCoefficient } from './wording';

/** What a slope means, and the units of x to hold per unit of y at the latest prices. */
export interface HedgeUnits {
  /** The slope as estimated: units of x per unit of y in prices, an elasticity in logs. */
  slope: number;
  slopeMeaning: 'units' | 'elasticity';
  /** Units of x to hold per unit of y at the latest prices: the slope in prices, slope * P_y / P_x in logs. */
  hedgeUnits: number;
  /** The last row's prices (exp of the logged values when the series are logs). */
  latestPriceY: number;
  latestPriceX: number;
  /** The slope and the quantity in words. */
  text: string;
}

/**
 * Units of x to hold per unit of y at the last row's prices, from the slope of y on x.
 * `y` and `x` are the series the slope was estimated on (logs when `logged`); `names` are the
 * prices' own names (without "ln").
 */
export function hedgeUnits(
  slope: number,
  y: ArrayLike<number>,
  x: ArrayLike<number>,
  logged: boolean,
  names: { y: string; x: string },
): HedgeUnits {
  if (!Number.isFinite(slope)) throw new MooringInputError(`The hedge ratio must be a finite number; got ${slope}.`);
  if (y.length === 0 || x.length === 0) throw new MooringInputError('The series are empty, so there is no latest price to size the hedge at.');
  const lastY = y[y.length - 1];
  const lastX = x[x.length - 1];
  const latestPriceY = logged ? Math.exp(lastY) : lastY;
  const latestPriceX = logged ? Math.exp(lastX) : lastX;
  const hold = (units: number): string => `hold about ${formatCoefficient(units)} units of ${names.x} per unit of ${names.y}`;
  if (!logged) {
    return { slope, slopeMeaning: 'units', hedgeUnits: slope, latestPriceY, latestPriceX, text: `${hold(slope)} (the slope in prices)` };
  }
  if (!(latestPriceX > 0) || !Number.isFinite(latestPriceX) || !Number.isFinite(latestPriceY)) {
    throw new MooringInputError(`The latest price of ${names.x} is ${latestPriceX}: the hedge in units needs a positive, finite price on the last row.`);
  }
  const units = (slope * latestPriceY) / latestPriceX;
  const text =
    `the slope ${formatCoefficient(slope)} is an elasticity (a 1% move in ${names.x} goes with about ${formatCoefficient(slope)}% in ${names.y}), not a quantity to hold; ` +
    `${hold(units)} at the latest prices (${names.y} ${formatCoefficient(latestPriceY)}, ${names.x} ${formatCoefficient(latestPriceX)})`;
  return { slope, slopeMeaning: 'elasticity', hedgeUnits: units, latestPriceY, latestPriceX, text };
}
