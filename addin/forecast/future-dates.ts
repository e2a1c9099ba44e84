/**
 * Dates for the rows after the last one, in the data's own spacing (report/row-period.ts): business
 * days skip Saturdays and Sundays, calendar days step by one, weeks by seven, months, quarters and
 * years by the calendar (the day of the month kept, or the month's last day when it has fewer).
 * Without dates, or with a spacing that matches no calendar period, there are none (null).
 */
import { isoDayNumber, isoText } from '../dates/read-dates';
import { rowPeriod } from '../report/row-period';

const DAY_MS = 86_400_000;

function weekday(day: number): number {
  return ((Math.floor(day) % 7) + 7 + 4) % 7; // 0 = Sunday
}

function addMonths(day: number, months: number, anchorDayOfMonth: number): number {
  const d = new Date(Math.round(day * DAY_MS));
  const y = d.getUTCFullYear();
  const m = d.getUTCMonth() + months;
  const last = new Date(Date.UTC(y, m + 1, 0)).getUTCDate();
  const time = day - Math.floor(day);
  return Date.UTC(y, m, Math.min(anchorDayOfMonth, last)) / DAY_MS + time;
}

/** The next `count` dates after the last of `dates`, or null when the spacing is not a calendar one. */
export function futureDates(dates: readonly (string | null)[] | null, count: number): string[] | null {
  const spacing = rowPeriod(dates).spacing;
  const lastText = dates?.[dates.length - 1];
  const last = lastText ? isoDayNumber(lastText) : null;
  if (last === null) return null;
  const anchor = new Date(Math.round(last * DAY_MS)).getUTCDate();
  const out: string[] = [];
  let day = last;
  for (let h = 1; h <= count; h++) {
    switch (spacing) {
      case 'business days':
        do day += 1; while (weekday(day) === 0 || weekday(day) === 6);
        break;
      case 'calendar days': day += 1; break;
      case 'weeks': day += 7; break;
      case 'months': day = addMonths(last, h, anchor); break;
      case 'quarters': day = addMonths(last, 3 * h, anchor); break;
      case 'years': day = addMonths(last, 12 * h, anchor); break;
      default: return null;
    }
    out.push(isoText(day));
  }
  return out;
}
