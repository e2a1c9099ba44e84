/**
 * Prices as they arrive, through the real commands: a newest-first export, repeated and
 * shuffled dates, two vendors' files on different calendars, a date window, a European
 * spreadsheet export, spreadsheet serial dates, weekly data. Every file here is the demo data
 * (Mooring's own seeded generator, addin/demo/data/quennel-delta.csv) rearranged the way
 * exports arrive; each check compares two routes to the same rows, so none has a hard-coded
 * statistic: the rearranged file must give exactly what the plain file (or a join computed
 * here, independently of Mooring) gives.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { MOORING_COMMANDS } from '../../addin/cli/commands';
import { expectOneLineRefusal, runWith } from './cli-harness';

const demo = readFileSync(new URL('../../addin/demo/data/quennel-delta.csv', import.meta.url), 'utf8').trim().split('\n');
const header = demo[0].split(',');
const rows = demo.slice(1).map((l) => l.split(','));
const csvOf = (head: string[], body: string[][], sep = ','): string => `${[head, ...body].map((r) => r.join(sep)).join('\n')}\n`;
const column = (name: string): number => header.indexOf(name);
const pick = (body: string[][], names: string[]): string[][] => body.map((r) => [r[0], ...names.map((n) => r[column(n)])]);

function json(files: Record<string, string>, ...argv: string[]): Record<string, any> {
  const run = runWith(MOORING_COMMANDS, [...argv, '--json'], files);
  expect(run.stderr).toBe('');
  expect(run.code).toBe(0);
  return JSON.parse(run.stdout);
}

/** The statistics of a command's JSON, without the fields that name the file or describe the input. */
function statistics(object: Record<string, any>): Record<string, any> {
  const { file, warnings, sample, spacing, ...rest } = object;
  void file; void warnings; void sample; void spacing;
  return withoutLines(rest);
}

/** A value with the file lines in its row labels blanked ("line 781 (2024-12-27)" -> "line # (2024-12-27)"): rows are named by their line in the file read. */
function withoutLines<T>(value: T): T {
  return JSON.parse(JSON.stringify(value).replace(/\blines? [\d, and]+(?= \()/g, 'line #'));
}

const plain = csvOf(header, rows);

describe('order: newest-first rows are put in date order and said; repeats and shuffles are refused', () => {
  const newest = csvOf(header, rows.slice().reverse());

  for (const argv of [['adf', '--series', 'GateGasoil'], ['eg', '--y', 'GateGasoil', '--x', 'DockDiesel'], ['ecm', '--y', 'GateGasoil', '--x', 'DockDiesel', '--log'],
    ['spread', '--y', 'GateGasoil', '--x', 'DockDiesel'], ['granger', '--cause', 'GateGasoil', '--effect', 'DockDiesel']]) {
    it(`${argv[0]}: the newest-first file gives the identical statistics to the oldest-first one, with a notice`, () => {
      const [command, ...options] = argv;
      const a = json({ 'p.csv': plain }, command, 'p.csv', ...options);
      const b = json({ 'n.csv': newest }, command, 'n.csv', ...options);
      expect(statistics(b)).toEqual(statistics(a));
      expect(b.warnings[0]).toMatch(/^The dates in 'Date' run newest first \(2024-12-27 back to 2022-01-03\): the rows were put in date order, oldest first\.$/);
      expect(a.warnings).toEqual([]);
    });
  }

  it('report: the same report, its first and last dates in date order, the notice among its warnings', () => {
    const a = json({ 'p.csv': plain }, 'report', 'p.csv', '--series', 'GateGasoil,DockDiesel');
    const b = json({ 'n.csv': newest }, 'report', 'n.csv', '--series', 'GateGasoil,DockDiesel');
    expect(b.report.data.first.date).toBe('2022-01-03');
    expect(b.report.data.last.date).toBe('2024-12-27');
    expect(withoutLines(b.report.pairs)).toEqual(withoutLines(a.report.pairs));
    expect(b.report.warnings[0]).toMatch(/run newest first/);
  });

  it('a repeated date is refused, naming both lines', () => {
    const body = rows.slice(0, 300);
    const repeated = [...body.slice(0, 10), body[9], ...body.slice(10)];
    const line = expectOneLineRefusal(runWith(MOORING_COMMANDS, ['adf', 'r.csv', '--series', 'GateGasoil'], { 'r.csv': csvOf(header, repeated) }));
    expect(line).toBe("mooring: Line 12 (2022-01-14) repeats the date of line 11 (2022-01-14) in 'Date': each date may appear once; remove or merge the repeated rows.");
  });

  it('shuffled dates are refused, naming the first line out of order', () => {
    const body = rows.slice(0, 300);
    const shuffled = [...body.slice(0, 10), body[11], body[10], ...body.slice(12)];
    const line = expectOneLineRefusal(runWith(MOORING_COMMANDS, ['eg', 's.csv', '--y', 'GateGasoil', '--x', 'DockDiesel'], { 's.csv': csvOf(header, shuffled) }));
    expect(line).toBe("mooring: The dates in 'Date' are not in order: line 13 (2022-01-17) goes back in time after line 12 (2022-01-18), though the rows before run oldest first; sort the rows by date (oldest or newest first).");
  });
});

describe('calendars: two files on different dates are joined on the dates they share', () => {
  // Vendor A misses every 7th row, vendor B every 11th and the first 15: different holidays and starts.
  const a = rows.filter((_, i) => i % 7 !== 3);
  const b = rows.filter((_, i) => i % 11 !== 5 && i >= 15);
  const files = { 'a.csv': csvOf(['Date', 'GateGasoil'], pick(a, ['GateGasoil'])), 'b.csv': csvOf(['Day', 'DockDiesel'], pick(b, ['DockDiesel']).reverse()) };
  // The inner join, computed here: the dates in both files, in date order.
  const bDates = new Set(b.map((r) => r[0]));
  const joined = a.filter((r) => bDates.has(r[0])).map((r) => [r[0], r[column('GateGasoil')], r[column('DockDiesel')]]);
  const joinedCsv = csvOf(['Date', 'GateGasoil', 'DockDiesel'], joined);

  for (const argv of [['eg', '--y', 'GateGasoil', '--x', 'DockDiesel'], ['hedge', '--y', 'GateGasoil', '--x', 'DockDiesel'], ['johansen', '--series', 'GateGasoil,DockDiesel']]) {
    it(`${argv[0]} on a.csv b.csv gives the statistics of their inner join, and says what each lost`, () => {
      const [command, ...options] = argv;
      const two = json(files, command, 'a.csv', 'b.csv', ...options);
      const one = json({ 'j.csv': joinedCsv }, command, 'j.csv', ...options);
      expect(statistics(two)).toEqual(statistics(one));
      const lostA = a.length - joined.length;
      const lostB = b.length - joined.length;
      expect(two.warnings).toContain(`Joined on dates: ${joined.length} dates from ${joined[0][0]} to ${joined[joined.length - 1][0]} are in every series; ` +
        `GateGasoil (a.csv) lost ${lostA} of its rows, DockDiesel (b.csv) lost ${lostB} of its rows.`);
      expect(two.warnings.some((w: string) => /'Day' of b\.csv run newest first/.test(w))).toBe(true);
    });
  }

  it('two date columns in one file are joined the same way', () => {
    const n = Math.max(a.length, b.length);
    const side = Array.from({ length: n }, (_, i) => [a[i]?.[0] ?? '', a[i]?.[column('GateGasoil')] ?? '', b[i]?.[0] ?? '', b[i]?.[column('DockDiesel')] ?? '']);
    const sideBySide = csvOf(['Date', 'GateGasoil', 'Date B', 'DockDiesel'], side);
    const two = json({ 's.csv': sideBySide }, 'eg', 's.csv', '--y', 'GateGasoil', '--x', 'DockDiesel');
    const one = json({ 'j.csv': joinedCsv }, 'eg', 'j.csv', '--y', 'GateGasoil', '--x', 'DockDiesel');
    expect(statistics(two)).toEqual(statistics(one));
  });

  it('--fill-forward 1 carries a price over one missing date, and says on how many rows', () => {
    const aDates = new Set(a.map((r) => r[0]));
    const all = rows.filter((r) => (aDates.has(r[0]) || bDates.has(r[0])) && r[0] >= b[0][0]);
    const out = json(files, 'eg', 'a.csv', 'b.csv', '--y', 'GateGasoil', '--x', 'DockDiesel', '--fill-forward', '1');
    expect(out.sample.observations).toBe(all.length);
    const filledA = all.filter((r) => !aDates.has(r[0])).length;
    const filledB = all.filter((r) => !bDates.has(r[0])).length;
    expect(out.warnings).toContain(`Prices were carried forward over at most 1 missing date (--fill-forward 1): GateGasoil on ${filledA} rows, DockDiesel on ${filledB} rows.`);
  });

  it('a file without dates cannot be joined', () => {
    const undated = csvOf(['DockDiesel'], b.map((r) => [r[column('DockDiesel')]]));
    expect(expectOneLineRefusal(runWith(MOORING_COMMANDS, ['eg', 'a.csv', 'u.csv', '--y', 'GateGasoil', '--x', 'DockDiesel'], { ...files, 'u.csv': undated })))
      .toBe('mooring: u.csv has no date column: several files are joined on their dates; name its date column with --dates NAME.');
  });
});

describe('window: --from and --to equal slicing the file', () => {
  const from = rows.findIndex((r) => r[0] >= '2023-03-01');
  const to = rows.findIndex((r) => r[0] > '2024-06-30');
  const sliced = csvOf(header, rows.slice(from, to));

  for (const argv of [['adf', '--series', 'HeavyFuel'], ['eg', '--y', 'GateGasoil', '--x', 'DockDiesel'], ['spread', '--y', 'GateGasoil', '--x', 'DockDiesel']]) {
    it(`${argv[0]} --from 2023-03-01 --to 2024-06-30 equals the sliced file`, () => {
      const [command, ...options] = argv;
      const cut = json({ 'p.csv': plain }, command, 'p.csv', ...options, '--from', '2023-03-01', '--to', '2024-06-30');
      const slice = json({ 's.csv': sliced }, command, 's.csv', ...options);
      expect(statistics(cut)).toEqual(statistics(slice));
    });
  }

  it('report records the window in its preparation, in the shared preparation words', () => {
    const out = json({ 'p.csv': plain }, 'report', 'p.csv', '--series', 'GateGasoil,DockDiesel', '--log', '--from', '2023-03-01', '--to', '2024-06-30');
    expect(out.report.settings.preparation).toBe(`log, from row ${from + 1}, to row ${to}`);
    expect(out.report.data.observations).toBe(to - from);
  });

  it('a window without dates, or with a date that is not one, is refused', () => {
    const undated = csvOf(header.slice(1), rows.map((r) => r.slice(1)));
    expect(expectOneLineRefusal(runWith(MOORING_COMMANDS, ['adf', 'u.csv', '--series', 'HeavyFuel', '--from', '2023-01-02'], { 'u.csv': undated })))
      .toMatch(/^mooring: --from and --to need dates/);
    expect(expectOneLineRefusal(runWith(MOORING_COMMANDS, ['adf', 'p.csv', '--series', 'HeavyFuel', '--from', 'March'], { 'p.csv': plain })))
      .toBe("mooring: --from: the date 'March' is not a date: type it as 2024-03-15.");
  });
});

describe('dialects: a European export reads as the comma/point file', () => {
  const european = `${[header.join(';'), ...rows.map((r) => r.map((f) => f.replace('.', ',')).join(';'))].join('\r\n')}\r\n`;

  for (const argv of [['adf', '--series', 'BunkerBlend'], ['eg', '--y', 'HeavyFuel', '--x', 'BunkerBlend'], ['report', '--series', 'GateGasoil,DockDiesel']]) {
    it(`${argv[0]}: semicolons and decimal commas give the comma/point file's statistics, and the notice names the dialect`, () => {
      const [command, ...options] = argv;
      const e = json({ 'e.csv': european }, command, 'e.csv', ...options);
      const p = json({ 'p.csv': plain }, command, 'p.csv', ...options);
      if (command === 'report') expect(e.report.pairs).toEqual(p.report.pairs);
      else expect(statistics(e)).toEqual(statistics(p));
      expect(e.warnings[0]).toBe('Read as semicolon-separated values with decimal commas (found from the file).');
    });
  }

  it('--delimiter and --decimal force the dialect', () => {
    const forced = json({ 'e.csv': european }, 'adf', 'e.csv', '--series', 'BunkerBlend', '--delimiter', 'semicolon', '--decimal', 'comma');
    expect(statistics(forced)).toEqual(statistics(json({ 'p.csv': plain }, 'adf', 'p.csv', '--series', 'BunkerBlend')));
    expect(forced.warnings[0]).toBe('Read as semicolon-separated values with decimal commas.');
  });

  it('a decimal comma inside a comma-separated file is named as such', () => {
    const quoted = csvOf(header.slice(0, 2), rows.map((r) => [r[0], `"${r[1].replace('.', ',')}"`]));
    expect(expectOneLineRefusal(runWith(MOORING_COMMANDS, ['adf', 'q.csv'], { 'q.csv': quoted })))
      .toBe("mooring: q.csv: Line 2 of GateGasoil holds '1,4008', a number with a decimal comma, in a file read with decimal points: give --decimal comma (and --delimiter semicolon if the fields are separated by semicolons), or save the file with decimal points.");
    const read = json({ 'q.csv': quoted }, 'adf', 'q.csv', '--decimal', 'comma');
    expect(read.statistic).toBe(json({ 'p.csv': csvOf(header.slice(0, 2), rows.map((r) => r.slice(0, 2))) }, 'adf', 'p.csv').statistic);
    const unquoted = csvOf(header.slice(0, 2), rows.map((r) => [r[0], r[1].replace('.', ',')]));
    expect(expectOneLineRefusal(runWith(MOORING_COMMANDS, ['adf', 'u.csv'], { 'u.csv': unquoted })))
      .toMatch(/^mooring: u\.csv: Line 2 has 3 fields but the header has 2 \(\d+ more lines also differ\): the numbers look like decimal commas \(such as 1,5\) splitting the fields/);
  });

  it('messages name the command line\'s option, --skip-gaps, not the pane\'s words', () => {
    const gap = csvOf(header, rows.map((r, i) => (i === 40 ? [r[0], 'n/a', ...r.slice(2)] : r)));
    expect(expectOneLineRefusal(runWith(MOORING_COMMANDS, ['adf', 'g.csv', '--series', 'GateGasoil'], { 'g.csv': gap })))
      .toBe("mooring: GateGasoil line 42 (2022-02-28) is text 'n/a': clean it or give --skip-gaps.");
  });

  it('"NaN" and "Infinity" text are refused under --skip-gaps, as the cleaner refuses those numbers', () => {
    for (const text of ['NaN', 'nan', 'Infinity', '-inf']) {
      const bad = csvOf(header, rows.map((r, i) => (i === 40 ? [r[0], text, ...r.slice(2)] : r)));
      expect(expectOneLineRefusal(runWith(MOORING_COMMANDS, ['adf', 'b.csv', '--series', 'GateGasoil', '--skip-gaps'], { 'b.csv': bad })))
        .toMatch(/^mooring: GateGasoil line 42 \(2022-02-28\) is (not a number \(NaN\)|-?Infinity \(not a finite number\)): correct the calculation that produced it\.$/);
    }
  });
});

describe('date columns: spreadsheet day numbers, day/month order, a header that names a date', () => {
  /** Spreadsheet serial day number of an ISO date: days since 1899-12-30 (Microsoft, "Date systems in Excel"). */
  const serial = (iso: string) => String(Date.UTC(+iso.slice(0, 4), +iso.slice(5, 7) - 1, +iso.slice(8, 10)) / 86_400_000 + 25569);
  const serialCsv = csvOf(['Trade Date', ...header.slice(1)], rows.map((r) => [serial(r[0]), ...r.slice(1)]));

  it('serial day numbers under "Trade Date" are dates: never a price, the same statistics, days', () => {
    const screened = json({ 's.csv': serialCsv }, 'screen', 's.csv');
    expect(screened.series).toEqual(header.slice(1));
    const e = json({ 's.csv': serialCsv }, 'ecm', 's.csv', '--y', 'GateGasoil', '--x', 'DockDiesel');
    const p = json({ 'p.csv': plain }, 'ecm', 'p.csv', '--y', 'GateGasoil', '--x', 'DockDiesel');
    expect(statistics(e)).toEqual(statistics(p));
    expect(e.halfLifeUnit).toBe('days');
    expect(e.spacing).toBe('business days');
    expect(e.warnings).toContain("The dates in 'Trade Date' were read as spreadsheet day numbers.");
  });

  it('--dates names a date column whose header does not say so', () => {
    const when = serialCsv.replace('Trade Date', 'When');
    const out = json({ 'w.csv': when }, 'screen', 'w.csv', '--dates', 'When');
    expect(out.series).toEqual(header.slice(1));
  });

  it('day/month/year and month/day/year text: the order is found from the data, and both read as the ISO file', () => {
    const dmy = csvOf(header, rows.map((r) => [`${r[0].slice(8)}/${r[0].slice(5, 7)}/${r[0].slice(0, 4)}`, ...r.slice(1)]));
    const mdy = csvOf(header, rows.map((r) => [`${+r[0].slice(5, 7)}/${+r[0].slice(8)}/${r[0].slice(0, 4)}`, ...r.slice(1)]));
    const iso = json({ 'p.csv': plain }, 'spread', 'p.csv', '--y', 'GateGasoil', '--x', 'DockDiesel');
    for (const [name, text, words] of [['d.csv', dmy, 'day/month/year'], ['m.csv', mdy, 'month/day/year']]) {
      const out = json({ [name]: text }, 'spread', name, '--y', 'GateGasoil', '--x', 'DockDiesel');
      expect(statistics(out)).toEqual(statistics(iso));
      expect(out.halfLifeUnit).toBe('days');
      expect(out.warnings).toContain(`The dates in 'Date' were read as ${words}.`);
    }
  });

  it('dates that could be either order, and that the data cannot settle, are refused with the option that settles them', () => {
    // 1/1, 2/2, ... 12/12 of three years: the same dates whichever way they are read.
    const same = rows.slice(0, 36).map((r, i) => [`${(i % 12) + 1}/${(i % 12) + 1}/${2022 + Math.floor(i / 12)}`, ...r.slice(1)]);
    const text = csvOf(header, same);
    expect(expectOneLineRefusal(runWith(MOORING_COMMANDS, ['adf', 'x.csv', '--series', 'GateGasoil'], { 'x.csv': text })))
      .toMatch(/could be day\/month\/year or month\/day\/year and the data do not tell which: give --date-order dmy or --date-order mdy, or write them as 2024-03-15\.$/);
    const settled = json({ 'x.csv': text }, 'adf', 'x.csv', '--series', 'GateGasoil', '--date-order', 'dmy');
    expect(settled.warnings).toContain("The dates in 'Date' were read as day/month/year (as given).");
  });
});

describe('time in the user\'s units', () => {
  it('weekly data report weeks: ecm, spread and report say so in text and JSON', () => {
    const weekly = csvOf(header, rows.filter((_, i) => i % 5 === 0));
    for (const command of ['ecm', 'spread']) {
      const out = json({ 'w.csv': weekly }, command, 'w.csv', '--y', 'GateGasoil', '--x', 'DockDiesel', '--log');
      expect(out.halfLifeUnit).toBe('weeks');
      expect(out.spacing).toBe('weeks');
      const text = runWith(MOORING_COMMANDS, [command, 'w.csv', '--y', 'GateGasoil', '--x', 'DockDiesel', '--log'], { 'w.csv': weekly }).stdout;
      expect(text).toMatch(/Half-life\s+[\d.]+ weeks/);
    }
    const report = json({ 'w.csv': weekly }, 'report', 'w.csv', '--series', 'GateGasoil,DockDiesel', '--log');
    expect(report.report.data.halfLifeUnit).toBe('weeks');
    expect(report.report.data.period).toBe('week');
  });

  it('daily business-day data report days; a file without dates reports rows', () => {
    expect(json({ 'p.csv': plain }, 'spread', 'p.csv', '--y', 'GateGasoil', '--x', 'DockDiesel').halfLifeUnit).toBe('days');
    const undated = csvOf(header.slice(1), rows.map((r) => r.slice(1)));
    expect(json({ 'u.csv': undated }, 'ecm', 'u.csv', '--y', 'GateGasoil', '--x', 'DockDiesel').halfLifeUnit).toBe('rows');
  });
});
