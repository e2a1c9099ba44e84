/**
 * Reads a column of dates as written by people and programs: ISO 8601 dates and date-times
 * (2024-03-15, 2024-03-15T16:30), day/month/year and month/day/year text (15/03/2024,
 * 3/15/2024, 15.03.24), and spreadsheet serial day numbers (45366). Every date becomes a day
 * number (days since 1970-01-01, with the time of day as a fraction) and a canonical ISO text,
 * so later steps compare, sort and join dates without caring how they were written.
 *
 * Day/month order is decided from the data: a first part above 12 means day first, a second
 * part above 12 month first. When every part is 12 or less, the order that puts the dates in
 * a steady sequence (rising or falling) is taken if only one of the two does; otherwise the
 * column is refused with the option that settles it. Serial numbers are taken as dates only
 * when the caller says so (a header that names a date, or the user naming the column), since
 * a column of numbers is otherwise a price.
 *
 * Serial numbers count days in the 1900 date system of spreadsheets: serial 25569 is
 * 1970-01-01 (Microsoft, "Date systems in Excel"); serials before 61 (the spreadsheet's
 * fictitious 29 February 1900) are refused as too early for price data.
 */
import { MooringInputError } from '../errors';

/** How the dates of a column were written. */
export type DateStyle = 'iso' | 'dmy' | 'mdy' | 'serial';

/** A column of dates read. */
export interface DateColumn {
  style: DateStyle;
  /** Days since 1970-01-01 (UTC), time of day as a fraction; one per field. */
  days: number[];
  /** The dates as ISO text: 2024-03-15, or 2024-03-15 16:30 when a time was given. */
  iso: string[];
}

/** What a caller allows when reading a column. */
export interface DateReadOptions {
  /** Read plain numbers as spreadsheet serial day numbers. */
  serial?: boolean;
  /** Settles day/month order for slash dates: 'dmy' or 'mdy'. */
  order?: 'dmy' | 'mdy';
  /** Names the column and its rows in messages. */
  name?: string;
  rowLabel?: (index: number) => string;
  /** The words that settle the day/month order on this surface ("--date-order dmy"). */
  orderHint?: string;
}

/** Days from 1970-01-01 to the spreadsheet's serial 0 (30 December 1899). */
const SERIAL_EPOCH = 25569;
const MS_PER_DAY = 86_400_000;

const ISO = /^(\d{4})[-/](\d{1,2})[-/](\d{1,2})(?:[T ](\d{1,2}):(\d{2})(?::(\d{2})(?:\.\d+)?)?(Z|[+-]\d{2}:?\d{2})?)?$/;
const SLASH = /^(\d{1,2})[/.-](\d{1,2})[/.-](\d{4}|\d{2})(?:[T ](\d{1,2}):(\d{2})(?::(\d{2}))?)?$/;
const SERIAL = /^\d{2,6}(\.\d+)?$/;

/** The day number of a calendar date and time, or null when the date does not exist. */
function dayNumber(year: number, month: number, day: number, hour = 0, minute = 0, second = 0): number | null {
  if (month < 1 || month > 12 || day < 1 || day > 31 || hour > 23 || minute > 59 || second > 59) return null;
  const t = Date.UTC(year, month - 1, day, hour, minute, second);
  const back = new Date(t);
  if (back.getUTCDate() !== day || back.getUTCMonth() !== month - 1) return null;
  return t / MS_PER_DAY;
}

/** A day number as ISO text, with the time only when it is not midnight. */
export function isoText(days: number): string {
  const t = Math.round(days * MS_PER_DAY / 1000) * 1000;
  const s = new Date(t).toISOString();
  const time = s.slice(11, 16);
  return s.slice(11, 19) === '00:00:00' ? s.slice(0, 10) : `${s.slice(0, 10)} ${time}`;
}

/** One ISO date or date-time as a day number (the zone, if any, is applied); null when not one. */
export function isoDayNumber(text: string): number | null {
  const m = ISO.exec(text.trim());
  if (!m) return null;
  const day = dayNumber(+m[1], +m[2], +m[3], m[4] ? +m[4] : 0, m[5] ? +m[5] : 0, m[6] ? +m[6] : 0);
  if (day === null) return null;
  const zone = m[7];
  if (!zone || zone === 'Z') return day;
  const z = /^([+-])(\d{2}):?(\d{2})$/.exec(zone) as RegExpExecArray;
  const offset = (z[1] === '-' ? -1 : 1) * (+z[2] * 60 + +z[3]) / 1440;
  return day - offset;
}

/** A spreadsheet serial day number as a day number; null outside 61 .. 2958465 (year 9999). */
export function serialDayNumber(serial: number): number | null {
  if (!(serial >= 61 && serial <= 2958465)) return null;
  return serial - SERIAL_EPOCH;
}

function fullYear(text: string): number {
  const y = Number(text);
  return text.length === 2 ? (y < 70 ? 2000 + y : 1900 + y) : y;
}

/** Whether a text looks like a date of some style (used to find date columns by content). */
export function looksLikeDateText(text: string): boolean {
  const t = text.trim();
  return ISO.test(t) || SLASH.test(t);
}

/**
 * Reads every field of a column as a date, or throws a MooringInputError naming the first
 * field that is not one. Blank fields are refused too: a row without a date cannot be placed.
 */
export function readDateColumn(fields: readonly string[], options: DateReadOptions = {}): DateColumn {
  const name = options.name ?? 'the date column';
  const label = options.rowLabel ?? ((i: number) => `row ${i + 1}`);
  const texts = fields.map((f) => f.trim());
  const blank = texts.findIndex((t) => t === '');
  if (blank >= 0) throw new MooringInputError(`${capital(label(blank))} has no date in ${name}: fill it in or delete the row.`, label(blank));
  if (texts.every((t) => ISO.test(t))) {
    const days = texts.map((t, i) => {
      const d = isoDayNumber(t);
      if (d === null) throw new MooringInputError(`${capital(label(i))}: '${t}' in ${name} is not a calendar date: correct it.`, label(i));
      return d;
    });
    return { style: 'iso', days, iso: days.map(isoText) };
  }
  if (texts.every((t) => SLASH.test(t))) return readSlashDates(texts, name, label, options);
  if (options.serial && texts.every((t) => SERIAL.test(t))) {
    const days = texts.map((t, i) => {
      const d = serialDayNumber(Number(t));
      if (d === null) throw new MooringInputError(`${capital(label(i))}: ${t} in ${name} is not a spreadsheet day number of a date after March 1900: correct it.`, label(i));
      return d;
    });
    return { style: 'serial', days, iso: days.map(isoText) };
  }
  const odd = texts.findIndex((t) => !ISO.test(t) && !SLASH.test(t) && !(options.serial && SERIAL.test(t)));
  const at = odd >= 0 ? odd : 0;
  throw new MooringInputError(
    `${capital(label(at))}: '${texts[at]}' in ${name} is not a date Mooring reads, or the column mixes styles: write every date one way, ` +
      `as 2024-03-15, 15/03/2024, 03/15/2024${options.serial ? ' or a spreadsheet day number' : ''}.`, label(at));
}

function readSlashDates(texts: string[], name: string, label: (i: number) => string, options: DateReadOptions): DateColumn {
  const parts = texts.map((t) => SLASH.exec(t) as RegExpExecArray);
  const firstOver = parts.findIndex((m) => +m[1] > 12);
  const secondOver = parts.findIndex((m) => +m[2] > 12);
  if (firstOver >= 0 && secondOver >= 0 && !options.order) {
    throw new MooringInputError(
      `${name} holds '${texts[firstOver]}' (${label(firstOver)}) and '${texts[secondOver]}' (${label(secondOver)}): one has the day first, the other the month first; write every date one way, or as 2024-03-15.`);
  }
  const read = (order: 'dmy' | 'mdy'): number[] | null => {
    const out: number[] = [];
    for (const m of parts) {
      const [d, mo] = order === 'dmy' ? [+m[1], +m[2]] : [+m[2], +m[1]];
      const v = dayNumber(fullYear(m[3]), mo, d, m[4] ? +m[4] : 0, m[5] ? +m[5] : 0, m[6] ? +m[6] : 0);
      if (v === null) return null;
      out.push(v);
    }
    return out;
  };
  let order = options.order ?? (firstOver >= 0 ? 'dmy' : secondOver >= 0 ? 'mdy' : null);
  if (order === null) {
    const dmy = read('dmy');
    const mdy = read('mdy');
    const dmySteady = dmy !== null && steady(dmy);
    const mdySteady = mdy !== null && steady(mdy);
    if (dmySteady !== mdySteady) order = dmySteady ? 'dmy' : 'mdy';
    else {
      throw new MooringInputError(
        `The dates in ${name} (such as '${texts[0]}') could be day/month/year or month/day/year and the data do not tell which: ` +
          `${options.orderHint ?? 'say which'}, or write them as 2024-03-15.`);
    }
  }
  const days = read(order);
  if (days === null) {
    const o = order;
    const bad = parts.findIndex((m) => dayNumber(fullYear(m[3]), o === 'dmy' ? +m[2] : +m[1], o === 'dmy' ? +m[1] : +m[2]) === null);
    throw new MooringInputError(
      `${capital(label(Math.max(0, bad)))}: '${texts[Math.max(0, bad)]}' in ${name} is not a date when read as ${o === 'dmy' ? 'day/month/year' : 'month/day/year'}: correct it.`, label(Math.max(0, bad)));
  }
  return { style: order, days, iso: days.map(isoText) };
}

/** Strictly rising or strictly falling with steps of at most about a quarter: a plausible price calendar. */
function steady(days: readonly number[]): boolean {
  if (days.length < 2) return true;
  const up = days[1] > days[0];
  for (let i = 1; i < days.length; i++) {
    const step = days[i] - days[i - 1];
    if ((up ? step <= 0 : step >= 0) || Math.abs(step) > 100) return false;
  }
  return true;
}

function capital(text: string): string {
  return text.length > 0 ? text[0].toUpperCase() + text.slice(1) : text;
}
