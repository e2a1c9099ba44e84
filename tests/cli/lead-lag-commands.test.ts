import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { MOORING_COMMANDS } from '../../addin/cli/commands';
import { demoCsv } from '../../addin/demo/scenario';
import { type Fixtures, loadFixture } from '../reference/fixtures';
import { expectOneLineRefusal, runWith } from './cli-harness';

/**
 * mooring granger and mooring varlags. End-to-end references: the statsmodels 0.13.5 fixtures
 * (grangercausalitytests on the macro growth rates, select_order on the four Danish series),
 * reached from the CSV files in tests/reference/data/ through the command line.
 */
const macro = readFileSync(new URL('../reference/data/macrodata.csv', import.meta.url), 'utf8');
const danish = readFileSync(new URL('../reference/data/danish-money-demand.csv', import.meta.url), 'utf8');
const granger = loadFixture<Fixtures['granger']>('granger');
const select = loadFixture<Fixtures['var-select']>('var-select');
const files = { 'm.csv': macro, 'd.csv': danish, 'q.csv': demoCsv() };
const run = (...argv: string[]) => runWith(MOORING_COMMANDS, argv, files);
const json = (...argv: string[]) => {
  const r = run(...argv, '--json');
  expect(r.stderr).toBe('');
  expect(r.code).toBe(0);
  return JSON.parse(r.stdout) as Record<string, any>;
};
const relative = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe('mooring granger', () => {
  it('--method f on the logged macro levels (both I(1)) tests the changes and matches grangercausalitytests on the growth rates, both directions, 2 lags', () => {
    const o = json('granger', 'm.csv', '--cause', 'realgdp', '--effect', 'realcons', '--log', '--method', 'f', '--lags', '2');
    const ab = granger.cases.find((c) => c.cause === 'macro_dlog_realgdp')!.lags[1];
    const ba = granger.cases.find((c) => c.cause === 'macro_dlog_realcons')!.lags[1];
    expect(o).toMatchObject({ command: 'granger', cause: 'ln(realgdp)', effect: 'ln(realcons)', method: 'f-differences', lags: 2, df: [ab.dfNum, ab.dfDenom] });
    expect(relative(o.fStatistic, ab.fStatistic)).toBeLessThan(1e-8);
    expect(Math.abs(o.pValue - ab.pValue)).toBeLessThan(1e-8);
    expect(relative(o.chiSquare.statistic, ab.chi2.statistic)).toBeLessThan(1e-8);
    expect(relative(o.likelihoodRatio.statistic, ab.lr.statistic)).toBeLessThan(1e-8);
    expect(o.chiSquare.df).toBe(2);
    expect(relative(o.reverse.fStatistic, ba.fStatistic)).toBeLessThan(1e-8);
    expect(o.leads).toBe(false);
    expect(o.reverse.leads).toBe(true);
    expect(o.verdict).toMatch(/^No evidence that ln\(realgdp\) leads ln\(realcons\) \(p = 0\.78\); ln\(realcons\) leads ln\(realgdp\) \(p < 0\.0001\)/);
  });

  it('--method ty reports the Wald chi-square with fStatistic null, df [p, null] and the extra lags', () => {
    const o = json('granger', 'q.csv', '--cause', 'GateGasoil', '--effect', 'DockDiesel', '--log', '--method', 'ty', '--lags', '2');
    expect(o).toMatchObject({ method: 'toda-yamamoto', fStatistic: null, df: [2, null], lags: 2, statisticName: 'Wald chi-square' });
    expect(o.waldChiSquare.statistic).toBe(o.statistic);
    expect(typeof o.extraLags).toBe('number');
    expect(o.leads).toBe(true);
    expect(o.reverse.leads).toBe(false);
  });

  it('--method ecm --cointegrated yes on the demo pair: short-run F headline and the long-run test', () => {
    const o = json('granger', 'q.csv', '--cause', 'GateGasoil', '--effect', 'DockDiesel', '--log', '--method', 'ecm', '--cointegrated', 'yes', '--lags', '1');
    expect(o.method).toBe('error-correction');
    expect(typeof o.fStatistic).toBe('number');
    expect(o.df[0]).toBe(1);
    expect(o.longRun.adjustment).toBeLessThan(0);
    expect(o.leads).toBe(true);
  });

  it('the readable report states the chosen test, the verdict and the cautions', () => {
    const r = run('granger', 'q.csv', '--cause', 'GateGasoil', '--effect', 'DockDiesel', '--log', '--lags', '2');
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/Test chosen/);
    expect(r.stdout).toMatch(/Verdict\s+ln\(GateGasoil\) leads/);
    expect(r.stdout).toMatch(/not advice to trade/);
  });

  it('refuses a missing --effect, the same series twice, a bad method and --max-lags with fixed lags, each in one line', () => {
    expect(expectOneLineRefusal(run('granger', 'q.csv', '--cause', 'GateGasoil'))).toMatch(/needs --cause NAME and --effect NAME/);
    expect(expectOneLineRefusal(run('granger', 'q.csv', '--cause', 'GateGasoil', '--effect', 'gategasoil'))).toMatch(/cannot be tested against itself/);
    expect(expectOneLineRefusal(run('granger', 'q.csv', '--cause', 'GateGasoil', '--effect', 'DockDiesel', '--method', 'sims'))).toMatch(/--method must be one of auto, f, ty, ecm/);
    expect(expectOneLineRefusal(run('granger', 'q.csv', '--cause', 'GateGasoil', '--effect', 'DockDiesel', '--lags', '2', '--max-lags', '5'))).toMatch(/--max-lags applies only/);
  });
});

describe('mooring varlags', () => {
  it('the four Danish series, max 4: the orders and criteria of select_order', () => {
    const c = select.cases.find((k) => k.series[0] === 'dk_lrm')!;
    const o = json('varlags', 'd.csv', '--series', 'lrm,lry,lpy,ibo', '--max-lags', '4');
    expect({ aic: o.aic, bic: o.bic, hq: o.hq, fpe: o.fpe }).toEqual(c.selected);
    expect(o.nobs).toBe(c.nobs);
    o.table.forEach((row: { aic: number; fpe: number }, p: number) => {
      expect(relative(row.aic, c.ics.aic[p])).toBeLessThan(1e-8);
      expect(relative(row.fpe, c.ics.fpe[p])).toBeLessThan(1e-8);
    });
  });

  it('prints the criteria table with the chosen orders marked', () => {
    const r = run('varlags', 'd.csv', '--series', 'lrm,lry', '--max-lags', '3');
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/Chosen by AIC/);
    expect(r.stdout).toMatch(/\*/);
  });

  it('refuses one series, a repeated name and too large a maximum, each in one line', () => {
    expect(expectOneLineRefusal(run('varlags', 'd.csv', '--series', 'lrm'))).toMatch(/at least two series/);
    expect(expectOneLineRefusal(run('varlags', 'd.csv', '--series', 'lrm,LRM'))).toMatch(/named twice/);
    expect(expectOneLineRefusal(run('varlags', 'd.csv', '--series', 'lrm,lry,lpy,ibo', '--max-lags', '11'))).toMatch(/largest allowed is 10/);
  });
});
