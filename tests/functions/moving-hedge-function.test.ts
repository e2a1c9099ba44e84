/**
 * MOOR.MOVINGHEDGE: the engine's moving hedge ratio spilled beside the prices, its columns by
 * show, its variances given or estimated, and its refusals. Reference: the statsmodels fixture
 * kalman.json (filtered and smoothed slope with fixed variances, to 1e-7).
 */
import { describe, expect, it } from 'vitest';
import { movingHedge } from '../../addin/kalman/moving-hedge';
import { movinghedge } from '../../functions/functions';
import { fixtureSeries, loadFixture, type Fixtures } from '../reference/fixtures';
import { cellErrorOf, column, row } from './cell-shapes';

const fixture = loadFixture<Fixtures['kalman']>('kalman');
const c = fixture.cases.find((k) => k.kind === 'fixed' && k.y === 'pair_y')!;
const Y = fixtureSeries(fixture, 'pair_y');
const X = fixtureSeries(fixture, 'pair_x');

describe('MOOR.MOVINGHEDGE', () => {
  it('with the variances given spills statsmodels\' filtered slope (1e-7), empty in the first set-up row', () => {
    const out = movinghedge(column(Y), column(X), null, c.stateVar, c.obsVar);
    expect(out).toHaveLength(Y.length);
    expect(out[0][0]).toBe('');
    for (let t = 1; t < Y.length; t++) expect(Math.abs((out[t][0] as number) - c.filteredSlope![t])).toBeLessThan(1e-7);
    const smoothed = movinghedge(column(Y), column(X), 'smoothed', c.stateVar, c.obsVar);
    for (let t = 0; t < Y.length; t++) expect(Math.abs((smoothed[t][0] as number) - c.smoothedSlope![t])).toBeLessThan(1e-7);
  });

  it('estimates the variances when both are left out: the engine\'s path; all gives six columns in the documented order', () => {
    const engine = movingHedge(Y, X, { y: 'y', x: 'x' });
    const all = movinghedge(column(Y), column(X), 'all');
    expect(all[5]).toEqual([engine.beta[5], engine.betaStd[5], engine.betaSmoothed[5], engine.betaSmoothedStd[5], engine.spread[5], engine.spreadStandardised[5]]);
    expect(all[1].slice(4)).toEqual(['', '']);
    expect(movinghedge(column(Y), column(X), 'zscore')[9][0]).toBe(engine.spreadStandardised[9]);
  });

  it('follows a row input with a row', () => {
    const out = movinghedge(row(Y), row(X), 'spread', c.stateVar, c.obsVar);
    expect(out).toHaveLength(1);
    expect(out[0]).toHaveLength(Y.length);
  });

  it('refuses one variance alone and an unknown show word, saying what works', () => {
    expect(cellErrorOf(() => movinghedge(column(Y), column(X), null, 1e-4), '#VALUE!')).toMatch(/both variances/);
    expect(cellErrorOf(() => movinghedge(column(Y), column(X), 'path'), '#VALUE!')).toMatch(/ratio, smoothed, spread, zscore, all/);
  });
});
