/**
 * One quantity, one number, on every surface: the half-life of the pair's spread, the
 * dynamic-OLS standard error, the line the spread is built on and the units to hold, read
 * from the commands (ecm, spread, hedge, report; JSON and text), the report's HTML and the
 * pane's view of "The relation and its pull", on the demo data with natural logs.
 *
 * Expected values are computed here independently of the engine where a formula allows:
 * the least-squares line and the AR(1) of its residual in closed form (sample covariances),
 * the half-life ln 2 / -ln(1 + lambda), Andrews' (1991, eqs. 6.2 and 6.4) AR(1) plug-in
 * bandwidth for the Bartlett kernel, and the units to hold, slope x (last price of y / last
 * price of x), from the raw prices on the CSV's last row.
 */
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { MOORING_COMMANDS } from '../../addin/cli/commands';
import { dynamicOls } from '../../addin/cointegration/dynamic-ols';
import type { DiagnosticReport } from '../../addin/report/report-types';
import type { PairReport } from '../../addin/report/pair-types';
import { relationStepView, type RelationStepView } from '../../taskpane/ui/views/relation-view';
import { COLUMN, DEMO_CSV, demoReport } from '../pane/demo-reports';
import { runWith } from './cli-harness';
import * as moor from '../../functions/functions';

const files = { 'd.csv': DEMO_CSV };
const PAIR = ['--y', 'DockDiesel', '--x', 'GateGasoil'];
const run = (...argv: string[]) => runWith(MOORING_COMMANDS, argv, files);
const json = (...argv: string[]) => {
  const r = run(...argv, '--json');
  expect(r.stderr).toBe('');
  expect(r.code).toBe(0);
  return JSON.parse(r.stdout) as Record<string, any>;
};
const relative = (a: number, b: number): number => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

/** The demo's columns as numbers (every demo cell is filled). */
function demoColumn(name: string): number[] {
  const lines = DEMO_CSV.trim().split('\n');
  const j = lines[0].split(',').indexOf(name);
  return lines.slice(1).map((l) => Number(l.split(',')[j]));
}

const dieselPrices = demoColumn('DockDiesel');
const gasoilPrices = demoColumn('GateGasoil');
const lnDiesel = dieselPrices.map(Math.log);
const lnGasoil = gasoilPrices.map(Math.log);

function mean(v: readonly number[]): number {
  return v.reduce((s, a) => s + a, 0) / v.length;
}

/** Slope of y on x with a constant: sample covariance over sample variance. */
function slopeOf(y: readonly number[], x: readonly number[]): { slope: number; intercept: number } {
  const mx = mean(x);
  const my = mean(y);
  let sxy = 0;
  let sxx = 0;
  for (let i = 0; i < x.length; i++) {
    sxy += (x[i] - mx) * (y[i] - my);
    sxx += (x[i] - mx) ** 2;
  }
  const slope = sxy / sxx;
  return { slope, intercept: my - slope * mx };
}

/** The definition, in closed form: AR(1) with a constant of the least-squares spread, ln 2 / -ln(1 + lambda). */
function independentHalfLife(y: readonly number[], x: readonly number[]): number {
  const line = slopeOf(y, x);
  const s = y.map((v, i) => v - line.intercept - line.slope * x[i]);
  const lagged = s.slice(0, -1);
  const change = s.slice(1).map((v, i) => v - s[i]);
  const lambda = slopeOf(change, lagged).slope;
  return Math.log(2) / -Math.log(1 + lambda);
}

let report: DiagnosticReport;
let reportPair: PairReport;
let pane: RelationStepView;
let paneReport: DiagnosticReport;

beforeAll(async () => {
  report = json('report', 'd.csv', '--series', 'GateGasoil,DockDiesel', '--log').report as DiagnosticReport;
  reportPair = report.pairs[0];
  paneReport = await demoReport([COLUMN.GateGasoil, COLUMN.DockDiesel]);
  pane = relationStepView(paneReport, paneReport.pairs[0]);
});

describe('the half-life of the pair: one definition, one number', () => {
  it('the report writes DockDiesel on GateGasoil, the normalisation the commands below use', () => {
    expect(reportPair.relation?.dependent).toBe('DockDiesel');
    expect(reportPair.relation?.regressor).toBe('GateGasoil');
  });

  it('ecm --json, spread --json and report --json give the same halfLife (1e-12 relative), equal to the closed-form definition (1e-8)', () => {
    const ecm = json('ecm', 'd.csv', ...PAIR, '--log', '--period', 'day');
    const spread = json('spread', 'd.csv', ...PAIR, '--log', '--period', 'day');
    const fromReport = reportPair.adjustment!.spreadAr1.halfLife as number;
    expect(relative(ecm.halfLife, fromReport)).toBeLessThan(1e-12);
    expect(relative(spread.halfLife, fromReport)).toBeLessThan(1e-12);
    expect(relative(paneReport.pairs[0].adjustment!.spreadAr1.halfLife as number, fromReport)).toBeLessThan(1e-12);
    // Closed form against QR: agreement to about 1e-8 is all the conditioning allows.
    expect(relative(fromReport, independentHalfLife(lnDiesel, lnGasoil))).toBeLessThan(1e-8);
  });

  it("the error-correction model's own half-lives carry other names, and none of them is called halfLife", () => {
    const ecm = json('ecm', 'd.csv', ...PAIR, '--log');
    expect(typeof ecm.ecmHalfLife).toBe('number');
    expect(Math.abs(ecm.ecmHalfLife - ecm.halfLife)).toBeGreaterThan(0.5);
    expect(ecm.equations.y).toHaveProperty('halfLifeAlone');
    expect(ecm.equations.y).not.toHaveProperty('halfLife');
    expect(relative(reportPair.adjustment!.ecm.ecmHalfLife as number, ecm.ecmHalfLife)).toBeLessThan(1e-12);
    expect(reportPair.adjustment!.ecm).not.toHaveProperty('halfLife');
  });

  it('the summary sentence rounds the same number, and the definition stands beside it in text, HTML and the pane', () => {
    const life = reportPair.adjustment!.spreadAr1.halfLife as number;
    expect(reportPair.adjustment!.verdict).toContain(`in about ${Math.round(life)} days`);
    const text = run('report', 'd.csv', '--series', 'GateGasoil,DockDiesel', '--log').stdout.replace(/\s+/g, ' ');
    expect(text).toContain(`Half-life ${life.toFixed(1)} days: ln 2 / -ln(1 + lambda), lambda from the AR(1) regression with a constant of the spread on the least-squares line`);
    expect(text).toMatch(/ECM half-life \d+\.\d days: implied by the error-correction model, both prices adjusting/);
    const dir = mkdtempSync(join(tmpdir(), 'mooring-one-number-'));
    try {
      const out = join(dir, 'r.html');
      expect(run('report', 'd.csv', '--series', 'GateGasoil,DockDiesel', '--log', '--out', out).code).toBe(0);
      const html = readFileSync(out, 'utf8');
      expect(html).toContain(`${life.toFixed(1)} days (AR(1) of the spread on the least-squares line)`);
      expect(html).toContain('Half-life implied by the error-correction model, both prices adjusting');
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
    const fact = pane.pullFacts.find((f) => f.label.startsWith('Half-life of the spread'));
    expect(fact?.label).toContain('least-squares line');
    expect(fact?.value).toBe(`${life.toFixed(1)} days`);
    const labels = pane.pullFacts.map((f) => f.label).filter((l) => /half-life/i.test(l));
    expect(new Set(labels).size).toBe(labels.length);
  });
});

describe("the half-life's 95% interval: one definition, one pair of numbers", () => {
  /** The interval in closed form: the speed and its standard error from sample moments, Kendall's centre, the ends mapped. */
  function independentInterval(y: readonly number[], x: readonly number[]): { low: number; high: number } {
    const line = slopeOf(y, x);
    const s = y.map((v, i) => v - line.intercept - line.slope * x[i]);
    const lagged = s.slice(0, -1);
    const change = s.slice(1).map((v, i) => v - s[i]);
    const fit = slopeOf(change, lagged);
    const n = change.length;
    const ml = mean(lagged);
    const rss = change.reduce((a, d, i) => a + (d - fit.intercept - fit.slope * lagged[i]) ** 2, 0);
    const sxx = lagged.reduce((a, v) => a + (v - ml) ** 2, 0);
    const se = Math.sqrt(rss / (n - 2) / sxx);
    const phi = 1 + fit.slope;
    const centre = phi + (1 + 3 * phi) / s.length; // Kendall (1954), from memory
    const life = (p: number) => Math.log(2) / -Math.log(p);
    return { low: life(centre - 1.959963984540054 * se), high: life(centre + 1.959963984540054 * se) };
  }

  it('ecm, spread and report --json, the pane and MOOR.HALFLIFE low/high agree (1e-12), and match the closed form (1e-7)', () => {
    const ecm = json('ecm', 'd.csv', ...PAIR, '--log', '--period', 'day');
    const spread = json('spread', 'd.csv', ...PAIR, '--log', '--period', 'day');
    const fromReport = reportPair.adjustment!.spreadAr1.halfLifeInterval;
    expect(fromReport.level).toBe(0.95);
    for (const other of [ecm.halfLifeInterval, spread.halfLifeInterval, paneReport.pairs[0].adjustment!.spreadAr1.halfLifeInterval]) {
      expect(relative(other.low, fromReport.low!)).toBeLessThan(1e-12);
      expect(relative(other.high, fromReport.high!)).toBeLessThan(1e-12);
      expect(other.text).toBe(fromReport.text);
    }
    const column = (v: number[]) => v.map((a) => [a]);
    expect(relative(moor.halflife(column(dieselPrices), column(gasoilPrices), 'low', 'log')[0][0] as number, fromReport.low!)).toBeLessThan(1e-12);
    expect(relative(moor.halflife(column(dieselPrices), column(gasoilPrices), 'high', 'log')[0][0] as number, fromReport.high!)).toBeLessThan(1e-12);
    const closed = independentInterval(lnDiesel, lnGasoil);
    expect(relative(fromReport.low!, closed.low)).toBeLessThan(1e-7);
    expect(relative(fromReport.high!, closed.high)).toBeLessThan(1e-7);
    const life = reportPair.adjustment!.spreadAr1.halfLife as number;
    expect(fromReport.low!).toBeLessThan(life);
    expect(fromReport.high!).toBeGreaterThan(life);
  });

  it('the words stand beside the half-life in the verdict, the terminal, the HTML and the pane', () => {
    const words = reportPair.adjustment!.spreadAr1.halfLifeInterval.text;
    expect(words).toMatch(/^likely between \d+(\.\d)? and \d+(\.\d)? days$/);
    expect(reportPair.adjustment!.verdict).toMatch(new RegExp(`in about \\d+(\\.\\d)? days, ${words}`));
    expect(run('report', 'd.csv', '--series', 'GateGasoil,DockDiesel', '--log').stdout.replace(/\s+/g, ' ')).toContain(`Half-life interval ${words}`);
    expect(run('ecm', 'd.csv', ...PAIR, '--log', '--period', 'day').stdout.replace(/\s+/g, ' ')).toContain(`Half-life interval ${words}`);
    expect(run('spread', 'd.csv', ...PAIR, '--log', '--period', 'day').stdout.replace(/\s+/g, ' ')).toContain(`Half-life interval ${words}`);
    expect(pane.pullVerdict).toContain(words);
    expect(pane.pullFacts.find((f) => f.label.startsWith('How sure'))?.value).toBe(words);
    const dir = mkdtempSync(join(tmpdir(), 'mooring-interval-'));
    try {
      const out = join(dir, 'r.html');
      expect(run('report', 'd.csv', '--series', 'GateGasoil,DockDiesel', '--log', '--out', out).code).toBe(0);
      expect(readFileSync(out, 'utf8')).toContain(`Half-life interval: ${words}`);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});

describe('the dynamic-OLS standard error: one estimator everywhere', () => {
  it('hedge --json gives the standard error the report and the pane show (1e-12 relative), with and without logs', () => {
    const hedge = json('hedge', 'd.csv', ...PAIR, '--log');
    const r = reportPair.relation!;
    expect(relative(hedge.dynamicOls.beta, r.dynamicOls.beta)).toBeLessThan(1e-12);
    expect(relative(hedge.dynamicOls.standardError, r.dynamicOls.standardError)).toBeLessThan(1e-12);
    expect(hedge.dynamicOls.bandwidth).toBe(r.dynamicOls.bandwidth);
    expect(pane.lineFacts.find((f) => f.label.startsWith('Its standard error'))?.value).toBe(r.dynamicOls.standardError.toFixed(4));
    const plainHedge = json('hedge', 'd.csv', ...PAIR);
    const plainReport = json('report', 'd.csv', '--series', 'GateGasoil,DockDiesel').report as DiagnosticReport;
    const plain = plainReport.pairs[0].relation!;
    expect(plain.dependent).toBe('DockDiesel');
    expect(relative(plainHedge.dynamicOls.standardError, plain.dynamicOls.standardError)).toBeLessThan(1e-12);
  });

  it("its bandwidth is Andrews' AR(1) plug-in for the Bartlett kernel on the DOLS residual: L = ceil(1.1447 (alpha n)^(1/3)) - 1, alpha = 4 rho^2 / ((1 - rho)^2 (1 + rho)^2) (Andrews 1991, eqs. 6.2 and 6.4)", () => {
    const fit = dynamicOls(Float64Array.from(lnDiesel), Float64Array.from(lnGasoil));
    const u = fit.residuals;
    let num = 0;
    let den = 0;
    for (let t = 1; t < u.length; t++) {
      num += u[t] * u[t - 1];
      den += u[t - 1] * u[t - 1];
    }
    const rho = num / den;
    expect(Math.abs(rho)).toBeLessThan(0.97); // below the cap, so the plain formula applies
    const alpha = (4 * rho * rho) / ((1 - rho) ** 2 * (1 + rho) ** 2);
    const expected = Math.ceil(1.1447 * Math.cbrt(alpha * u.length)) - 1;
    expect(fit.bandwidth).toBe(expected);
    expect(reportPair.relation!.dynamicOls.bandwidth).toBe(expected);
  });

  it('says in words which estimator it is, beside the number', () => {
    const hedge = run('hedge', 'd.csv', ...PAIR, '--log').stdout.replace(/\s+/g, ' ');
    expect(hedge).toContain("standard error from the residual's long-run variance, Bartlett kernel with");
    expect(reportPair.relation!.dynamicOls.standardErrorMethod).toContain("Andrews' AR(1) plug-in rule");
    expect(pane.lineFacts.some((f) => f.label === 'Its standard error (from the long-run variance of the residual)')).toBe(true);
  });
});

describe('the line the spread is built on', () => {
  it('is the least-squares line on every surface, and each says so', () => {
    const r = reportPair.relation!;
    const sp = reportPair.spread!;
    const line = slopeOf(lnDiesel, lnGasoil);
    expect(relative(sp.line.beta, line.slope)).toBeLessThan(1e-9);
    expect(sp.line).toMatchObject({ beta: r.ols.beta, intercept: r.ols.intercept, method: 'least-squares' });
    expect(sp.definition).toContain('least-squares line');
    const ecm = json('ecm', 'd.csv', ...PAIR, '--log');
    const spread = json('spread', 'd.csv', ...PAIR, '--log');
    expect(relative(ecm.spreadLine.beta, sp.line.beta)).toBeLessThan(1e-12);
    expect(relative(spread.beta, sp.line.beta)).toBeLessThan(1e-12);
    expect(spread.lineText).toContain('least-squares line');
    // The pane headlines dynamic OLS and says that the spread and its charts use the least-squares line.
    expect(pane.relationText).toContain('1.122');
    expect(pane.spreadLineNote).toContain('plain least-squares line');
    expect(pane.charts!.spread.title).toContain('least-squares line');
    expect(pane.charts!.spread.lines[0].values).toEqual(paneReport.pairs[0].spread!.values);
  });
});

describe('logs read as logs: the slope is an elasticity, the hedge is sized in units at the latest prices', () => {
  const lastY = dieselPrices[dieselPrices.length - 1];
  const lastX = gasoilPrices[gasoilPrices.length - 1];

  it('hedge --json --log gives hedgeUnits = slope x lastY / lastX for every method (1e-12 relative), and the slope itself without logs', () => {
    const hedge = json('hedge', 'd.csv', ...PAIR, '--log');
    for (const key of ['ols', 'reverseOls', 'totalLeastSquares', 'dynamicOls']) {
      expect(hedge[key].slopeMeaning).toBe('elasticity');
      expect(relative(hedge[key].hedgeUnits, (hedge[key].beta * lastY) / lastX)).toBeLessThan(1e-12);
    }
    const plain = json('hedge', 'd.csv', ...PAIR);
    for (const key of ['ols', 'reverseOls', 'totalLeastSquares', 'dynamicOls']) {
      expect(plain[key].slopeMeaning).toBe('units');
      expect(plain[key].hedgeUnits).toBe(plain[key].beta);
    }
  });

  it('says elasticity in words and gives the units to hold at the latest prices, never "units of ln(...)"', () => {
    const hedge = json('hedge', 'd.csv', ...PAIR, '--log');
    const units = hedge.dynamicOls.hedgeUnits as number;
    const said = /hold about ([\d.]+) units of GateGasoil per unit of DockDiesel at the latest prices/.exec(hedge.verdict);
    expect(said).not.toBeNull();
    expect(relative(Number(said![1]), units)).toBeLessThan(5e-4); // four significant digits in words
    expect(hedge.verdict).toContain('is an elasticity');
    expect(hedge.verdict).not.toMatch(/units of ln/);
    const text = run('hedge', 'd.csv', ...PAIR, '--log').stdout;
    expect(text).toContain('elasticity');
    expect(text).not.toMatch(/units of ln/);
  });

  it('the report (pair relation) and the pane carry the same hedgeUnits, with the words', () => {
    const r = reportPair.relation!;
    expect(r.slopeMeaning).toBe('elasticity');
    expect(relative(r.dynamicOls.hedgeUnits, (r.dynamicOls.beta * lastY) / lastX)).toBeLessThan(1e-12);
    expect(relative(r.ols.hedgeUnits, (r.ols.beta * lastY) / lastX)).toBeLessThan(1e-12);
    expect(relative(r.latestPrices.y, lastY)).toBeLessThan(1e-12);
    const hedge = json('hedge', 'd.csv', ...PAIR, '--log');
    expect(relative(r.dynamicOls.hedgeUnits, hedge.dynamicOls.hedgeUnits)).toBeLessThan(1e-12);
    expect(reportPair.verdicts.join(' ')).toContain('is an elasticity');
    expect(pane.hedgeText).toContain('is an elasticity');
    expect(pane.hedgeText).toContain('at the latest prices');
    const fact = pane.lineFacts.find((f) => f.label === 'Units of GateGasoil to hold per unit of DockDiesel, at the latest prices');
    expect(fact?.value).toBe(r.dynamicOls.hedgeUnits.toFixed(4));
    expect(pane.lineFacts.some((f) => f.label.startsWith('Elasticity, dynamic least squares'))).toBe(true);
  });
});
