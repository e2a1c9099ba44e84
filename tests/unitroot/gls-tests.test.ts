import { Matrix, solve } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { MooringInputError } from '../../addin/errors';
import { SeededRandom, autoregressive1, randomWalk } from '../../addin/random';
import { glsCriticalValues } from '../../addin/tables/gls-unitroot-table';
import { dfglsTest } from '../../addin/unitroot/dfgls';
import { glsDetrend } from '../../addin/unitroot/gls-detrend';
import { chooseGlsLags } from '../../addin/unitroot/gls-lag-search';
import { ngPerronTest } from '../../addin/unitroot/ng-perron';

/**
 * The tests on GLS-detrended data recomputed in the test from the papers' formulas with
 * ml-matrix's normal-equation solve (an independent path from the engine's QR and Cholesky):
 * ERS (1996) sec. 3 for the detrending, Ng & Perron (2001) eqs. 7 and 9 and sec. 2 for s2_AR,
 * the modified AIC and the M statistics.
 */
function ols(y: number[], X: number[][]): { b: number[]; ssr: number; se: number[] } {
  const A = new Matrix(X);
  const XtX = A.transpose().mmul(A);
  const b = solve(XtX, A.transpose().mmul(Matrix.columnVector(y))).to1DArray();
  const e = y.map((v, i) => v - X[i].reduce((s, x, j) => s + x * b[j], 0));
  const ssr = e.reduce((s, v) => s + v * v, 0);
  const inv = solve(XtX, Matrix.eye(X[0].length));
  const s2 = ssr / (y.length - X[0].length);
  return { b, ssr, se: b.map((_, j) => Math.sqrt(s2 * inv.get(j, j))) };
}

function detrendByHand(y: number[], trend: boolean): number[] {
  const T = y.length;
  const a = 1 + (trend ? -13.5 : -7) / T;
  const z = (t: number) => (trend ? [1, t + 1] : [1]);
  const ya = y.map((v, t) => (t === 0 ? v : v - a * y[t - 1]));
  const za = y.map((_, t) => (t === 0 ? z(0) : z(t).map((v, j) => v - a * z(t - 1)[j])));
  const { b } = ols(ya, za);
  return y.map((v, t) => v - z(t).reduce((s, x, j) => s + x * b[j], 0));
}

/** Rows of the regression of the change on the lagged level and k lagged changes, from row `first`. */
function design(d: number[], k: number, first: number): { y: number[]; X: number[][] } {
  const y: number[] = [];
  const X: number[][] = [];
  for (let t = first; t < d.length; t++) {
    y.push(d[t] - d[t - 1]);
    X.push([d[t - 1], ...Array.from({ length: k }, (_, i) => d[t - 1 - i] - d[t - 2 - i])]);
  }
  return { y, X };
}

const walk = Array.from(randomWalk(new SeededRandom(7101), 300, { start: 50 }));

describe('GLS detrending (ERS 1996, sec. 3)', () => {
  for (const trend of [false, true]) {
    it(`${trend ? 'constant and trend' : 'constant'}: equals the quasi-differenced least squares solved by ml-matrix, to 1e-9 relative`, () => {
      const ours = glsDetrend(walk, trend ? 'trend' : 'const');
      const scale = 2 ** -Math.floor(Math.log2(Math.max(...walk.map(Math.abs))));
      const theirs = detrendByHand(walk.map((v) => v * scale), trend);
      ours.values.forEach((v, i) => expect(Math.abs(v - theirs[i])).toBeLessThan(1e-9 * Math.max(1, Math.abs(theirs[i]))));
    });
  }
});

describe('DF-GLS and Ng-Perron statistics', () => {
  const lags = 3;
  for (const trend of [false, true]) {
    const det = trend ? 'trend' : 'const';
    const d = detrendByHand(walk, trend);
    const { y, X } = design(d, lags, lags + 1);
    const fit = ols(y, X);

    it(`${det}: DF-GLS tau is the OLS t-ratio of the lagged level with ${lags} lags and no deterministic terms (1e-8)`, () => {
      const result = dfglsTest(walk, { deterministic: det, lags });
      expect(result.statistic).toBeCloseTo(fit.b[0] / fit.se[0], 8);
      expect(result.nobs).toBe(walk.length - 1 - lags);
    });

    it(`${det}: MZa, MZt, MSB, MPT follow Ng & Perron (2001) with s2_AR = (SSR/n) / (1 - sum b)^2 (1e-8 relative)`, () => {
      const T = d.length;
      const s2 = fit.ssr / y.length / (1 - fit.b.slice(1).reduce((s, v) => s + v, 0)) ** 2;
      const kappa = d.slice(0, T - 1).reduce((s, v) => s + v * v, 0) / (T * T);
      const end = (d[T - 1] * d[T - 1]) / T;
      const c = trend ? -13.5 : -7;
      const MZa = (end - s2) / (2 * kappa);
      const MSB = Math.sqrt(kappa / s2);
      const MPT = trend ? (c * c * kappa + (1 - c) * end) / s2 : (c * c * kappa - c * end) / s2;
      const scaled = ngPerronTest(walk.map((v) => v * 2 ** -Math.floor(Math.log2(Math.max(...walk.map(Math.abs))))), { deterministic: det, lags });
      const s = scaled.statistics;
      // the statistics are free of units: the test's series is brought to unit scale as the engine's is
      const same = ngPerronTest(walk, { deterministic: det, lags }).statistics;
      for (const [name, want] of [['MZa', MZa], ['MZt', MZa * MSB], ['MSB', MSB], ['MPT', MPT]] as const) {
        expect(Math.abs(s[name].statistic - want) / Math.abs(want)).toBeLessThan(1e-8);
        expect(same[name].statistic).toBe(s[name].statistic);
      }
    });
  }

  it('the modified AIC chooses the lag that minimises ln s2_k + 2 (tau_k + k) / n on the common sample, recomputed by ml-matrix', () => {
    const rng = new SeededRandom(7102);
    for (let rep = 0; rep < 5; rep++) {
      // an MA(1) with a negative root, where the rule matters
      const e = rng.normals(251);
      let level = 0;
      const series = Array.from({ length: 250 }, (_, t) => (level += e[t + 1] - 0.6 * e[t]));
      const d = detrendByHand(series.map((v) => v * 2 ** -Math.floor(Math.log2(Math.max(...series.map(Math.abs))))), false);
      const kmax = 8;
      let best = 0;
      let bestValue = Infinity;
      for (let k = 0; k <= kmax; k++) {
        const { y, X } = design(d, k, kmax + 1);
        const { b, ssr } = ols(y, X);
        const n = y.length;
        const s2 = ssr / n;
        const tau = (b[0] * b[0] * X.reduce((s, row) => s + row[0] * row[0], 0)) / s2;
        const value = Math.log(s2) + (2 * (tau + k)) / n;
        if (value < bestValue) [best, bestValue] = [k, value];
      }
      const ours = chooseGlsLags(glsDetrend(series, 'const').values, kmax, 'maic');
      expect(ours.lags).toBe(best);
      expect(ours.criterion).toBeCloseTo(bestValue, 9);
    }
  });
});

describe('properties', () => {
  it('adding a level leaves DF-GLS (constant) unchanged; adding a level and a trend leaves DF-GLS and MZa (trend) unchanged (1e-7)', () => {
    const shifted = walk.map((v) => v + 1234.5);
    const tilted = walk.map((v, t) => v + 40 - 0.37 * t);
    expect(dfglsTest(shifted).statistic).toBeCloseTo(dfglsTest(walk).statistic, 7);
    expect(dfglsTest(tilted, { deterministic: 'trend' }).statistic).toBeCloseTo(dfglsTest(walk, { deterministic: 'trend' }).statistic, 7);
    expect(ngPerronTest(tilted, { deterministic: 'trend' }).statistic).toBeCloseTo(ngPerronTest(walk, { deterministic: 'trend' }).statistic, 7);
  });

  it('prices times 1e300 or 1e-300 give the same statistics and lags as the prices themselves', () => {
    for (const f of [1e300, 1e-300]) {
      const big = walk.map((v) => v * f);
      const a = dfglsTest(walk);
      const b = dfglsTest(big);
      expect(b.lags).toBe(a.lags);
      expect(b.statistic).toBeCloseTo(a.statistic, 8);
      expect(ngPerronTest(big).statistics.MPT.statistic).toBeCloseTo(ngPerronTest(walk).statistics.MPT.statistic, 8);
    }
  });

  it('with no lagged changes a strongly mean-reverting series is rejected by both (p < 0.01); a random walk is not rejected at 1%', () => {
    // (with a rule choosing the lags see gls-size-and-power.test.ts: the lags a rule adds can take power away)
    const stationary = autoregressive1(new SeededRandom(7103), 400, 0.5);
    expect(dfglsTest(stationary, { lags: 0 }).pValue!).toBeLessThan(0.01);
    expect(ngPerronTest(stationary, { lags: 0 }).pValue!).toBeLessThan(0.01);
    expect(dfglsTest(walk).pValue!).toBeGreaterThan(0.01);
  });

  it('results carry the lag rule, the GLS details and, for Ng-Perron, all four statistics with their critical values and Table 1\'s', () => {
    const r = ngPerronTest(walk, { deterministic: 'trend' });
    expect(r.lagRule).toBe('maic');
    expect(r.statistics.MPT.publishedCritical['5%']).toBe(5.48); // Ng & Perron (2001), Table 1, trend (from memory)
    expect(r.statistics.MPT.critical).toEqual(glsCriticalValues('MPT', 'trend', null));
    expect(r.details.map((d) => d.key)).toEqual(expect.arrayContaining(['MZt', 'MSB', 'MPT', 'MZtPValue', 'cbar']));
    const g = dfglsTest(walk, { lags: 'bic' });
    expect(g.lagRule).toBe('bic');
    expect(g.details.find((d) => d.key === 'cbar')?.value).toBe(-7);
  });
});

describe('bad input', () => {
  it('refuses none (GLS always removes a constant), too few rows, and a largest lag with a fixed lag', () => {
    expect(() => dfglsTest(walk, { deterministic: 'none' as never })).toThrow(MooringInputError);
    expect(() => dfglsTest(walk.slice(0, 3))).toThrow(/too few/);
    expect(() => ngPerronTest(walk, { lags: 2, maxLags: 4 })).toThrow(/largest lag applies only/);
    expect(() => dfglsTest(walk, { lags: 'hq' as never })).toThrow(/maic/);
  });
});
