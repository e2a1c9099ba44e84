/**
 * mooring kalman: the command gives the engine's moving hedge ratio (JSON and text), with the
 * dates of the rows, nulls in the set-up rows, the variances as given or estimated, and the
 * refusals a user can act on. Reference numbers: the statsmodels fixture (kalman.json), through
 * a CSV written from its series.
 */
import { describe, expect, it } from 'vitest';
import { MOORING_COMMANDS } from '../../addin/cli/commands';
import { movingHedge } from '../../addin/kalman/moving-hedge';
import { runWith } from '../cli/cli-harness';
import { fixtureSeries, loadFixture, type Fixtures } from '../reference/fixtures';

const fixture = loadFixture<Fixtures['kalman']>('kalman');
const y = fixtureSeries(fixture, 'macro_log_realcons');
const x = fixtureSeries(fixture, 'macro_log_realgdp');
const dates = y.map((_, t) => `${1959 + Math.floor(t / 4)}-${String(1 + 3 * (t % 4)).padStart(2, '0')}-01`);
const csv = ['Date,cons,gdp', ...y.map((v, t) => `${dates[t]},${v},${x[t]}`)].join('\n');
const run = (...argv: string[]) => runWith(MOORING_COMMANDS, argv, { 'm.csv': csv });
const json = (...argv: string[]) => {
  const r = run(...argv, '--json');
  expect(r.stderr).toBe('');
  expect(r.code).toBe(0);
  return JSON.parse(r.stdout) as Record<string, any>;
};

describe('mooring kalman', () => {
  it('with fixed variances gives statsmodels\' filtered and smoothed slope (1e-7) with the dates, null in the set-up rows', () => {
    const c = fixture.cases.find((k) => k.kind === 'fixed' && k.y === 'macro_log_realcons')!;
    const out = json('kalman', 'm.csv', '--y', 'cons', '--x', 'gdp', '--state-var', String(c.stateVar), '--obs-var', String(c.obsVar));
    expect(out.variances).toBe('given');
    expect(out.dates[0]).toBe('1959-01-01');
    expect(out.dates).toHaveLength(203);
    expect(out.beta[0]).toBeNull();
    expect(out.spread[0]).toBeNull();
    expect(out.spread[1]).toBeNull();
    expect(out.spreadStandardised[2]).toBeCloseTo(c.forecastError![2] / Math.sqrt(c.forecastErrorVar![2]), 7);
    for (let t = 1; t < 203; t++) expect(Math.abs(out.beta[t] - c.filteredSlope![t])).toBeLessThan(1e-7);
    for (let t = 0; t < 203; t++) expect(Math.abs(out.betaSmoothed[t] - c.smoothedSlope![t])).toBeLessThan(1e-7);
    expect(Math.abs(out.logLikelihood - c.logLikelihood)).toBeLessThan(1e-6);
    expect(out.latest.beta).toBe(out.beta[202]);
    expect(out.latest.low).toBeLessThan(out.latest.beta);
  });

  it('estimates the variances by default: the engine\'s numbers, a likelihood at least statsmodels\' maximum - 0.01', () => {
    const c = fixture.cases.find((k) => k.kind === 'estimated' && k.y === 'macro_log_realcons')!;
    const out = json('kalman', 'm.csv', '--y', 'cons', '--x', 'gdp');
    expect(out.variances).toBe('estimated');
    expect(out.logLikelihood).toBeGreaterThanOrEqual(c.logLikelihood - 0.01);
    const engine = movingHedge(y, x, { y: 'cons', x: 'gdp' });
    expect(out.stateVar).toBe(engine.stateVar);
    expect(out.betaSmoothed).toEqual(engine.betaSmoothed);
  });

  it('says in words what the filter assumes and what a drifting ratio means, and shows the latest ratio with its band', () => {
    const text = run('kalman', 'm.csv', '--y', 'cons', '--x', 'gdp').stdout.replace(/\s+/g, ' ');
    expect(text).toMatch(/latest hedge ratio [\d.]+, likely between [\d.]+ and [\d.]+ \(95%/);
    expect(text).toContain('random step every row');
    expect(text).toContain('A ratio that drifts is itself evidence that the fixed relation is unstable');
  });

  it('refuses one variance without the other, and a negative one, with what would work', () => {
    const one = run('kalman', 'm.csv', '--y', 'cons', '--x', 'gdp', '--state-var', '1e-5');
    expect(one.code).toBe(2);
    expect(one.stderr).toMatch(/both variances .* or neither/);
    const negative = run('kalman', 'm.csv', '--y', 'cons', '--x', 'gdp', '--state-var', '-1', '--obs-var', '1');
    expect(negative.code).toBe(2);
    expect(negative.stderr).toMatch(/variance of 0 or more/);
  });
});
