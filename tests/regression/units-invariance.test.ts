import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { grangerTest } from '../../addin/causality/granger-test';
import { engleGranger } from '../../addin/cointegration/engle-granger';
import { hedgeRatios } from '../../addin/cointegration/hedge-ratio';
import { phillipsOuliaris } from '../../addin/cointegration/phillips-ouliaris';
import { johansenTest } from '../../addin/johansen/johansen';
import { powerOfTwoScale } from '../../addin/linalg/power-of-two-scale';
import { SeededRandom, autoregressive1, randomWalk } from '../../addin/random';
import { diagnose } from '../../addin/report/pairwise-diagnostic';
import { screenPairs } from '../../addin/screen/screen-pairs';
import { pairSpread } from '../../addin/spread/pair-spread';
import { rollingZScore, zScore } from '../../addin/spread/z-score';
import { rollingRelation } from '../../addin/stability/rolling-relation';
import { adfTest } from '../../addin/unitroot/adf';
import { kpssTest } from '../../addin/unitroot/kpss';
import { phillipsPerronTest } from '../../addin/unitroot/phillips-perron';

/**
 * Property: no statistic depends on the units of the prices, from 1e-300 to 1e300, and none on
 * where their zero lies (a shift, with a constant in the model). Prices of 1e300 overflowed every
 * sum of squares and prices of 1e-300 underflowed them, so every test refused the data as
 * "constant" or answered "not a number"; these checks fail on that engine.
 *
 * Data: a SeededRandom pair, y = 10 + 2 x + AR(1), x a walk around 50 (the seed drawn by
 * fast-check from a fixed seed, so every run sees the same cases). Factors are powers of ten,
 * which change the digits of the prices (powers of two would not), so the checks allow for
 * rounding: statistics to 1e-8 relative, p-values to 1e-9; lag choices must be equal.
 * Quantities with units move as they must: a hedge ratio of y on x by a/b when y is multiplied
 * by a and x by b, an intercept by a.
 */
function pair(seed: number, T = 200): { y: Float64Array; x: Float64Array; w: Float64Array } {
  const rng = new SeededRandom(seed);
  const x = randomWalk(rng, T, { start: 50, sigma: 0.5 });
  const u = autoregressive1(rng, T, 0.7, 0.3);
  const w = randomWalk(rng, T, { start: 80 });
  return { y: x.map((v, t) => 10 + 2 * v + u[t]), x, w };
}

const close = (a: number, b: number, tolerance = 1e-8) => Math.abs(a - b) <= tolerance * Math.max(Math.abs(a), Math.abs(b), 1e-300);
const expectClose = (a: number | null | undefined, b: number | null | undefined, tolerance = 1e-8) => {
  expect(typeof a).toBe('number');
  expect(typeof b).toBe('number');
  expect(close(a as number, b as number, tolerance), `${a} vs ${b}`).toBe(true);
};
const expectP = (a: number | null, b: number | null) => {
  expect(a).not.toBeNull();
  expect(Math.abs((a as number) - (b as number))).toBeLessThan(1e-9);
};
const times = (v: Float64Array, k: number) => v.map((z) => z * k);

/** 10^e for e in -300..300 (the units), and a second factor within 10^5 of it. */
const units = fc.record({ seed: fc.integer({ min: 1, max: 1_000_000 }), e: fc.integer({ min: -300, max: 300 }), d: fc.integer({ min: -5, max: 5 }) });
const RUNS = { seed: 4, numRuns: 12 };

describe('the power of two that brings a series near one', () => {
  it('puts the largest |value| in [1, 2) for any size of double, and is exact', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-307, max: 1e307, noNaN: true }), fc.boolean(), (v, negative) => {
        const f = powerOfTwoScale([negative ? -v : v, v / 3]);
        const m = v * f;
        expect(m).toBeGreaterThanOrEqual(1);
        expect(m).toBeLessThan(2);
        expect(m / f).toBe(v);
      }),
      { seed: 5, numRuns: 300 },
    );
  });
});

describe('unit-root tests do not depend on units or on a shift', () => {
  it('ADF, KPSS and Phillips-Perron at 10^e (e in -300..300) equal the test on the prices as they are', () => {
    fc.assert(
      fc.property(units, ({ seed, e }) => {
        const { y } = pair(seed);
        const k = 10 ** e;
        const moved = times(y, k);
        const adf = [adfTest(y), adfTest(moved)];
        expect(adf[1].lags).toBe(adf[0].lags);
        expectClose(adf[1].statistic, adf[0].statistic);
        expectP(adf[1].pValue, adf[0].pValue);
        const kpss = [kpssTest(y), kpssTest(moved)];
        expect(kpss[1].bandwidth).toBe(kpss[0].bandwidth);
        expectClose(kpss[1].statistic, kpss[0].statistic);
        // The long-run variance carries squared units: compared where k^2 is a double.
        const lrv = kpss.map((r) => r.details.find((x) => x.key === 'longRunVariance')?.value as number);
        if (Math.abs(e) <= 150) expectClose(lrv[1], lrv[0] * k * k, 1e-7);
        const pp = [phillipsPerronTest(y), phillipsPerronTest(moved)];
        expect(pp[1].bandwidth).toBe(pp[0].bandwidth);
        expectClose(pp[1].statistic, pp[0].statistic);
      }),
      RUNS,
    );
  });

  it('ADF, KPSS and Phillips-Perron with a constant are unchanged by a shift of the prices', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 1_000_000 }), fc.double({ min: -1000, max: 1000, noNaN: true }), (seed, c) => {
        const { y } = pair(seed);
        const moved = y.map((v) => v + c);
        const tol = 1e-6; // a shift of 1,000 on prices near 50 spends about three digits of the changes
        const adf = [adfTest(y), adfTest(moved)];
        expect(adf[1].lags).toBe(adf[0].lags);
        expectClose(adf[1].statistic, adf[0].statistic, tol);
        expectClose(kpssTest(moved).statistic, kpssTest(y).statistic, tol);
        expectClose(phillipsPerronTest(moved).statistic, phillipsPerronTest(y).statistic, tol);
      }),
      RUNS,
    );
  });
});

describe('pair statistics do not depend on units; the line moves as units say', () => {
  it('Engle-Granger and Phillips-Ouliaris: tau, p and lags unchanged; beta times a/b, intercept times a', () => {
    fc.assert(
      fc.property(units, ({ seed, e, d }) => {
        const { y, x } = pair(seed);
        const a = 10 ** e;
        const b = 10 ** (e + d);
        const base = engleGranger(y, [x]);
        const moved = engleGranger(times(y, a), [times(x, b)]);
        expect(moved.test.lags).toBe(base.test.lags);
        expectClose(moved.test.statistic, base.test.statistic);
        expectP(moved.test.pValue, base.test.pValue);
        expectClose(moved.beta[0], (base.beta[0] * a) / b);
        expectClose(moved.intercept, (base.intercept as number) * a);
        expectClose(phillipsOuliaris(times(y, a), [times(x, b)]).test.statistic, phillipsOuliaris(y, [x]).test.statistic);
      }),
      RUNS,
    );
  });

  it('Johansen: eigenvalues and trace statistics unchanged; the relation\'s weight on x times a/b', () => {
    fc.assert(
      fc.property(units, ({ seed, e, d }) => {
        const { y, x } = pair(seed);
        const a = 10 ** e;
        const b = 10 ** (e + d);
        const base = johansenTest([y, x]);
        const moved = johansenTest([times(y, a), times(x, b)]);
        expect(moved.rank).toEqual(base.rank);
        base.eigenvalues.forEach((l, i) => expectClose(moved.eigenvalues[i], l, 1e-7));
        base.trace.forEach((t, i) => expectClose(moved.trace[i].statistic, t.statistic, 1e-7));
        expectClose(moved.beta[1][0], (base.beta[1][0] * a) / b, 1e-7);
        expectClose(moved.alpha[0][0], base.alpha[0][0], 1e-7);
      }),
      RUNS,
    );
  });

  it('hedge ratios: OLS, reverse OLS and dynamic OLS times a/b (t-value unchanged); the orthogonal line unchanged under one factor for both', () => {
    fc.assert(
      fc.property(units, ({ seed, e, d }) => {
        const { y, x } = pair(seed);
        const a = 10 ** e;
        const b = 10 ** (e + d);
        const base = hedgeRatios(y, x);
        const moved = hedgeRatios(times(y, a), times(x, b));
        expectClose(moved.ols.beta, (base.ols.beta * a) / b);
        expectClose(moved.reverseOls.beta, (base.reverseOls.beta * a) / b);
        expect(moved.dynamicOlsFit.leadsLags).toBe(base.dynamicOlsFit.leadsLags);
        expectClose(moved.dynamicOls.beta, (base.dynamicOls.beta * a) / b);
        expectClose(moved.dynamicOls.tValue as number, base.dynamicOls.tValue as number, 1e-7);
        expectClose(moved.dynamicOls.standardError as number, ((base.dynamicOls.standardError as number) * a) / b, 1e-7);
        const common = hedgeRatios(times(y, a), times(x, a));
        expectClose(common.totalLeastSquares.beta, base.totalLeastSquares.beta);
        expectClose(common.totalLeastSquares.intercept, base.totalLeastSquares.intercept * a);
      }),
      RUNS,
    );
  });

  it('half-life and z-scores of the spread unchanged by units and by shifts of either price', () => {
    fc.assert(
      fc.property(units, fc.double({ min: -1000, max: 1000, noNaN: true }), ({ seed, e, d }, c) => {
        const { y, x } = pair(seed);
        const a = 10 ** e;
        const b = 10 ** (e + d);
        const base = pairSpread(y, x, { y: 'y', x: 'x' });
        const moved = pairSpread(times(y, a), times(x, b), { y: 'y', x: 'x' });
        expectClose(moved.halfLife.halfLife, base.halfLife.halfLife);
        const shifted = pairSpread(y.map((v) => v + c), x.map((v) => v - c / 3), { y: 'y', x: 'x' });
        expectClose(shifted.halfLife.halfLife, base.halfLife.halfLife, 1e-6);
        const z = [zScore(base.values), zScore(moved.values)];
        expectClose(z[1].values[199], z[0].values[199], 1e-7);
        expectClose(z[1].standardDeviation, z[0].standardDeviation * a, 1e-7);
        const rolling = [rollingZScore(base.values, 30), rollingZScore(moved.values, 30)];
        for (let i = 29; i < 200; i += 17) expectClose(rolling[1][i] as number, rolling[0][i] as number, 1e-6);
      }),
      RUNS,
    );
  });

  it('Granger F (values, changes, error-correction form) and Toda-Yamamoto unchanged by units', () => {
    fc.assert(
      fc.property(units, ({ seed, e, d }) => {
        const { y, x } = pair(seed);
        const a = 10 ** e;
        const b = 10 ** (e + d);
        for (const method of ['f-levels', 'f-differences', 'toda-yamamoto', 'error-correction'] as const) {
          const options = { method, lags: 2, extraLags: 1 };
          const base = grangerTest(x, y, options);
          const moved = grangerTest(times(x, b), times(y, a), options);
          expectClose(moved.test.statistic, base.test.statistic, 1e-7);
          expect(Math.abs((moved.test.pValue as number) - (base.test.pValue as number))).toBeLessThan(1e-9);
        }
      }),
      { seed: 6, numRuns: 8 },
    );
  });

  it('rolling windows and the screen: p-values and half-lives unchanged, hedge ratios times a/b', () => {
    fc.assert(
      fc.property(units, ({ seed, e, d }) => {
        const { y, x, w } = pair(seed);
        const a = 10 ** e;
        const b = 10 ** (e + d);
        const base = rollingRelation(y, x, { window: 60, step: 20 });
        const moved = rollingRelation(times(y, a), times(x, b), { window: 60, step: 20 });
        base.pValue.forEach((p, k) => {
          expectP(moved.pValue[k], p);
          expectClose(moved.beta[k], ((base.beta[k] as number) * a) / b);
          expectClose(moved.halfLife[k], base.halfLife[k], 1e-7);
        });
        const screen = (k: number) =>
          screenPairs([{ name: 'y', values: times(y, k * a) }, { name: 'x', values: times(x, k * b) }, { name: 'w', values: times(w, k * b) }], { threads: 1 } as never);
        const s0 = screenPairs([{ name: 'y', values: y }, { name: 'x', values: x }, { name: 'w', values: w }]);
        const s1 = screen(1);
        expect(s1.pairs.map((p) => `${p.y}/${p.x}`)).toEqual(s0.pairs.map((p) => `${p.y}/${p.x}`));
        s0.pairs.forEach((p, i) => {
          const q = s1.pairs[i];
          expectP(q.pValue, p.pValue);
          const unit = (name: string) => (name === 'y' ? a : b);
          expectClose(q.beta, (p.beta * unit(p.y)) / unit(p.x));
          if (p.halfLife !== null) expectClose(q.halfLife, p.halfLife, 1e-7);
        });
      }),
      { seed: 7, numRuns: 8 },
    );
  });
});

/** Every number under a key named pValue, statistic or halfLife in a report, in document order. */
function statisticsOf(value: unknown, out: number[] = []): number[] {
  if (Array.isArray(value)) value.forEach((v) => statisticsOf(v, out));
  else if (value !== null && typeof value === 'object') {
    for (const [key, v] of Object.entries(value)) {
      if ((key === 'pValue' || key === 'statistic' || key === 'halfLife') && typeof v === 'number') out.push(v);
      else statisticsOf(v, out);
    }
  }
  return out;
}

describe('the full pair report does not depend on units', () => {
  it.each([1e300, 1e-300, 1e6])('prices times %s: the same tests, choices, warnings and statistics (seed 13)', (k) => {
    const { y, x } = pair(13, 250);
    const base = diagnose({ series: [{ name: 'Y', values: y }, { name: 'X', values: x }] });
    const moved = diagnose({ series: [{ name: 'Y', values: times(y, k) }, { name: 'X', values: times(x, k) }] });
    expect(moved.warnings).toEqual(base.warnings);
    const [a, b] = [statisticsOf(base), statisticsOf(moved)];
    expect(b.length).toBe(a.length);
    expect(a.length).toBeGreaterThan(20);
    a.forEach((v, i) => expect(Math.abs(b[i] - v) <= 1e-7 * Math.max(1, Math.abs(v)), `${i}: ${v} vs ${b[i]}`).toBe(true));
  });
});
