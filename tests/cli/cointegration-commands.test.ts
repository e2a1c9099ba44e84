import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { engleGranger } from '../../addin/cointegration/engle-granger';
import { errorCorrectionModel } from '../../addin/cointegration/error-correction';
import { hedgeRatios } from '../../addin/cointegration/hedge-ratio';
import { phillipsOuliaris } from '../../addin/cointegration/phillips-ouliaris';
import { MOORING_COMMANDS } from '../../addin/cli/commands';
import { pairSpread } from '../../addin/spread/pair-spread';
import { autoregressive1, randomWalk, SeededRandom } from '../../addin/random';
import { type Fixtures, loadFixture } from '../reference/fixtures';
import { expectOneLineRefusal, runWith } from './cli-harness';

/** A price CSV with a cointegrated pair (Diesel = 3 + 1.1 Gasoil + AR(1) spread), an unrelated walk and a copy of Gasoil in other units. */
function pairCsv(n: number): { text: string; diesel: number[]; gasoil: number[]; freight: number[] } {
  const rng = new SeededRandom(44);
  const gasoil = Array.from(randomWalk(rng, n, { start: 60 }), (v) => Number(v.toFixed(4)));
  const freight = Array.from(randomWalk(rng, n, { start: 20 }), (v) => Number(v.toFixed(4)));
  const spread = autoregressive1(rng, n, 0.9, 0.5);
  const diesel = gasoil.map((v, i) => Number((3 + 1.1 * v + spread[i]).toFixed(4)));
  const lines = ['Date,Diesel,Gasoil,Freight,GasoilCents'];
  for (let i = 0; i < n; i++) {
    const day = new Date(Date.UTC(2021, 0, 1 + i)).toISOString().slice(0, 10);
    lines.push([day, diesel[i], gasoil[i], freight[i], (gasoil[i] * 100).toFixed(2)].join(','));
  }
  return { text: `${lines.join('\n')}\n`, diesel, gasoil, freight };
}

const pair = pairCsv(400);
const macro = readFileSync(new URL('../reference/data/macrodata.csv', import.meta.url), 'utf8');
const fixture = loadFixture<Fixtures['coint']>('coint');
const files = { 'p.csv': pair.text, 'm.csv': macro };
const run = (...argv: string[]) => runWith(MOORING_COMMANDS, argv, files);
const json = (...argv: string[]) => {
  const r = run(...argv, '--json');
  expect(r.stderr).toBe('');
  expect(r.code).toBe(0);
  return JSON.parse(r.stdout) as Record<string, any>;
};

describe('mooring eg', () => {
  it('--json carries statistic, pValue, lags, nobs, the 1/5/10% critical values, beta (in order) and the intercept', () => {
    const o = json('eg', 'p.csv', '--y', 'Diesel', '--x', 'Gasoil,Freight');
    expect(o).toMatchObject({ command: 'eg', test: 'Engle-Granger', y: 'Diesel', x: ['Gasoil', 'Freight'], deterministic: 'const', lagRule: 'aic' });
    for (const k of ['statistic', 'pValue', 'lags', 'nobs', 'intercept']) expect(typeof o[k]).toBe('number');
    expect(Object.keys(o.critical)).toEqual(['1%', '5%', '10%']);
    const direct = engleGranger(pair.diesel, [pair.gasoil, pair.freight], {}, { y: 'Diesel', xs: ['Gasoil', 'Freight'] });
    expect(o.statistic).toBe(direct.test.statistic);
    expect(o.beta).toEqual(direct.beta);
    expect(o.verdict).toBe(direct.verdict);
  });

  it('reproduces the reference library end to end: ln(realcons) on ln(realgdp) from the macro CSV matches the statsmodels coint fixture', () => {
    const c = fixture.cases.find((k) => k.y === 'macro_log_realcons' && k.deterministic === 'const' && k.lags === 'aic');
    const o = json('eg', 'm.csv', '--y', 'realcons', '--x', 'realgdp', '--log');
    expect(o.title).toBe('Cointegration test (Engle-Granger) of ln(realcons) on ln(realgdp)');
    expect(Math.abs(o.statistic - c!.statistic) / Math.abs(c!.statistic)).toBeLessThan(1e-8);
    expect(Math.abs(o.pValue - c!.pValue)).toBeLessThan(1e-6);
    expect(Math.abs(o.beta[0] - c!.beta[0])).toBeLessThan(1e-8);
  });

  it('an exact combination prints the plain verdict, and the JSON has a null statistic, p-value 0 and the warning', () => {
    const o = json('eg', 'p.csv', '--y', 'GasoilCents', '--x', 'Gasoil');
    expect(o.statistic).toBeNull();
    expect(o.pValue).toBe(0);
    expect(o.verdict).toContain('move as one up to scale: the residual is zero');
    expect(o.warnings[0]).toContain('copy or a formula');
    const r = run('eg', 'p.csv', '--y', 'GasoilCents', '--x', 'Gasoil');
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('move as one up to scale');
  });

  it('the readable report holds the test block, the verdict and the sample', () => {
    const r = run('eg', 'p.csv', '--y', 'Diesel', '--x', 'Gasoil', '--deterministic', 'trend', '--lags', '1');
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/^Cointegration test \(Engle-Granger\) of Diesel on Gasoil\n/);
    expect(r.stdout).toContain('Verdict');
    expect(r.stdout).toContain('Lagged differences    1, as given');
    expect(r.stdout).toContain('p.csv, column Diesel, Gasoil');
  });
});

describe('mooring po', () => {
  it('--json carries zt, zAlpha, pValue and critical, equal to the engine', () => {
    const o = json('po', 'p.csv', '--y', 'Diesel', '--x', 'Gasoil', '--bandwidth', '4');
    const direct = phillipsOuliaris(pair.diesel, [pair.gasoil], { bandwidth: 4 });
    expect(o.zt).toBe(direct.zt);
    expect(o.statistic).toBe(direct.zt);
    expect(o.zAlpha).toBe(direct.zAlpha);
    expect(o.pValue).toBe(direct.test.pValue);
    expect(o.bandwidth).toBe(4);
    expect(Object.keys(o.critical)).toEqual(['1%', '5%', '10%']);
    expect(Object.keys(o.zAlphaCritical)).toEqual(['1%', '5%', '10%']);
  });
});

describe('mooring hedge', () => {
  it('--json carries the four estimators, with standard errors only for dynamic OLS', () => {
    const o = json('hedge', 'p.csv', '--y', 'Diesel', '--x', 'Gasoil', '--leads-lags', '2');
    const direct = hedgeRatios(pair.diesel, pair.gasoil, { leadsLags: 2 });
    expect(o.ols.beta).toBe(direct.ols.beta);
    expect(o.reverseOls.beta).toBe(direct.reverseOls.beta);
    expect(o.totalLeastSquares.beta).toBe(direct.totalLeastSquares.beta);
    expect(o.dynamicOls).toMatchObject({ beta: direct.dynamicOls.beta, standardError: direct.dynamicOls.standardError, leadsLags: 2, leadsLagsRule: 'fixed' });
    expect(o.ols.standardError).toBeNull();
    const r = run('hedge', 'p.csv', '--y', 'Diesel', '--x', 'Gasoil');
    expect(r.stdout.split('\n').every((line) => line.length <= 78)).toBe(true);
  });
});

describe('mooring ecm', () => {
  it('--json carries both equations, the lags and the half-life, equal to the engine', () => {
    const o = json('ecm', 'p.csv', '--y', 'Diesel', '--x', 'Gasoil', '--lags', '1', '--period', 'day');
    const direct = errorCorrectionModel(pair.diesel, pair.gasoil, { lags: 1, period: 'day' }, { y: 'Diesel', x: 'Gasoil' });
    expect(o.lags).toBe(1);
    expect(o.equations.y.alpha).toBe(direct.y.alpha);
    expect(o.equations.x.alpha).toBe(direct.x.alpha);
    expect(o.equations.y.coefficients).toHaveLength(4);
    // halfLife is the pair's one half-life (the spread's AR(1)); the model's own carries another name.
    expect(o.halfLife).toBe(pairSpread(pair.diesel, pair.gasoil, { y: 'Diesel', x: 'Gasoil' }, 'day').halfLife.halfLife);
    expect(o.ecmHalfLife).toBe(direct.ecmHalfLife);
    expect(o.equations.y.halfLifeAlone).toBe(direct.y.halfLifeAlone);
    expect(o.verdict).toBe(direct.verdict);
    const r = run('ecm', 'p.csv', '--y', 'Diesel', '--x', 'Gasoil', '--period', 'day');
    expect(r.stdout.split('\n').every((line) => line.length <= 78)).toBe(true);
  });
});

describe('mooring spread', () => {
  it('--json carries the spread values, the half-life and the z-scores (full and rolling)', () => {
    const o = json('spread', 'p.csv', '--y', 'Diesel', '--x', 'Gasoil', '--window', '20');
    expect(o.values).toHaveLength(400);
    expect(o.zscore).toHaveLength(400);
    expect(o.rollingZscore.slice(0, 19).every((v: unknown) => v === null)).toBe(true);
    expect(typeof o.halfLife).toBe('number');
    expect(o.hedge).toBe('ols');
    expect(o.values[0]).toBeCloseTo(pair.diesel[0] - o.intercept - o.beta * pair.gasoil[0], 10);
  });
  it('takes a hedge ratio as given', () => {
    const o = json('spread', 'p.csv', '--y', 'Diesel', '--x', 'Gasoil', '--beta', '1.1', '--intercept', '3');
    expect(o).toMatchObject({ hedge: 'given', beta: 1.1, intercept: 3 });
    expect(o.values[5]).toBeCloseTo(pair.diesel[5] - 3 - 1.1 * pair.gasoil[5], 10);
    expect(o.rollingZscore).toBeNull();
  });
});

describe('refusals of the relation commands: exit 2, one line', () => {
  const cases: [string, string[], RegExp][] = [
    ['--series instead of --y/--x', ['eg', 'p.csv', '--series', 'Diesel'], /name its series with --y and --x/],
    ['no --x', ['po', 'p.csv', '--y', 'Diesel'], /needs --y NAME and --x NAME/],
    ['two regressors for a pair command', ['hedge', 'p.csv', '--y', 'Diesel', '--x', 'Gasoil,Freight'], /takes one regressor/],
    ['the same series twice', ['eg', 'p.csv', '--y', 'Diesel', '--x', 'diesel'], /named twice/],
    ['an unknown column', ['ecm', 'p.csv', '--y', 'Diesel', '--x', 'Jet'], /No column is named 'Jet'/],
    ['--beta with --hedge', ['spread', 'p.csv', '--y', 'Diesel', '--x', 'Gasoil', '--beta', '1', '--hedge', 'tls'], /either --beta or --hedge/],
    ['a beta that is not a number', ['spread', 'p.csv', '--y', 'Diesel', '--x', 'Gasoil', '--beta', 'one'], /--beta must be a number/],
    ['a window below 3', ['spread', 'p.csv', '--y', 'Diesel', '--x', 'Gasoil', '--window', '2'], /at least 3/],
    ['too large a maximum lag', ['eg', 'p.csv', '--y', 'Diesel', '--x', 'Gasoil', '--max-lags', '300'], /largest allowed is 199/],
  ];
  for (const [what, argv, message] of cases) {
    it(what, () => {
      expect(expectOneLineRefusal(run(...argv))).toMatch(message);
    });
  }
});

describe('help', () => {
  it('lists eg, po, hedge, ecm and spread', () => {
    const r = run('--help');
    for (const name of ['eg', 'po', 'hedge', 'ecm', 'spread']) expect(r.stdout).toMatch(new RegExp(`\\b${name}\\b`));
  });
});
