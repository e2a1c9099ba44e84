import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { adfTest } from '../../addin/unitroot/adf';
import type { Deterministic } from '../../addin/result';
import { relative } from '../reference/compare';

/**
 * Reference: statsmodels 0.13.5 (Debian python3-statsmodels) adfuller, fixtures made by
 * tests/reference/make_fixtures.py on seeded series and on the open datasets (US macro data,
 * Danish money-demand data). Every deterministic option and lag rule; statistic to 1e-8
 * relative, p-value to 1e-6, chosen lags and nobs exactly, critical values to 1e-10.
 */
interface AdfCase {
  series: string;
  deterministic: Deterministic;
  lags: number | 'aic' | 'bic' | 'tstat';
  maxLags: number | null;
  statistic: number;
  pValue: number;
  usedLags: number;
  nobs: number;
  critical: Record<string, number>;
  icBest?: number;
}
const fixture = JSON.parse(readFileSync(new URL('../reference/fixtures/adf.json', import.meta.url), 'utf8')) as {
  series: Record<string, number[]>;
  cases: AdfCase[];
};

describe('ADF against the reference library (statsmodels adfuller)', () => {
  it(`covers every deterministic option and lag rule (${fixture.cases.length} cases)`, () => {
    const kinds = new Set(fixture.cases.map((c) => `${c.deterministic}/${typeof c.lags === 'number' ? 'fixed' : c.lags}`));
    expect(kinds.size).toBe(12);
  });
  for (const c of fixture.cases) {
    const label = `${c.series} ${c.deterministic} lags=${c.lags} max=${c.maxLags ?? 'default'}`;
    it(label, () => {
      const r = adfTest(fixture.series[c.series], { deterministic: c.deterministic, lags: c.lags, maxLags: c.maxLags ?? undefined });
      expect(r.lags).toBe(c.usedLags);
      expect(r.nobs).toBe(c.nobs);
      expect(relative(r.statistic, c.statistic)).toBeLessThan(1e-8);
      expect(Math.abs((r.pValue as number) - c.pValue)).toBeLessThan(1e-6);
      for (const level of ['1%', '5%', '10%']) expect(r.critical[level]).toBeCloseTo(c.critical[level], 10);
    });
  }
});
