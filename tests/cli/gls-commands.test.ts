import { describe, expect, it } from 'vitest';
import { MOORING_COMMANDS } from '../../addin/cli/commands';
import { dfglsTest } from '../../addin/unitroot/dfgls';
import { ngPerronTest } from '../../addin/unitroot/ng-perron';
import { pricesCsv, runWith } from './cli-harness';

/** mooring dfgls and mooring ngperron: the engine's numbers reach the JSON unchanged, options are read, refusals are one line. */
const csv = pricesCsv(300, 11);
const files = { 'p.csv': csv };
const column = (name: string) => csv.trim().split('\n').slice(1).map((l) => Number(l.split(',')[['Date', 'Walk', 'Calm', 'Drift'].indexOf(name)]));
const json = (...argv: string[]) => {
  const r = runWith(MOORING_COMMANDS, [...argv, '--json'], files);
  expect(r.stderr).toBe('');
  expect(r.code).toBe(0);
  return JSON.parse(r.stdout) as Record<string, any>;
};

describe('mooring dfgls and ngperron', () => {
  it('dfgls --deterministic trend --lags aic: the engine\'s statistic, p-value, critical values and lags', () => {
    const out = json('dfgls', 'p.csv', '--series', 'Drift', '--deterministic', 'trend', '--lags', 'aic');
    const engine = dfglsTest(column('Drift'), { deterministic: 'trend', lags: 'aic' }, 'Drift');
    expect(out.test).toBe('DF-GLS');
    expect(out.statistic).toBe(engine.statistic);
    expect(out.pValue).toBe(engine.pValue);
    expect(out.critical).toEqual(engine.critical);
    expect(out.lags).toBe(engine.lags);
    expect(out.lagRule).toBe('aic');
  });

  it('ngperron: MZa, MZt, MSB, MPT at the top of the JSON, each with its p-value, critical values and Table 1\'s', () => {
    const out = json('ngperron', 'p.csv', '--series', 'Calm');
    const engine = ngPerronTest(column('Calm'), {}, 'Calm');
    for (const s of ['MZa', 'MZt', 'MSB', 'MPT'] as const) {
      expect(out[s]).toBe(engine.statistics[s].statistic);
      expect(out.statistics[s].pValue).toBe(engine.statistics[s].pValue);
      expect(out.statistics[s].critical).toEqual(engine.statistics[s].critical);
      expect(out.statistics[s].publishedCritical).toEqual(engine.statistics[s].publishedCritical);
    }
    expect(out.statistics.MZa.publishedCritical['5%']).toBe(-8.1); // Ng & Perron (2001), Table 1, constant (from memory)
    expect(out.lagRule).toBe('maic');
  });

  it('refuses --deterministic none and --max-lags beside a fixed lag, in one line with exit 2', () => {
    for (const argv of [['dfgls', 'p.csv', '--series', 'Walk', '--deterministic', 'none'], ['ngperron', 'p.csv', '--series', 'Walk', '--lags', '2', '--max-lags', '5']]) {
      const r = runWith(MOORING_COMMANDS, argv, files);
      expect(r.code).toBe(2);
      expect(r.stderr.trim().split('\n')).toHaveLength(1);
    }
  });
});
