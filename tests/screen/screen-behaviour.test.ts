import { describe, expect, it } from 'vitest';
import { MooringInputError } from '../../addin/errors';
import { screenPairs } from '../../addin/screen/screen-pairs';
import { generatedUniverse } from './generated-universe';

/** Every number anywhere inside a value, for the "never NaN" check. */
function numbersIn(value: unknown): number[] {
  if (typeof value === 'number') return [value];
  if (Array.isArray(value)) return value.flatMap(numbersIn);
  if (value && typeof value === 'object') return Object.values(value).flatMap(numbersIn);
  return [];
}

const universe = generatedUniverse(21, { clusters: 2, perCluster: 3, walks: 3, T: 300 });

describe('screen ranking, filters and family', () => {
  const all = screenPairs(universe.series);

  it('ranks by p-value, smallest first, ties by the more negative tau', () => {
    for (let k = 1; k < all.pairs.length; k++) {
      const a = all.pairs[k - 1];
      const b = all.pairs[k];
      expect(a.pValue <= b.pValue).toBe(true);
      if (a.pValue === b.pValue) expect((a.statistic ?? -Infinity) <= (b.statistic ?? -Infinity)).toBe(true);
    }
  });

  it('adjusts over the family of every directed pair tested: 9 series give 72, and the family says so', () => {
    expect(all.family.size).toBe(72);
    expect(all.family.description).toContain('every directed pair tested (72 of the 72 ordered pairs of 9 series');
    expect(all.discoveries).toBe(all.pairs.filter((p) => p.adjustedPValue <= 0.05).length);
    expect(all.rawPasses).toBe(all.pairs.filter((p) => p.pValue <= 0.05).length);
    expect(all.chanceSentence).toContain('Of 72 directed pairs tested at 5%');
    expect(all.chanceSentence).toContain('about 4 would pass by chance alone');
  });

  it('applies the half-life range after the adjustment: kept pairs carry the same numbers as without the range', () => {
    const filtered = screenPairs(universe.series, { minHalfLife: 1, maxHalfLife: 3 });
    expect(filtered.pairs.length).toBeGreaterThan(0);
    expect(filtered.pairs.length).toBeLessThan(all.pairs.length);
    const before = new Map(all.pairs.map((p) => [`${p.y}|${p.x}`, p] as const));
    for (const p of filtered.pairs) {
      expect(p.halfLife as number).toBeGreaterThanOrEqual(1);
      expect(p.halfLife as number).toBeLessThanOrEqual(3);
      expect(p).toEqual(before.get(`${p.y}|${p.x}`));
    }
    expect(filtered.matrix).toEqual(all.matrix);
    expect(filtered.cautions.join(' ')).toMatch(/The half-life range keeps \d+ of the 72 tested pairs/);
  });

  it('at a lower level reports fewer discoveries and the level in the sentence', () => {
    const strict = screenPairs(universe.series, { alpha: 0.01 });
    expect(strict.discoveries).toBeLessThanOrEqual(all.discoveries);
    expect(strict.chanceSentence).toContain('tested at 1%');
    expect(strict.pairs.map((p) => p.pValue)).toEqual(all.pairs.map((p) => p.pValue));
  });

  it('leaves out pairs with too few shared rows, lists them, and keeps them out of the family', () => {
    // Series 0 has prices on rows 0..149 only, series 1 on rows 110..299 only: 40 shared rows,
    // while each has enough rows of its own for its order of integration.
    const short = universe.series.map((s, j) => ({
      name: s.name,
      values: Array.from(s.values, (v, t) => ((j === 0 && t >= 150) || (j === 1 && t < 110) ? null : v)),
    }));
    const result = screenPairs(short, { minObservations: 60 });
    expect(result.orders[0].order).toBe(1);
    expect(result.orders[1].order).toBe(1);
    expect(result.untested).toEqual([
      { y: 'c0m0', x: 'c0m1', reason: 'only 40 shared rows (the minimum is 60)' },
      { y: 'c0m1', x: 'c0m0', reason: 'only 40 shared rows (the minimum is 60)' },
    ]);
    expect(result.family.size).toBe(72 - 2 - result.setAside.length);
    expect(result.matrix[0][1]).toBeNull();
    expect(result.matrix[1][0]).toBeNull();
    expect(result.cautions.join(' ')).toContain('2 directed pairs were not tested');
  });

  it('reports an exact copy up to scale as p = 0 with a note, and sets aside the pairs of a series that never moves', () => {
    const base = universe.series[6].values;
    const result = screenPairs([
      { name: 'A', values: base },
      { name: 'B', values: base.map((v) => 2 * v + 1) },
      { name: 'Flat', values: base.map(() => 7) },
    ]);
    expect(result.pairs).toHaveLength(2);
    expect(result.pairs[0].pValue).toBe(0);
    expect(result.pairs[0].statistic).toBeNull();
    expect(result.pairs[0].note).toMatch(/exact multiple/);
    expect(result.orders[2]).toEqual({ name: 'Flat', order: null, orderText: null, agree: null, note: 'Flat does not move' });
    expect(result.untested).toEqual([]);
    expect(result.setAside.map((u) => [u.y, u.x])).toEqual([['A', 'Flat'], ['Flat', 'A'], ['B', 'Flat'], ['Flat', 'B']]);
    expect(result.setAside.map((u) => u.reason)).toEqual(
      Array(4).fill('the order of integration of Flat could not be decided (Flat does not move): a pair needs two wandering series of the same order'),
    );
  });

  it('never carries NaN: every number in the answer is finite or absent', () => {
    expect(numbersIn(all).every((v) => Number.isFinite(v))).toBe(true);
    expect(JSON.stringify(all)).not.toContain('NaN');
  });
});

describe('screen refuses bad input with MooringInputError', () => {
  const [a, b] = universe.series;
  it.each([
    ['one series', [a], {}, /at least two series/],
    ['a repeated name', [a, { name: a.name.toUpperCase(), values: b.values }], {}, /both named/],
    ['a nameless series', [a, { name: ' ', values: b.values }], {}, /Series 2 has no name/],
    ['unequal lengths', [a, { name: 'b', values: b.values.subarray(1) }], {}, /has 299 rows but 'c0m0' has 300/],
    ['an infinite value', [a, { name: 'b', values: Array.from(b.values, (v, t) => (t === 5 ? Infinity : v)) }], {}, /Infinity at row 6/],
    ['text in a series', [a, { name: 'b', values: Array.from(b.values, (v, t) => (t === 9 ? ('n/a' as unknown as number) : v)) }], {}, /n\/a at row 10/],
    ['a level of 0.7', [a, b], { alpha: 0.7 }, /between 0 and 0.5/],
    ['a minimum of 5 observations', [a, b], { minObservations: 5 }, /at least 10/],
    ['a maximum lag the shortest pair cannot take', [a, b], { maxLags: 40 }, /needs at least 82 shared observations/],
    ['a fixed lag with a maximum', [a, b], { lags: 2, maxLags: 4 }, /applies only when a rule/],
    ['an unknown lag rule', [a, b], { lags: 'hq' as never }, /Unknown lag rule 'hq'/],
    ['a half-life range upside down', [a, b], { minHalfLife: 10, maxHalfLife: 2 }, /above the maximum/],
    ['a negative half-life', [a, b], { maxHalfLife: -1 }, /0 or more/],
  ])('%s', (_label, series, options, message) => {
    expect(() => screenPairs(series as never, options as never)).toThrow(MooringInputError);
    expect(() => screenPairs(series as never, options as never)).toThrow(message);
  });
});
