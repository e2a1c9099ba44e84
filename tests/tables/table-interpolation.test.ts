import { describe, expect, it } from 'vitest';
import { polynomialAscending } from '../../addin/tables/polynomial';
import { interpolateLinearly } from '../../addin/tables/table-interpolation';

describe('linear interpolation in a table', () => {
  const xs = [1, 2, 4];
  const ys = [10, 20, 0];
  it('returns the table value at each point and the straight-line value between points', () => {
    expect(interpolateLinearly(1, xs, ys)).toEqual({ value: 10, end: null });
    expect(interpolateLinearly(2, xs, ys)).toEqual({ value: 20, end: null });
    expect(interpolateLinearly(4, xs, ys)).toEqual({ value: 0, end: null });
    expect(interpolateLinearly(1.25, xs, ys).value).toBeCloseTo(12.5, 12);
    expect(interpolateLinearly(3, xs, ys).value).toBeCloseTo(10, 12);
  });
  it('outside the table returns the end value and says which end', () => {
    expect(interpolateLinearly(0.5, xs, ys)).toEqual({ value: 10, end: 'left' });
    expect(interpolateLinearly(9, xs, ys)).toEqual({ value: 0, end: 'right' });
  });
});

describe('polynomial in ascending powers', () => {
  it('1 + 2x + 3x² at x = 2 is 17, and the empty polynomial is 0', () => {
    expect(polynomialAscending([1, 2, 3], 2)).toBe(17);
    expect(polynomialAscending([], 5)).toBe(0);
  });
});
