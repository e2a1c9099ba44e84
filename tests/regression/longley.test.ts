import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { leastSquares } from '../../addin/regression/least-squares';
import { MooringInputError } from '../../addin/errors';

/**
 * NIST Statistical Reference Datasets, linear regression "Longley" (Longley 1967), certified
 * values (higher difficulty). The data are the copy that ships with Debian's python3-statsmodels
 * (tests/reference/data/longley.json); the certified values are quoted from memory of NIST's
 * certificate and agree with the reference library's fit to 8+ digits (checked in ols-reference.test.ts).
 */
const certified = {
  coefficients: [
    -3482258.63459582, 15.0618722713733, -0.358191792925910e-1, -2.02022980381683, -1.03322686717359,
    -0.511041056535807e-1, 1829.15146461355,
  ],
  residualSd: 304.854073561965,
  rSquared: 0.995479004577296,
};

const data = JSON.parse(readFileSync(new URL('../reference/data/longley.json', import.meta.url), 'utf8')) as Record<string, number[]>;

function significantDigits(got: number, want: number): number {
  if (got === want) return 16;
  return -Math.log10(Math.abs(got - want) / Math.abs(want));
}

describe('least squares on NIST StRD Longley (certified values, from memory)', () => {
  const y = data.TOTEMP;
  const ones = y.map(() => 1);
  const columns = [ones, data.GNPDEFL, data.GNP, data.UNEMP, data.ARMED, data.POP, data.YEAR];
  const fit = leastSquares(y, columns);

  it('reproduces every certified coefficient to at least 10 significant digits', () => {
    for (let j = 0; j < 7; j++) {
      expect(significantDigits(fit.coefficients[j], certified.coefficients[j])).toBeGreaterThanOrEqual(10);
    }
  });
  it('reproduces the certified residual standard deviation to at least 10 significant digits', () => {
    expect(significantDigits(Math.sqrt(fit.sigma2), certified.residualSd)).toBeGreaterThanOrEqual(10);
    expect(significantDigits(fit.rSquared, certified.rSquared)).toBeGreaterThanOrEqual(10);
  });
  it('refuses a duplicated column with a message naming it', () => {
    expect(() => leastSquares(y, [ones, data.GNP, data.GNP], { names: ['constant', 'GNP', 'GNP again'] })).toThrow(MooringInputError);
    expect(() => leastSquares(y, [ones, data.GNP, data.GNP], { names: ['constant', 'GNP', 'GNP again'] })).toThrow(/GNP again/);
  });
  it('refuses a constant series beside a constant term', () => {
    const flat = y.map(() => 71.2);
    expect(() => leastSquares(y, [ones, flat], { names: ['constant', 'Crude'] })).toThrow(/Crude/);
  });
});
