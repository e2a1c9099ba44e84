import { describe, expect, it } from 'vitest';
import { GREGORY_HANSEN_MODELS, gregoryHansenCritical } from '../../addin/tables/gregory-hansen-table';
import { MooringInputError } from '../../addin/errors';
import table from '../../addin/tables/gregory-hansen-critical.json';

/**
 * The Gregory & Hansen (1996) Table 1 critical values as stored (1/5/10% for m = 1..3, and m = 4
 * in model C, compared with a typed copy of the printed table; the rest from memory, see
 * the JSON's transcribedFrom and tests/tables/gregory-hansen-typed copy.test.ts): spot
 * values, the shape any such table must have, and the lookups.
 */
describe('Gregory-Hansen critical values (Gregory & Hansen 1996, Table 1)', () => {
  it('says in its provenance which numbers were compared with the printed table and which are from memory, and cites the paper', () => {
    expect(table.transcribedFrom).toMatch(/compared, value by value, with an independent public typed copy of Table 1/);
    expect(table.transcribedFrom).toMatch(/still from memory/);
    expect(table.source).toMatch(/Gregory, A\. W\. & Hansen, B\. E\. \(1996\).*Journal of Econometrics, 70\(1\), 99-126 \(Table 1\)/);
  });
  it('m = 1: C -5.13/-4.83/-4.61/-4.34, C/T -5.45/-5.21/-4.99/-4.72, C/S -5.47/-5.19/-4.95/-4.68 (1/5/10%: Table 1 as transcribed; 2.5%: from memory)', () => {
    expect(gregoryHansenCritical('level', 1)).toEqual({ '1%': -5.13, '2.5%': -4.83, '5%': -4.61, '10%': -4.34 });
    expect(gregoryHansenCritical('level-trend', 1)).toEqual({ '1%': -5.45, '2.5%': -5.21, '5%': -4.99, '10%': -4.72 });
    expect(gregoryHansenCritical('regime', 1)).toEqual({ '1%': -5.47, '2.5%': -5.19, '5%': -4.95, '10%': -4.68 });
  });
  it('m = 4, C/S: -6.92/-6.64/-6.41/-6.17 (from memory)', () => {
    expect(gregoryHansenCritical('regime', 4)).toEqual({ '1%': -6.92, '2.5%': -6.64, '5%': -6.41, '10%': -6.17 });
  });
  it('every row rises from 1% to 10%, and every point falls as regressors are added', () => {
    for (const model of GREGORY_HANSEN_MODELS) {
      let previous: Record<string, number> | null = null;
      for (let m = 1; m <= 4; m++) {
        const row = gregoryHansenCritical(model, m) as Record<string, number>;
        expect(row['1%']).toBeLessThan(row['2.5%']);
        expect(row['2.5%']).toBeLessThan(row['5%']);
        expect(row['5%']).toBeLessThan(row['10%']);
        if (previous) for (const k of ['1%', '2.5%', '5%', '10%']) expect(row[k]).toBeLessThan(previous[k]);
        previous = row;
      }
    }
  });
  it('the shift models with more freedom (C/T, C/S) have points below the level-shift model (C) for every m', () => {
    for (let m = 1; m <= 4; m++) {
      const c = gregoryHansenCritical('level', m) as Record<string, number>;
      for (const model of ['level-trend', 'regime'] as const) {
        const row = gregoryHansenCritical(model, m) as Record<string, number>;
        for (const k of ['1%', '2.5%', '5%', '10%']) expect(row[k]).toBeLessThan(c[k]);
      }
    }
  });
  it('beyond four regressors there is no table (null), and bad arguments are refused', () => {
    expect(gregoryHansenCritical('level', 5)).toBeNull();
    expect(() => gregoryHansenCritical('level', 0)).toThrow(MooringInputError);
    expect(() => gregoryHansenCritical('C' as never, 1)).toThrow(/Unknown Gregory-Hansen model 'C'/);
  });
});
