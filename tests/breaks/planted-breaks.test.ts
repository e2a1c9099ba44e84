import { describe, expect, it } from 'vitest';
import { gregoryHansenTest } from '../../addin/breaks/gregory-hansen';
import { zivotAndrewsTest } from '../../addin/breaks/zivot-andrews';
import { SeededRandom, autoregressive1, randomWalk } from '../../addin/random';

/**
 * Planted breaks: series built with a known break date, from stated seeds. The tolerances
 * come from a wider run of the same designs (50 seeds for Zivot-Andrews, 30 per model for
 * Gregory-Hansen), whose largest errors were 10 rows of 300 and 14 rows of 600.
 */
describe('Zivot-Andrews locates a planted level break in a stationary series', () => {
  // x_t = 10 + 3 [t >= 180] + u_t, u AR(1) with phi = 0.5 and unit shocks, T = 300.
  const T = 300;
  const truth = 180;
  const errors: number[] = [];
  const verdicts: boolean[] = [];
  for (let seed = 501; seed <= 520; seed++) {
    const u = autoregressive1(new SeededRandom(seed), T, 0.5);
    const x = u.map((e, t) => 10 + (t >= truth ? 3 : 0) + e);
    const r = zivotAndrewsTest(x, { model: 'level' });
    errors.push(r.breakAt.firstAfter - truth);
    verdicts.push(r.statistic < r.critical['5%']);
  }
  it('seeds 501-520: every date within 4% of the sample (12 rows) of row 180', () => {
    for (const e of errors) expect(Math.abs(e)).toBeLessThanOrEqual(12);
  });
  it('seeds 501-520: at least 18 of 20 dates within 1% of the sample (3 rows)', () => {
    expect(errors.filter((e) => Math.abs(e) <= 3).length).toBeGreaterThanOrEqual(18);
  });
  it('seeds 501-520: the unit root is rejected at 5% every time', () => {
    expect(verdicts.every(Boolean)).toBe(true);
  });
  it('names the date through rowLabel in the verdict (seed 501)', () => {
    const u = autoregressive1(new SeededRandom(501), T, 0.5);
    const x = u.map((e, t) => 10 + (t >= truth ? 3 : 0) + e);
    const r = zivotAndrewsTest(x, { model: 'level', rowLabel: (i) => `day ${i} (row ${i + 2})` }, 'Spread');
    expect(r.breakAt.label).toBe(`day ${r.breakAt.firstAfter} (row ${r.breakAt.firstAfter + 2})`);
    expect(r.verdict).toContain(`around ${r.breakAt.label}`);
    expect(r.verdict.startsWith('Spread looks stationary')).toBe(true);
  });
});

describe('Gregory-Hansen locates a planted shift in a cointegrating relation', () => {
  // x a random walk from 50; y = 1 + 2x + e before row 300 and 3 + 2x + e from row 300, e N(0, 1), T = 600.
  const T = 600;
  const truth = 300;
  function pair(seed: number): { x: Float64Array; y: Float64Array } {
    const rng = new SeededRandom(seed);
    const x = randomWalk(rng, T, { start: 50 });
    const y = x.map((v, t) => (t < truth ? 1 : 3) + 2 * v + rng.normal());
    return { x, y };
  }
  it('level model, seeds 701-708: rejects at 5% and every date within 3% of the sample (18 rows) of row 300', () => {
    for (let seed = 701; seed <= 708; seed++) {
      const { x, y } = pair(seed);
      const r = gregoryHansenTest(y, [x], { model: 'level' }, { y: 'A', xs: ['B'] });
      expect(r.statistic).toBeLessThan(r.critical['5%']);
      expect(Math.abs(r.breakAt.firstAfter - truth)).toBeLessThanOrEqual(18);
    }
  });
  it('level model, seed 701: the shift in intercept near 2 (within 0.3) and the slope near 2 (within 0.02)', () => {
    // The intercepts themselves carry the slope's error times the level of x (about 50), so the
    // shift between them is the sharper check.
    const { x, y } = pair(701);
    const r = gregoryHansenTest(y, [x], { model: 'level' }, { y: 'A', xs: ['B'] });
    expect(Math.abs(r.relation.interceptAfter - r.relation.interceptBefore - 2)).toBeLessThan(0.3);
    expect(Math.abs(r.relation.slopesBefore[0] - 2)).toBeLessThan(0.02);
    expect(r.relation.slopesAfter[0]).toBe(r.relation.slopesBefore[0]);
    expect(r.verdict).toContain('The relation between A and B appears to shift around row');
    expect(r.verdict).toContain('can shift again');
  });
  for (const model of ['level-trend', 'regime'] as const) {
    it(`${model} model, seed 702: rejects at 5% and the date within 18 rows of row 300`, () => {
      const { x, y } = pair(702);
      const r = gregoryHansenTest(y, [x], { model });
      expect(r.statistic).toBeLessThan(r.critical['5%']);
      expect(Math.abs(r.breakAt.firstAfter - truth)).toBeLessThanOrEqual(18);
    });
  }
});
