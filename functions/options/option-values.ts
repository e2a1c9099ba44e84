/**
 * The one parser of option arguments for every Mooring function. Options arrive as Excel
 * passes an `any` cell value: null when the argument is left out ("Custom functions parameter
 * options": an omitted optional parameter is null), a number, text, a logical value, or an
 * error value. Words are matched without regard to case; a wrong value is refused with the
 * allowed ones, so the cell's message says what would work.
 */
import { MooringInputError } from '../../addin/errors';
import { describeCell, isBlankCell } from '../../addin/series/cell-kinds';
import { parsePreparation, type Preparation } from '../../addin/series/preparation';

/** True when the argument was left out (null, undefined) or points at a blank cell. */
export function isOmitted(value: unknown): boolean {
  return isBlankCell(value);
}

function shown(value: unknown): string {
  return typeof value === 'string' ? `'${value}'` : describeCell(value);
}

/** A word from `allowed` (any case); `fallback` when the argument is left out. */
export function optionWord<T extends string>(option: string, value: unknown, allowed: readonly T[], fallback: T): T {
  if (isOmitted(value)) return fallback;
  if (typeof value === 'string') {
    const word = value.trim().toLowerCase();
    const hit = allowed.find((a) => a.toLowerCase() === word);
    if (hit !== undefined) return hit;
  }
  throw new MooringInputError(`${option} must be one of ${allowed.join(', ')}; got ${shown(value)}.`);
}

/** A whole number of at least `min` given as a number or as digits; `fallback` when left out. */
export function wholeNumber<F extends number | undefined>(option: string, value: unknown, fallback: F, meaning: string, min = 0): number | F {
  if (isOmitted(value)) return fallback;
  const n = typeof value === 'number' ? value : typeof value === 'string' && /^\s*\d{1,7}\s*$/.test(value) ? Number(value) : NaN;
  if (!Number.isInteger(n) || n < min) {
    throw new MooringInputError(`${option} must be a whole number of ${meaning}, ${min} or more; got ${shown(value)}.`);
  }
  return n;
}

/** A whole number (of at least `min`) or one of `words`; `fallback` when left out. */
export function countOrWord<T extends string>(option: string, value: unknown, words: readonly T[], fallback: number | T, meaning: string, min = 0): number | T {
  if (isOmitted(value)) return fallback;
  if (typeof value === 'string') {
    const word = value.trim().toLowerCase();
    const hit = words.find((w) => w.toLowerCase() === word);
    if (hit !== undefined) return hit;
    if (/^\s*\d{1,7}\s*$/.test(value) && Number(value) >= min) return Number(value);
  }
  if (typeof value === 'number' && Number.isInteger(value) && value >= min) return value;
  throw new MooringInputError(`${option} must be a whole number of ${meaning} (${min} or more) or one of ${words.join(', ')}; got ${shown(value)}.`);
}

/** A significance level strictly between 0 and 0.5, as a decimal (0.05) or a percentage (5% or "5%"); `fallback` when left out. */
export function levelValue(option: string, value: unknown, fallback: number): number {
  if (isOmitted(value)) return fallback;
  let v = NaN;
  if (typeof value === 'number') v = value;
  else if (typeof value === 'string') {
    const t = value.trim();
    const percent = t.endsWith('%');
    const body = percent ? t.slice(0, -1).trim() : t;
    if (/^(\d+\.?\d*|\.\d+)$/.test(body)) v = Number(body) / (percent ? 100 : 1);
  }
  if (!(v > 0 && v < 0.5)) {
    throw new MooringInputError(`${option} must be a level between 0 and 0.5, such as 0.05 or 5%; got ${shown(value)}.`);
  }
  return v;
}

/** A finite number (or decimal text); undefined when left out. */
export function decimalValue(option: string, value: unknown, meaning: string): number | undefined {
  if (isOmitted(value)) return undefined;
  const n = typeof value === 'number' ? value
    : typeof value === 'string' && /^\s*[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?\s*$/.test(value) ? Number(value) : NaN;
  if (!Number.isFinite(n)) throw new MooringInputError(`${option} must be a number (${meaning}); got ${shown(value)}.`);
  return n;
}

/** The last argument of every function that reads prices: how to prepare them (addin/series/preparation.ts). */
export function prepValue(value: unknown): Preparation {
  // A reference to one cell may arrive as a 1 x 1 range (the results block points every
  // formula at its one preparation cell).
  const single = Array.isArray(value) && value.length === 1 && Array.isArray(value[0]) && value[0].length === 1 ? value[0][0] : value;
  return parsePreparation(isOmitted(single) ? null : single, 'prep');
}
