/**
 * The series cleaner every surface shares: spreadsheet cells (or CSV fields already turned
 * into cells) in, a checked Float64Array of prices out, or a MooringInputError that names
 * the row and says what would work.
 *
 * Decisions, each with its reason:
 * - Trailing blanks are dropped first, by a backward scan, because a whole-column reference
 *   (A:A) hands over a million cells of which only the top few thousand hold prices.
 * - Leading blanks are skipped too (a header offset, or a series that starts later). They are
 *   counted in `leadingBlanks`, not listed in `dropped`: `dropped` lists only cells inside the
 *   series that the user's data lost, which is what a report must disclose.
 * - Numbers stored as text ("12.5") are refused, even when gaps are allowed, with a message
 *   that suggests converting them. Excel itself skips such cells in SUM and AVERAGE, so
 *   accepting them here would make Mooring disagree with the rest of the workbook; text like
 *   "1.234" also reads differently across locales. Skipping them as gaps would silently drop
 *   real observations. (The CSV reader converts its fields before they reach the cleaner:
 *   in a CSV every number is text.)
 * - NaN and ±Infinity are refused even when gaps are allowed: they signal a calculation gone
 *   wrong upstream, not a missing observation.
 * - Interior blanks, text, booleans and error values are gaps: refused by default, dropped
 *   and recorded when `skipGaps` is set.
 * - A value more than 1e100 times the series' typical size is refused, naming its row
 *   (magnitude-range.ts): its square has no double to live in, whatever the units, and it would
 *   come out as NaN several steps later. The rule is a ratio, so prices in any unit pass.
 */
import { MooringInputError } from '../errors';
import { cellKind, describeCell, isBlankCell } from './cell-kinds';
import { describeMagnitude, magnitudeOutlier } from './magnitude-range';

/** How to clean one series. */
export interface CleanOptions {
  /** Name used in messages and results; default "series". */
  name?: string;
  /** Take natural logs (every value must be positive). */
  log?: boolean;
  /** Drop interior blank, text, logical and error cells instead of refusing them. */
  skipGaps?: boolean;
  /**
   * Fewest usable values; default 20. Common practice: unit-root and cointegration work needs
   * at least about 20 observations before the asymptotic tables mean anything.
   */
  minLength?: number;
  /** Sheet row of the first cell, for the default row labels; default 1. */
  firstRow?: number;
  /** Label of the cell at a source index, for messages; default `row ${firstRow + index}`. */
  rowLabel?: (index: number) => string;
  /**
   * How this surface lets a user skip gaps, for messages: "allow gaps" (the default, the
   * pane's and the formulas' words) or "give --skip-gaps" on the command line.
   */
  skipGapsWords?: string;
}

/** A cell the cleaner dropped because gaps were allowed. */
export interface DroppedCell {
  /** Source index of the cell in the input. */
  index: number;
  /** Its row label, as messages name it. */
  row: string;
  /** Why it was dropped, in words. */
  reason: string;
}

/** A cleaned series: values with the source index of each. */
export interface CleanSeries {
  name: string;
  /** The usable values, in source order (natural logs when `log` was set). */
  values: Float64Array;
  /** Source index of each value in the input cells. */
  rows: Int32Array;
  /** Interior cells dropped as gaps (only when gaps were allowed). */
  dropped: DroppedCell[];
  /** Blank cells skipped before the first value. */
  leadingBlanks: number;
  /** Blank cells dropped after the last value. */
  trailingBlanks: number;
  /** Whether the series was cleaned with gaps allowed (alignment then matches rows, not positions). */
  gapsSkipped: boolean;
  /** Whether `values` are natural logs. */
  logged: boolean;
  /** The row label of a source index, as messages name it. */
  rowLabel: (index: number) => string;
}

/** Default fewest values (common practice: about 20 observations for cointegration work). */
export const DEFAULT_MIN_LENGTH = 20;

/** Relative spread below which a series counts as numerically constant. */
const NEAR_CONSTANT = 1e-10;

/**
 * Cleans one series of spreadsheet cells. See the file comment for each rule; every refusal
 * is a MooringInputError naming the row.
 */
export function cleanSeries(cells: readonly unknown[], options: CleanOptions = {}): CleanSeries {
  const name = options.name ?? 'series';
  const minLength = checkedMinLength(options.minLength);
  const firstRow = options.firstRow ?? 1;
  if (!Number.isInteger(firstRow)) throw new MooringInputError(`The first row number must be a whole number, not ${String(firstRow)}.`);
  const rowLabel = options.rowLabel ?? ((index: number) => `row ${firstRow + index}`);
  const subject = (index: number) => (options.name ? `${name} ${rowLabel(index)}` : capitalise(rowLabel(index)));
  const skipGaps = options.skipGaps === true;
  const gapWords = options.skipGapsWords ?? 'allow gaps';
  const log = options.log === true;
  if (cells == null || typeof cells.length !== 'number') {
    throw new MooringInputError(`${options.name ?? 'The series'} is not a range of cells: pass a column or a row of prices.`);
  }

  const end = endOfFilled(cells);
  let start = 0;
  while (start < end && isBlankCell(cells[start])) start++;

  const span = end - start;
  const values = new Float64Array(span);
  const rows = new Int32Array(span);
  const dropped: DroppedCell[] = [];
  let k = 0;
  let min = Infinity;
  let max = -Infinity;
  for (let i = start; i < end; i++) {
    const c = cells[i];
    if (typeof c === 'number' && c - c === 0) {
      if (log && c <= 0) {
        throw new MooringInputError(
          `${subject(i)} is ${c}: logs need positive values; remove or correct that row, or turn logs off.`, rowLabel(i));
      }
      values[k] = c;
      rows[k] = i;
      k++;
      if (c < min) min = c;
      if (c > max) max = c;
      continue;
    }
    const refusal = gapRefusal(c);
    if (refusal !== 'gap' || !skipGaps) {
      const what = describeCell(c);
      const fix = refusal === 'numericText' ? 'convert the column to numbers (numbers stored as text are not read)'
        : refusal === 'always' ? 'correct the calculation that produced it'
        : i === start && typeof c === 'string' ? `if it is a header, select only the numbers below it; otherwise clean it or ${gapWords}`
        : `clean it or ${gapWords}`;
      throw new MooringInputError(`${subject(i)} is ${what}: ${fix}.`, rowLabel(i));
    }
    dropped.push({ index: i, row: rowLabel(i), reason: describeCell(c) });
  }

  if (k === 0) {
    throw new MooringInputError(`${options.name ?? 'The series'} holds no numbers: select the range with the prices.`);
  }
  if (k < minLength) {
    const skipped = dropped.length > 0 ? ` after skipping ${dropped.length} gap${dropped.length === 1 ? '' : 's'}` : '';
    throw new MooringInputError(
      `${options.name ?? 'The series'} has ${k} usable value${k === 1 ? '' : 's'} (${rowLabel(rows[0])} to ${rowLabel(rows[k - 1])})${skipped}; ` +
        `at least ${minLength} are needed: select a longer history.`);
  }
  if (max - min <= NEAR_CONSTANT * Math.max(Math.abs(min), Math.abs(max))) {
    const of = options.name ? ` of ${name}` : '';
    throw new MooringInputError(max === min
      ? `All ${k} values${of} are ${formatValue(min)}: a constant series has no unit-root test and no regression; check that the range holds the prices.`
      : `The ${k} values${of} only vary between ${formatValue(min)} and ${formatValue(max)}: the series is numerically constant; check that the range holds the prices.`);
  }

  const outValues = k === span ? values : values.slice(0, k);
  if (log) for (let j = 0; j < k; j++) outValues[j] = Math.log(outValues[j]);
  refuseOverflow(outValues, rows, log, subject, rowLabel);
  return {
    name,
    values: outValues,
    rows: k === span ? rows : rows.slice(0, k),
    dropped,
    leadingBlanks: start,
    trailingBlanks: cells.length - end,
    gapsSkipped: skipGaps,
    logged: log,
    rowLabel,
  };
}

/**
 * One past the last non-blank cell: a backward scan kept in its own small function so the
 * engine optimises the loop early (two comparisons per blank cell in the common case).
 */
export function endOfFilled(cells: readonly unknown[]): number {
  let end = cells.length;
  while (end > 0) {
    const c = cells[end - 1];
    if (c === '' || c == null) {
      end--;
      continue;
    }
    if (typeof c === 'string' && isBlankCell(c)) {
      end--;
      continue;
    }
    break;
  }
  return end;
}

/**
 * Refuses a value too far above the rest to square (magnitude-range.ts): the first such row,
 * its value as typed, how far out it is, and what would work.
 */
function refuseOverflow(values: Float64Array, rows: Int32Array, logged: boolean, subject: (index: number) => string, rowLabel: (index: number) => string): void {
  const out = magnitudeOutlier(values);
  if (out === null) return;
  const shown = logged ? Math.exp(values[out.position]) : values[out.position];
  const more = out.count > 1 ? ` (${out.count - 1} more row${out.count === 2 ? ' is' : 's are'} as far out)` : '';
  const i = rows[out.position];
  throw new MooringInputError(
    `${subject(i)} is ${describeMagnitude(values[out.position], out.typical)}${logged ? ` in logs (the price is ${formatValue(shown)})` : ''}${more}: ` +
      'numbers this far apart overflow when the statistics square them, whatever the units. ' +
      'Correct that cell (a value this far out is a typing, unit or formula error), or clear it and skip the gap.', rowLabel(i));
}

/** How a non-number cell is treated: a gap, a gap that is never skipped, or numeric text. */
function gapRefusal(cell: unknown): 'gap' | 'always' | 'numericText' {
  const kind = cellKind(cell);
  return kind === 'nonfinite' ? 'always' : kind === 'numericText' ? 'numericText' : 'gap';
}

function checkedMinLength(value: number | undefined): number {
  if (value === undefined) return DEFAULT_MIN_LENGTH;
  if (!Number.isInteger(value) || value < 2) {
    throw new MooringInputError(`The fewest values must be a whole number of at least 2, not ${String(value)}.`);
  }
  return value;
}

/** A value for a message: as typed when short, else to 10 significant digits. */
export function formatValue(v: number): string {
  const s = String(v);
  if (s.length <= 12) return s;
  // Read back through Number only without an exponent: 1.797693135e+308 would round to Infinity.
  const p = v.toPrecision(10);
  return p.includes('e') ? p.replace(/\.?0+e/, 'e') : String(Number(p));
}

function capitalise(text: string): string {
  return text.length > 0 ? text[0].toUpperCase() + text.slice(1) : text;
}
