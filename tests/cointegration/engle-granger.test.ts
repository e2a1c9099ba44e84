import { describe, expect, it } from 'vitest';
import { engleGranger } from '../../addin/cointegration/engle-granger';
import { engleGrangerBothWays } from '../../addin/cointegration/engle-granger-both-ways';
import { NO_P_VALUE_NOTE, residualTauCritical } from '../../addin/cointegration/residual-tables';
import { MooringInputError } from '../../addin/errors';
import { autoregressive1, randomWalk, SeededRandom } from '../../addin/random';
import { mackinnonTauPValue } from '../../addin/tables/mackinnon-tau';
import { adfTest } from '../../addin/unitroot/adf';

/** A cointegrated pair y = 1 + 2x + u, x a random walk, u AR(1) with coefficient phi. */
function cointegratedPair(rng: SeededRandom, T: number, phi: number): { y: Float64Array; x: Float64Array } {
  const x = randomWalk(rng, T, { start: 50 });
  const u = autoregressive1(rng, T, phi);
  return { y: x.map((v, i) => 1 + 2 * v + u[i]), x };
}

/** Every number anywhere inside a value, for "never NaN" checks. */
function numbersIn(value: unknown): number[] {
  if (typeof value === 'number') return [value];
  if (value instanceof Float64Array) return Array.from(value);
  if (Array.isArray(value)) return value.flatMap(numbersIn);
  if (value && typeof value === 'object') return Object.values(value).flatMap(numbersIn);
  return [];
}

describe('Engle-Granger critical values against published tables', () => {
  it('MacKinnon (2010), N = 2 with a constant, asymptotic 5% point: -3.33613', () => {
    // MacKinnon (2010), Queen's Economics Department Working Paper 1227, Table 2 (c, N = 2).
    expect(residualTauCritical('const', 2, 1e12).value['5%']).toBeCloseTo(-3.33613, 5);
  });
  it('Engle & Yoo (1987), N = 2, T = 100, 5%: about -3.37 (quoted from memory), within 0.05 of our surface at T = 100', () => {
    const ours = residualTauCritical('const', 2, 100).value['5%'];
    expect(Math.abs(ours - -3.37)).toBeLessThan(0.05);
  });
  it('uses the residual (N-variable) tables, never the Dickey-Fuller N = 1 ones: at T = 300 the EG 5% point is below the ADF one', () => {
    const { y, x } = cointegratedPair(new SeededRandom(3), 300, 0.8);
    const eg = engleGranger(y, [x]);
    const adf = adfTest(y);
    expect(eg.test.critical['5%']).toBeLessThan(adf.critical['5%'] - 0.4);
    expect(eg.test.critical).toEqual(residualTauCritical('const', 2, 299).value);
  });
});

describe('Engle-Granger conventions', () => {
  const rng = new SeededRandom(41);
  const { y, x } = cointegratedPair(rng, 300, 0.7);

  it('reports the residual ADF with no deterministic terms: tau equals ADF(none) on the step-1 residuals, and p uses the step-1 case with N = 2', () => {
    const eg = engleGranger(y, [x], { deterministic: 'trend', lags: 1 });
    const adf = adfTest(eg.residuals, { deterministic: 'none', lags: 1 });
    expect(eg.test.statistic).toBe(adf.statistic);
    expect(eg.test.nobs).toBe(300 - 1 - 1);
    expect(eg.test.pValue).toBe(mackinnonTauPValue(eg.test.statistic, 'ct', 2));
    expect(eg.trendCoefficient).not.toBeNull();
  });

  it('refuses a maximum lag above T/2 - 1 and names the largest allowed', () => {
    expect(() => engleGranger(y, [x], { maxLags: 150 })).toThrow(/largest allowed is 149/);
    expect(() => engleGranger(y, [x], { lags: 150 })).toThrow(MooringInputError);
    expect(engleGranger(y, [x], { lags: 100 }).test.lags).toBe(100);
  });

  it('refuses series of different lengths, gaps and an unknown deterministic word with MooringInputError', () => {
    expect(() => engleGranger(y, [x.subarray(1)], {}, { y: 'Crude', xs: ['Brent'] })).toThrow(/'Brent' has 299 values but 'Crude' has 300/);
    const gap = Float64Array.from(x);
    gap[10] = Number.NaN;
    expect(() => engleGranger(y, [gap])).toThrow(/position 11/);
    expect(() => engleGranger(y, [x], { deterministic: 'quadratic' as never })).toThrow(MooringInputError);
    expect(() => engleGranger(y, [])).toThrow(MooringInputError);
  });

  it('names the series in the title, hypotheses and verdict', () => {
    const eg = engleGranger(y, [x], {}, { y: 'Crude', xs: ['Brent'] });
    expect(eg.test.title).toBe('Cointegration test (Engle-Granger) of Crude on Brent');
    expect(eg.test.nullHypothesis).toContain('Crude and Brent are not cointegrated');
    expect(eg.verdict).toMatch(/^Crude and Brent are cointegrated at the 5% level \(tau = -\d/);
    expect(eg.verdict).toContain('Crude - 2');
  });

  it('without a constant: no critical values exist beyond N = 1, so they are empty with a warning, and the p-value is still given', () => {
    const eg = engleGranger(y, [x], { deterministic: 'none' });
    expect(eg.test.critical).toEqual({});
    expect(eg.test.warnings.join(' ')).toContain('No critical values are published');
    expect(eg.test.pValue).not.toBeNull();
    expect(eg.intercept).toBeNull();
  });

  it('above 6 variables the p-value is null with a note, never a number from the wrong surface; critical values stop at 12', () => {
    const r = new SeededRandom(8);
    const xs7 = Array.from({ length: 6 }, () => randomWalk(r, 200));
    const seven = engleGranger(randomWalk(r, 200), xs7);
    expect(seven.nVariables).toBe(7);
    expect(seven.test.pValue).toBeNull();
    expect(seven.test.pValueNote).toBe(NO_P_VALUE_NOTE);
    expect(seven.test.critical['5%']).toBeLessThan(-4.5);
    const xs12 = Array.from({ length: 12 }, () => randomWalk(r, 200));
    const thirteen = engleGranger(randomWalk(r, 200), xs12, { lags: 0 });
    expect(thirteen.test.critical).toEqual({});
    expect(thirteen.test.warnings.join(' ')).toContain('up to 12 variables');
    expect(thirteen.verdict).toContain('not available');
  });
});

describe('Engle-Granger when y is an exact combination of the xs', () => {
  const x = randomWalk(new SeededRandom(5), 250, { start: 80 });
  const y = x.map((v) => 0.5 + 1.25 * v);

  it('gives tau = -Infinity and p = 0 with a warning and a plain verdict, never NaN and never a crash', () => {
    const eg = engleGranger(y, [x], {}, { y: 'Brent in euros', xs: ['Brent'] });
    expect(eg.test.statistic).toBe(-Infinity);
    expect(eg.test.pValue).toBe(0);
    expect(eg.test.lags).toBeNull();
    expect(eg.verdict).toContain('move as one up to scale: the residual is zero');
    expect(eg.test.warnings[0]).toContain('copy or a formula of another');
    expect(eg.beta[0]).toBeCloseTo(1.25, 10);
    expect(numbersIn(eg).some(Number.isNaN)).toBe(false);
  });
  it('still refuses an impossible lag request', () => {
    expect(() => engleGranger(y, [x], { maxLags: 500 })).toThrow(/largest allowed is 124/);
  });
});

describe('Engle-Granger both ways', () => {
  it('agrees on a clearly cointegrated pair and says so', () => {
    const { y, x } = cointegratedPair(new SeededRandom(12), 400, 0.6);
    const both = engleGrangerBothWays(y, x, {}, { a: 'Diesel', b: 'Gasoil' });
    expect(both.agree).toBe(true);
    expect(both.aOnB.test.title).toContain('of Diesel on Gasoil');
    expect(both.bOnA.test.title).toContain('of Gasoil on Diesel');
    expect(both.verdict).toMatch(/^Diesel and Gasoil are cointegrated at the 5% level whichever side/);
  });
  it('agrees on two independent walks that there is no evidence', () => {
    const r = new SeededRandom(13);
    const both = engleGrangerBothWays(randomWalk(r, 300), randomWalk(r, 300), { alpha: 0.01 });
    expect(both.agree).toBe(true);
    expect(both.verdict).toMatch(/^No evidence at the 1% level/);
  });
  it('says when the two normalisations disagree (the first of seeds 1..400 of weakly tied pairs where they do)', () => {
    let found = null;
    for (let seed = 1; seed <= 400 && !found; seed++) {
      const { y, x } = cointegratedPair(new SeededRandom(seed), 120, 0.93);
      const both = engleGrangerBothWays(y, x, { lags: 0 });
      if (!both.agree) found = both;
    }
    expect(found).not.toBeNull();
    expect(found!.verdict).toMatch(/^The two directions disagree at the 5% level/);
    const ps = [found!.aOnB.test.pValue as number, found!.bOnA.test.pValue as number].sort();
    expect(ps[0]).toBeLessThan(0.05);
    expect(ps[1]).toBeGreaterThanOrEqual(0.05);
  });
  it('refuses a significance level outside (0, 0.5)', () => {
    const r = new SeededRandom(2);
    expect(() => engleGrangerBothWays(randomWalk(r, 100), randomWalk(r, 100), { alpha: 5 })).toThrow(MooringInputError);
  });
});
