import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { screenPairs } from '../../addin/screen/screen-pairs';

/**
 * Reference: statsmodels 0.13.5 (Debian python3-statsmodels) coint, from the fixture file
 * tests/reference/fixtures/coint.json (made by tests/reference/make_fixtures.py). Every
 * two-series case with a constant and the default maximum lag is screened here as part of a
 * universe, and each directed pair must carry the fixture's statistic (1e-8 relative),
 * p-value (1e-6, the tolerance of the single-pair reference test), lag count and hedge ratio.
 */
interface CointCase {
  y: string;
  x: string[];
  deterministic: string;
  lags: number | 'aic' | 'bic' | 'tstat';
  maxLags: number | null;
  statistic: number;
  pValue: number;
  usedLags: number;
  nobs: number;
  beta: number[];
  intercept: number | null;
}
const fixture = JSON.parse(readFileSync(new URL('../reference/fixtures/coint.json', import.meta.url), 'utf8')) as {
  series: Record<string, number[]>;
  cases: CointCase[];
};
const pairCases = fixture.cases.filter((c) => c.x.length === 1 && c.deterministic === 'const' && c.maxLags === null && typeof c.lags === 'string');
const relative = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

/** The universes: the 300-row seeded series together, and each real-data pair on its own rows. */
const UNIVERSES = [
  ['pair_y', 'pair_x', 'indep_a', 'indep_b', 'triple_y', 'triple_x1'],
  ['dk_lrm', 'dk_lry'],
  ['macro_log_realcons', 'macro_log_realgdp'],
];

describe('screen against the reference library (statsmodels coint) on the fixture pairs', () => {
  it(`covers ${pairCases.length} fixture cases (6 pairs x 3 lag rules)`, () => {
    expect(pairCases).toHaveLength(18);
  });
  for (const rule of ['aic', 'bic', 'tstat'] as const) {
    it(`lag rule ${rule}: every fixture pair found in a screen matches its fixture`, () => {
      let matched = 0;
      for (const names of UNIVERSES) {
        const result = screenPairs(names.map((name) => ({ name, values: fixture.series[name] })), { lags: rule });
        for (const c of pairCases.filter((k) => k.lags === rule && names.includes(k.y))) {
          const pair = result.pairs.find((p) => p.y === c.y && p.x === c.x[0]);
          expect(pair, `${c.y} on ${c.x[0]}`).toBeDefined();
          expect(pair!.lags).toBe(c.usedLags);
          expect(pair!.nobs - 1 - (pair!.lags as number)).toBe(c.nobs);
          expect(relative(pair!.statistic as number, c.statistic)).toBeLessThan(1e-8);
          expect(Math.abs(pair!.pValue - c.pValue)).toBeLessThan(1e-6);
          expect(relative(pair!.beta, c.beta[0])).toBeLessThan(1e-8);
          expect(relative(pair!.intercept, c.intercept as number)).toBeLessThan(1e-8);
          matched++;
        }
      }
      expect(matched).toBe(6);
    });
  }
});
