/**
 * From the series cleaner to the diagnostic: takes cleaned, aligned series (cleanBlock,
 * csvBlock, alignAll) and builds the diagnostic's input, carrying what the report must
 * disclose: the label of every row used, its date where one is known, and every cell the
 * cleaner dropped with its reason.
 */
import { MooringInputError } from '../errors';
import type { CleanSeries } from '../series/clean-series';
import type { DroppedRow } from './report-types';

/** The diagnostic's input: two or more cleaned, aligned series and what came with them. */
export interface DiagnosticInput {
  series: { name: string; values: ArrayLike<number> }[];
  /** The date of each observation, when the source has dates. */
  dates?: (string | null)[];
  /** The label of each observation ("line 37", "row 12"); default "row 1", "row 2", ... */
  rowLabels?: string[];
  /** Cells the cleaner dropped, with their reasons. */
  dropped?: DroppedRow[];
  /** Where the numbers came from: a file name, a range address. */
  source?: string;
  /** Whether the values are natural logs (informational; options.log wins when given). */
  logged?: boolean;
  /** What the surface did to the rows before the diagnostic (put in date order, joined ...), said first among the report's warnings. */
  notices?: string[];
}

/** What prepareDiagnosticInput needs besides the series. */
export interface PrepareOptions {
  /** The date of a source index (the cleaner's row index), or null. */
  dateOf?: (sourceIndex: number) => string | null;
  source?: string;
}

/**
 * The diagnostic input of cleaned series. They must already be aligned (same rows in the
 * same order); a mismatch is refused with a pointer to the block cleaner.
 */
export function prepareDiagnosticInput(series: readonly CleanSeries[], options: PrepareOptions = {}): DiagnosticInput {
  if (!Array.isArray(series) || series.length < 2) {
    throw new MooringInputError('The diagnostic needs at least two cleaned series: select two or more columns of prices.');
  }
  const first = series[0];
  for (const s of series.slice(1)) {
    const same = s.rows.length === first.rows.length && s.rows.every((r: number, i: number) => r === first.rows[i]);
    if (!same) {
      throw new MooringInputError(
        `${s.name} and ${first.name} do not cover the same rows: clean them together as one block (or allow gaps) so their rows line up.`,
      );
    }
  }
  const dateOf = options.dateOf ?? (() => null);
  const rows: number[] = Array.from(first.rows);
  const dates = rows.map((r) => dateOf(r));
  const dropped: DroppedRow[] = [];
  for (const s of series) {
    for (const d of s.dropped) dropped.push({ series: s.name, row: d.row, date: dateOf(d.index), reason: d.reason });
  }
  return {
    series: series.map((s) => ({ name: s.name, values: s.values })),
    ...(dates.some((d) => d !== null) ? { dates } : {}),
    rowLabels: rows.map((r) => first.rowLabel(r)),
    dropped,
    ...(options.source !== undefined ? { source: options.source } : {}),
    logged: series.every((s) => s.logged),
  };
}
