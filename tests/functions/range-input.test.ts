/**
 * The range reader in front of the shared series cleaner: how a range's shape becomes one
 * series, several, or a block, and the refusals that come before any statistics.
 */
import { describe, expect, it } from 'vitest';
import { readBlock, readRelation, readSeries, trailingZeroRun, TRAILING_ZERO_LIMIT } from '../../functions/cells/range-input';
import { adf, order } from '../../functions/functions';
import { fixtureSeries, loadFixture, type Fixtures } from '../reference/fixtures';
import { block, cellErrorOf, column, row } from './cell-shapes';

const adfFixture = loadFixture<Fixtures['adf']>('adf');
const walk = fixtureSeries(adfFixture, 'rw_150');

describe('shapes', () => {
  it('a column and a row are one series; leading and trailing blanks are counted, not kept', () => {
    const fromColumn = readSeries(column([null, '', ...walk, null]), 'y');
    expect(fromColumn.orientation).toBe('column');
    expect(Array.from(fromColumn.series.values)).toEqual(walk);
    expect(fromColumn.series.leadingBlanks).toBe(2);
    const fromRow = readSeries(row(['', ...walk]), 'y');
    expect(fromRow.orientation).toBe('row');
    expect(Array.from(fromRow.series.values)).toEqual(walk);
  });
  it('x beside a column y is read by columns, under a row y by rows', () => {
    const byColumns = readRelation(column(walk), block([walk.map((v) => v + 1), walk.map((v) => v * 2)]));
    expect(byColumns.xs.map((s) => s.name)).toEqual(['x (column 1)', 'x (column 2)']);
    const byRows = readRelation(row(walk), [walk.map((v) => v + 1), walk.map((v) => v * 2)]);
    expect(byRows.orientation).toBe('row');
    expect(byRows.xs.map((s) => s.values[0])).toEqual([walk[0] + 1, walk[0] * 2]);
  });
  it('a block is one series per column, named by position, lined up by row', () => {
    const series = readBlock(block([walk, walk.map((v) => v * 3)]));
    expect(series.map((s) => s.name)).toEqual(['series 1', 'series 2']);
    expect(series[1].values[5]).toBe(walk[5] * 3);
  });
  it('counts the exact zeros a range ends with', () => {
    expect(trailingZeroRun([1, 0, 2, 0, 0])).toBe(2);
    expect(trailingZeroRun([1, 2])).toBe(0);
    expect(TRAILING_ZERO_LIMIT).toBe(10);
  });
});

describe('refusals before any statistics', () => {
  it('a block where one series was expected', () => {
    expect(cellErrorOf(() => adf(block([walk, walk])), '#VALUE!')).toBe('the series covers 150 rows and 2 columns: select one column (or one row) of prices.');
  });
  it('a header above the prices', () => {
    expect(cellErrorOf(() => adf(column(['Crude', ...walk])), '#VALUE!')).toMatch(/row 1 of its range is text 'Crude': if it is a header, select only the numbers below it/);
  });
  it('too short a history, saying how many values there are and how many are needed', () => {
    expect(cellErrorOf(() => adf(column(walk.slice(0, 12))), '#VALUE!')).toMatch(/has 12 usable values .* at least 20 are needed/);
  });
  it('a constant series', () => {
    expect(cellErrorOf(() => adf(column(new Array(40).fill(5))), '#VALUE!')).toMatch(/All 40 values of the series are 5/);
  });
  it('a range of blanks only', () => {
    expect(cellErrorOf(() => adf(column(['', null, ''])), '#VALUE!')).toMatch(/holds no numbers/);
  });
  it('a single cell', () => {
    expect(cellErrorOf(() => adf(7 as unknown as unknown[][]), '#VALUE!')).toMatch(/has 1 usable value/);
    expect(cellErrorOf(() => adf([[7]]), '#VALUE!')).toMatch(/has 1 usable value/);
  });
  it('not a number: NaN and infinities are refused even though they are numbers', () => {
    expect(cellErrorOf(() => adf(column([...walk.slice(0, 30), NaN, ...walk.slice(30)])), '#VALUE!')).toMatch(/row 31 of its range is not a number \(NaN\): correct the calculation/);
    expect(cellErrorOf(() => adf(column([...walk, Infinity])), '#VALUE!')).toMatch(/Infinity/);
  });
  it('nine trailing zeros are zeros; ten are refused as likely blanks', () => {
    expect(() => adf(column([...walk, ...new Array(9).fill(0)]))).not.toThrow();
    expect(cellErrorOf(() => adf(column([...walk, ...new Array(10).fill(0)])), '#VALUE!')).toMatch(/The last 10 cells of the series are exactly 0/);
  });
});

describe('MOOR.ORDER answers', () => {
  it('"above 2" as text for a series still wandering after two differences (a triple running sum of a walk)', () => {
    const cumsum = (v: number[]) => v.reduce<number[]>((out, x) => [...out, (out.at(-1) ?? 0) + x], []);
    const i3 = cumsum(cumsum(fixtureSeries(adfFixture, 'rw_400')));
    expect(order(column(i3))).toEqual([['above 2']]);
  });
});
