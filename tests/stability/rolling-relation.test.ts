import { describe, expect, it } from 'vitest';
import { cointegratingRegression } from '../../addin/cointegration/cointegrating-regression';
import { engleGranger } from '../../addin/cointegration/engle-granger';
import { MooringInputError } from '../../addin/errors';
import { SeededRandom, autoregressive1, randomWalk } from '../../addin/random';
import { halfLife } from '../../addin/spread/half-life';
import { spreadSeries } from '../../addin/spread/spread-series';
import { rollingRelation } from '../../addin/stability/rolling-relation';

/**
 * The incremental window statistics against from-scratch fits of each window. Tolerances:
 * hedge ratio and intercept 1e-9 against QR least squares on the window's rows (the brief's),
 * measured on the scale of the terms that make them: a hedge ratio relative to max(|beta|, 1)
 * (after the break below, beta passes near 0, where no method has relative accuracy), an
 * intercept, mean(y) - beta mean(x), relative to |mean(y)| + |beta mean(x)|; half-life 1e-8
 * relative against halfLife() on the window's spread; Engle-Granger p-value 1e-10 absolute
 * against engleGranger() on the window's rows.
 */
const relative = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);
const betaError = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1);
const mean = (v: Float64Array) => v.reduce((p, q) => p + q, 0) / v.length;
/** |a - b| over the size of the two terms of the intercept of y on x with slope beta. */
const interceptError = (a: number, b: number, y: Float64Array, x: Float64Array, beta: number) =>
  Math.abs(a - b) / (Math.abs(mean(y)) + Math.abs(beta * mean(x)));

/** y = 3 + 1.5 x + u with x a random walk around `level`; from row `breakAt` the relation gives way to a walk of its own. */
function pair(seed: number, T: number, level: number, breakAt = T): { y: Float64Array; x: Float64Array } {
  const rng = new SeededRandom(seed);
  const x = randomWalk(rng, T, { start: level, sigma: 0.5 });
  const u = autoregressive1(rng, T, 0.8, 0.4);
  const drift = randomWalk(rng, T);
  return { y: x.map((v, t) => 3 + 1.5 * v + u[t] + (t >= breakAt ? drift[t] - drift[breakAt] : 0)), x };
}

describe('rolling windows: incremental numbers equal from-scratch fits of each window', () => {
  // Seed 5, T = 1,200 around a price of 2,000 (far from zero, where running sums lose digits).
  const { y, x } = pair(5, 1200, 2000, 700);
  const r = rollingRelation(y, x, { window: 150 });

  it('has one window per end row from 149 to 1,199', () => {
    expect(r.endRow).toHaveLength(1051);
    expect(r.endRow[0]).toBe(149);
    expect(r.endRow[1050]).toBe(1199);
    expect(r.startRow[1050]).toBe(1050);
    expect(r.nobs.every((n) => n === 150)).toBe(true);
  });

  it('hedge ratio and intercept equal QR least squares on every window to 1e-9', () => {
    let worst = 0;
    r.endRow.forEach((e, k) => {
      const s = r.startRow[k];
      const ys = y.subarray(s, e + 1);
      const xs = x.subarray(s, e + 1);
      const fit = cointegratingRegression(ys, [xs], 'const');
      worst = Math.max(worst, betaError(r.beta[k] as number, fit.beta[0]), interceptError(r.intercept[k] as number, fit.intercept as number, ys, xs, fit.beta[0]));
    });
    expect(worst).toBeLessThan(1e-9);
  });

  it('half-life equals halfLife() of the window spread under the window beta, to 1e-8', () => {
    for (let k = 0; k < r.endRow.length; k += 7) {
      const s = r.startRow[k];
      const e = r.endRow[k];
      const spread = spreadSeries(y.subarray(s, e + 1), x.subarray(s, e + 1), r.beta[k] as number, r.intercept[k] as number);
      const life = halfLife(spread).halfLife;
      if (life === null) expect(r.halfLife[k]).toBeNull();
      else expect(relative(r.halfLife[k] as number, life)).toBeLessThan(1e-8);
    }
  });

  it('Engle-Granger p-value, tau and lags equal engleGranger() on the window rows (p to 1e-10)', () => {
    for (let k = 0; k < r.endRow.length; k += 25) {
      const s = r.startRow[k];
      const e = r.endRow[k];
      const eg = engleGranger(y.subarray(s, e + 1), [x.subarray(s, e + 1)]);
      expect(r.lags[k]).toBe(eg.test.lags);
      expect(Math.abs((r.pValue[k] as number) - (eg.test.pValue as number))).toBeLessThan(1e-10);
      expect(relative(r.statistic[k] as number, eg.test.statistic)).toBeLessThan(1e-10);
    }
  });

  it('sees the relation give way: windows before row 700 pass at 5%, the latest ones do not', () => {
    const early = r.pValue.slice(0, 400).filter((p) => (p as number) <= 0.05).length / 400;
    const late = r.pValue.slice(-200).filter((p) => (p as number) <= 0.05).length / 200;
    expect(early).toBeGreaterThan(0.9);
    expect(late).toBeLessThan(0.3);
    expect(r.summary[0]).toMatch(/^In \d+ of 1,051 rolling windows of 150 rows \(\d+%\), the Engle-Granger p-value of y on x is at or below 5%\.$/);
    expect(r.summary.join(' ')).toContain('not independent tests');
  });
});

describe('step thins the windows and keeps the latest', () => {
  const { y, x } = pair(6, 600, 50);
  const all = rollingRelation(y, x, { window: 100 });
  const thin = rollingRelation(y, x, { window: 100, step: 40 });

  it('ends windows on the last row and every 40 rows before it', () => {
    expect(thin.endRow).toEqual([119, 159, 199, 239, 279, 319, 359, 399, 439, 479, 519, 559, 599]);
  });

  it('gives the same numbers as the full run at those ends (to 1e-10)', () => {
    thin.endRow.forEach((e, k) => {
      const j = all.endRow.indexOf(e);
      expect(betaError(thin.beta[k] as number, all.beta[j] as number)).toBeLessThan(1e-10);
      expect(Math.abs((thin.pValue[k] as number) - (all.pValue[j] as number))).toBeLessThan(1e-12);
    });
  });

  it('a step longer than the window still equals fits from scratch', () => {
    const sparse = rollingRelation(y, x, { window: 100, step: 150 });
    expect(sparse.endRow).toEqual([149, 299, 449, 599]);
    sparse.endRow.forEach((e, k) => {
      const fit = cointegratingRegression(y.subarray(e - 99, e + 1), [x.subarray(e - 99, e + 1)], 'const');
      expect(betaError(sparse.beta[k] as number, fit.beta[0])).toBeLessThan(1e-9);
    });
  });
});

describe('expanding windows', () => {
  const { y, x } = pair(7, 800, 120);
  const r = rollingRelation(y, x, { window: 200, step: 50, expanding: true });
  const last = r.endRow.length - 1;

  it('start on the first row and grow to the whole series', () => {
    expect(r.startRow.every((s) => s === 0)).toBe(true);
    expect(r.nobs[0]).toBe(200);
    expect(r.endRow.slice(0, 3)).toEqual([199, 249, 299]);
    expect(r.nobs[last]).toBe(800);
  });

  it('end on the full-sample values: beta, intercept, p-value, tau and lags of engleGranger, half-life of its spread', () => {
    const eg = engleGranger(y, [x]);
    expect(relative(r.beta[last] as number, eg.beta[0])).toBeLessThan(1e-9);
    expect(relative(r.intercept[last] as number, eg.intercept as number)).toBeLessThan(1e-9);
    expect(Math.abs((r.pValue[last] as number) - (eg.test.pValue as number))).toBeLessThan(1e-10);
    expect(relative(r.statistic[last] as number, eg.test.statistic)).toBeLessThan(1e-10);
    expect(r.lags[last]).toBe(eg.test.lags);
    const life = halfLife(spreadSeries(y, x, eg.beta[0], eg.intercept as number)).halfLife as number;
    expect(relative(r.halfLife[last] as number, life)).toBeLessThan(1e-8);
  });

  it('every expanding hedge ratio equals least squares on rows 0..end to 1e-9', () => {
    r.endRow.forEach((e, k) => {
      const fit = cointegratingRegression(y.subarray(0, e + 1), [x.subarray(0, e + 1)], 'const');
      expect(betaError(r.beta[k] as number, fit.beta[0])).toBeLessThan(1e-9);
    });
  });
});

describe('rolling refusals and edge cases', () => {
  const { y, x } = pair(8, 300, 80);
  it.each([
    [{ window: 10 }, /at least 21 rows/],
    [{ window: 20 }, /at least 21 rows/],
    [{ window: 301 }, /longer than the series \(300 rows\)/],
    [{ window: 50, step: 0 }, /step must be a whole number of at least 1/],
    [{ window: 50.5 }, /whole number/],
  ])('refuses %j with MooringInputError', (options, message) => {
    expect(() => rollingRelation(y, x, options)).toThrow(MooringInputError);
    expect(() => rollingRelation(y, x, options)).toThrow(message);
  });

  it('refuses series of different lengths or with a gap', () => {
    expect(() => rollingRelation(y, x.subarray(1), { window: 50 })).toThrow(/299 values/);
    const gap = Float64Array.from(x);
    gap[3] = Number.NaN;
    expect(() => rollingRelation(y, gap, { window: 50 })).toThrow(/position 4/);
    expect(() => rollingRelation(y, x, undefined as never)).toThrow(MooringInputError);
  });

  it('reports a window where x does not move as nulls, never NaN, and says so', () => {
    const flat = Float64Array.from(x, (v, t) => (t < 120 ? 80 : v));
    const r = rollingRelation(y, flat, { window: 60, step: 30 });
    expect(r.beta[0]).toBeNull();
    expect(r.pValue[0]).toBeNull();
    expect(r.beta[r.beta.length - 1]).not.toBeNull();
    expect(JSON.stringify(r)).not.toContain('NaN');
    expect(r.summary.join(' ')).toMatch(/In \d+ windows? x or y does not move/);
  });

  it('gives p = 0 and no tau for a window where y is an exact line in x', () => {
    const line = Float64Array.from(x, (v) => 2 + 3 * v);
    const r = rollingRelation(line, x, { window: 100, step: 100 });
    expect(r.pValue.every((p) => p === 0)).toBe(true);
    expect(r.statistic.every((t) => t === null)).toBe(true);
  });
});
