import { describe, expect, it } from 'vitest';
import { MooringInputError } from '../../addin/errors';
import { kpssCriticalValues, kpssPValue, type KpssKind } from '../../addin/tables/kpss-table';

// Kwiatkowski, Phillips, Schmidt & Shin (1992), Journal of Econometrics 54, Table 1:
// upper-tail asymptotic critical values at 10 / 5 / 2.5 / 1%.
const PRINTED: Record<KpssKind, [number, number, number, number]> = {
  const: [0.347, 0.463, 0.574, 0.739],
  trend: [0.119, 0.146, 0.176, 0.216],
};
const LEVELS = [0.1, 0.05, 0.025, 0.01];

describe('KPSS (1992) Table 1', () => {
  it('level stationarity (eta_mu): 0.347 / 0.463 / 0.574 / 0.739', () => {
    expect(kpssCriticalValues('const')).toEqual({ '10%': 0.347, '5%': 0.463, '2.5%': 0.574, '1%': 0.739 });
  });
  it('trend stationarity (eta_tau): 0.119 / 0.146 / 0.176 / 0.216', () => {
    expect(kpssCriticalValues('trend')).toEqual({ '10%': 0.119, '5%': 0.146, '2.5%': 0.176, '1%': 0.216 });
  });

  for (const kind of ['const', 'trend'] as const) {
    it(`${kind}: the p-value at each printed critical value is its level, inside the table`, () => {
      PRINTED[kind].forEach((cv, i) => {
        const result = kpssPValue(cv, kind);
        expect(result.pValue).toBeCloseTo(LEVELS[i], 12);
        expect(result.beyondTable).toBeNull();
      });
    });
    it(`${kind}: midway between two printed points the p-value is midway between their levels`, () => {
      for (let i = 0; i < 3; i++) {
        const mid = (PRINTED[kind][i] + PRINTED[kind][i + 1]) / 2;
        expect(kpssPValue(mid, kind).pValue).toBeCloseTo((LEVELS[i] + LEVELS[i + 1]) / 2, 12);
      }
    });
  }

  it('level: 0.405 (midway 10%-5%) gives 0.075; a quarter of the way from 0.574 to 0.739 gives 0.02125', () => {
    expect(kpssPValue(0.405, 'const').pValue).toBeCloseTo(0.075, 12);
    expect(kpssPValue(0.574 + 0.25 * (0.739 - 0.574), 'const').pValue).toBeCloseTo(0.02125, 12);
  });

  it('a statistic below the 10% point is held at 0.10 and flagged "above" (the true p-value is larger)', () => {
    expect(kpssPValue(0.2, 'const')).toEqual({ pValue: 0.1, beyondTable: 'above' });
    expect(kpssPValue(0, 'trend')).toEqual({ pValue: 0.1, beyondTable: 'above' });
  });

  it('a statistic beyond the 1% point is held at 0.01 and flagged "below" (the true p-value is smaller)', () => {
    expect(kpssPValue(1.2, 'const')).toEqual({ pValue: 0.01, beyondTable: 'below' });
    expect(kpssPValue(0.3, 'trend')).toEqual({ pValue: 0.01, beyondTable: 'below' });
    expect(kpssPValue(Infinity, 'trend')).toEqual({ pValue: 0.01, beyondTable: 'below' });
  });

  it('the p-value falls as the statistic rises (level case, 0.30 to 0.80)', () => {
    let previous = Infinity;
    for (let stat = 0.3; stat <= 0.8; stat += 0.005) {
      const { pValue } = kpssPValue(stat, 'const');
      expect(pValue).toBeLessThanOrEqual(previous);
      previous = pValue;
    }
  });

  it('refuses NaN, a negative statistic and an unknown case with MooringInputError', () => {
    expect(() => kpssPValue(NaN, 'const')).toThrow(MooringInputError);
    expect(() => kpssPValue(-0.1, 'const')).toThrow(MooringInputError);
    expect(() => kpssPValue(0.3, 'level' as KpssKind)).toThrow(MooringInputError);
    expect(() => kpssCriticalValues('none' as KpssKind)).toThrow(MooringInputError);
  });
});
