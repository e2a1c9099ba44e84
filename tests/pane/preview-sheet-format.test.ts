import { describe, expect, it } from 'vitest';
import { NUMBER_FORMAT, periodsFormat } from '../../taskpane/block/block-style';
import { shownText } from '../../taskpane/preview/sheet-format';

// How the preview's sheet prints a cell under the number formats the results block writes
// (taskpane/block/block-style.ts). Expected texts follow from the formats' own meaning
// (fixed decimals, a percent, a quoted unit, an ISO date of a 1900-system serial).

describe('the preview sheet\'s cell text', () => {
  it('prints each of the block\'s number formats', () => {
    expect(shownText(0.006634, NUMBER_FORMAT.pValue)).toBe('0.0066');
    expect(shownText(1.14562, NUMBER_FORMAT.ratio)).toBe('1.146');
    expect(shownText(-2.8449, NUMBER_FORMAT.statistic)).toBe('-2.84');
    expect(shownText(780, NUMBER_FORMAT.count)).toBe('780');
    expect(shownText(0.05, NUMBER_FORMAT.level)).toBe('5%');
    expect(shownText(11.94, periodsFormat('day'))).toBe('11.9 days');
    // 45292 is 2024-01-01 in the 1900 date system (days since 1899-12-30).
    expect(shownText(45292, NUMBER_FORMAT.date)).toBe('2024-01-01');
  });

  it('prints general numbers to ten significant digits, text as it is, blanks as nothing', () => {
    expect(shownText(1.4008)).toBe('1.4008');
    expect(shownText(1 / 3)).toBe('0.3333333333');
    expect(shownText('2022-01-03')).toBe('2022-01-03');
    expect(shownText(null)).toBe('');
    expect(shownText(true)).toBe('TRUE');
  });
});
