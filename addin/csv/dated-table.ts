/**
 * Prices as they arrive, made into one table on one calendar: the date columns of one or
 * several CSV files are read (dates.ts), each calendar is checked for order (newest first is
 * put in date order and said; repeats and shuffles are refused), and several calendars (several
 * files, or several date columns in one file) are joined on their dates (join-on-dates.ts).
 * What was done is returned as notices for every surface to show. The result is an ordinary
 * CsvTable whose date column holds ISO dates, oldest first, so the commands need no change.
 *
 * Series columns belong to the nearest date column on their left (the first date column for
 * columns before it): the layout of price histories pasted side by side.
 */
import { dateDirection } from '../dates/date-order';
import { joinOnDates, type DatedGroup } from '../dates/join-on-dates';
import { looksLikeDateText, readDateColumn, type DateColumn } from '../dates/read-dates';
import { MooringInputError } from '../errors';
import { findDateColumns, headerNamesDate, DATE_HEADER_WORDS } from './date-column';
import type { CsvTable } from './read-csv';

/** One file as read. */
export interface SourceTable {
  /** The file name as the user gave it. */
  file: string;
  table: CsvTable;
}

/** How to read dates and join calendars; the words name the surface's own options. */
export interface DatedTableOptions {
  /** Columns named as dates by the user. */
  dates?: readonly string[];
  /** Settles day/month order. */
  dateOrder?: 'dmy' | 'mdy';
  /** Carry a price forward over at most this many missing dates (0: inner join only). */
  fillForward?: number;
  /** How this surface names its options in messages. */
  words?: { dates: string; dateOrder: string; fillForward: string };
}

/** The table on one calendar, with what was done to get it. */
export interface DatedTable {
  table: CsvTable;
  /** In words, for every surface: the dialect, the order, the join, carried prices. */
  notices: string[];
  /** Whether the rows carry dates that were read (so windows and spacing can use them). */
  dated: boolean;
}

const CLI_WORDS = { dates: '--dates NAME', dateOrder: 'give --date-order dmy or --date-order mdy', fillForward: '--fill-forward N' };

interface Group {
  file: SourceTable;
  dateIndex: number;
  seriesIndices: number[];
  /** Rows of the file in this calendar (blank rows at the end of a shorter calendar left out). */
  rows: number[];
  dates: DateColumn;
}

/** One table on one calendar from the files given; see the file comment. */
export function datedTable(sources: readonly SourceTable[], options: DatedTableOptions = {}): DatedTable {
  const words = options.words ?? CLI_WORDS;
  const notices: string[] = sources.flatMap((s) => (s.table.notices ?? []).map((n) => (sources.length > 1 ? `${s.file}: ${n}` : n)));
  const named = options.dates ?? [];
  for (const name of named) {
    if (!sources.some((s) => s.table.header.some((h) => h.toLowerCase() === name.trim().toLowerCase()))) {
      throw new MooringInputError(`${words.dates.split(' ')[0]} names '${name}', but no column has that name; the columns are: ${sources.flatMap((s) => s.table.header).join(', ')}.`);
    }
  }
  const many = sources.length > 1;
  const groups: Group[] = [];
  /** Date columns without series of their own, left out of a single calendar's table. */
  const otherDates: number[] = [];
  for (const source of sources) {
    const { table, file } = source;
    const mine = named.filter((n) => table.header.some((h) => h.toLowerCase() === n.trim().toLowerCase()));
    const dateIndices = findDateColumns(table.header, table.columns, mine);
    if (dateIndices.length === 0) {
      if (many) throw new MooringInputError(`${file} has no date column: several files are joined on their dates; name its date column with ${words.dates}.`);
      return { table: { ...table, notices }, notices, dated: false };
    }
    const forced = new Set(mine.map((n) => table.header.findIndex((h) => h.toLowerCase() === n.trim().toLowerCase())));
    dateIndices.forEach((d, k) => {
      const next = dateIndices[k + 1] ?? table.header.length;
      const seriesIndices: number[] = [];
      for (let j = k === 0 ? 0 : d + 1; j < next; j++) if (!dateIndices.includes(j)) seriesIndices.push(j);
      const rows: number[] = [];
      for (let i = 0; i < table.lines.length; i++) {
        const blank = table.columns[d][i].trim() === '' && seriesIndices.every((j) => table.columns[j][i].trim() === '');
        if (!blank) rows.push(i);
      }
      const what = `'${table.header[d]}'${many ? ` of ${file}` : ''}`;
      const label = (i: number) => `${many ? `${file} ` : ''}line ${table.lines[rows[i]]}`;
      const fields = rows.map((i) => table.columns[d][i]);
      let dates: DateColumn;
      try {
        dates = readDateColumn(fields, {
          serial: forced.has(d) || headerNamesDate(table.header[d]), order: options.dateOrder, name: what, rowLabel: label, orderHint: words.dateOrder,
        });
      } catch (e) {
        // A column found by its header word alone, holding no text that looks like a date, in a
        // file with one calendar, still labels the rows as before; the user is told the rows are
        // taken in file order. Dates that look like dates but do not read are refused.
        const byWordOnly = !forced.has(d) && DATE_HEADER_WORDS.includes(table.header[d].trim().toLowerCase()) && !fields.some((f) => looksLikeDateText(f));
        if (!many && dateIndices.length === 1 && byWordOnly && e instanceof MooringInputError) {
          notices.push(`The dates in ${what} were not read (${e.message.replace(/\.$/, '')}); the rows are taken in file order.`);
          return;
        }
        throw e;
      }
      if (seriesIndices.length === 0 && dateIndices.length > 1) {
        otherDates.push(d);
        return;
      }
      const shown = dates;
      const direction = dateDirection(dates.days, (i) => `${label(i)} (${shown.iso[i]})`, what);
      if (direction === 'newest first') {
        rows.reverse();
        dates = { ...dates, days: dates.days.slice().reverse(), iso: dates.iso.slice().reverse() };
        notices.push(`The dates in ${what} run newest first (${dates.iso[dates.iso.length - 1]} back to ${dates.iso[0]}): the rows were put in date order, oldest first.`);
      }
      if (dates.style === 'dmy' || dates.style === 'mdy' || dates.style === 'serial') {
        const style = dates.style === 'dmy' ? 'day/month/year' : dates.style === 'mdy' ? 'month/day/year' : 'spreadsheet day numbers';
        notices.push(`The dates in ${what} were read as ${style}${options.dateOrder ? ' (as given)' : ''}.`);
      }
      groups.push({ file: source, dateIndex: d, seriesIndices, rows, dates });
    });
  }
  if (groups.length === 0) return { table: { ...sources[0].table, notices }, notices, dated: false };
  if (groups.length === 1) return { table: oneCalendar(groups[0], otherDates, notices), notices, dated: true };
  return { table: joined(groups, options.fillForward ?? 0, notices, words), notices, dated: true };
}

/** A single calendar: the file's own columns, rows in date order, ISO dates. */
function oneCalendar(g: Group, otherDates: readonly number[], notices: string[]): CsvTable {
  const t = g.file.table;
  const keep = t.header.flatMap((_, j) => (otherDates.includes(j) ? [] : [j]));
  const columns = keep.map((j) => (j === g.dateIndex ? g.dates.iso.slice() : g.rows.map((i) => t.columns[j][i])));
  const dateIndex = keep.indexOf(g.dateIndex);
  return { ...t, header: keep.map((j) => t.header[j]), columns, dateIndex, dateColumn: t.header[g.dateIndex], lines: g.rows.map((i) => t.lines[i]), notices };
}

/** Several calendars joined on their dates. */
function joined(groups: Group[], fillForward: number, notices: string[], words: DatedTableOptions['words'] & object): CsvTable {
  const files = new Set(groups.map((g) => g.file.file));
  const manyFiles = files.size > 1;
  const sourceName = (g: Group) => (manyFiles ? g.file.file : `the columns dated by '${g.file.table.header[g.dateIndex]}'`);
  const datedGroups: DatedGroup<string>[] = groups.map((g) => ({
    source: sourceName(g),
    days: g.dates.days,
    series: g.seriesIndices.map((j) => ({ name: g.file.table.header[j], cells: g.rows.map((i) => g.file.table.columns[j][i]) })),
  }));
  const join = joinOnDates(datedGroups, fillForward);
  const taken = new Map<string, number>();
  for (const s of join.series) taken.set(s.name.toLowerCase(), (taken.get(s.name.toLowerCase()) ?? 0) + 1);
  const names = join.series.map((s) => ((taken.get(s.name.toLowerCase()) ?? 0) > 1 ? `${s.name} (${s.source})` : s.name));
  const iso = join.days.map((d, r) => isoOf(groups, join.sourceRows[r], d));
  const rowLabels = join.sourceRows.map((row, r) => {
    const parts = groups.map((g, k) => `${manyFiles ? `${g.file.file} ` : ''}line ${g.file.table.lines[g.rows[row[k]]]}`);
    return `${manyFiles ? parts.join(', ') : `lines ${[...new Set(parts.map((p) => p.slice(5)))].join(' and ')}`} (${iso[r]})`;
  });
  const n = join.days.length;
  const first = iso[0];
  const last = iso[n - 1];
  const lost = join.series.map((s, k) => `${names[k]}${manyFiles && names[k] === s.name ? ` (${s.source})` : ''} lost ${s.lost} of its row${s.lost === 1 ? '' : 's'}`);
  notices.push(`Joined on dates: ${n} dates from ${first} to ${last} are in every series; ${lost.join(', ')}.`);
  if (fillForward > 0) {
    const filled = join.series.map((s, k) => `${names[k]} on ${s.filled} row${s.filled === 1 ? '' : 's'}`);
    notices.push(`Prices were carried forward over at most ${fillForward} missing date${fillForward === 1 ? '' : 's'} (${words.fillForward.replace(' N', ` ${fillForward}`)}): ${filled.join(', ')}.`);
  }
  return {
    header: ['date', ...names],
    columns: [iso, ...join.series.map((s) => s.cells)],
    dateColumn: 'date',
    dateIndex: 0,
    lines: join.sourceRows.map((row) => groups[0].file.table.lines[groups[0].rows[row[0]]]),
    rowLabels,
    notices,
  };
}

/** The ISO text of a joined row's date, as its first calendar wrote it. */
function isoOf(groups: Group[], row: number[], day: number): string {
  for (let k = 0; k < groups.length; k++) {
    const g = groups[k];
    if (g.dates.days[row[k]] === day) return g.dates.iso[row[k]];
  }
  return groups[0].dates.iso[row[0]];
}
