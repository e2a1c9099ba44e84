/**
 * The preparation of an analysis (addin/series/preparation.ts): its words read back to the same
 * value, unknown words and backward windows are refused with the words that work, and the window
 * is cut on source positions after the lining up, oldest first in time whichever way the range
 * runs. Expected values are worked out by hand from the definitions in the file comment.
 */
import { describe, expect, it } from 'vitest';
import { cleanSeries } from '../../addin/series/clean-series';
import { AS_GIVEN, cutWindow, describePreparation, parsePreparation, windowPositions } from '../../addin/series/preparation';

describe('parsePreparation and describePreparation', () => {
  it('read every word, in any case and order, and write them back in one canonical order', () => {
    const p = parsePreparation('  Last 250 ; SKIP GAPS, from row 12, log, newest first, to row 900, skip rows 40 17 40 ');
    expect(p).toEqual({ log: true, skipGaps: true, newestFirst: true, fromRow: 12, toRow: 900, lastRows: 250, skipRows: [17, 40] });
    expect(describePreparation(p)).toBe('log, skip gaps, newest first, from row 12, to row 900, last 250, skip rows 17 40');
    expect(parsePreparation(describePreparation(p))).toEqual(p);
  });

  it('treat a blank or left-out argument as the prices as they are', () => {
    for (const blank of [null, undefined, '', '   ']) expect(parsePreparation(blank)).toEqual(AS_GIVEN);
    expect(describePreparation(AS_GIVEN)).toBe('');
  });

  it('refuse what they do not know, naming the word and the words that work', () => {
    expect(() => parsePreparation('logs please')).toThrow(/does not know 'logs please': it takes log, skip gaps, newest first/);
    expect(() => parsePreparation('from row 90, to row 10')).toThrow(/from row 90 to row 10, which is backwards/);
    expect(() => parsePreparation('log, log')).toThrow(/says 'log' twice/);
    expect(() => parsePreparation('from row 0')).toThrow(/row number of 1 or more/);
    expect(() => parsePreparation(5)).toThrow(/must be a text such as "log, skip gaps"; got the number 5/);
  });
});

describe('the window', () => {
  const series = (cells: unknown[]) => cleanSeries(cells, { name: 's', skipGaps: true, minLength: 2 });
  const cells = Array.from({ length: 30 }, (_, i) => (i === 4 ? '' : 100 + i * (i % 3)));

  it('counts rows as positions in the range, so a gap before the window does not move it', () => {
    const s = series(cells);
    const [cut] = cutWindow([s], parsePreparation('skip gaps, from row 11, to row 20'), 2);
    expect(Array.from(cut.rows)).toEqual([10, 11, 12, 13, 14, 15, 16, 17, 18, 19]);
  });

  it('takes the last N rows in time, and refuses a window with too few rows', () => {
    const s = series(cells);
    expect(windowPositions(s.rows, parsePreparation('last 5'), 2)).toEqual({ start: 24, end: 29 });
    expect(() => windowPositions(s.rows, parsePreparation('from row 29'), 5)).toThrow(/holds 2 usable rows; at least 5 are needed/);
  });

  it('reads a newest-first range bottom up, and its last N rows are the N at its top', () => {
    const s = series(cells);
    const [cut] = cutWindow([s], parsePreparation('newest first, last 4'), 2);
    expect(Array.from(cut.rows)).toEqual([3, 2, 1, 0]);
    expect(Array.from(cut.values)).toEqual([s.values[3], s.values[2], s.values[1], s.values[0]]);
  });
});
