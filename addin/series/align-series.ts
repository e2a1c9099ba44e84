/**
 * Lines up cleaned series row by row for two-series and several-series work (hedge ratios,
 * Engle-Granger, Johansen). Rows are the source indices the cleaner kept, so two ranges of
 * the same shape line up cell for cell.
 *
 * - Without gaps skipped, the series must cover the same rows: a different count is refused
 *   naming the longer series and by how many, and equal counts that start on different rows
 *   are refused too (pairing them by position would pair different dates).
 * - When any series was cleaned with gaps allowed, only the rows present in every series are
 *   kept; each row a series loses because another had a gap there is recorded in its
 *   `dropped` list.
 */
import { MooringInputError } from '../errors';
import { DEFAULT_MIN_LENGTH, type CleanSeries, type DroppedCell } from './clean-series';

/** Options for alignment. */
export interface AlignOptions {
  /** Fewest shared rows; default 20 (common practice, as in the cleaner). */
  minLength?: number;
  /** How this surface lets a user skip gaps, for messages (see CleanOptions); default "allow gaps". */
  skipGapsWords?: string;
}

/** Aligns two cleaned series by row; see the file comment for the rules. */
export function alignSeries(a: CleanSeries, b: CleanSeries, options: AlignOptions = {}): [CleanSeries, CleanSeries] {
  const [x, y] = alignAll([a, b], options);
  return [x, y];
}

/** Aligns any number of cleaned series by row; see the file comment for the rules. */
export function alignAll(series: readonly CleanSeries[], options: AlignOptions = {}): CleanSeries[] {
  if (series.length < 2) return series.slice();
  const minLength = options.minLength ?? DEFAULT_MIN_LENGTH;
  if (!series.some((s) => s.gapsSkipped)) {
    checkSameRows(series, options.skipGapsWords ?? 'allow gaps');
    return series.slice();
  }
  const shared = sharedRows(series);
  if (shared.length < minLength) {
    throw new MooringInputError(
      `${listNames(series)} have values in the same rows only ${shared.length} time${shared.length === 1 ? '' : 's'}; ` +
        `at least ${minLength} shared rows are needed: fill the gaps or select a longer history.`);
  }
  return series.map((s) => keepRows(s, shared, series));
}

function checkSameRows(series: readonly CleanSeries[], gapWords: string): void {
  const first = series[0];
  for (let j = 1; j < series.length; j++) {
    const s = series[j];
    const n0 = first.values.length;
    const n1 = s.values.length;
    if (n0 !== n1) {
      const [longer, shorter, by] = n0 > n1 ? [first, s, n0 - n1] : [s, first, n1 - n0];
      throw new MooringInputError(
        `${first.name} has ${n0} values and ${s.name} has ${n1}: ${longer.name} is longer than ${shorter.name} by ${by}; ` +
          `select ranges covering the same rows, or ${gapWords} to keep only the rows both have.`);
    }
    if (first.rows[0] !== s.rows[0]) {
      throw new MooringInputError(
        `${first.name} starts at ${first.rowLabel(first.rows[0])} but ${s.name} at ${s.rowLabel(s.rows[0])}, so their rows do not line up; ` +
          `select ranges whose numbers start on the same row, or ${gapWords}.`);
    }
  }
}

/** Source indices present in every series (each rows array is increasing). */
function sharedRows(series: readonly CleanSeries[]): Int32Array {
  const base = series[0].rows;
  const cursor = new Int32Array(series.length);
  const out = new Int32Array(base.length);
  let n = 0;
  outer: for (let i = 0; i < base.length; i++) {
    const r = base[i];
    for (let j = 1; j < series.length; j++) {
      const rows = series[j].rows;
      let p = cursor[j];
      while (p < rows.length && rows[p] < r) p++;
      cursor[j] = p;
      if (p === rows.length || rows[p] !== r) continue outer;
    }
    out[n++] = r;
  }
  return out.slice(0, n);
}

function keepRows(s: CleanSeries, shared: Int32Array, all: readonly CleanSeries[]): CleanSeries {
  if (shared.length === s.rows.length) return s;
  const values = new Float64Array(shared.length);
  const lost: DroppedCell[] = [];
  let p = 0;
  for (let i = 0; i < s.rows.length; i++) {
    const r = s.rows[i];
    if (p < shared.length && shared[p] === r) {
      values[p++] = s.values[i];
    } else {
      const other = all.find((o) => o !== s && !hasRow(o.rows, r));
      lost.push({ index: r, row: s.rowLabel(r), reason: `${other ? other.name : 'another series'} has no value in this row` });
    }
  }
  const dropped = s.dropped.concat(lost).sort((u, v) => u.index - v.index);
  return { ...s, values, rows: shared.slice(), dropped };
}

function hasRow(rows: Int32Array, r: number): boolean {
  let lo = 0;
  let hi = rows.length - 1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    if (rows[mid] === r) return true;
    if (rows[mid] < r) lo = mid + 1;
    else hi = mid - 1;
  }
  return false;
}

function listNames(series: readonly CleanSeries[]): string {
  const names = series.map((s) => s.name);
  return names.length === 2 ? `${names[0]} and ${names[1]}` : `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]}`;
}
