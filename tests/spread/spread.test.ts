import { describe, expect, it } from 'vitest';
import { MooringInputError } from '../../addin/errors';
import { autoregressive1, SeededRandom } from '../../addin/random';
import { EXPLOSIVE_OVERSHOOT, halfLife, halfLifeFromSpeed, NO_MEAN_REVERSION, OVERSHOOT_NOTE } from '../../addin/spread/half-life';
import { spreadSeries } from '../../addin/spread/spread-series';
import { rollingZScore, zScore } from '../../addin/spread/z-score';

describe('spreadSeries', () => {
  it('is y - intercept - beta x, row by row', () => {
    expect(Array.from(spreadSeries([10, 12, 11], [4, 5, 4.5], 2, 1))).toEqual([1, 1, 1]);
  });
  it('refuses a non-finite hedge ratio and series of different lengths', () => {
    expect(() => spreadSeries([1, 2], [1, 2], Number.NaN)).toThrow(MooringInputError);
    expect(() => spreadSeries([1, 2, 3], [1, 2], 1)).toThrow(MooringInputError);
  });
});

describe('half-life', () => {
  it('from a speed: ln 2 / -ln(1 + lambda) for -1 < lambda < 0; null with a note for lambda >= 0 and lambda <= -2; overshoot noted for -2 < lambda < -1', () => {
    expect(halfLifeFromSpeed(-0.06).halfLife).toBeCloseTo(Math.log(2) / -Math.log(0.94), 12);
    expect(halfLifeFromSpeed(0)).toEqual({ halfLife: null, note: NO_MEAN_REVERSION });
    expect(halfLifeFromSpeed(0.02)).toEqual({ halfLife: null, note: NO_MEAN_REVERSION });
    expect(halfLifeFromSpeed(-1).halfLife).toBe(0);
    expect(halfLifeFromSpeed(-1.5)).toEqual({ halfLife: 1, note: OVERSHOOT_NOTE });
    expect(halfLifeFromSpeed(-2)).toEqual({ halfLife: null, note: EXPLOSIVE_OVERSHOOT });
    expect(() => halfLifeFromSpeed(Number.NaN)).toThrow(MooringInputError);
  });

  it('AR(1) spread with phi = 0.95, T = 5,000 (seed 95): half-life near ln 2 / -ln 0.95 = 13.51, within the range that phi +/- 3 standard errors implies', () => {
    // The standard error of phi-hat is sqrt((1 - phi^2) / T) = 0.0044, so 3 s.e. = 0.0132 and the
    // half-life may lie between ln 2 / -ln(0.9368) = 10.6 and ln 2 / -ln(0.9632) = 18.5 periods.
    const phi = 0.95;
    const T = 5000;
    const spread = autoregressive1(new SeededRandom(95), T, phi);
    const h = halfLife(spread, 'day');
    const se = Math.sqrt((1 - phi * phi) / T);
    const bound = (p: number): number => Math.log(2) / -Math.log(p);
    expect(Math.abs(h.phi - phi)).toBeLessThan(3 * se);
    expect(h.halfLife as number).toBeGreaterThan(bound(phi - 3 * se));
    expect(h.halfLife as number).toBeLessThan(bound(phi + 3 * se));
    expect(Math.abs(h.standardError - se)).toBeLessThan(0.1 * se);
    expect(h.nobs).toBe(T - 1);
    expect(h.verdict).toMatch(/^The spread closes about \d(\.\d)?% of a gap to its mean each day: half the gap in about \d+ days\.$/);
  });

  it('an explosive spread has no half-life: null with "no mean reversion", never a negative or infinite number', () => {
    const rng = new SeededRandom(1);
    const s = new Float64Array(300);
    s[0] = 1;
    for (let t = 1; t < 300; t++) s[t] = 1.02 * s[t - 1] + 0.1 * rng.normal();
    const h = halfLife(s);
    expect(h.lambda).toBeGreaterThan(0);
    expect(h.halfLife).toBeNull();
    expect(h.note).toBe(NO_MEAN_REVERSION);
    expect(h.verdict).toContain('no mean reversion');
  });

  it('refuses fewer than 10 values', () => {
    expect(() => halfLife([1, 2, 3])).toThrow(/too few/);
  });
});

describe('z-scores', () => {
  const spread = Array.from(autoregressive1(new SeededRandom(4), 500, 0.8), (v) => 1e6 + v);

  it('full sample: mean 0 and sample standard deviation 1 (n - 1)', () => {
    const z = zScore(spread);
    const m = z.values.reduce((a, b) => a + b, 0) / 500;
    const ss = z.values.reduce((a, b) => a + (b - m) ** 2, 0) / 499;
    expect(Math.abs(m)).toBeLessThan(1e-9);
    expect(ss).toBeCloseTo(1, 10);
    expect(() => zScore([3, 3, 3])).toThrow(/constant/);
  });

  it('rolling: the running sums give the same z as recomputing each window, to 1e-8, on a series near 1,000,000; the first window - 1 entries are null', () => {
    const w = 20;
    const rolled = rollingZScore(spread, w);
    expect(rolled.slice(0, w - 1).every((v) => v === null)).toBe(true);
    for (let i = w - 1; i < spread.length; i++) {
      const win = spread.slice(i - w + 1, i + 1);
      const m = win.reduce((a, b) => a + b, 0) / w;
      const sd = Math.sqrt(win.reduce((a, b) => a + (b - m) ** 2, 0) / (w - 1));
      expect(Math.abs((rolled[i] as number) - (spread[i] - m) / sd)).toBeLessThan(1e-8);
    }
  });

  it('rolling: a constant window gives null, not NaN or infinity', () => {
    const s = [1, 2, 3, 5, 5, 5, 5, 4];
    const rolled = rollingZScore(s, 3);
    expect(rolled[5]).toBeNull();
    expect(rolled[6]).toBeNull();
    expect(rolled[7]).not.toBeNull();
  });

  it('rolling: refuses a window below 3 or above the length, saying what would work', () => {
    expect(() => rollingZScore(spread, 2)).toThrow(/at least 3/);
    expect(() => rollingZScore(spread, 501)).toThrow(/use at most 500/);
    expect(() => rollingZScore(spread, 4.5)).toThrow(MooringInputError);
  });
});
