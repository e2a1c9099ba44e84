/**
 * What one row of the data is, found once from the dates, for every half-life, lag and window
 * a surface reports ("half its gap in about 12 days"). From the dates (ISO text; a time of day
 * is allowed): the median gap between consecutive dates in calendar days. Up to 4 days is a
 * day (business-day data skip weekends and holidays, so their gaps are 1 to 4; with no date on
 * a Saturday or Sunday the spacing is "business days", else "calendar days"); 5 to 10 a week;
 * 26 to 35 a month; 80 to 100 a quarter; 350 to 380 a year. Anything else (intraday prices,
 * irregular dates), or no dates, leaves the neutral word "row".
 */
import { isoDayNumber } from '../dates/read-dates';

/** The unit of every half-life in JSON: the plural of the period, or "rows". */
export type HalfLifeUnit = 'days' | 'weeks' | 'months' | 'quarters' | 'years' | 'rows';

/** The period word and how it was found. */
export interface RowPeriod {
  /** Singular word for sentences: "day", "week", "month", "quarter", "year", or "row". */
  period: string;
  /** How the word was found, in words. */
  source: string;
  /** The unit of half-lives, lags and windows in JSON. */
  unit: HalfLifeUnit;
  /** The spacing found: "business days", "calendar days", "weeks", ...; "rows" without dates. */
  spacing: string;
}

const RANGES: readonly { from: number; to: number; word: string; unit: HalfLifeUnit }[] = [
  { from: 0.5, to: 4, word: 'day', unit: 'days' },
  { from: 5, to: 10, word: 'week', unit: 'weeks' },
  { from: 26, to: 35, word: 'month', unit: 'months' },
  { from: 80, to: 100, word: 'quarter', unit: 'quarters' },
  { from: 350, to: 380, word: 'year', unit: 'years' },
];

const UNIT_OF_WORD: Record<string, HalfLifeUnit> = Object.fromEntries(RANGES.map((r) => [r.word, r.unit]));

/** The period of the rows: the given word, else one found from the dates, else "row". */
export function rowPeriod(dates: readonly (string | null)[] | null, given?: string): RowPeriod {
  if (given !== undefined && given.trim() !== '') {
    const word = given.trim();
    const singular = word.toLowerCase().replace(/s$/, '');
    return { period: word, source: 'as given', unit: UNIT_OF_WORD[singular] ?? 'rows', spacing: `${word}s (as given)` };
  }
  const days = dayNumbers(dates);
  if (days === null) return { period: 'row', source: 'no dates to tell the spacing of the rows', unit: 'rows', spacing: 'rows' };
  const gaps: number[] = [];
  for (let i = 1; i < days.length; i++) gaps.push(days[i] - days[i - 1]);
  gaps.sort((a, b) => a - b);
  const median = gaps[Math.floor(gaps.length / 2)];
  const hit = RANGES.find((r) => median >= r.from && median <= r.to);
  const shown = Number(median.toFixed(3));
  if (!hit) {
    return { period: 'row', source: `the dates are ${shown} days apart (median), which matches no calendar period`, unit: 'rows', spacing: 'rows' };
  }
  let spacing = `${hit.word}s`;
  if (hit.word === 'day') spacing = days.some((d) => isWeekend(d)) ? 'calendar days' : 'business days';
  return {
    period: hit.word,
    source: `found from the dates: ${spacing}, median gap ${shown} calendar day${shown === 1 ? '' : 's'}`,
    unit: hit.unit,
    spacing,
  };
}

/** Whether a day number (days since 1970-01-01, a Thursday) falls on a Saturday or Sunday. */
function isWeekend(day: number): boolean {
  const weekday = ((Math.floor(day) % 7) + 7 + 4) % 7; // 0 = Sunday
  return weekday === 0 || weekday === 6;
}

/** Day numbers of the ISO dates, or null unless every date reads and they increase. */
function dayNumbers(dates: readonly (string | null)[] | null): number[] | null {
  if (dates === null || dates.length < 2) return null;
  const out: number[] = [];
  for (const d of dates) {
    const day = d ? isoDayNumber(d) : null;
    if (day === null) return null;
    if (out.length > 0 && day <= out[out.length - 1]) return null;
    out.push(day);
  }
  return out;
}
