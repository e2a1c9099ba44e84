import { describe, expect, it } from 'vitest';
import { integrationOrder } from '../../addin/unitroot/integration-order';
import { SeededRandom, autoregressive1, randomWalk } from '../../addin/random';
import { MooringInputError } from '../../addin/errors';

function cumulate(x: ArrayLike<number>): Float64Array {
  const out = new Float64Array(x.length);
  let s = 0;
  for (let i = 0; i < x.length; i++) out[i] = s += x[i];
  return out;
}

describe('integration order, tested from the highest order down (Pantula 1989)', () => {
  const rng = new SeededRandom(314);
  it('a stationary AR(1) (phi 0.5, T 400) is I(0)', () => {
    const r = integrationOrder(autoregressive1(rng, 400, 0.5), {}, 'Storage spread');
    expect(r.order).toBe(0);
    expect(r.verdict).toMatch(/Storage spread is stationary/);
    expect(r.steps.map((s) => s.differences)).toEqual([2, 1, 0]);
  });
  it('a random walk (T 400) is I(1), and ADF and KPSS agree', () => {
    const r = integrationOrder(randomWalk(rng, 400, { start: 80 }), {}, 'Crude');
    expect(r.order).toBe(1);
    expect(r.agree).toBe(true);
    expect(r.steps.map((s) => s.differences)).toEqual([2, 1, 0]);
  });
  it('a cumulated random walk (T 400) is I(2)', () => {
    const r = integrationOrder(cumulate(randomWalk(rng, 400)), {}, 'Stock');
    expect(r.order).toBe(2);
    expect(r.steps.map((s) => s.differences)).toEqual([2, 1]);
  });
  it('a twice-cumulated random walk is above 2', () => {
    const r = integrationOrder(cumulate(cumulate(randomWalk(rng, 400))));
    expect(r.order).toBe('above 2');
  });
  it('refuses fewer than 20 usable observations with a message saying how many are needed', () => {
    expect(() => integrationOrder(randomWalk(rng, 15), {}, 'Short')).toThrow(MooringInputError);
    expect(() => integrationOrder(randomWalk(rng, 15), {}, 'Short')).toThrow(/Short has 15 usable observations.*at least 22/);
  });
  it('refuses a significance level outside (0, 0.5)', () => {
    expect(() => integrationOrder(randomWalk(rng, 100), { alpha: 5 })).toThrow(/significance level/);
  });
});

describe('integration order starting at the first differences (the lead-lag tests use it)', () => {
  const rng = new SeededRandom(2718);
  const cases: [string, () => Float64Array][] = [
    ['a stationary AR(1)', () => autoregressive1(rng, 400, 0.5)],
    ['a random walk', () => randomWalk(rng, 400, { start: 80 })],
    ['a cumulated walk', () => cumulate(randomWalk(rng, 400))],
    ['a twice-cumulated walk', () => cumulate(cumulate(randomWalk(rng, 400)))],
  ];
  for (const [label, make] of cases) {
    it(`${label}: the same order and agreement as Pantula's order from the top`, () => {
      const x = make();
      const top = integrationOrder(x);
      const fromFirst = integrationOrder(x, { highestDifference: 1 });
      expect(fromFirst.order).toBe(top.order);
      expect(fromFirst.agree).toBe(top.agree);
    });
  }
  it('skips the second differences for an I(1) series', () => {
    const r = integrationOrder(randomWalk(rng, 400), { highestDifference: 1 });
    expect(r.steps.map((s) => s.differences)).toEqual([1, 0]);
  });
});
