import { describe, expect, it } from 'vitest';
import { MooringInputError } from '../../addin/errors';
import { mackinnonCriticalValues, type TableCase } from '../../addin/tables/mackinnon-tau';
import reference from './fixtures/tau-reference-values.json';

describe('MacKinnon (2010) response-surface critical values for tau', () => {
  // MacKinnon (2010), Queen's Economics Department Working Paper 1227; the values below are
  // the shared reference-tables README's check values, read from the transcribed table.
  it('constant, N = 1, asymptotic: -3.43035 / -2.86154 / -2.56677', () => {
    expect(mackinnonCriticalValues('c', 1, null)).toEqual({ '1%': -3.43035, '5%': -2.86154, '10%': -2.56677 });
  });
  it('constant, N = 2, asymptotic 5%: -3.33613', () => {
    expect(mackinnonCriticalValues('c', 2, null)['5%']).toBe(-3.33613);
  });
  it('constant, N = 1, T = 100: -3.497501 / -2.890906 / -2.582435', () => {
    const cv = mackinnonCriticalValues('c', 1, 100);
    expect(cv['1%']).toBeCloseTo(-3.497501, 6);
    expect(cv['5%']).toBeCloseTo(-2.890906, 6);
    expect(cv['10%']).toBeCloseTo(-2.582435, 6);
  });
  it('constant and trend, N = 1, asymptotic: -3.95877 / -3.41049 / -3.12705', () => {
    expect(mackinnonCriticalValues('ct', 1, null)).toEqual({ '1%': -3.95877, '5%': -3.41049, '10%': -3.12705 });
  });
  it('constant, linear and quadratic trend, N = 1, asymptotic: -4.37113 / -3.83239 / -3.55326', () => {
    expect(mackinnonCriticalValues('ctt', 1, null)).toEqual({ '1%': -4.37113, '5%': -3.83239, '10%': -3.55326 });
  });
  // MacKinnon (1996), Journal of Applied Econometrics 11, the no-constant row.
  it('no constant, N = 1, asymptotic: -2.56574 / -1.94100 / -1.61682', () => {
    expect(mackinnonCriticalValues('n', 1, null)).toEqual({ '1%': -2.56574, '5%': -1.941, '10%': -1.61682 });
  });
  it('constant and trend, N = 3, T = 200, 5%: -4.178827', () => {
    expect(mackinnonCriticalValues('ct', 3, 200)['5%']).toBeCloseTo(-4.178827, 6);
  });

  it('agrees with the reference library (python3-statsmodels 0.13.5 mackinnoncrit) to 1e-12 for every case, N and T = 20..1000 and infinity', () => {
    expect(reference.criticalValues.length).toBe(296);
    for (const row of reference.criticalValues) {
      const ours = mackinnonCriticalValues(row.regression as TableCase, row.N, row.nobs);
      for (const level of ['1%', '5%', '10%'] as const) {
        expect(Math.abs(ours[level] - row[level])).toBeLessThan(1e-12);
      }
    }
  });

  it('critical values are ordered 1% < 5% < 10% and fall as N grows, for every case at T = 50, 100 and infinity', () => {
    for (const regression of ['c', 'ct', 'ctt'] as const) {
      for (const nobs of [50, 100, null]) {
        let previous5 = Infinity;
        for (let n = 1; n <= 12; n++) {
          const cv = mackinnonCriticalValues(regression, n, nobs);
          expect(cv['1%']).toBeLessThan(cv['5%']);
          expect(cv['5%']).toBeLessThan(cv['10%']);
          expect(cv['5%']).toBeLessThan(previous5);
          previous5 = cv['5%'];
        }
      }
    }
  });

  it('refuses N > 1 without a constant, N = 13, N = 0 and a non-positive or non-finite T, with MooringInputError', () => {
    expect(() => mackinnonCriticalValues('n', 2, 100)).toThrow(MooringInputError);
    expect(() => mackinnonCriticalValues('n', 2, 100)).toThrow(/single series/);
    expect(() => mackinnonCriticalValues('c', 13, 100)).toThrow(/N = 1 to 12/);
    expect(() => mackinnonCriticalValues('ct', 0, 100)).toThrow(MooringInputError);
    expect(() => mackinnonCriticalValues('c', 1, 0)).toThrow(MooringInputError);
    expect(() => mackinnonCriticalValues('c', 1, -5)).toThrow(MooringInputError);
    expect(() => mackinnonCriticalValues('c', 1, NaN)).toThrow(MooringInputError);
    expect(() => mackinnonCriticalValues('c', 1, Infinity)).toThrow(MooringInputError);
  });
});

describe('response surfaces against Fuller (1976), Table 8.5.2, T = 100', () => {
  // Fuller, W. A. (1976), Introduction to Statistical Time Series, Wiley, Table 8.5.2
  // (empirical percentiles of the Dickey-Fuller tau statistics), row n = 100. The printed
  // values are quoted FROM MEMORY, not read from the book; the surfaces are evaluated at
  // T = 100, the same sample size. Tolerance 0.02: Fuller's percentiles are simulated and
  // printed to two decimals.
  const FULLER_T100: [TableCase, string, [number, number, number]][] = [
    ['n', 'tau (no constant)', [-2.6, -1.95, -1.61]],
    ['c', 'tau_mu (constant)', [-3.51, -2.89, -2.58]],
    ['ct', 'tau_tau (constant and trend)', [-4.04, -3.45, -3.15]],
  ];
  for (const [regression, label, [one, five, ten]] of FULLER_T100) {
    it(`${label}: 1/5/10% about ${one} / ${five} / ${ten} (from memory), surface within 0.02`, () => {
      const cv = mackinnonCriticalValues(regression, 1, 100);
      expect(Math.abs(cv['1%'] - one)).toBeLessThan(0.02);
      expect(Math.abs(cv['5%'] - five)).toBeLessThan(0.02);
      expect(Math.abs(cv['10%'] - ten)).toBeLessThan(0.02);
    });
  }
});
