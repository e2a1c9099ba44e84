/**
 * Reading a probability off a short table of (statistic, probability) points by linear
 * interpolation, with an explicit flag when the statistic lies outside the table.
 */

/**
 * Set when a statistic fell outside a table and its p-value was held at the table's end:
 * 'below' means the true p-value is smaller than the one reported, 'above' that it is
 * larger; null means the statistic was inside the table.
 */
export type BeyondTable = 'below' | 'above' | null;

/** A probability read from a table, with the flag for a statistic beyond its ends. */
export interface TablePValue {
  pValue: number;
  beyondTable: BeyondTable;
}

/** Which end of the table a statistic fell beyond, or null if inside. */
export type TableEnd = 'left' | 'right' | null;

/**
 * Linear interpolation of y against x through the points (xs[i], ys[i]), xs strictly
 * increasing: y = y_i + (y_{i+1} − y_i)·(x − x_i)/(x_{i+1} − x_i) on [x_i, x_{i+1}].
 * Outside [xs[0], xs[last]] the end value is returned and `end` says which end.
 */
export function interpolateLinearly(
  x: number,
  xs: readonly number[],
  ys: readonly number[],
): { value: number; end: TableEnd } {
  const last = xs.length - 1;
  if (x < xs[0]) return { value: ys[0], end: 'left' };
  if (x > xs[last]) return { value: ys[last], end: 'right' };
  let i = 0;
  while (i < last - 1 && x > xs[i + 1]) i++;
  const weight = (x - xs[i]) / (xs[i + 1] - xs[i]);
  return { value: ys[i] + weight * (ys[i + 1] - ys[i]), end: null };
}
