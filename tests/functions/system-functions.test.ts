/**
 * MOOR.JOHANSEN, MOOR.RANK, MOOR.GRANGER and MOOR.VARLAGS called with cell ranges, against
 * statsmodels 0.13.5 (tests/reference/fixtures/): coint_johansen (johansen.json; statistics to
 * 1e-8 relative, floor 1; for K = 0 the fixture's levelLagOne numbers, because the library pairs
 * the change with the current level there, as tests/johansen/johansen-reference.test.ts explains), grangercausalitytests (granger.json; F to 1e-8 relative, p-values 1e-8) and
 * VAR select_order (var-select.json; chosen orders exactly).
 */
import { describe, expect, it } from 'vitest';
import { granger, johansen, rank, varlags } from '../../functions/functions';
import { fixtureSeries, loadFixture, type Fixtures } from '../reference/fixtures';
import { SeededRandom, randomWalk } from '../../addin/random';
import { block, column, only, tableValue } from './cell-shapes';

const relative = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);
/** Relative difference with a floor of 1, as the engine's Johansen reference test uses for the smallest statistics. */
const difference = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1);

describe('MOOR.JOHANSEN and MOOR.RANK against statsmodels coint_johansen (johansen.json)', () => {
  const fixture = loadFixture<Fixtures['johansen']>('johansen');
  for (const c of fixture.cases) {
    const range = block(c.series.map((id) => fixtureSeries(fixture, id)));
    const expected = c.lagDiffs === 0 ? c.levelLagOne : c;
    it(`${c.series.join(', ')}, ${c.deterministic}, K = ${c.lagDiffs}: trace statistics and the rank`, () => {
      expect(difference(only(johansen(range, c.lagDiffs, c.deterministic, 'stat')) as number, expected.trace[0])).toBeLessThan(1e-8);
      const table = johansen(range, c.lagDiffs, c.deterministic, 'all');
      expected.trace.forEach((t, r) => expect(difference(tableValue(table, `Trace statistic, at most ${r} relations`) as number, t)).toBeLessThan(1e-8));
      expected.maxEigen.forEach((t, r) => expect(difference(tableValue(table, `Maximum-eigenvalue statistic, at most ${r} relations`) as number, t)).toBeLessThan(1e-8));
      expect(tableValue(table, 'Observations in the test')).toBe(expected.nobs);
      expect(tableValue(table, 'Critical value at 5%')).toBe(c.traceCritical[0]['5%']);
      // The sequential rank by the fixture's own 5% critical values, where no statistic sits within 5% of its value.
      const nearBorder = expected.trace.some((t, r) => Math.abs(t - c.traceCritical[r]['5%']) < 0.05 * c.traceCritical[r]['5%']);
      if (!nearBorder) {
        const first = expected.trace.findIndex((t, r) => t <= c.traceCritical[r]['5%']);
        expect(rank(range, c.lagDiffs, c.deterministic)).toBe(first < 0 ? expected.trace.length : first);
      }
    });
  }
  it('the rank check above applies to most cases (those with no statistic near its 5% value)', () => {
    const clear = fixture.cases.filter((c) => {
      const e = c.lagDiffs === 0 ? c.levelLagOne : c;
      return !e.trace.some((t, r) => Math.abs(t - c.traceCritical[r]['5%']) < 0.05 * c.traceCritical[r]['5%']);
    });
    expect(clear.length).toBeGreaterThanOrEqual(25);
  });
  it('the sys3 system was built with one long-run relation (tests/reference/README.md) and RANK finds it', () => {
    const range = block(['sys3_y1', 'sys3_y2', 'sys3_y3'].map((id) => fixtureSeries(fixture, id)));
    expect(rank(range)).toBe(1);
    expect(rank(range, 1, 'CONSTANT', '1%')).toBe(1);
    expect(only(johansen(range)) as number).toBeLessThan(0.01);
  });
});

describe('MOOR.GRANGER against statsmodels grangercausalitytests (granger.json)', () => {
  // The fixture pairs are stationary (a simulated VAR(2) and US growth rates), so method f runs
  // Granger's F test on the values, which is what grangercausalitytests computes.
  const fixture = loadFixture<Fixtures['granger']>('granger');
  for (const c of fixture.cases) {
    for (const ref of c.lags) {
      it(`${c.cause} leads ${c.effect}? F test, ${ref.lag} lags: p = ${ref.pValue.toPrecision(3)}`, () => {
        const cause = column(fixtureSeries(fixture, c.cause));
        const effect = column(fixtureSeries(fixture, c.effect));
        const p = only(granger(cause, effect, ref.lag, 'f')) as number;
        expect(Math.abs(p - ref.pValue)).toBeLessThan(1e-8);
        // Far in the tail the distribution functions differ in their last digits; compare relatively where p is not tiny.
        if (ref.pValue > 1e-6) expect(relative(p, ref.pValue)).toBeLessThan(1e-6);
        expect(relative(only(granger(cause, effect, ref.lag, 'F', 'stat')) as number, ref.fStatistic)).toBeLessThan(1e-8);
      });
    }
  }
  it('with method auto says which test it chose and why, and reports both directions', () => {
    const c = fixture.cases[0];
    const cause = column(fixtureSeries(fixture, c.cause));
    const effect = column(fixtureSeries(fixture, c.effect));
    const table = granger(cause, effect, 2, null, 'all');
    expect(String(tableValue(table, 'Why this test'))).toMatch(/valid/);
    expect(String(tableValue(table, 'Orders of integration (cause, effect)'))).toMatch(/tested/);
    expect(tableValue(table, 'p-value, cause leads effect')).toBe(tableValue(table, 'p-value'));
    expect(only(granger(cause, effect, 2))).toBe(tableValue(table, 'p-value'));
    // The reverse direction is the forward direction of the swapped pair.
    expect(tableValue(table, 'p-value, effect leads cause')).toBe(only(granger(effect, cause, 2)));
  });
  it('on two random walks method f tests their changes: the same as the F test on the differenced cells', () => {
    const rng = new SeededRandom(23);
    const x = Array.from(randomWalk(rng, 400));
    const y = Array.from(randomWalk(rng, 400));
    const diff = (v: number[]) => v.slice(1).map((u, i) => u - v[i]);
    const onChanges = granger(column(x), column(y), 2, 'f', 'all');
    expect(String(tableValue(onChanges, 'Test'))).toMatch(/on changes/);
    expect(tableValue(onChanges, 'p-value')).toBeCloseTo(only(granger(column(diff(x)), column(diff(y)), 2, 'f')) as number, 12);
  });
});

describe('MOOR.VARLAGS against statsmodels select_order (var-select.json)', () => {
  const fixture = loadFixture<Fixtures['var-select']>('var-select');
  for (const c of fixture.cases) {
    it(`${c.series.join(', ')} up to ${c.maxLags} lags: ${JSON.stringify(c.selected)}`, () => {
      const range = block(c.series.map((id) => fixtureSeries(fixture, id)));
      expect(varlags(range, null, c.maxLags)).toBe(c.selected.aic);
      expect(varlags(range, 'bic', c.maxLags)).toBe(c.selected.bic);
      expect(varlags(range, 'HQ', c.maxLags)).toBe(c.selected.hq);
      expect(varlags(range, 'fpe', String(c.maxLags))).toBe(c.selected.fpe);
    });
  }
});
