import { describe, expect, it } from 'vitest';
import { type FixtureFile, type FixtureName, type Fixtures, fixtureSeries, loadFixture } from './fixtures';

// Checks the fixture files keep the contract in tests/reference/README.md: the header,
// inputs present and finite, the documented lengths, and the sample-size conventions of
// statsmodels 0.13.5 that the engine's tests rely on.

const NAMES: FixtureName[] = [
  'adf', 'kpss', 'ols-longley', 'coint', 'johansen', 'granger', 'granger-levels', 'var-select', 'var-wald', 'zivot-andrews', 'kalman', 'vecm-forecast',
];

// Case counts follow from the README's grid (e.g. adf: 21 series x 3 terms x 9 lag settings).
const CASE_COUNTS: Record<FixtureName, number> = {
  adf: 567, kpss: 210, 'ols-longley': 1, coint: 84, johansen: 30, granger: 4, 'granger-levels': 2, 'var-select': 3,
  'var-wald': 12, 'zivot-andrews': 27, kalman: 8, 'vecm-forecast': 20,
};

// Series lengths as documented in the README.
const LENGTHS: Record<string, number> = {
  rw_60: 60, rw_150: 150, rw_400: 400, rw_drift_200: 200, ar1_phi050_250: 250, ar1_phi090_250: 250,
  trend_stationary_300: 300, i2_200: 200, pair_x: 300, pair_y: 300, triple_y: 300, triple_x1: 300,
  triple_x2: 300, indep_a: 300, indep_b: 300, sys3_y1: 300, sys4_y4: 300, var2_x: 400, var2_y: 400,
  za_rw_250: 250, za_level_break_250: 250, za_slope_break_250: 250, macro_log_realgdp: 203,
  macro_infl: 202, macro_realint: 202, macro_tbilrate: 203, macro_realgdp: 203, macro_realcons: 203, macro_dlog_realgdp: 202, dk_lrm: 55,
  dk_ide: 55, longley_TOTEMP: 16,
};

function load<N extends FixtureName>(name: N): Fixtures[N] {
  return loadFixture<Fixtures[N]>(name);
}

function idsOf(c: Record<string, unknown>): string[] {
  const out: string[] = [];
  for (const key of ['series', 'y', 'x', 'cause', 'effect']) {
    const v = c[key];
    if (typeof v === 'string') out.push(v);
    if (Array.isArray(v)) out.push(...(v as string[]));
  }
  return out;
}

describe('reference fixtures (statsmodels 0.13.5)', () => {
  it.each(NAMES)('%s: header, case count, and every input series present and finite', (name) => {
    const file = loadFixture<FixtureFile<Record<string, unknown>>>(name);
    expect(file.generatedBy).toBe('tests/reference/make_fixtures.py');
    expect(file.library).toBe('statsmodels 0.13.5, Debian python3-statsmodels');
    expect(file.cases.length).toBe(CASE_COUNTS[name]);
    for (const c of file.cases) {
      const ids = idsOf(c);
      expect(ids.length).toBeGreaterThan(0);
      for (const id of ids) {
        const values = fixtureSeries(file, id);
        expect(values.every((v) => typeof v === 'number' && Number.isFinite(v))).toBe(true);
        if (id in LENGTHS) expect(values.length, id).toBe(LENGTHS[id]);
      }
    }
  });

  it('a series used by several files holds the same values in each', () => {
    const seen = new Map<string, number[]>();
    for (const name of NAMES) {
      for (const [id, values] of Object.entries(load(name).series)) {
        const before = seen.get(id);
        if (before) expect(values, `${id} in ${name}`).toEqual(before);
        else seen.set(id, values);
      }
    }
    expect(seen.size).toBeGreaterThan(40);
  });

  it('adf: rows of the final regression = T - 1 - usedLags, and a search never exceeds its ceiling', () => {
    const file = load('adf');
    for (const c of file.cases) {
      expect(c.nobs).toBe(fixtureSeries(file, c.series).length - 1 - c.usedLags);
      if (typeof c.lags === 'number') expect(c.usedLags).toBe(c.lags);
      else expect(c.usedLags).toBeLessThanOrEqual(c.maxLagsSearched as number);
    }
  });

  it('kpss: pValueBeyondTable exactly when the statistic is outside the 10%..1% critical values', () => {
    for (const c of load('kpss').cases) {
      const beyond = c.statistic < c.critical['10%'] || c.statistic > c.critical['1%'];
      expect(c.pValueBeyondTable).toBe(beyond);
      if (beyond) expect([0.01, 0.1]).toContain(c.pValue);
    }
  });

  it('johansen: nobs = T - lagDiffs - 1 and each beta vector starts with 1', () => {
    const file = load('johansen');
    for (const c of file.cases) {
      expect(c.nobs).toBe(fixtureSeries(file, c.series[0]).length - c.lagDiffs - 1);
      for (const v of c.beta) expect(v[0]).toBe(1);
      expect(c.sameAsLevelLagOne).toBe(c.lagDiffs >= 1);
    }
  });

  it('granger and granger-levels: lag order p uses T - p rows and F has (p, T - 3p - 1) degrees of freedom', () => {
    for (const file of [load('granger'), load('granger-levels')]) {
      for (const c of file.cases) {
        const T = fixtureSeries(file, c.effect).length;
        for (const l of c.lags) {
          expect(l.nobs).toBe(T - l.lag);
          expect([l.dfNum, l.dfDenom]).toEqual([l.lag, T - 3 * l.lag - 1]);
        }
      }
    }
  });
});
