import { describe, expect, it } from 'vitest';
import { MooringInputError } from '../../addin/errors';
import { columnsOf } from '../../addin/series/columns-of';

describe('columnsOf', () => {
  const grid = [
    [1, 10],
    [2, 20],
    [3, 30],
  ];

  it('reads a row-major grid by columns', () => {
    expect(columnsOf(grid)).toEqual([
      [1, 2, 3],
      [10, 20, 30],
    ]);
  });

  it('a single row is one series', () => {
    expect(columnsOf([[1, 2, 3, 4]])).toEqual([[1, 2, 3, 4]]);
    expect(columnsOf([[1, 2, 3, 4]], 'columns')).toEqual([[1], [2], [3], [4]]);
  });

  it('reads by rows on request', () => {
    expect(columnsOf(grid, 'rows')).toEqual(grid);
  });

  it('pads short rows with blanks', () => {
    const cols = columnsOf([[1, 2], [3]]);
    expect(cols[1]).toEqual([2, undefined]);
  });

  it('an empty grid has no series', () => {
    expect(columnsOf([])).toEqual([]);
  });

  it('refuses a grid whose rows are not arrays', () => {
    expect(() => columnsOf([1, 2] as unknown as unknown[][])).toThrow(MooringInputError);
    expect(() => columnsOf([1, 2] as unknown as unknown[][])).toThrow('Row 1 of the range is not a row of cells: pass the range as rows of values.');
  });
});
