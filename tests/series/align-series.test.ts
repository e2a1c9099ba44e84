import { describe, expect, it } from 'vitest';
import { MooringInputError } from '../../addin/errors';
import { alignAll, alignSeries } from '../../addin/series/align-series';
import { cleanBlock } from '../../addin/series/clean-block';
import { cleanSeries } from '../../addin/series/clean-series';

const ramp = (n: number, from = 10, step = 0.7) => Array.from({ length: n }, (_, i) => from + i * step + Math.sin(i));

function refusal(fn: () => unknown): string {
  try {
    fn();
  } catch (e) {
    expect(e).toBeInstanceOf(MooringInputError);
    return (e as Error).message;
  }
  throw new Error('expected a MooringInputError, but the input was accepted');
}

describe('alignSeries', () => {
  it('equal ranges without gaps pass through untouched', () => {
    const a = cleanSeries(ramp(30), { name: 'Crude' });
    const b = cleanSeries(ramp(30, 50), { name: 'Brent' });
    const [x, y] = alignSeries(a, b);
    expect(x).toBe(a);
    expect(y).toBe(b);
  });

  it('unequal lengths: says which is longer and by how many', () => {
    const a = cleanSeries(ramp(250), { name: 'Crude' });
    const b = cleanSeries(ramp(245), { name: 'Brent' });
    expect(refusal(() => alignSeries(a, b))).toBe(
      'Crude has 250 values and Brent has 245: Crude is longer than Brent by 5; select ranges covering the same rows, or allow gaps to keep only the rows both have.');
    expect(refusal(() => alignSeries(b, a))).toMatch(/^Brent has 245 values and Crude has 250: Crude is longer than Brent by 5;/);
  });

  it('equal lengths that start on different rows are refused', () => {
    const a = cleanSeries(['', '', ...ramp(30)], { name: 'Crude' });
    const b = cleanSeries([...ramp(30), '', ''], { name: 'Brent' });
    expect(refusal(() => alignSeries(a, b))).toBe(
      'Crude starts at row 3 but Brent at row 1, so their rows do not line up; select ranges whose numbers start on the same row, or allow gaps.');
  });

  it('with gaps allowed, keeps only the rows present in both and records what each lost', () => {
    const ca: unknown[] = ramp(30);
    const cb: unknown[] = ramp(30, 50);
    ca[4] = '#N/A';
    cb[10] = '';
    cb[11] = 'n/a';
    const a = cleanSeries(ca, { name: 'Crude', skipGaps: true });
    const b = cleanSeries(cb, { name: 'Brent', skipGaps: true });
    const [x, y] = alignSeries(a, b);
    expect(x.values.length).toBe(27);
    expect(y.values.length).toBe(27);
    expect(Array.from(x.rows)).toEqual(Array.from(y.rows));
    expect(Array.from(x.rows)).not.toContain(4);
    expect(Array.from(x.rows)).not.toContain(10);
    expect(x.values[9]).toBe(ca[12]); // kept rows 0-3, 5-9, 12-29: position 9 is row index 12
    expect(y.values[9]).toBe(cb[12]);
    expect(x.dropped.map((d) => [d.row, d.reason])).toEqual([
      ['row 5', 'the error #N/A'],
      ['row 11', 'Brent has no value in this row'],
      ['row 12', 'Brent has no value in this row'],
    ]);
    expect(y.dropped.map((d) => d.row)).toEqual(['row 5', 'row 11', 'row 12']);
  });

  it('with gaps allowed, too few shared rows are refused', () => {
    const a = cleanSeries([...ramp(25), '', '', '', '', ''], { name: 'Crude', skipGaps: true });
    const b = cleanSeries(['', '', '', '', '', '', '', '', '', '', ...ramp(20)], { name: 'Brent', skipGaps: true });
    expect(refusal(() => alignSeries(a, b))).toBe(
      'Crude and Brent have values in the same rows only 15 times; at least 20 shared rows are needed: fill the gaps or select a longer history.');
  });
});

describe('cleanBlock', () => {
  it('cleans and aligns several columns with their names', () => {
    const c1: unknown[] = ramp(40);
    c1[7] = 'n/a';
    const block = cleanBlock([c1, ramp(40, 5), ramp(40, 90)], ['A', 'B', 'C'], { skipGaps: true });
    expect(block.map((s) => s.name)).toEqual(['A', 'B', 'C']);
    for (const s of block) {
      expect(s.values.length).toBe(39);
      expect(Array.from(s.rows)).not.toContain(7);
    }
  });

  it('names the series that fails, with default names where none are given', () => {
    const bad: unknown[] = ramp(30);
    bad[3] = true;
    expect(refusal(() => cleanBlock([ramp(30), bad]))).toBe('series 2 row 4 is the logical value TRUE: clean it or allow gaps.');
  });

  it('refuses an empty block and surplus names', () => {
    expect(refusal(() => cleanBlock([]))).toMatch(/^The block holds no columns/);
    expect(refusal(() => cleanBlock([ramp(30)], ['A', 'B']))).toBe('2 names were given for 1 column: give one name per column.');
  });

  it('alignAll of a single series returns it', () => {
    const a = cleanSeries(ramp(30));
    expect(alignAll([a])).toEqual([a]);
  });
});
