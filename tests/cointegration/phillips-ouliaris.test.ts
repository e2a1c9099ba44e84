import { describe, expect, it } from 'vitest';
import { engleGranger } from '../../addin/cointegration/engle-granger';
import { phillipsOuliaris } from '../../addin/cointegration/phillips-ouliaris';
import { residualTauCritical, residualZCritical } from '../../addin/cointegration/residual-tables';
import { MooringInputError } from '../../addin/errors';
import { autoregressive1, randomWalk, SeededRandom } from '../../addin/random';
import { mackinnonTauPValue } from '../../addin/tables/mackinnon-tau';
import { mackinnonZPValue } from '../../addin/tables/mackinnon-z';
import { adfRegression } from '../../addin/unitroot/adf-regression';

function pair(seed: number, T: number, phi: number): { y: Float64Array; x: Float64Array } {
  const rng = new SeededRandom(seed);
  const x = randomWalk(rng, T, { start: 20 });
  const u = autoregressive1(rng, T, phi);
  return { y: x.map((v, i) => -3 + 0.8 * v + u[i]), x };
}

describe('Phillips-Ouliaris formulas', () => {
  for (const deterministic of ['none', 'const', 'trend'] as const) {
    it(`with bandwidth 0 (long-run variance = short-run variance), Z-t is the Dickey-Fuller t on the residuals and Z-alpha = n(rho - 1) (${deterministic})`, () => {
      const { y, x } = pair(17, 300, 0.85);
      const po = phillipsOuliaris(y, [x], { deterministic, bandwidth: 0 });
      const eg = engleGranger(y, [x], { deterministic, lags: 0 });
      const df = adfRegression(po.residuals, 0, 'none');
      expect(Math.abs(po.zt - eg.test.statistic)).toBeLessThan(1e-12 * Math.abs(eg.test.statistic));
      expect(Math.abs(po.zAlpha - df.nobs * df.gamma)).toBeLessThan(1e-12 * Math.abs(po.zAlpha));
      expect(po.test.nobs).toBe(299);
    });
  }

  it('a positive bandwidth corrects for serial correlation: with an ARMA(1,1) spread (0.5, 0.7) the AR(1) errors are correlated and the corrected Z-alpha lies far from the raw n(rho - 1)', () => {
    const rng = new SeededRandom(23);
    const T = 400;
    const x = randomWalk(rng, T);
    const e = rng.normals(T);
    const u = new Float64Array(T);
    for (let t = 1; t < T; t++) u[t] = 0.5 * u[t - 1] + e[t] + 0.7 * e[t - 1];
    const y = x.map((v, i) => 1 + v + u[i]);
    const raw = phillipsOuliaris(y, [x], { bandwidth: 0 });
    const corrected = phillipsOuliaris(y, [x]);
    expect(corrected.bandwidth).toBeGreaterThan(0);
    expect(corrected.test.details.find((d) => d.key === 'bandwidthRule')?.value).toBe('Newey-West (1994) automatic');
    expect(Math.abs(corrected.zAlpha - raw.zAlpha)).toBeGreaterThan(5);
  });
});

describe('Phillips-Ouliaris tables', () => {
  it('Z-alpha, one regressor with a constant, asymptotic 1/5/10%: near -28.32 / -20.49 / -17.04 (Phillips & Ouliaris 1990, Table Ia, quoted from memory), within 0.15', () => {
    const cv = residualZCritical('const', 2).value;
    expect(Math.abs(cv['1%'] - -28.32)).toBeLessThan(0.15);
    expect(Math.abs(cv['5%'] - -20.49)).toBeLessThan(0.15);
    expect(Math.abs(cv['10%'] - -17.04)).toBeLessThan(0.15);
  });

  it('Z-t takes the residual tau tables with N variables (MacKinnon 1994 p-value, MacKinnon 2010 critical values at T - 1); Z-alpha the N-variable z surfaces', () => {
    const { y, x } = pair(31, 250, 0.9);
    const po = phillipsOuliaris(y, [x], { deterministic: 'trend' });
    expect(po.test.pValue).toBe(mackinnonTauPValue(po.zt, 'ct', 2));
    expect(po.zAlphaPValue).toBe(mackinnonZPValue(po.zAlpha, 'ct', 2));
    expect(po.test.critical).toEqual(residualTauCritical('trend', 2, 249).value);
    expect(po.zAlphaCritical).toEqual(residualZCritical('trend', 2).value);
    expect(po.test.statistic).toBe(po.zt);
    expect(po.test.details.find((d) => d.key === 'zAlpha')?.value).toBe(po.zAlpha);
    expect(po.test.details.find((d) => d.key === 'zAlphaCritical5')?.value).toBe(po.zAlphaCritical['5%']);
  });

  it('rejects on a cointegrated pair and not on independent walks', () => {
    const { y, x } = pair(37, 500, 0.7);
    expect(phillipsOuliaris(y, [x]).test.pValue as number).toBeLessThan(0.01);
    const rng = new SeededRandom(38);
    const indep = phillipsOuliaris(randomWalk(rng, 500), [randomWalk(rng, 500)], {}, { y: 'Crude', xs: ['Freight'] });
    expect(indep.test.pValue as number).toBeGreaterThan(0.05);
    expect(indep.verdict).toMatch(/^No evidence at the 5% level that Crude and Freight are cointegrated \(Z-t = /);
  });
});

describe('Phillips-Ouliaris edge cases', () => {
  it('an exact combination gives Z-t = Z-alpha = -Infinity, p = 0 and the same warning as Engle-Granger', () => {
    const x = randomWalk(new SeededRandom(4), 120);
    const po = phillipsOuliaris(x.map((v) => 3 * v), [x]);
    expect(po.zt).toBe(-Infinity);
    expect(po.zAlpha).toBe(-Infinity);
    expect(po.test.pValue).toBe(0);
    expect(po.zAlphaPValue).toBe(0);
    expect(po.test.warnings[0]).toContain('exact combination');
  });
  it('refuses an unknown or too large bandwidth with MooringInputError', () => {
    const { y, x } = pair(5, 100, 0.5);
    expect(() => phillipsOuliaris(y, [x], { bandwidth: 'wide' as never })).toThrow(MooringInputError);
    expect(() => phillipsOuliaris(y, [x], { bandwidth: 500 })).toThrow(/largest allowed is 98/);
  });
});
