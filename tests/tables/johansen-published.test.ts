import { describe, expect, it } from 'vitest';
import { chiSquareUpperP } from '../../addin/distributions';
import { MooringInputError } from '../../addin/errors';
import {
  publishedJohansenCritical,
  type JohansenCaseName,
  type JohansenStatisticKind,
} from '../../addin/tables/johansen-published';

const KINDS: JohansenStatisticKind[] = ['trace', 'maxEigen'];
const CASES: JohansenCaseName[] = ['none', 'constant', 'trend'];

// MacKinnon, Haug & Michelis (1999) method; values from the transcribed table, check
// values as listed in the shared reference-tables README.
describe('published Johansen critical values', () => {
  it('unrestricted constant, n - r = 1, trace: 2.7055 / 3.8415 / 6.6349', () => {
    expect(publishedJohansenCritical('trace', 'constant', 1)).toEqual({ '10%': 2.7055, '5%': 3.8415, '1%': 6.6349 });
  });
  it('unrestricted constant, n - r = 2, 5%: trace 15.4943, maximum eigenvalue 14.2639', () => {
    expect(publishedJohansenCritical('trace', 'constant', 2)['5%']).toBe(15.4943);
    expect(publishedJohansenCritical('maxEigen', 'constant', 2)['5%']).toBe(14.2639);
  });
  it('no deterministic terms, n - r = 1, trace: 2.9762 / 4.1296 / 6.9406', () => {
    expect(publishedJohansenCritical('trace', 'none', 1)).toEqual({ '10%': 2.9762, '5%': 4.1296, '1%': 6.9406 });
  });
  it('unrestricted trend, n - r = 2, trace: 16.1619 / 18.3985 / 23.1485', () => {
    expect(publishedJohansenCritical('trace', 'trend', 2)).toEqual({ '10%': 16.1619, '5%': 18.3985, '1%': 23.1485 });
  });
  it('unrestricted trend, n - r = 12, trace and maximum eigenvalue 5%: 358.719 and 79.9878 (last row)', () => {
    expect(publishedJohansenCritical('trace', 'trend', 12)['5%']).toBe(358.719);
    expect(publishedJohansenCritical('maxEigen', 'trend', 12)['5%']).toBe(79.9878);
  });

  // With an unrestricted constant or trend and one common trend, the limit of both
  // statistics is chi-square(1) (Johansen 1995); its upper 10/5/1% points are
  // 2.70554 / 3.84146 / 6.63490 (any chi-square table, e.g. Abramowitz & Stegun 1964, Table 26.8).
  it('constant and trend cases, n - r = 1: both statistics give the chi-square(1) tail probabilities 0.10 / 0.05 / 0.01 to 4 decimals', () => {
    for (const kind of KINDS) {
      for (const caseName of ['constant', 'trend'] as const) {
        const cv = publishedJohansenCritical(kind, caseName, 1);
        expect(chiSquareUpperP(cv['10%'], 1)).toBeCloseTo(0.1, 4);
        expect(chiSquareUpperP(cv['5%'], 1)).toBeCloseTo(0.05, 4);
        expect(chiSquareUpperP(cv['1%'], 1)).toBeCloseTo(0.01, 4);
      }
    }
  });

  it('the two statistics coincide at n - r = 1, and trace ≥ maximum eigenvalue above it, every case', () => {
    for (const caseName of CASES) {
      expect(publishedJohansenCritical('trace', caseName, 1)).toEqual(publishedJohansenCritical('maxEigen', caseName, 1));
      for (let k = 2; k <= 12; k++) {
        expect(publishedJohansenCritical('trace', caseName, k)['5%']).toBeGreaterThan(
          publishedJohansenCritical('maxEigen', caseName, k)['5%'],
        );
      }
    }
  });

  it('values rise with the level (10% < 5% < 1%) and with n - r, in all six tables', () => {
    for (const kind of KINDS) {
      for (const caseName of CASES) {
        let previous = 0;
        for (let k = 1; k <= 12; k++) {
          const cv = publishedJohansenCritical(kind, caseName, k);
          expect(cv['10%']).toBeLessThan(cv['5%']);
          expect(cv['5%']).toBeLessThan(cv['1%']);
          expect(cv['5%']).toBeGreaterThan(previous);
          previous = cv['5%'];
        }
      }
    }
  });

  it('refuses n - r = 0, 13 and 1.5, and unknown statistic or case names, with MooringInputError', () => {
    expect(() => publishedJohansenCritical('trace', 'constant', 0)).toThrow(MooringInputError);
    expect(() => publishedJohansenCritical('trace', 'constant', 13)).toThrow(/1 to 12/);
    expect(() => publishedJohansenCritical('trace', 'constant', 1.5)).toThrow(MooringInputError);
    expect(() => publishedJohansenCritical('lambda' as JohansenStatisticKind, 'constant', 1)).toThrow(MooringInputError);
    expect(() => publishedJohansenCritical('trace', 'restricted' as JohansenCaseName, 1)).toThrow(MooringInputError);
    expect(() => publishedJohansenCritical('trace', 'toString' as JohansenCaseName, 1)).toThrow(MooringInputError);
  });
});
