/**
 * MOOR.SCREEN with a header row, and its set-aside pairs. The evidence is agreement with the
 * engine and the command line on the same prices: the demo data (addin/demo/data/
 * quennel-delta.csv, our seeded generator's file) in natural logs, handed over as Excel hands a
 * table reference with its headers (Table[#All]: the header row of text, then the numbers), must
 * give the pairs, p-values and set-aside pairs of screenPairs on the same columns, named after
 * the headers. TankPremium settles around its own mean (order 0), so its pairs are set aside
 * after the ranking, each with its reason, as `mooring screen --log` does.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { screenPairs } from '../../addin/screen/screen-pairs';
import { screen } from '../../functions/functions';
import { SCREEN_LIST_HEADER, SET_ASIDE_MARK } from '../../functions/render/screen-table';
import { block, cellErrorOf } from './cell-shapes';

const lines = readFileSync(new URL('../../addin/demo/data/quennel-delta.csv', import.meta.url), 'utf8').trim().split('\n');
const headers = lines[0].split(',').slice(1);
/** Each demo column in natural logs, as cells. */
const columns = headers.map((_, j) => lines.slice(1).map((l) => Math.log(Number(l.split(',')[j + 1]))));
const withHeader = [headers, ...block(columns)];
const engine = screenPairs(headers.map((name, j) => ({ name, values: columns[j] })));

describe('MOOR.SCREEN takes the series names from a header row', () => {
  const list = screen(withHeader) as (number | string)[][];
  const ranked = list.slice(1, 1 + engine.pairs.length);

  it('names the pairs after the header cells, and equals the engine on the same named columns', () => {
    expect(list[0]).toEqual([...SCREEN_LIST_HEADER]);
    expect(ranked).toHaveLength(20);
    ranked.forEach((r, k) => {
      const p = engine.pairs[k];
      expect([r[0], r[1]]).toEqual([p.y, p.x]);
      expect(headers).toContain(r[0]);
      expect(r[2]).toBe(p.pValue);
      expect(r[3]).toBe(p.adjustedPValue);
    });
    expect(list[list.length - 1][0]).toBe(engine.chanceSentence);
  });

  it('gives the same numbers as the block without its header row, whose series are named series 1..6', () => {
    const plain = screen(block(columns)) as (number | string)[][];
    expect(plain).toHaveLength(list.length);
    const names = headers.map((_, j) => `series ${j + 1}`);
    plain.slice(1, 21).forEach((r, k) => {
      expect([r[0], r[1]]).toEqual([names[headers.indexOf(String(ranked[k][0]))], names[headers.indexOf(String(ranked[k][1]))]]);
      expect(r.slice(2)).toEqual(ranked[k].slice(2));
    });
    expect(plain[21][2]).toBe('series 6 settles around its own mean (order 0): a pair needs two wandering series of the same order');
  });

  it('names a column whose header cell is blank series k, and keeps every row where it was: a bad cell is named at its row in the range', () => {
    const partly = [headers.map((h, j) => (j === 2 ? null : h)), ...block(columns)];
    const out = screen(partly) as (number | string)[][];
    expect(out.slice(1, 21).flatMap((r) => [r[0], r[1]])).toContain('series 3');
    const broken = withHeader.map((r) => r.slice());
    broken[37][3] = 'n/a';
    expect(cellErrorOf(() => screen(broken), '#VALUE!')).toContain('row 38 of its range');
  });
});

describe('MOOR.SCREEN sets aside the pairs that cannot cointegrate, after the ranking', () => {
  const list = screen(withHeader) as (number | string)[][];

  it('lists the 10 directed pairs with TankPremium after the 20 ranked ones, each with its reason and the set-aside mark', () => {
    const aside = list.slice(21, -1);
    expect(aside).toHaveLength(10);
    expect(aside).toEqual(engine.setAside.map((p) => [p.y, p.x, p.reason, '', '', '', '', SET_ASIDE_MARK]));
    for (const r of aside) {
      expect([r[0], r[1]]).toContain('TankPremium');
      expect(r[2]).toBe('TankPremium settles around its own mean (order 0): a pair needs two wandering series of the same order');
    }
    for (const r of list.slice(1, 21)) expect([r[0], r[1]]).not.toContain('TankPremium');
  });

  it('counts only the ranked pairs in the chance sentence', () => {
    expect(String(list[list.length - 1][0])).toMatch(/^Of 20 directed pairs tested at 5%/);
  });

  it('leaves the grid blank for them and says why under it, before the chance sentence', () => {
    const grid = screen(withHeader, null, 'matrix') as (number | string)[][];
    expect(grid[0].slice(1)).toEqual(headers);
    const t = headers.indexOf('TankPremium');
    expect(grid[t + 1].slice(1).every((c) => c === '')).toBe(true);
    expect(grid.slice(1, 7).every((r) => r[t + 1] === '')).toBe(true);
    expect(grid[7][0]).toBe('Set aside: TankPremium settles around its own mean (order 0): its 10 directed pairs set aside');
    expect(grid[8][0]).toBe(engine.chanceSentence);
    expect(grid).toHaveLength(9);
  });
});
