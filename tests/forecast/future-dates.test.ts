/** Future dates in the data's own spacing (addin/forecast/future-dates.ts): calendar facts, checked by hand. */
import { describe, expect, it } from 'vitest';
import { futureDates } from '../../addin/forecast/future-dates';

describe('futureDates', () => {
  it('business days skip the weekend: after Thursday 2024-12-26 and Friday 27th come Monday 30th and Tuesday 31st', () => {
    const dates = ['2024-12-16', '2024-12-17', '2024-12-18', '2024-12-19', '2024-12-20', '2024-12-23', '2024-12-24', '2024-12-26', '2024-12-27'];
    expect(futureDates(dates, 3)).toEqual(['2024-12-30', '2024-12-31', '2025-01-01']);
  });
  it('months keep the day of the month, or the month\'s last day (31 January -> 29 February 2024, then 31 March)', () => {
    expect(futureDates(['2023-10-31', '2023-11-30', '2023-12-31', '2024-01-31'], 2)).toEqual(['2024-02-29', '2024-03-31']);
  });
  it('quarters step three months; weeks seven days', () => {
    expect(futureDates(['2009-01-01', '2009-04-01', '2009-07-01'], 2)).toEqual(['2009-10-01', '2010-01-01']);
    expect(futureDates(['2024-01-05', '2024-01-12', '2024-01-19'], 1)).toEqual(['2024-01-26']);
  });
  it('no dates, or a spacing that is no calendar period, give none', () => {
    expect(futureDates(null, 3)).toBeNull();
    expect(futureDates(['2024-01-01', '2024-01-14', '2024-01-27', '2024-02-16'], 2)).toBeNull(); // median gap 13 days: no calendar period
  });
});
