/**
 * How the prices of one analysis are prepared before any test sees them: natural logs or not,
 * gaps refused or skipped, and the window of rows used. It is one value, written as a short
 * text of comma-separated words, so it can travel unchanged from the pane to the results block
 * and into every MOOR formula's last argument, and the same rows reach the engine from every
 * surface:
 *
 *   log               natural logs of the prices
 *   skip gaps         drop rows where any series of the analysis has a blank or text cell
 *   from row N        start at the N-th row of the range (1 = its first cell)
 *   to row N          stop at the N-th row of the range
 *   last N            the last N usable rows in time (after the other words)
 *   newest first      the range runs newest row first: the rows are read in reverse, so
 *                     every test sees them oldest first (positions still count from the top)
 *   skip rows N M ... leave out these rows of the range (the results block uses it for rows
 *                     the analysis dropped because a series outside the pair had a gap)
 *
 * Order of the steps, the same as the pane's: every selected series is cleaned whole (logs
 * taken, gaps refused or skipped), the series are lined up by row, and only then is the window
 * cut. So a row outside the window still has to be clean, exactly as in the pane, and "from row
 * 521" keeps its meaning however many gaps lie before it. Rows are positions in the range
 * handed over, which for an Excel table column are the table's data rows; a window that starts
 * at a date is written with the row that date sits on (see the README for XMATCH).
 */
import { MooringInputError } from '../errors';
import { DEFAULT_MIN_LENGTH, type CleanSeries } from './clean-series';

/** The preparation of one analysis. Rows are 1-based positions in the source range. */
export interface Preparation {
  log: boolean;
  skipGaps: boolean;
  fromRow: number | null;
  toRow: number | null;
  lastRows: number | null;
  /** Rows left out by number, ascending, without repeats. */
  skipRows: number[];
  /** The range runs newest first: the rows are read bottom up. */
  newestFirst: boolean;
}

/** The prices as they are: no logs, gaps refused, every row. */
export const AS_GIVEN: Readonly<Preparation> = Object.freeze({ log: false, skipGaps: false, fromRow: null, toRow: null, lastRows: null, skipRows: [] as number[], newestFirst: false });

const WORDS_HELP = 'log, skip gaps, newest first, from row N, to row N, last N or skip rows N M, separated by commas (for example "log, skip gaps, from row 260")';

/**
 * Reads the preparation from its text (any case, words separated by commas or semicolons).
 * A blank or left-out argument is AS_GIVEN; anything unknown is refused with the words that work.
 */
export function parsePreparation(text: unknown, option = 'prep'): Preparation {
  if (text === null || text === undefined || (typeof text === 'string' && text.trim() === '')) return { ...AS_GIVEN };
  if (typeof text !== 'string') {
    throw new MooringInputError(`${option} must be a text such as "log, skip gaps"; got ${typeof text === 'number' ? `the number ${text}` : `a ${typeof text}`}. It takes ${WORDS_HELP}.`);
  }
  const out: Preparation = { ...AS_GIVEN, skipRows: [] };
  const seen = new Set<string>();
  for (const raw of text.split(/[,;]/)) {
    const part = raw.trim().toLowerCase().replace(/\s+/g, ' ');
    if (part === '') continue;
    const key = part.replace(/\d+/g, 'N');
    if (seen.has(key)) throw new MooringInputError(`${option} says '${part}' twice: give each word once.`);
    seen.add(key);
    let m: RegExpMatchArray | null;
    if (part === 'log' || part === 'logs' || part === 'ln') out.log = true;
    else if (part === 'skip gaps' || part === 'skip gap') out.skipGaps = true;
    else if (part === 'newest first') out.newestFirst = true;
    else if ((m = part.match(/^from row (\d{1,7})$/))) out.fromRow = positive(Number(m[1]), part, option);
    else if ((m = part.match(/^to row (\d{1,7})$/))) out.toRow = positive(Number(m[1]), part, option);
    else if ((m = part.match(/^last (\d{1,7})(?: rows?)?$/))) out.lastRows = positive(Number(m[1]), part, option);
    else if ((m = part.match(/^skip rows? ((?:\d{1,7} ?)+)$/))) out.skipRows = [...new Set(m[1].trim().split(' ').map((d) => positive(Number(d), part, option)))].sort((a, b) => a - b);
    else throw new MooringInputError(`${option} does not know '${raw.trim()}': it takes ${WORDS_HELP}.`);
  }
  if (out.fromRow !== null && out.toRow !== null && out.toRow < out.fromRow) {
    throw new MooringInputError(`${option} runs from row ${out.fromRow} to row ${out.toRow}, which is backwards: make the last row at least the first.`);
  }
  return out;
}

function positive(n: number, part: string, option: string): number {
  if (!(n >= 1)) throw new MooringInputError(`${option}: '${part}' needs a row number of 1 or more.`);
  return n;
}

/** The preparation as the text parsePreparation reads back; '' for the prices as they are. */
export function describePreparation(p: Preparation): string {
  const words: string[] = [];
  if (p.log) words.push('log');
  if (p.skipGaps) words.push('skip gaps');
  if (p.newestFirst) words.push('newest first');
  if (p.fromRow !== null) words.push(`from row ${p.fromRow}`);
  if (p.toRow !== null) words.push(`to row ${p.toRow}`);
  if (p.lastRows !== null) words.push(`last ${p.lastRows}`);
  if (p.skipRows.length > 0) words.push(`skip row${p.skipRows.length === 1 ? '' : 's'} ${p.skipRows.join(' ')}`);
  return words.join(', ');
}

/** Whether the preparation cuts rows (a window or rows by number). */
export function hasWindow(p: Preparation): boolean {
  return p.fromRow !== null || p.toRow !== null || p.lastRows !== null || p.skipRows.length > 0 || p.newestFirst;
}

/**
 * The window among aligned rows, as 0-based positions [start, end) into the series' values:
 * rows whose source index lies within from/to, then the last N of them. Refuses a window with
 * fewer than `minLength` rows, naming the rows it found.
 */
export function windowPositions(rows: ArrayLike<number>, p: Preparation, minLength = DEFAULT_MIN_LENGTH): { start: number; end: number } {
  const n = rows.length;
  let start = 0;
  let end = n;
  if (p.fromRow !== null) while (start < n && rows[start] < p.fromRow - 1) start++;
  if (p.toRow !== null) while (end > start && rows[end - 1] > p.toRow - 1) end--;
  // The last N rows in time: at the bottom of the range, or at its top when it runs newest first.
  if (p.lastRows !== null && end - start > p.lastRows) {
    if (p.newestFirst) end = start + p.lastRows;
    else start = end - p.lastRows;
  }
  const used = end - start;
  if (used < minLength) {
    const what = describePreparation({ ...AS_GIVEN, fromRow: p.fromRow, toRow: p.toRow, lastRows: p.lastRows, skipRows: p.skipRows });
    throw new MooringInputError(`The window (${what}) holds ${used} usable row${used === 1 ? '' : 's'}; at least ${minLength} are needed: widen it.`);
  }
  return { start, end };
}

/** Cuts aligned series to the preparation's window (the same rows for every series). */
export function cutWindow(series: readonly CleanSeries[], p: Preparation, minLength = DEFAULT_MIN_LENGTH): CleanSeries[] {
  if (series.length === 0 || !hasWindow(p)) return series.slice();
  if (p.skipRows.length > 0) series = leaveOutRows(series, p.skipRows);
  const { start, end } = windowPositions(series[0].rows, p, minLength);
  if (p.newestFirst) {
    // Oldest first for every test; `rows` keep the source positions, now falling.
    return series.map((s) => ({
      ...s,
      values: s.values.slice(start, end).reverse(),
      rows: s.rows.slice(start, end).reverse(),
      dropped: s.dropped.filter((d) => d.index >= s.rows[start] && d.index <= s.rows[end - 1]).reverse(),
    }));
  }
  if (start === 0 && end === series[0].rows.length) return series.slice();
  const first = series[0].rows[start];
  const last = series[0].rows[end - 1];
  return series.map((s) => ({
    ...s,
    values: s.values.slice(start, end),
    rows: s.rows.slice(start, end),
    dropped: s.dropped.filter((d) => d.index >= first && d.index <= last),
  }));
}

/** The aligned series without the rows (1-based positions) named. */
function leaveOutRows(series: readonly CleanSeries[], skipRows: readonly number[]): CleanSeries[] {
  const skip = new Set(skipRows.map((r) => r - 1));
  const keep: number[] = [];
  series[0].rows.forEach((r, k) => {
    if (!skip.has(r)) keep.push(k);
  });
  if (keep.length === series[0].rows.length) return series.slice();
  return series.map((s) => ({
    ...s,
    values: Float64Array.from(keep, (k) => s.values[k]),
    rows: Int32Array.from(keep, (k) => s.rows[k]),
  }));
}
