/**
 * MOOR.ENGLEGRANGER, MOOR.PHILLIPSOULIARIS, MOOR.HEDGE, MOOR.SPREAD, MOOR.ZSCORE, MOOR.HALFLIFE and MOOR.ECM
 * called with cell ranges. Reference: statsmodels 0.13.5 coint (tests/reference/fixtures/
 * coint.json): statistic 1e-8 relative, p-value 1e-6, step-1 coefficients and residual sum of
 * squares 1e-8 relative. Where no fixture exists the check states its source.
 */
import { randomWalk, SeededRandom } from '../../addin/random';
import { describe, expect, it } from 'vitest';
import { ecm, englegranger, halflife, hedge, phillipsouliaris, spread, zscore } from '../../functions/functions';
import { errorCorrectionModel } from '../../addin/cointegration/error-correction';
import { fixtureSeries, loadFixture, type Fixtures } from '../reference/fixtures';
import { block, cellErrorOf, column, only, row, tableValue } from './cell-shapes';

const coint = loadFixture<Fixtures['coint']>('coint');
const relative = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);
const cellsOf = (id: string) => fixtureSeries(coint, id);
const xRange = (ids: readonly string[]) => block(ids.map(cellsOf));

describe('MOOR.ENGLEGRANGER against statsmodels coint (coint.json)', () => {
  it(`reaches all ${coint.cases.length} cases: every deterministic option, lag rule and a fixed lag`, () => {
    expect(new Set(coint.cases.map((c) => `${c.deterministic}/${c.lags}`)).size).toBe(12);
  });
  for (const c of coint.cases) {
    it(`${c.y} on ${c.x.join(' + ')}, ${c.deterministic}, lags=${c.lags}: p = ${c.pValue.toPrecision(4)}`, () => {
      const y = column(cellsOf(c.y));
      const x = xRange(c.x);
      expect(Math.abs((only(englegranger(y, x, c.deterministic, c.lags)) as number) - c.pValue)).toBeLessThan(1e-6);
      expect(relative(only(englegranger(y, x, c.deterministic, c.lags, 'stat')) as number, c.statistic)).toBeLessThan(1e-8);
    });
  }

  it('the table carries the step-1 coefficients, critical values and a verdict', () => {
    const c = coint.cases.find((k) => k.x.length === 2 && k.deterministic === 'const' && k.lags === 'aic')!;
    const table = englegranger(column(cellsOf(c.y)), xRange(c.x), 'const', 'aic', 'all');
    expect(relative(tableValue(table, 'Coefficient on x (column 1)') as number, c.beta[0])).toBeLessThan(1e-8);
    expect(relative(tableValue(table, 'Coefficient on x (column 2)') as number, c.beta[1])).toBeLessThan(1e-8);
    expect(relative(tableValue(table, 'Intercept') as number, c.intercept as number)).toBeLessThan(1e-8);
    expect(relative(tableValue(table, 'Residual sum of squares') as number, c.residualSsr)).toBeLessThan(1e-8);
    expect(tableValue(table, 'Critical value at 5%') as number).toBeCloseTo(c.critical['5%'] as number, 8);
    expect(String(tableValue(table, 'Verdict'))).toMatch(/cointegrated/);
  });

  it('rows laid out across the sheet give the same answer as columns', () => {
    const c = coint.cases.find((k) => k.x.length === 2 && k.lags === 'bic' && k.deterministic === 'trend')!;
    const xRows = c.x.map((id) => cellsOf(id));
    const p = only(englegranger(row(cellsOf(c.y)), xRows, 'trend', 'bic')) as number;
    expect(Math.abs(p - c.pValue)).toBeLessThan(1e-6);
  });
});

describe('MOOR.PHILLIPSOULIARIS', () => {
  // Phillips & Ouliaris (1990): with bandwidth 0 Z-t is the Dickey-Fuller t of the residual
  // with no lagged changes, the Engle-Granger statistic at lags 0, with the same tables.
  for (const c of coint.cases.filter((k) => k.lags === 'aic')) {
    it(`at bandwidth 0 equals Engle-Granger at lag 0: ${c.y} on ${c.x.join(' + ')}, ${c.deterministic}`, () => {
      const y = column(cellsOf(c.y));
      const x = xRange(c.x);
      expect(relative(only(phillipsouliaris(y, x, c.deterministic, 0, 'stat')) as number, only(englegranger(y, x, c.deterministic, 0, 'stat')) as number)).toBeLessThan(1e-10);
      expect(only(phillipsouliaris(y, x, c.deterministic, 0))).toBeCloseTo(only(englegranger(y, x, c.deterministic, 0)) as number, 12);
    });
  }
  it('its table gives Z-alpha beside Z-t, and the step-1 coefficients of the fixture', () => {
    const c = coint.cases.find((k) => k.y === 'pair_y' && k.deterministic === 'const')!;
    const table = phillipsouliaris(column(cellsOf(c.y)), column(cellsOf(c.x[0])), 'const', 'auto', 'all');
    expect(typeof tableValue(table, 'Z-alpha (normalised bias)')).toBe('number');
    expect(relative(tableValue(table, 'Coefficient on x') as number, c.beta[0])).toBeLessThan(1e-8);
  });
});

describe('MOOR.HEDGE, MOOR.SPREAD and MOOR.ZSCORE against the step-1 regression of coint.json', () => {
  const pairs = coint.cases.filter((k) => k.x.length === 1 && k.deterministic === 'const' && k.lags === 'aic');
  for (const c of pairs) {
    const y = column(cellsOf(c.y));
    const x = column(cellsOf(c.x[0]));
    it(`${c.y} on ${c.x[0]}: OLS hedge ratio, spread and z-scores`, () => {
      expect(relative(hedge(y, x), c.beta[0])).toBeLessThan(1e-8);
      expect(relative(hedge(y, x, 'OLS'), c.beta[0])).toBeLessThan(1e-8);
      const s = (spread(y, x) as number[][]).map((r) => r[0]);
      expect(s.length).toBe(y.length);
      const yv = cellsOf(c.y);
      const xv = cellsOf(c.x[0]);
      s.forEach((v, i) => expect(v).toBeCloseTo(yv[i] - (c.intercept as number) - c.beta[0] * xv[i], 8));
      expect(relative(s.reduce((a, v) => a + v * v, 0), c.residualSsr)).toBeLessThan(1e-8);
      // The residual has mean 0, so its z-score is u / sqrt(SSR / (T - 1)).
      const sd = Math.sqrt(c.residualSsr / (yv.length - 1));
      (zscore(y, x) as number[][]).forEach((r, i) => expect(r[0]).toBeCloseTo(s[i] / sd, 8));
    });
  }

  it('a given beta gives y - beta x with no intercept, spilled as a row for row input', () => {
    const yv = cellsOf('pair_y');
    const xv = cellsOf('pair_x');
    const out = spread(row(yv), row(xv), 2) as number[][];
    expect(out.length).toBe(1);
    out[0].forEach((v, i) => expect(v).toBeCloseTo(yv[i] - 2 * xv[i], 12));
  });

  it('the four estimators differ and bracket the relation (OLS both ways, orthogonal, dynamic)', () => {
    const y = column(cellsOf('pair_y'));
    const x = column(cellsOf('pair_x'));
    const betas = ['ols', 'reverse-ols', 'tls', 'dols'].map((m) => hedge(y, x, m));
    // The two OLS lines bracket the orthogonal one (a property of least squares in two variables).
    expect(Math.min(betas[0], betas[1])).toBeLessThanOrEqual(betas[2]);
    expect(Math.max(betas[0], betas[1])).toBeGreaterThanOrEqual(betas[2]);
    betas.forEach((b) => expect(Math.abs(b - 2)).toBeLessThan(0.1)); // y = 1 + 2x + noise by construction
  });

  it('a rolling z-score leaves the first window - 1 rows empty, and pads the leading blanks', () => {
    const yv = cellsOf('pair_y');
    const xv = cellsOf('pair_x');
    const out = (zscore(column(['', '', ...yv]), column([null, null, ...xv]), 20) as unknown[][]).map((r) => r[0]);
    expect(out.length).toBe(yv.length + 2);
    expect(out.slice(0, 2 + 19).every((v) => v === '')).toBe(true);
    expect(typeof out[21]).toBe('number');
  });
});

describe('MOOR.HALFLIFE', () => {
  // Closed form: s_t = m + A phi^t satisfies Δs_t = (phi - 1)(s_{t-1} - m) exactly, so the AR(1)
  // regression recovers lambda = phi - 1 and the half-life ln 2 / -ln(phi).
  it('recovers ln 2 / -ln(phi) from an exactly decaying spread', () => {
    const phi = 0.9;
    const s = Array.from({ length: 120 }, (_, t) => 5 + 40 * phi ** t);
    expect(halflife(column(s))[0][0]).toBeCloseTo(Math.log(2) / -Math.log(phi), 8);
  });
  it('with two ranges measures the Engle-Granger spread: the same as the spread function spilled', () => {
    const y = column(cellsOf('pair_y'));
    const x = column(cellsOf('pair_x'));
    expect(halflife(y, x)[0][0]).toBeCloseTo(halflife(spread(y, x))[0][0] as number, 10);
  });
  it('show low, high and all: the ends of the 95% interval and the labelled table, the engine\'s numbers', () => {
    const y = column(cellsOf('pair_y'));
    const x = column(cellsOf('pair_x'));
    const table = halflife(y, x, 'all');
    const row = (label: string) => table.find((r) => String(r[0]).startsWith(label))?.[1];
    expect(row('Half-life')).toBe(halflife(y, x)[0][0]);
    expect(row('Low end')).toBe(halflife(y, x, 'low')[0][0]);
    expect(row('High end')).toBe(halflife(y, x, 'high')[0][0]);
    expect(halflife(y, x, 'low')[0][0] as number).toBeLessThan(halflife(y, x)[0][0] as number);
    expect(halflife(y, x, 'high')[0][0] as number).toBeGreaterThan(halflife(y, x)[0][0] as number);
    expect(String(row('The interval in words'))).toMatch(/^likely between/);
    expect(cellErrorOf(() => halflife(y, x, 'middle'), '#VALUE!')).toMatch(/value, low, high, all/);
  });
  it('show high is #N/A with the reason when the interval reaches no reversion', () => {
    const walk = column(Array.from(randomWalk(new SeededRandom(14), 300))); // a seeded random walk: no reversion to find
    expect(cellErrorOf(() => halflife(walk, undefined, 'high'), '#N/A')).toMatch(/no upper bound|no reversion/);
  });
  it('gives #N/A with the reason when the spread does not revert', () => {
    const trending = Array.from({ length: 60 }, (_, t) => 1.05 ** t);
    expect(cellErrorOf(() => halflife(column(trending)), '#N/A')).toMatch(/no mean reversion/);
  });
});

describe('MOOR.ECM', () => {
  const yv = cellsOf('pair_y');
  const xv = cellsOf('pair_x');
  it('returns the engine\'s speed of adjustment of y, its t-value and its table', () => {
    const engine = errorCorrectionModel(yv, xv, { lags: 'aic' }, { y: 'y', x: 'x' });
    expect(only(ecm(column(yv), column(xv)))).toBe(engine.y.alpha);
    expect(only(ecm(column(yv), column(xv), 'aic', 'stat'))).toBe(engine.y.tValue);
    const table = ecm(column(yv), column(xv), null, 'all');
    expect(tableValue(table, 'Speed of adjustment of y')).toBe(engine.y.alpha);
    expect(tableValue(table, 'p-value')).toBe(engine.y.pValue);
    expect(tableValue(table, 'Verdict')).toBe(engine.verdict);
    // y = 1 + 2x + AR(1) 0.6 noise by construction: y closes its gap, so its speed is negative.
    expect(engine.y.alpha).toBeLessThan(0);
  });
  it('takes a fixed number of lags', () => {
    expect(tableValue(ecm(column(yv), column(xv), 3, 'all'), 'Lags')).toBe(3);
  });
});
