/**
 * mooring forecast: the engine's VECM forecast through the command line (JSON and text), checked
 * against the statsmodels fixture (vecm-forecast.json) through a CSV of its series with quarterly
 * dates, the future dates in that spacing, the rank chosen by the trace test by default, the band
 * note beside the fan, and refusals.
 */
import { describe, expect, it } from 'vitest';
import { MOORING_COMMANDS } from '../../addin/cli/commands';
import { johansenTest } from '../../addin/johansen/johansen';
import { runWith } from '../cli/cli-harness';
import { fixtureSeries, loadFixture, type Fixtures } from '../reference/fixtures';

const fixture = loadFixture<Fixtures['vecm-forecast']>('vecm-forecast');
const c = fixture.cases.find((k) => k.series[0] === 'dk_lrm' && k.case === 'restricted-constant')!;
const block = c.series.map((id) => fixtureSeries(fixture, id));
const quarter = (t: number) => `${1974 + Math.floor(t / 4)}-${String(1 + 3 * (t % 4)).padStart(2, '0')}-01`;
const csv = ['Date,lrm,lry,lpy,ibo', ...block[0].map((_, t) => [quarter(t), ...block.map((s) => s[t])].join(','))].join('\n');
const run = (...argv: string[]) => runWith(MOORING_COMMANDS, argv, { 'dk.csv': csv });
const json = (...argv: string[]) => {
  const r = run(...argv, '--json');
  expect(r.stderr).toBe('');
  expect(r.code).toBe(0);
  return JSON.parse(r.stdout) as Record<string, any>;
};

describe('mooring forecast', () => {
  it('gives statsmodels\' VECM forecast and 95% bounds (1e-9) on the quarters after the last (1987-07-01)', () => {
    const out = json('forecast', 'dk.csv', '--series', 'lrm,lry,lpy,ibo', '--case', 'restricted-constant', '--lags', '1', '--rank', '1', '--horizon', '8');
    expect(quarter(block[0].length - 1)).toBe('1987-07-01');
    expect(out.dates).toEqual(['1987-10-01', '1988-01-01', '1988-04-01', '1988-07-01', '1988-10-01', '1989-01-01', '1989-04-01', '1989-07-01']);
    for (let h = 0; h < 8; h++) {
      for (let i = 0; i < 4; i++) {
        expect(Math.abs(out.forecast[h][i] - c.forecast[h][i])).toBeLessThan(1e-9);
        expect(Math.abs(out.lower[h][i] - c.lower[h][i])).toBeLessThan(1e-9);
        expect(Math.abs(out.upper[h][i] - c.upper[h][i])).toBeLessThan(1e-9);
      }
    }
    expect(out.spread.path).toHaveLength(8);
    expect(out.bandNote).toMatch(/ignoring the uncertainty of the estimated coefficients/);
  });

  it('takes the rank from the trace test when --rank is left out', () => {
    const out = json('forecast', 'dk.csv', '--series', 'lrm,lry,lpy,ibo', '--case', 'restricted-constant', '--horizon', '4');
    expect(out.rankChosenBy).toBe('trace test');
    expect(out.rank).toBe(johansenTest(block, { case: 'restricted-constant', lags: 1 }).rank.trace);
  });

  it('says beside the fan how the bands are made and that a forecast assumes the relation holds', () => {
    const text = run('forecast', 'dk.csv', '--series', 'lrm,lry', '--rank', '1', '--horizon', '3').stdout.replace(/\s+/g, ' ');
    expect(text).toContain('1987-10-01');
    expect(text).toContain('ignoring the uncertainty of the estimated coefficients');
    expect(text).toContain('A forecast assumes the relation holds');
  });

  it('refuses a missing horizon and a rank out of range, saying what works', () => {
    const none = run('forecast', 'dk.csv', '--series', 'lrm,lry');
    expect(none.code).toBe(2);
    expect(none.stderr).toMatch(/needs --horizon H/);
    const big = run('forecast', 'dk.csv', '--series', 'lrm,lry', '--rank', '2', '--horizon', '3');
    expect(big.code).toBe(2);
    expect(big.stderr).toMatch(/rank must be a whole number from 0 to 1/);
  });
});
