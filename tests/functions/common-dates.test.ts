/**
 * MOOR.COMMONDATES: two ranges on different calendars joined on their shared dates. The
 * prices are the demo data (Mooring's own seeded generator); dates arrive as spreadsheet
 * serial day numbers (Microsoft, "Date systems in Excel": days since 30 December 1899), one
 * range newest first. The join is computed here independently, and MOOR.ENGLEGRANGER on the
 * spilled columns must equal it on the join.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { commondates, englegranger } from '../../functions/functions';

const demo = readFileSync(new URL('../../addin/demo/data/quennel-delta.csv', import.meta.url), 'utf8').trim().split('\n').slice(1).map((l) => l.split(','));
const serial = (iso: string) => Date.UTC(+iso.slice(0, 4), +iso.slice(5, 7) - 1, +iso.slice(8, 10)) / 86_400_000 + 25569;
const a = demo.filter((_, i) => i % 6 !== 2).map((r) => [serial(r[0]), Number(r[1])]);
const b = demo.filter((_, i) => i % 9 !== 4 && i > 10).map((r) => [serial(r[0]), Number(r[2])]);

describe('MOOR.COMMONDATES', () => {
  it('spills the dates both ranges have, oldest first, with each price beside them', () => {
    const inB = new Map(b.map((r) => [r[0], r[1]]));
    const expected = a.filter((r) => inB.has(r[0])).map((r) => [r[0], r[1], inB.get(r[0])]);
    const block = commondates(a, b.slice().reverse());
    expect(block).toEqual(expected);
    const y = expected.map((r) => [r[1]]);
    const x = expected.map((r) => [r[2]]);
    expect(englegranger(block.map((r) => [r[1]]), block.map((r) => [r[2]]), undefined, undefined, 'all')).toEqual(englegranger(y, x, undefined, undefined, 'all'));
  });

  it('carries a price over at most fillforward missing dates', () => {
    const block = commondates(a, b, 1);
    const inA = new Set(a.map((r) => r[0]));
    const inB = new Set(b.map((r) => r[0]));
    const all = demo.map((r) => serial(r[0])).filter((d) => (inA.has(d) || inB.has(d)) && d >= b[0][0]);
    expect(block.map((r) => r[0])).toEqual(all);
  });

  it('reads text dates too, and refuses a repeated date naming its row', () => {
    const text = a.slice(0, 40).map((r, i) => [demo[i + Math.floor(i / 5)][0], r[1]]);
    expect(() => commondates([...a.slice(0, 5), a[4], ...a.slice(5)], b)).toThrow();
    try {
      commondates([...a.slice(0, 5), a[4], ...a.slice(5)], b);
    } catch (e) {
      expect((e as { message: string }).message).toMatch(/^First row 6 \(\d{4}-\d{2}-\d{2}\) repeats the date of first row 5/);
    }
    expect(() => commondates(text, b)).not.toThrow();
  });
});
