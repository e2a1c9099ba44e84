/**
 * The date reader, the order rule, the dialect finder and the spacing of dates, on small
 * tables written here. Calendar facts are checked against the proleptic Gregorian calendar of
 * JavaScript's Date (ECMA-262, "Time Values and Time Range"); the spreadsheet serial numbers
 * against Microsoft's "Date systems in Excel" (the 1900 system: serial 1 is 1 January 1900,
 * and serials from 61 on count days from 30 December 1899).
 */
import { describe, expect, it } from 'vitest';
import { findDialect, toPointDecimal } from '../../addin/csv/dialect';
import { readCsv } from '../../addin/csv/read-csv';
import { dateDirection } from '../../addin/dates/date-order';
import { isoDayNumber, readDateColumn, serialDayNumber } from '../../addin/dates/read-dates';
import { rowPeriod } from '../../addin/report/row-period';

const refusal = (f: () => unknown): string => {
  try {
    f();
  } catch (e) {
    return (e as Error).message;
  }
  throw new Error('expected a refusal');
};

describe('readDateColumn', () => {
  it('reads ISO dates and date-times, with a zone applied', () => {
    const c = readDateColumn(['2024-03-15', '2024-03-15T16:30', '2024-03-16T01:00+02:00']);
    expect(c.style).toBe('iso');
    expect(c.iso).toEqual(['2024-03-15', '2024-03-15 16:30', '2024-03-15 23:00']);
    expect(c.days[0]).toBe(Date.UTC(2024, 2, 15) / 86_400_000);
  });

  it('spreadsheet serial 45366 is 2024-03-15, and 61 is 1900-03-01 (Microsoft, "Date systems in Excel")', () => {
    expect(readDateColumn(['45366', '61'], { serial: true }).iso).toEqual(['2024-03-15', '1900-03-01']);
    expect(serialDayNumber(60)).toBeNull();
  });

  it('serial numbers are dates only when the caller says so', () => {
    expect(refusal(() => readDateColumn(['45366', '45367']))).toMatch(/is not a date Mooring reads/);
  });

  it('a part above 12 settles day/month/year or month/day/year', () => {
    expect(readDateColumn(['01/03/2024', '13/03/2024']).style).toBe('dmy');
    expect(readDateColumn(['03/01/2024', '03/13/2024']).style).toBe('mdy');
    expect(readDateColumn(['01/03/2024', '13/03/2024']).iso).toEqual(['2024-03-01', '2024-03-13']);
  });

  it('dates with every part 12 or less are settled by which reading runs steadily, and only then', () => {
    // Day first: 2 Mar, 1 Apr, 3 May. Month first: 3 Feb, 4 Jan, 5 Mar, which goes back and forth.
    expect(readDateColumn(['02/03/2024', '01/04/2024', '03/05/2024']).style).toBe('dmy');
    // 1 to 10 March day first is also the 3rd of January to October month first: both steady, so refused.
    const days = Array.from({ length: 10 }, (_, i) => `${String(i + 1).padStart(2, '0')}.03.2024`);
    expect(refusal(() => readDateColumn(days))).toMatch(/the data do not tell which/);
  });

  it('refuses what cannot be settled, a column of mixed orders, a blank date, a date that does not exist', () => {
    expect(refusal(() => readDateColumn(['01/01/2024', '02/02/2024'], { orderHint: 'say which' }))).toMatch(/could be day\/month\/year or month\/day\/year and the data do not tell which: say which/);
    expect(refusal(() => readDateColumn(['13/01/2024', '01/13/2024']))).toMatch(/one has the day first, the other the month first/);
    expect(refusal(() => readDateColumn(['2024-03-15', ' ']))).toMatch(/^Row 2 has no date/);
    expect(refusal(() => readDateColumn(['2024-02-30']))).toMatch(/is not a calendar date/);
  });

  it('isoDayNumber reads what the window and the spacing compare', () => {
    expect(isoDayNumber('2024-03-15')).toBe(Date.UTC(2024, 2, 15) / 86_400_000);
    expect(isoDayNumber('15/03/2024')).toBeNull();
  });
});

describe('dateDirection', () => {
  const label = (i: number) => `row ${i + 1}`;
  it('rising, falling, repeated, shuffled', () => {
    expect(dateDirection([1, 2, 5], label, 'x')).toBe('oldest first');
    expect(dateDirection([5, 2, 1], label, 'x')).toBe('newest first');
    expect(refusal(() => dateDirection([1, 2, 2, 3], label, 'x'))).toBe('Row 3 repeats the date of row 2 in x: each date may appear once; remove or merge the repeated rows.');
    expect(refusal(() => dateDirection([1, 3, 2, 4], label, 'x'))).toBe('The dates in x are not in order: row 3 goes back in time after row 2, though the rows before run oldest first; sort the rows by date (oldest or newest first).');
    expect(refusal(() => dateDirection([1, 2, 3, 1], label, 'x'))).toBe('Row 4 repeats the date of row 1 in x: each date may appear once; remove or merge the repeated rows.');
  });
});

describe('dialects', () => {
  it('semicolons with decimal commas are found and read as numbers with points', () => {
    const t = readCsv('Datum;Preis;Menge\n15.03.2024;1.234,5;7\n18.03.2024;-0,25;8\n');
    expect(t.dialect).toEqual({ delimiter: ';', decimal: ',', found: true });
    expect(t.columns[1]).toEqual(['1234.5', '-0.25']);
    expect(t.notices).toEqual(['Read as semicolon-separated values with decimal commas (found from the file).']);
    expect(t.dateIndex).toBe(0);
  });

  it('tabs are found; semicolons with points keep points', () => {
    expect(findDialect('a\tb\n1.5\t2\n')).toEqual({ delimiter: '\t', decimal: '.', found: true });
    expect(findDialect('a;b\n1.5;2\n')).toEqual({ delimiter: ';', decimal: '.', found: true });
    expect(findDialect('a,b\n1,2\n')).toEqual({ delimiter: ',', decimal: '.', found: true });
  });

  it('a given dialect wins', () => {
    expect(findDialect('a;b\n1,5;2\n', { delimiter: ';', decimal: '.' })).toEqual({ delimiter: ';', decimal: '.', found: false });
  });

  it('only numbers are rewritten', () => {
    expect(toPointDecimal('1.234.567')).toBe('1234567');
    expect(toPointDecimal('15.03.2024')).toBe('15.03.2024');
    expect(toPointDecimal('n/a')).toBe('n/a');
  });
});

describe('date columns in a table', () => {
  it('a header that names a date with serial numbers is a date column; plain numbers under other headers are not', () => {
    expect(readCsv('Trade Date,x\n45366,1\n45369,2\n').dateColumn).toBe('Trade Date');
    expect(readCsv('Year,x\n2020,1\n2021,2\n').dateColumn).toBeNull();
    expect(readCsv('when,x\n15/03/2024,1\n18/03/2024,2\n').dateColumn).toBe('when');
  });
});

describe('rowPeriod: the spacing of the dates', () => {
  const dates = (start: string, step: number, n: number, skipWeekends = false): string[] => {
    const out: string[] = [];
    let t = Date.parse(start);
    while (out.length < n) {
      const d = new Date(t);
      if (!skipWeekends || (d.getUTCDay() !== 0 && d.getUTCDay() !== 6)) out.push(d.toISOString().slice(0, 10));
      t += step * 86_400_000;
    }
    return out;
  };
  it('business days, calendar days, weeks, months, none', () => {
    expect(rowPeriod(dates('2024-01-01', 1, 60, true))).toMatchObject({ period: 'day', unit: 'days', spacing: 'business days' });
    expect(rowPeriod(dates('2024-01-01', 1, 60))).toMatchObject({ period: 'day', unit: 'days', spacing: 'calendar days' });
    expect(rowPeriod(dates('2024-01-01', 7, 60))).toMatchObject({ period: 'week', unit: 'weeks', spacing: 'weeks' });
    const months = Array.from({ length: 36 }, (_, i) => new Date(Date.UTC(2020, i, 1)).toISOString().slice(0, 10));
    expect(rowPeriod(months)).toMatchObject({ period: 'month', unit: 'months' });
    expect(rowPeriod(null)).toMatchObject({ period: 'row', unit: 'rows', spacing: 'rows' });
    expect(rowPeriod(null, 'week')).toMatchObject({ unit: 'weeks' });
  });
});
