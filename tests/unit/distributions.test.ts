import { describe, expect, it } from 'vitest';
import { chiSquareUpperP, fUpperP, normalCdf, normalQuantile, studentTwoSidedP } from '../../addin/distributions';

// Textbook quantiles (any statistics table, e.g. Abramowitz & Stegun 1964, Tables 26.1, 26.7, 26.8).
describe('distributions from jstat', () => {
  it('normal: Phi(1.959964) = 0.975 and the 95% quantile is 1.644854', () => {
    expect(normalCdf(1.959963985)).toBeCloseTo(0.975, 9);
    expect(normalQuantile(0.95)).toBeCloseTo(1.644853627, 8);
  });
  it('t: two-sided p of 2.228139 with 10 df is 0.05', () => {
    expect(studentTwoSidedP(2.228138852, 10)).toBeCloseTo(0.05, 8);
  });
  it('F: P(F(3, 20) > 3.098391) = 0.05', () => {
    expect(fUpperP(3.098391212, 3, 20)).toBeCloseTo(0.05, 7);
  });
  it('chi-square: P(X(1) > 3.841459) = 0.05', () => {
    expect(chiSquareUpperP(3.841458821, 1)).toBeCloseTo(0.05, 8);
  });
});

describe('critical values from jstat quantiles', () => {
  // Textbook values (e.g. any F and chi-square table; Abramowitz & Stegun 1964, Tables 26.8 and 26.9).
  it('F(3, 20) at 5% is 3.0984 and chi-square(2) at 5% is 5.9915', async () => {
    const { fCriticalValues, chiSquareCriticalValues } = await import('../../addin/distributions');
    expect(fCriticalValues(3, 20)['5%']).toBeCloseTo(3.0984, 4);
    expect(chiSquareCriticalValues(2)['5%']).toBeCloseTo(5.9915, 4);
    expect(chiSquareCriticalValues(1)['1%']).toBeCloseTo(6.6349, 4);
  });
});
