/**
 * What one row of the data is, for sentences like "half its gap in about 12 days". From ISO
 * dates: the median gap between consecutive dates in calendar days. Up to 4 days is a day
 * (business-day data skip weekends and holidays, so their gaps are 1 to 4); 5 to 10 a week;
 * 26 to 35 a month; 80 to 100 a quarter; 350 to 380 a year. Anything else, or no dates,
 * leaves the neutral word "row".
 */

/** The period word and how it was found. */
export interface RowPeriod {
  period: string;
  source: string;
}

const RANGES: readonly { from: number; to: number; word: string }[] = [
  { from: 0.5, to: 4, word: 'day' },
  { from: 5, to: 10, word: 'week' },
  { from: 26, to: 35, word: 'month' },
  { from: 80, to: 100, word: 'quarter' },
  { from: 350, to: 380, word: 'year' },
];

/** The period of the rows: the given word, else one found from the dates, else "row". */
export function rowPeriod(dates: readonly string[] | null, given?: string): RowPeriod {
  if (given !== undefined && given.trim() !== '') return { period: given.trim(), source: 'as given' };
  const days = dayNumbers(dates);
  if (days === null) return { period: 'row', source: 'no dates to tell the spacing of the rows' };
  const gaps: number[] = [];
  for (let i = 1; i < days.length; i++) gaps.push(days[i] - days[i - 1]);
  gaps.sort((a, b) => a - b);
  const median = gaps[Math.floor(gaps.length / 2)];
  const hit = RANGES.find((r) => median >= r.from && median <= r.to);
  if (!hit) return { period: 'row', source: `the dates are ${median} days apart (median), which matches no calendar period` };
  return { period: hit.word, source: `found from the dates: median gap ${median} calendar day${median === 1 ? '' : 's'}` };
}

/** Days since 1970 of each ISO date, or null unless every date reads and they increase. */
function dayNumbers(dates: readonly string[] | null): number[] | null {
  if (dates === null || dates.length < 2) return null;
  const out: number[] = [];
  for (const d of dates) {
    const m = /^(\d{4})-(\d{2})-(\d{2})/.exec(d ?? '');
    if (!m) return null;
    const t = Date.UTC(Number(m[1]), Number(m[2]) - 1, Number(m[3]));
    if (!Number.isFinite(t)) return null;
    const day = t / 86_400_000;
    if (out.length > 0 && day <= out[out.length - 1]) return null;
    out.push(day);
  }
  return out;
}
