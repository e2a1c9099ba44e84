/**
 * Reads the values of command-line options: choice words (case-insensitive), whole numbers,
 * lag and bandwidth choices, a significance level. Each wrong value is refused with the
 * allowed ones.
 */
import { MooringInputError } from '../errors';

/** A choice word, matched without regard to case; undefined when the option was not given. */
export function choiceValue<T extends string>(option: string, raw: string | undefined, allowed: readonly T[]): T | undefined {
  if (raw === undefined) return undefined;
  const word = raw.trim().toLowerCase();
  const hit = allowed.find((a) => a.toLowerCase() === word);
  if (hit === undefined) throw new MooringInputError(`--${option} must be one of ${allowed.join(', ')}, not '${raw}'.`);
  return hit;
}

/** A whole number of at least 0 (digits only); undefined when the option was not given. */
export function wholeNumberValue(option: string, raw: string | undefined, meaning: string): number | undefined {
  if (raw === undefined) return undefined;
  const t = raw.trim();
  if (!/^\d{1,6}$/.test(t)) throw new MooringInputError(`--${option} must be a whole number of ${meaning} (0, 1, 2, ...), not '${raw}'.`);
  return Number(t);
}

/** A whole number or one of the rule words: `--lags 4` or `--lags aic`. */
export function countOrWordValue<T extends string>(option: string, raw: string | undefined, meaning: string, words: readonly T[]): number | T | undefined {
  if (raw === undefined) return undefined;
  const t = raw.trim().toLowerCase();
  const word = words.find((w) => w === t);
  if (word !== undefined) return word;
  if (/^\d{1,6}$/.test(t)) return Number(t);
  throw new MooringInputError(`--${option} must be a whole number of ${meaning} (0, 1, 2, ...) or one of ${words.join(', ')}, not '${raw}'.`);
}

/** A significance level strictly between 0 and 0.5, as a decimal (0.05) or a percentage (5%). */
export function levelValue(option: string, raw: string | undefined): number | undefined {
  if (raw === undefined) return undefined;
  const t = raw.trim();
  const percent = t.endsWith('%');
  const body = percent ? t.slice(0, -1) : t;
  const v = /^(\d+\.?\d*|\.\d+)$/.test(body) ? Number(body) / (percent ? 100 : 1) : NaN;
  if (!(v > 0 && v < 0.5)) throw new MooringInputError(`--${option} must be a level between 0 and 0.5, such as 0.05 or 5%, not '${raw}'.`);
  return v;
}
