/**
 * MOOR.CRIT against the critical values statsmodels 0.13.5 reports with its tests (the same
 * published surfaces): adfuller (adf.json, MacKinnon 2010 at the regression's observations),
 * coint (coint.json, at T - 1 for N = y plus the xs), kpss (kpss.json, KPSS 1992 Table 1) and
 * coint_johansen (johansen.json, MacKinnon-Haug-Michelis 1999). Agreement to 1e-10.
 */
import { describe, expect, it } from 'vitest';
import { crit } from '../../functions/functions';
import { fixtureSeries, loadFixture, type Fixtures } from '../reference/fixtures';
import { cellErrorOf } from './cell-shapes';

const LEVELS = [['1%', 0.01], ['5%', '5%'], ['10%', 0.1]] as const;

describe('MOOR.CRIT against the fixtures', () => {
  it('adf: every case of adf.json at its observations', () => {
    const fixture = loadFixture<Fixtures['adf']>('adf');
    for (const c of fixture.cases) {
      for (const [key, level] of LEVELS) expect(crit('adf', c.nobs, 1, c.deterministic, level)).toBeCloseTo(c.critical[key], 10);
    }
  });
  it('eg: every case of coint.json with a constant or trend, at T - 1 with N = 1 + the xs', () => {
    const fixture = loadFixture<Fixtures['coint']>('coint');
    const cases = fixture.cases.filter((c) => c.deterministic !== 'none');
    expect(cases.length).toBeGreaterThan(50);
    for (const c of cases) {
      const T = fixtureSeries(fixture, c.y).length;
      for (const [key, level] of LEVELS) expect(crit('EG', T - 1, 1 + c.x.length, c.deterministic, level)).toBeCloseTo(c.critical[key] as number, 10);
    }
  });
  it('kpss: Table 1, both cases and all four levels', () => {
    const fixture = loadFixture<Fixtures['kpss']>('kpss');
    for (const c of fixture.cases.slice(0, 20)) {
      for (const key of ['10%', '5%', '2.5%', '1%'] as const) expect(crit('kpss', null, null, c.deterministic, key)).toBe(c.critical[key]);
    }
  });
  it('johansen-trace and johansen-max: every step of every case, n - r common trends', () => {
    const fixture = loadFixture<Fixtures['johansen']>('johansen');
    for (const c of fixture.cases) {
      const m = c.series.length;
      for (let r = 0; r < m; r++) {
        for (const key of ['10%', '5%', '1%'] as const) {
          expect(crit('johansen-trace', null, m - r, c.deterministic, key)).toBe(c.traceCritical[r][key]);
          expect(crit('johansen-max', null, m - r, c.deterministic, key)).toBe(c.maxEigenCritical[r][key]);
        }
      }
    }
  });
  it('pp reads the adf surfaces, and leaving observations out gives the asymptotic value', () => {
    expect(crit('pp', 250, 1, 'const', 0.05)).toBe(crit('adf', 250, 1, 'const', 0.05));
    // MacKinnon (2010), constant, N = 1: asymptotic 5% value -2.86154 (from memory; the table's first coefficient).
    expect(crit('adf')).toBeCloseTo(-2.86154, 4);
    expect(crit('adf', 10_000_000)).toBeCloseTo(crit('adf') as number, 5);
  });
});

describe('MOOR.CRIT refusals', () => {
  it('names the tests when the test is missing or unknown', () => {
    expect(cellErrorOf(() => crit(null), '#VALUE!')).toMatch(/adf, pp, eg, po, po-alpha, kpss, johansen-trace, johansen-max/);
    expect(cellErrorOf(() => crit('dickey'), '#VALUE!')).toMatch(/test must be one of adf, pp/);
  });
  it('refuses a level the table does not print, listing those it does', () => {
    expect(cellErrorOf(() => crit('adf', null, null, null, 0.025), '#VALUE!'))
      .toBe('The adf table gives critical values at 1%, 5%, 10% only; level 2.5% is not among them: give one of 0.01, 0.05, 0.1 (or 1%, 5%, 10% as text).');
  });
  it('refuses a level far outside the tables in plain words (1e-300 once read as a "1e-298%" column)', () => {
    for (const level of [1e-300, 5e-7, '0.0000001%']) {
      const message = cellErrorOf(() => crit('kpss', null, null, null, level), '#VALUE!');
      expect(message).toMatch(/^The kpss table gives critical values at 10%, 5%, 2\.5%, 1% only; level [\d.e-]+ is not among them: give one of 0\.1, 0\.05, 0\.025, 0\.01/);
      expect(message).not.toMatch(/e-\d+%/);
    }
    expect(cellErrorOf(() => crit('adf', null, null, null, 1e-300), '#VALUE!')).toContain('level 1e-300 is not among them');
  });
  it('refuses observations for an asymptotic table and several series for a one-series table', () => {
    expect(cellErrorOf(() => crit('kpss', 200), '#VALUE!')).toMatch(/asymptotic/);
    expect(cellErrorOf(() => crit('adf', 200, 3), '#VALUE!')).toMatch(/one series/);
  });
  it('refuses the no-constant residual case, which has no published surface beyond one series', () => {
    expect(cellErrorOf(() => crit('eg', 200, 2, 'none'), '#VALUE!')).toMatch(/single series only/);
  });
  it('gives #N/A where no Z-alpha table covers the number of variables', () => {
    expect(cellErrorOf(() => crit('po-alpha', null, 7), '#N/A')).toMatch(/6/);
  });
});
