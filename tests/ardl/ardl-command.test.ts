/**
 * mooring ardl and mooring johansen --beta-test / --exogeneity: the commands give the engine's
 * numbers (the statsmodels fixture ardl-bounds.json for F and t; the engine's restriction tests
 * for the Johansen flags), name the table used, and refuse bad values in words.
 */
import { describe, expect, it } from 'vitest';
import { MOORING_COMMANDS } from '../../addin/cli/commands';
import { betaRestrictionTest, exogeneityTests } from '../../addin/johansen/restrictions';
import { runWith } from '../cli/cli-harness';
import { loadFixture } from '../reference/fixtures';

const fixture = loadFixture<{ series: Record<string, number[]>; cases: { y: string; x: string[]; case: number; lags: number; order: number[]; fStatistic: number; tStatistic: number }[] }>('ardl-bounds');
const s = fixture.series;
const csv = ['a,b,c,d', ...s.ardl_y.map((v, t) => `${v},${s.ardl_x1[t]},${s.ardl_x2[t]},${s.pair_x[t]}`)].join('\n');
const shortCsv = csv.split('\n').slice(0, 42).join('\n');
const run = (...argv: string[]) => runWith(MOORING_COMMANDS, argv, { 'm.csv': csv, 's.csv': shortCsv });
const json = (...argv: string[]) => {
  const r = run(...argv, '--json');
  expect(r.stderr).toBe('');
  expect(r.code).toBe(0);
  return JSON.parse(r.stdout) as Record<string, any>;
};

describe('mooring ardl', () => {
  it('gives statsmodels\' F and t (1e-6) with the fields of the result, for every case', () => {
    for (const c of fixture.cases.filter((f) => f.y === 'ardl_y')) {
      const out = json('ardl', 'm.csv', '--y', 'a', '--x', 'b,c', '--case', String(c.case), '--lags', String(c.lags), '--order', c.order.join(','));
      expect(Math.abs(out.statistic - c.fStatistic)).toBeLessThan(1e-6 * c.fStatistic);
      expect(Math.abs(out.tStatistic - c.tStatistic)).toBeLessThan(1e-6 * Math.abs(c.tStatistic));
      expect(Object.keys(out.critical)).toEqual(['10%', '5%', '2.5%', '1%']);
      expect(out.critical['5%'].lower).toBeLessThan(out.critical['5%'].upper);
      expect(out.pValue.lower).toBeLessThanOrEqual(out.pValue.upper);
      expect(out.lags).toBe(c.lags);
      expect(out.order).toEqual(c.order);
      expect(out.longRun).toHaveLength(2 + (c.case === 2 || c.case === 4 ? 1 : 0));
      expect(out.speedOfAdjustment.coefficient).toBeLessThan(0);
      expect(out.criticalSource).toMatch(/Table CI/);
      expect(['relation', 'no-relation', 'inconclusive']).toContain(out.outcome);
    }
  });

  it('the verdict has three outcomes in words: a relation, none, and inconclusive between the bounds', () => {
    expect(json('ardl', 'm.csv', '--y', 'a', '--x', 'b,c', '--lags', '2', '--order', '1').outcome).toBe('relation');
    const none = json('ardl', 'm.csv', '--y', 'd', '--x', 'c', '--lags', '1', '--order', '1');
    expect(none.verdict).toMatch(/below the lower 5% bound|between the 5% bounds|above/);
  });

  it('a short sample names Mooring\'s simulation for its size, never a silent asymptotic value', () => {
    const out = json('ardl', 's.csv', '--y', 'a', '--x', 'b', '--lags', '2', '--order', '1');
    expect(out.nobs).toBe(39);
    expect(out.criticalSource).toMatch(/Mooring's simulation for 39 rows/);
  });

  it('orders by AIC are reported with their rule; bad values are refused in words', () => {
    const out = json('ardl', 'm.csv', '--y', 'a', '--x', 'b,c');
    expect(out.orderRule).toEqual({ lags: 'aic', order: 'aic' });
    expect(run('ardl', 'm.csv', '--y', 'a', '--x', 'b', '--case', '6').stderr).toMatch(/--case must be 1, 2, 3, 4 or 5/);
    expect(run('ardl', 'm.csv', '--y', 'a', '--x', 'b', '--lags', '0').stderr).toMatch(/whole number from 1/);
    expect(run('ardl', 'm.csv', '--y', 'a', '--x', 'b,c', '--order', '1,2,3').stderr).toMatch(/one value for every x/);
    expect(run('ardl', 'm.csv', '--y', 'a', '--x', 'b', '--alpha', '0.2').stderr).toMatch(/10%, 5%, 2.5% and 1%/);
  });
});

describe('mooring johansen --beta-test and --exogeneity', () => {
  it('report the engine\'s LR tests as betaTest and exogeneity', () => {
    const out = json('johansen', 'm.csv', '--series', 'a,b', '--beta-test', '1,-0.8', '--exogeneity');
    const beta = betaRestrictionTest([s.ardl_y, s.ardl_x1], [1, -0.8], { case: 'constant', lags: 1 });
    expect(out.betaTest).toEqual({ vector: [1, -0.8], statistic: beta.statistic, df: 1, pValue: beta.pValue });
    const exo = exogeneityTests([s.ardl_y, s.ardl_x1], { case: 'constant', lags: 1, rank: out.exogeneityRank });
    expect(out.exogeneity).toEqual(exo.map((e) => ({ series: ['a', 'b'][exo.indexOf(e)], statistic: e.statistic, df: e.df, pValue: e.pValue })));
    // a (y) adjusts toward x1 at speed 0.3 in the generator; x1 is a random walk
    expect(out.exogeneity[0].pValue).toBeLessThan(0.01);
  });
  it('a vector of the wrong length or with text is refused in words', () => {
    expect(run('johansen', 'm.csv', '--series', 'a,b', '--beta-test', '1,x').stderr).toMatch(/one number per series/);
    expect(run('johansen', 'm.csv', '--series', 'a,b', '--beta-test', '1,-1,2').stderr).toMatch(/one weight per series/);
  });
});
