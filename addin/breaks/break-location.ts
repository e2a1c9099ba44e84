/**
 * Where a one-time break sits, in the same words for every break test: the last observation
 * of the old regime, the first observation the break affects, and a label for people.
 * Also the trimming rule that keeps candidate dates away from the ends of the sample.
 */
import { MooringInputError } from '../errors';

/** Share of the sample kept free of candidate breaks at each end, unless the caller says otherwise. */
export const DEFAULT_TRIM = 0.15;

/** A break located in a series of T observations (indexes 0-based into the series as passed). */
export interface BreakLocation {
  /** Index of the last observation of the old regime. */
  lastBefore: number;
  /** Index of the first observation the break affects (lastBefore + 1). */
  firstAfter: number;
  /** The first affected observation as people see it: rowLabel(firstAfter), else "row <firstAfter + 1>". */
  label: string;
  /** The last observation of the old regime as people see it: rowLabel(lastBefore), else "row <lastBefore + 1>". */
  lastBeforeLabel: string;
  /** Share of the sample before the break: firstAfter / T. */
  fraction: number;
}

/** Maps an index of the series (0-based) to a row or date label; the default is "row <index + 1>". */
export type RowLabel = (index: number) => string;

/** The default label: the 1-based position in the series. */
export function defaultRowLabel(index: number): string {
  return `row ${index + 1}`;
}

/** The location of a break whose old regime ends at lastBefore, in a sample of T observations. */
export function breakLocation(lastBefore: number, T: number, rowLabel: RowLabel = defaultRowLabel): BreakLocation {
  const firstAfter = lastBefore + 1;
  return { lastBefore, firstAfter, label: rowLabel(firstAfter), lastBeforeLabel: rowLabel(lastBefore), fraction: firstAfter / T };
}

/**
 * Refuses a trimming share outside (0, 0.5): at 0 the first and last candidate dates leave no
 * observation in one regime, and at 0.5 or more no candidate is left.
 */
export function requireTrim(trim: unknown): number {
  if (typeof trim !== 'number' || !Number.isFinite(trim) || !(trim > 0 && trim < 0.5)) {
    throw new MooringInputError(
      `The trim must be a share of the sample strictly between 0 and 0.5 (0.15 is usual); got ${String(trim)}.`,
    );
  }
  return trim;
}

/** floor(trim T): the observations kept free of candidate breaks at each end. */
export function trimmedCount(T: number, trim: number): number {
  return Math.floor(trim * T);
}

/** Refuses anything but a list of finite numbers, naming the first bad position. */
export function requireFiniteSeries(series: unknown, name: string): ArrayLike<number> {
  if (series === null || typeof series !== 'object' || typeof (series as ArrayLike<number>).length !== 'number') {
    throw new MooringInputError(`${name} is not a list of numbers.`);
  }
  const s = series as ArrayLike<number>;
  for (let i = 0; i < s.length; i++) {
    if (typeof s[i] !== 'number' || !Number.isFinite(s[i])) {
      throw new MooringInputError(
        `${name} has no number at position ${i + 1} (${String(s[i])}): fill or drop the gap before testing.`,
        `${name}, position ${i + 1}`,
      );
    }
  }
  return s;
}

/** Warning when the chosen date is the first or last candidate: the best break may lie in the trimmed ends. */
export function edgeOfSearchWarning(location: BreakLocation, first: number, last: number): string | null {
  if (location.lastBefore !== first && location.lastBefore !== last) return null;
  return (
    `The most likely break date (${location.label}) is at the edge of the dates searched; ` +
    'a break nearer the start or end of the sample is possible but cannot be tested with this trim.'
  );
}
