/**
 * MOOR.ADF, MOOR.KPSS, MOOR.PHILLIPSPERRON and MOOR.ORDER called as Excel calls them (a column of
 * cells, options as cell values or null when left out), checked against the reference
 * fixtures: statsmodels 0.13.5 adfuller and kpss (tests/reference/fixtures/adf.json,
 * kpss.json). Tolerances: p-values 1e-6 absolute, statistics 1e-8 relative.
 */
import { describe, expect, it } from 'vitest';
import { adf, kpss, order, phillipsperron } from '../../functions/functions';
import { fixtureSeries, loadFixture, type Fixtures } from '../reference/fixtures';
import { column, only, row, tableValue } from './cell-shapes';
import { relative } from '../reference/compare';

const adfFixture = loadFixture<Fixtures['adf']>('adf');
const kpssFixture = loadFixture<Fixtures['kpss']>('kpss');

describe('MOOR.ADF against statsmodels adfuller (adf.json)', () => {
  // The function has no maximum-lag argument, so only cases at the default maximum or with fixed lags apply.
  const cases = adfFixture.cases.filter((c) => c.maxLags === null || typeof c.lags === 'number');
  it(`reaches every deterministic option and lag rule through the function layer (${cases.length} cases)`, () => {
    expect(new Set(cases.map((c) => `${c.deterministic}/${typeof c.lags}`)).size).toBe(6);
    expect(cases.length).toBeGreaterThan(300);
  });
  for (const c of cases) {
    it(`${c.series} ${c.deterministic} lags=${c.lags}: p = ${c.pValue.toPrecision(4)}`, () => {
      const cells = column(fixtureSeries(adfFixture, c.series));
      const p = only(adf(cells, c.deterministic, c.lags, null)) as number;
      expect(Math.abs(p - c.pValue)).toBeLessThan(1e-6);
      const tau = only(adf(cells, c.deterministic.toUpperCase(), typeof c.lags === 'string' ? c.lags.toUpperCase() : c.lags, 'stat')) as number;
      expect(relative(tau, c.statistic)).toBeLessThan(1e-8);
    });
  }

  it('reads the same series laid out as a row', () => {
    const c = adfFixture.cases.find((k) => k.maxLags === null && k.lags === 'aic' && k.deterministic === 'const')!;
    const p = only(adf(row(fixtureSeries(adfFixture, c.series)))) as number;
    expect(Math.abs(p - c.pValue)).toBeLessThan(1e-6);
  });

  it('spills the labelled table with the fixture values in it', () => {
    const c = adfFixture.cases.find((k) => k.maxLags === null && k.lags === 'bic' && k.deterministic === 'trend')!;
    const table = adf(column(fixtureSeries(adfFixture, c.series)), 'trend', 'bic', 'all');
    expect(relative(tableValue(table, 'Statistic (tau)') as number, c.statistic)).toBeLessThan(1e-8);
    expect(Math.abs((tableValue(table, 'p-value') as number) - c.pValue)).toBeLessThan(1e-6);
    expect(tableValue(table, 'Lags')).toBe(c.usedLags);
    expect(tableValue(table, 'Observations in the test')).toBe(c.nobs);
    expect(tableValue(table, 'Critical value at 5%') as number).toBeCloseTo(c.critical['5%'], 10);
  });
});

describe('MOOR.KPSS against statsmodels kpss (kpss.json)', () => {
  // 'legacy' is statsmodels' old bandwidth rule, which Mooring does not offer.
  const cases = kpssFixture.cases.filter((c) => c.lags !== 'legacy');
  it(`covers the automatic and fixed bandwidths (${cases.length} cases)`, () => {
    expect(new Set(cases.map((c) => String(c.lags)))).toEqual(new Set(['auto', '0', '4', '10']));
  });
  for (const c of cases) {
    it(`${c.series} ${c.deterministic} bandwidth=${c.lags}: p = ${c.pValue}`, () => {
      const cells = column(fixtureSeries(kpssFixture, c.series));
      const p = only(kpss(cells, c.deterministic, c.lags, null)) as number;
      expect(Math.abs(p - c.pValue)).toBeLessThan(1e-6);
      const eta = only(kpss(cells, c.deterministic, c.lags, 'stat')) as number;
      expect(relative(eta, c.statistic)).toBeLessThan(1e-8);
    });
  }
  it('says in the table when the p-value is only a bound', () => {
    const c = cases.find((k) => k.pValueBeyondTable)!;
    const table = kpss(column(fixtureSeries(kpssFixture, c.series)), c.deterministic, c.lags, 'all');
    expect(String(tableValue(table, 'About the p-value'))).toMatch(/beyond the table/);
  });
});

describe('MOOR.PHILLIPSPERRON', () => {
  // Phillips & Perron (1988): with bandwidth 0 the long-run variance equals the short-run one,
  // so Z-tau is the Dickey-Fuller t of the lag-0 regression, which adf.json holds for lags = 0.
  const cases = adfFixture.cases.filter((c) => c.lags === 0);
  for (const c of cases) {
    it(`at bandwidth 0 equals the lag-0 Dickey-Fuller fixture: ${c.series} ${c.deterministic}`, () => {
      const cells = column(fixtureSeries(adfFixture, c.series));
      expect(relative(only(phillipsperron(cells, c.deterministic, 0, 'stat')) as number, c.statistic)).toBeLessThan(1e-8);
      expect(Math.abs((only(phillipsperron(cells, c.deterministic, 0)) as number) - c.pValue)).toBeLessThan(1e-6);
    });
  }
});

describe('MOOR.ORDER on series of known construction (tests/reference/README.md)', () => {
  it('a random walk is I(1), the running sum of one is I(2), an AR(1) with phi 0.5 is I(0)', () => {
    expect(order(column(fixtureSeries(adfFixture, 'rw_400')))).toEqual([[1]]);
    expect(order(column(fixtureSeries(adfFixture, 'i2_200')))).toEqual([[2]]);
    expect(order(column(fixtureSeries(adfFixture, 'ar1_phi050_250')), '5%', 'const')).toEqual([[0]]);
  });
});
