import { describe, expect, it } from 'vitest';
import { engleGranger } from '../../addin/cointegration/engle-granger';
import { MooringInputError } from '../../addin/errors';
import { SeededRandom, autoregressive1, randomWalk } from '../../addin/random';
import { rollingRelation } from '../../addin/stability/rolling-relation';
import { SMALLEST_WINDOW } from '../../addin/stability/window-plan';
import { largestAllowedLag, schwertMaxLag } from '../../addin/unitroot/max-lag';

/**
 * The smallest accepted window yields a p-value in every window. A window of 20 was accepted
 * and gave "not available" in all of them (the residual ADF at its default largest lag had as
 * many columns as rows); the minimum is now the fewest rows the test can use, and these checks
 * tie it to the lag rule (Schwert 1989's default, capped at T/2 - 1) rather than to a number.
 */
function pair(seed: number, T: number): { y: Float64Array; x: Float64Array } {
  const rng = new SeededRandom(seed);
  const x = randomWalk(rng, T, { start: 50, sigma: 0.5 });
  const u = autoregressive1(rng, T, 0.7, 0.3);
  return { y: x.map((v, t) => 10 + 2 * v + u[t]), x };
}

/** Rows minus columns of the residual ADF's lag search at its default largest lag, for T rows. */
function spareRows(T: number): number {
  const pmax = Math.min(schwertMaxLag(T), largestAllowedLag(T, 'none'));
  return T - 1 - pmax - (pmax + 1);
}

describe('smallest rolling window', () => {
  it('is the fewest rows whose lag search keeps a row to spare: none at one row fewer', () => {
    expect(spareRows(SMALLEST_WINDOW)).toBeGreaterThan(0);
    expect(spareRows(SMALLEST_WINDOW - 1)).toBeLessThanOrEqual(0);
    const { y, x } = pair(3, SMALLEST_WINDOW);
    expect(() => engleGranger(y.subarray(1), [x.subarray(1)])).toThrow(MooringInputError);
    expect(engleGranger(y, [x]).test.pValue).not.toBeNull();
  });

  it('refuses one row fewer, saying the smallest it takes', () => {
    const { y, x } = pair(4, 250);
    expect(() => rollingRelation(y, x, { window: SMALLEST_WINDOW - 1 })).toThrow(`at least ${SMALLEST_WINDOW} rows`);
  });

  it.each([1, 2, 3, 4, 5])('every window from the smallest to 12 rows more has a p-value, and the summary counts them all (seed %i, 250 rows)', (seed) => {
    const { y, x } = pair(seed, 250);
    for (let window = SMALLEST_WINDOW; window <= SMALLEST_WINDOW + 12; window++) {
      const r = rollingRelation(y, x, { window });
      expect(r.pValue.every((p) => p !== null && p >= 0 && p <= 1)).toBe(true);
      const total = r.endRow.length.toLocaleString('en-US');
      expect(r.summary[0]).toMatch(new RegExp(`^In \\d+ of ${total} rolling windows of ${window} rows`));
    }
  });

  it('expanding windows from the smallest have a p-value each', () => {
    const { y, x } = pair(6, 120);
    const r = rollingRelation(y, x, { window: SMALLEST_WINDOW, expanding: true });
    expect(r.pValue.every((p) => p !== null)).toBe(true);
  });
});
