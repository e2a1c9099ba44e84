import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { MOORING_COMMANDS } from '../../addin/cli/commands';
import { type Fixtures, loadFixture } from '../reference/fixtures';
import { expectOneLineRefusal, runWith } from './cli-harness';

/**
 * mooring johansen, end to end from the CSV: the Danish money-demand data (Johansen & Juselius
 * 1990), four series in levels, against statsmodels 0.13.5 coint_johansen (det_order 0 is our
 * 'constant' case, det_order -1 our 'none'), fixtures from tests/reference/make_fixtures.py.
 */
const danish = readFileSync(new URL('../reference/data/danish-money-demand.csv', import.meta.url), 'utf8');
const fixture = loadFixture<Fixtures['johansen']>('johansen');
const run = (...argv: string[]) => runWith(MOORING_COMMANDS, argv, { 'd.csv': danish });
const relative = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1);

describe('mooring johansen', () => {
  for (const [word, deterministic] of [['constant', 'constant'], ['none', 'none']] as const) {
    it(`--case ${word} --lags 1 on lrm, lry, lpy, ibo matches coint_johansen (statistics 1e-8, critical values exactly)`, () => {
      const c = fixture.cases.find(
        (k) => k.series.join(',') === 'dk_lrm,dk_lry,dk_lpy,dk_ibo' && k.deterministic === deterministic && k.lagDiffs === 1,
      )!;
      expect(c).toBeDefined();
      const r = run('johansen', 'd.csv', '--series', 'lrm,lry,lpy,ibo', '--case', word, '--lags', '1', '--json');
      expect(r.stderr).toBe('');
      expect(r.code).toBe(0);
      const o = JSON.parse(r.stdout);
      expect(o.nobs).toBe(c.nobs);
      o.eigenvalues.forEach((v: number, i: number) => expect(Math.abs(v - c.eigenvalues[i])).toBeLessThan(1e-8));
      o.trace.forEach((v: number, i: number) => expect(relative(v, c.trace[i])).toBeLessThan(1e-8));
      o.maxEigen.forEach((v: number, i: number) => expect(relative(v, c.maxEigen[i])).toBeLessThan(1e-8));
      expect(o.traceCritical).toEqual(c.traceCritical);
      expect(o.maxEigenCritical).toEqual(c.maxEigenCritical);
      expect(o.tracePValue).toHaveLength(4);
      expect(typeof o.rank).toBe('number');
    });
  }
  it('refuses one series and an unknown case word in one line', () => {
    expect(expectOneLineRefusal(run('johansen', 'd.csv', '--series', 'lrm'))).toMatch(/at least two series/);
    expect(expectOneLineRefusal(run('johansen', 'd.csv', '--series', 'lrm,lry', '--case', 'drift'))).toMatch(/--case must be one of none, restricted-constant/);
  });
});
