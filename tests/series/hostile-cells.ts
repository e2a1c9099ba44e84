/**
 * A seeded generator of hostile numeric input for the "never NaN, never a fault" tests: a pair
 * of ordinary price columns (a random walk near 60 and a series tied to it), into which one
 * extreme number is planted at a seeded row and column. The extremes are finite doubles that
 * ordinary arithmetic on them overflows or underflows: powers of ten up to the largest double,
 * the largest double itself, and values at the other end (subnormals, negative zero).
 */
import { SeededRandom } from '../../addin/random';

/** A pair of price columns as spreadsheet cells (one value per row). */
export interface CellPair {
  y: number[][];
  x: number[][];
}

/** Where a hostile value was planted. */
export interface Planted {
  /** 0-based index of the row in the columns. */
  index: number;
  column: 'y' | 'x';
  value: number;
}

/** y = 5 + 1.2 x + AR(1) noise, x a random walk near 60: a cointegrated pair of n rows. */
export function pricePair(seed: number, n: number): CellPair {
  const rng = new SeededRandom(seed);
  let x = 60;
  let u = 0;
  const y: number[][] = [];
  const xs: number[][] = [];
  for (let t = 0; t < n; t++) {
    x += 0.5 * rng.normal();
    u = 0.7 * u + 0.3 * rng.normal();
    xs.push([Number(x.toFixed(4))]);
    y.push([Number((5 + 1.2 * x + u).toFixed(4))]);
  }
  return { y, x: xs };
}

/** Huge magnitudes: where squares, products and sums of doubles overflow (about 1.8e308). */
export const HUGE_VALUES: readonly number[] = [1e154, 1e155, 1e200, 1e300, 1e308, Number.MAX_VALUE];

/** Tiny magnitudes: where squares underflow to zero or the values are subnormal. */
export const TINY_VALUES: readonly number[] = [1e-160, 1e-300, 5e-324, -0];

/**
 * `count` hostile cases from `seed`: each a fresh pair with one value planted, of seeded sign,
 * drawn from HUGE_VALUES and TINY_VALUES, at a seeded row (never the first two or last two, so
 * the value sits inside the series) and in a seeded column.
 */
export function hostileCases(seed: number, count: number, n = 120): { pair: CellPair; planted: Planted }[] {
  const rng = new SeededRandom(seed);
  const pool = [...HUGE_VALUES, ...TINY_VALUES];
  const out: { pair: CellPair; planted: Planted }[] = [];
  for (let c = 0; c < count; c++) {
    const pair = pricePair(seed * 1000 + c, n);
    const magnitude = pool[Math.floor(rng.uniform() * pool.length)];
    const value = rng.uniform() < 0.5 ? -magnitude : magnitude;
    const index = 2 + Math.floor(rng.uniform() * (n - 4));
    const column = rng.uniform() < 0.5 ? 'y' : 'x';
    pair[column][index] = [value];
    out.push({ pair, planted: { index, column, value } });
  }
  return out;
}
