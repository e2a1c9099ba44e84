import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { MOORING_COMMANDS } from '../../addin/cli/commands';
import { runCli } from '../../addin/cli/run-cli';
import { csvSeries } from '../../addin/csv/csv-series';
import { readCsv } from '../../addin/csv/read-csv';
import { adfTest } from '../../addin/unitroot/adf';
import { expectOneLineRefusal, pricesCsv, runWith } from './cli-harness';

const macro = readFileSync(new URL('../reference/data/macrodata.csv', import.meta.url), 'utf8');
const files = { 'p.csv': pricesCsv(250), 'm.csv': macro };
const run = (...argv: string[]) => runWith(MOORING_COMMANDS, argv, files);
const json = (...argv: string[]) => {
  const r = run(...argv, '--json');
  expect(r.stderr).toBe('');
  expect(r.code).toBe(0);
  return JSON.parse(r.stdout) as Record<string, any>;
};

describe('mooring adf', () => {
  it('--json carries statistic, pValue, lags, nobs and the 1/5/10% critical values', () => {
    const o = json('adf', 'p.csv', '--series', 'Walk');
    expect(o).toMatchObject({ command: 'adf', test: 'ADF', series: 'Walk', deterministic: 'const', lagRule: 'aic' });
    for (const k of ['statistic', 'pValue', 'nobs', 'lags']) expect(typeof o[k]).toBe('number');
    expect(Object.keys(o.critical)).toEqual(['1%', '5%', '10%']);
    expect(o.nullHypothesis).toMatch(/unit root/);
    expect(Array.isArray(o.warnings)).toBe(true);
    expect(typeof o.details).toBe('object');
    expect(o.sample).toMatchObject({ observations: 250, firstLine: 2, lastLine: 251, firstDate: '2020-01-01' });
  });

  it('reports exactly what the engine computes on the cleaned column', () => {
    const o = json('adf', 'm.csv', '--series', 'realgdp', '--log', '--lags', '2', '--deterministic', 'TREND');
    const values = csvSeries(readCsv(macro), 'realgdp', { log: true }).values;
    const direct = adfTest(values, { deterministic: 'trend', lags: 2 }, 'ln(realgdp)');
    expect(o.statistic).toBe(direct.statistic);
    expect(o.pValue).toBe(direct.pValue);
    expect(o.lags).toBe(2);
    expect(o.lagRule).toBe('fixed');
    expect(o.title).toBe('Unit-root test (ADF) on ln(realgdp)');
  });

  it('lag rules are words in any case, with a maximum', () => {
    const o = json('adf', 'p.csv', '--series', 'Walk', '--lags', 'BIC', '--max-lags', '3');
    expect(o.lagRule).toBe('bic');
    expect(o.lags).toBeLessThanOrEqual(3);
  });

  it('the readable report ends with the cautions', () => {
    const r = run('adf', 'p.csv', '--series', 'Calm');
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/^Unit-root test \(ADF\) on Calm\n/);
    expect(r.stdout).toContain('rejected at 5%');
    const tail = r.stdout.slice(r.stdout.lastIndexOf('Keep in mind'));
    expect(tail).toMatch(/^Keep in mind\n[\s\S]*not advice to trade[\s\S]*licensed financial advice come first\.\n$/);
  });
});

describe('mooring kpss', () => {
  it('--json carries statistic, pValue, bandwidth and the 10/5/2.5/1% critical values', () => {
    const o = json('kpss', 'p.csv', '--series', 'Calm');
    expect(o.test).toBe('KPSS');
    expect(Object.keys(o.critical)).toEqual(['10%', '5%', '2.5%', '1%']);
    expect(Number.isInteger(o.bandwidth)).toBe(true);
    expect(o.lags).toBeNull();
  });

  it('--bandwidth N uses exactly N kernel lags', () => {
    expect(json('kpss', 'p.csv', '--series', 'Calm', '--bandwidth', '7').bandwidth).toBe(7);
  });

  it('refuses the deterministic word KPSS has no use for, listing the allowed ones', () => {
    expect(expectOneLineRefusal(run('kpss', 'p.csv', '--series', 'Calm', '--deterministic', 'none'))).toBe(
      "mooring: --deterministic must be one of const, trend, not 'none'.");
  });
});

describe('mooring pp', () => {
  it('--json carries Z-tau as statistic, zAlpha, pValue, bandwidth and critical values', () => {
    const o = json('pp', 'p.csv', '--series', 'Walk', '--bandwidth', 'Auto');
    expect(o.statisticName).toBe('Z-tau');
    expect(typeof o.zAlpha).toBe('number');
    expect(o.zAlpha).toBe(o.details.zAlpha);
    expect(typeof o.pValue).toBe('number');
    expect(Number.isInteger(o.bandwidth)).toBe(true);
    expect(Object.keys(o.critical)).toEqual(['1%', '5%', '10%']);
  });
});

describe('mooring order', () => {
  it('a random walk is I(1) and a stationary series I(0), with the tests behind each (seed 3, 250 rows)', () => {
    const walk = json('order', 'p.csv', '--series', 'Walk');
    expect(walk.order).toBe(1);
    expect(walk.steps.length).toBeGreaterThan(0);
    for (const s of walk.steps) {
      expect(s.adf.test).toBe('ADF');
      expect(s.kpss.test).toBe('KPSS');
      expect(typeof s.adfRejects).toBe('boolean');
    }
    expect(json('order', 'p.csv', '--series', 'Calm').order).toBe(0);
  });

  it('the readable report shows the table of tests', () => {
    const r = run('order', 'm.csv', '--series', 'realgdp', '--log');
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/Order of integration of ln\(realgdp\)/);
    expect(r.stdout).toMatch(/levels +-?\d+\.\d{4}/);
  });

  it('--alpha accepts a decimal or a percentage and refuses anything else', () => {
    expect(json('order', 'p.csv', '--series', 'Walk', '--alpha', '1%').alpha).toBe(0.01);
    expect(expectOneLineRefusal(run('order', 'p.csv', '--series', 'Walk', '--alpha', '0.7'))).toBe(
      "mooring: --alpha must be a level between 0 and 0.5, such as 0.05 or 5%, not '0.7'.");
  });
});

describe('mooring: bad input through the real commands', () => {
  const cases: [string, string[], string][] = [
    ['a wrong deterministic word', ['adf', 'p.csv', '--series', 'Walk', '--deterministic', 'linear'], "mooring: --deterministic must be one of none, const, trend, not 'linear'."],
    ['a wrong lag word', ['adf', 'p.csv', '--series', 'Walk', '--lags', 'hq'], "mooring: --lags must be a whole number of lagged differences (0, 1, 2, ...) or one of aic, bic, tstat, not 'hq'."],
    ['a negative lag count', ['adf', 'p.csv', '--series', 'Walk', '--lags', '-1'], "mooring: --lags must be a whole number of lagged differences (0, 1, 2, ...) or one of aic, bic, tstat, not '-1'."],
    ['a maximum with fixed lags', ['adf', 'p.csv', '--series', 'Walk', '--lags', '2', '--max-lags', '5'], 'mooring: --max-lags applies only when a rule chooses the lags (--lags aic, bic or tstat); with --lags 2 leave it out.'],
    ['a wrong bandwidth', ['pp', 'p.csv', '--series', 'Walk', '--bandwidth', 'wide'], "mooring: --bandwidth must be a whole number of kernel lags (0, 1, 2, ...) or one of auto, not 'wide'."],
    ['an option of another command', ['kpss', 'p.csv', '--series', 'Walk', '--lags', '2'], 'mooring: Unknown option --lags for kpss; its options are --series, --log, --skip-gaps, --json, --from, --to, --dates, --date-order, --fill-forward, --delimiter, --decimal, --deterministic, --bandwidth.'],
    ['an unknown series', ['pp', 'm.csv', '--series', 'gdp'], "mooring: No column is named 'gdp'; the series are: year, quarter, realgdp, realcons, realinv, realgovt, realdpi, cpi, m1, tbilrate, unemp, pop, infl, realint."],
    ['a non-positive value under --log', ['adf', 'm.csv', '--series', 'infl', '--log'], 'mooring: infl line 2 is 0: logs need positive values; remove or correct that row, or turn logs off.'],
    ['a missing file', ['order', 'none.csv', '--series', 'x'], "mooring: Cannot read 'none.csv': no such file; check the name and the folder."],
  ];
  for (const [what, argv, expected] of cases) {
    it(what, () => {
      expect(expectOneLineRefusal(run(...argv))).toBe(expected);
      expect(expectOneLineRefusal(run(...argv, '--json'))).toBe(expected);
    });
  }

  it('a lag count too large for the sample is refused by the engine as bad input, not a crash', () => {
    const r = run('adf', 'p.csv', '--series', 'Walk', '--lags', '400');
    expectOneLineRefusal(r);
  });

  it('runCli returns the exit code and writes through the io it is given', () => {
    let out = '';
    let err = '';
    const code = runCli(['adf', 'x.csv', '--series', 'Walk'], { stdout: (s) => { out += s; }, stderr: (s) => { err += s; }, readFile: () => files['p.csv'] });
    expect(code).toBe(0);
    expect(err).toBe('');
    expect(out).toContain('Unit-root test (ADF) on Walk');
  });
});

const bundle = new URL('../../dist/cli/mooring.js', import.meta.url);
// `npm test` builds the bundles before vitest runs, so this suite always runs there.
describe('the built bundle dist/cli/mooring.js', () => {
  it('exists (npm test builds it first)', () => expect(existsSync(bundle)).toBe(true));
  const dir = mkdtempSync(join(tmpdir(), 'mooring-cli-'));
  const csv = join(dir, 'prices.csv');
  writeFileSync(csv, pricesCsv(3_000));
  const node = (...argv: string[]) => spawnSync(process.execPath, [bundle.pathname, ...argv], { encoding: 'utf8' });

  it('prints one JSON object through a pipe, whole', () => {
    const r = node('order', csv, '--series', 'Walk', '--json');
    expect(r.status).toBe(0);
    expect(JSON.parse(r.stdout).order).toBe(1);
  });

  it('a JSON object of about a megabyte arrives whole through a pipe (no cut-off at exit)', () => {
    const big = join(dir, 'gappy.csv');
    writeFileSync(big, pricesCsv(20_000, 5, (row, i) => { if (i % 2 === 1) row[1] = 'n/a'; }));
    const r = node('adf', big, '--series', 'Walk', '--skip-gaps', '--lags', '1', '--json');
    expect(r.status).toBe(0);
    expect(r.stdout.length).toBeGreaterThan(500_000);
    const o = JSON.parse(r.stdout);
    expect(o.sample.skipped).toHaveLength(10_000);
    expect(o.sample.observations).toBe(10_000);
  });

  it('bad input: exit 2, one line on stderr, no stack', () => {
    const r = node('adf', join(dir, 'missing.csv'), '--series', 'Walk');
    expect(r.status).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr.trimEnd().split('\n')).toHaveLength(1);
    expect(r.stderr).toMatch(/^mooring: .*missing\.csv/); // wording checked in-process; the bundle may predate it
  });
});
