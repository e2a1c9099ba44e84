/**
 * MOOR.LEVELBOUNDS, MOOR.RELATIONIS and MOOR.ADJUSTS give the engine's numbers (the bounds test
 * checked against statsmodels in tests/ardl; the restriction tests in tests/johansen), read
 * through the cell cleaner, and refuse bad options in words.
 */
import { describe, expect, it } from 'vitest';
import { ardlBoundsTest } from '../../addin/ardl/bounds-test';
import { betaRestrictionTest, exogeneityTests } from '../../addin/johansen/restrictions';
import { johansenTest } from '../../addin/johansen/johansen';
import * as moor from '../../functions/functions';
import { loadFixture } from '../reference/fixtures';
import { cellErrorOf } from './cell-shapes';

const fixture = loadFixture<{ series: Record<string, number[]> }>('ardl-bounds');
const y = fixture.series.ardl_y;
const x = fixture.series.ardl_x1;
const col = (v: number[]) => v.map((n) => [n]);
const block = y.map((v, i) => [v, x[i]]);

describe('the long-run formulas', () => {
  it('MOOR.LEVELBOUNDS: headline is the p-value with x wandering, stat is F, as the engine gives them', () => {
    const engine = ardlBoundsTest(y, [x], { case: 3, lags: { fixed: 2 }, order: [{ fixed: 1 }] });
    expect(moor.levelbounds(col(y), col(x), 3, 2, 1)[0][0]).toBe(engine.pValue!.upper);
    expect(moor.levelbounds(col(y), col(x), 3, 2, 1, 'stat')[0][0]).toBe(engine.fTest.statistic);
    const table = moor.levelbounds(col(y), col(x), 3, 2, 1, 'all') as unknown[][];
    expect(table.some((r) => r[0] === 'Bounds from' && r[1] === engine.criticalSource)).toBe(true);
  });
  it('MOOR.RELATIONIS and MOOR.ADJUSTS: the engine\'s LR p-values', () => {
    expect(moor.relationis(block, [[1, -0.8]])[0][0]).toBe(betaRestrictionTest([y, x], [1, -0.8]).pValue);
    const rank = Math.max(1, johansenTest([y, x]).rank.trace);
    const exo = exogeneityTests([y, x], { rank: Math.min(rank, 1) });
    expect(moor.adjusts(block, 1)[0][0]).toBe(exo[0].pValue);
    expect(moor.adjusts(block, 2, null, null, 'stat')[0][0]).toBe(exo[1].statistic);
  });
  it('bad options are refused with a message', () => {
    expect(cellErrorOf(() => moor.levelbounds(col(y), col(x), 7), '#VALUE!')).toMatch(/case must be 1 to 5/);
    expect(cellErrorOf(() => moor.adjusts(block, 3), '#VALUE!')).toMatch(/1 to 2/);
    expect(cellErrorOf(() => moor.relationis(block, [[1, 'a']]), '#VALUE!')).toMatch(/weights must be numbers/);
  });
});
