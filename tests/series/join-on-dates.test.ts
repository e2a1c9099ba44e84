/** The inner join of calendars, and carrying a price forward, on small hand-made calendars. */
import { describe, expect, it } from 'vitest';
import { joinOnDates } from '../../addin/dates/join-on-dates';

const a = { source: 'a', days: [1, 2, 3, 4, 5, 8], series: [{ name: 'A', cells: ['a1', 'a2', 'a3', 'a4', 'a5', 'a8'] }] };
const b = { source: 'b', days: [2, 3, 5, 6, 8], series: [{ name: 'B', cells: ['b2', 'b3', 'b5', 'b6', 'b8'] }] };

describe('joinOnDates', () => {
  it('keeps the dates every series has, and counts what each lost', () => {
    const j = joinOnDates([a, b]);
    expect(j.days).toEqual([2, 3, 5, 8]);
    expect(j.series.map((s) => s.cells)).toEqual([['a2', 'a3', 'a5', 'a8'], ['b2', 'b3', 'b5', 'b8']]);
    expect(j.series.map((s) => s.lost)).toEqual([2, 1]);
    expect(j.series.map((s) => s.filled)).toEqual([0, 0]);
  });

  it('carries a price forward over at most N missing dates of its own series', () => {
    const j = joinOnDates([a, b], 1);
    // Date 4: B carries b3; date 6: A carries a5; date 1: B has no earlier price, so it is left out.
    expect(j.days).toEqual([2, 3, 4, 5, 6, 8]);
    expect(j.series[0].cells).toEqual(['a2', 'a3', 'a4', 'a5', 'a5', 'a8']);
    expect(j.series[1].cells).toEqual(['b2', 'b3', 'b3', 'b5', 'b6', 'b8']);
    expect(j.series.map((s) => s.filled)).toEqual([1, 1]);
    expect(j.series.map((s) => s.lost)).toEqual([1, 0]);
  });

  it('refuses calendars with no date in common', () => {
    expect(() => joinOnDates([a, { ...b, days: [10, 11, 12, 13, 14] }])).toThrow(/share no dates/);
  });
});
