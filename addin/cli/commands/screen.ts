/**
 * `mooring screen`: every pair of the file's series (or of --series A,B,...) whose two series
 * wander with the same order tested for cointegration both ways round, ranked by evidence
 * (the other pairs listed apart, with the reason), with Benjamini-Hochberg adjusted
 * p-values and the sentence on how many would pass by chance alone. Each column is cleaned on
 * its own and each pair tested on the rows both have, so a series that starts later still
 * pairs with the others.
 */
import { mkdtempSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { csvSeries, seriesNames } from '../../csv/csv-series';
import type { CsvTable } from '../../csv/read-csv';
import { MooringInputError } from '../../errors';
import { RECORD_SIZE } from '../../screen/pair-record';
import { screenRecordsInThreads, startScreenThreads, withSeriesOrdersInThreads, type ThreadReport } from '../../screen/parallel-node';
import type { NamedSeries } from '../../screen/screen-pairs';
import { resolveScreenOptions, type ScreenSettings } from '../../screen/screen-options';
import { ScreenTally } from '../../screen/screen-tally';
import { screenUniverse, unorderedPairCount, type ScreenUniverse } from '../../screen/screen-universe';
import { decimalTextValue } from '../../series/cell-kinds';
import type { Command, CommandContext, CommandOutput } from '../command';
import { choiceValue, levelValue, wholeNumberValue } from '../option-values';
import { LIST_LIMIT, STREAM_FORMATS, screenOutput, type StreamFormat } from '../screen-answer';
import { requireDiskRoom, requireScreenMemory } from '../screen-memory';
import { PartWriter, partRange, readPartHeader, readPartRecords, screenFingerprint, type PartHeader, type ScreenSource } from '../screen-part-file';
import { LAGS_OPTION, MAX_LAGS_OPTION, readLags } from '../test-options';

/** Pairs listed in the terminal report unless --top says otherwise. */
const DEFAULT_TOP = 20;

/**
 * Files of at least this many bytes start the worker threads before they are read: a megabyte
 * holds 70,000 prices or more, past the work that earns the orders of integration a second
 * thread (ORDER_WORK_PER_THREAD); a smaller screen may not use the threads, and a thread started
 * for nothing would cost more than the head start saves.
 */
const EARLY_THREADS_BYTES = 2 ** 20;

/** A number of rows for the half-life range: decimals allowed. */
function rowsValue(option: string, raw: string | undefined): number | undefined {
  if (raw === undefined) return undefined;
  const t = raw.trim();
  if (!/^(\d+\.?\d*|\.\d+)$/.test(t)) throw new MooringInputError(`--${option} must be a number of rows such as 5 or 12.5, not '${raw}'.`);
  return Number(t);
}

/** The columns a screen takes by default: every series column whose first filled field is a number. */
export function numericColumns(table: CsvTable): { names: string[]; leftOut: string[] } {
  const names: string[] = [];
  const leftOut: string[] = [];
  for (const name of seriesNames(table)) {
    const fields = table.columns[table.header.indexOf(name)];
    const first = fields.find((f) => f.trim() !== '');
    (first !== undefined && decimalTextValue(first) !== null ? names : leftOut).push(name);
  }
  return { names, leftOut };
}

/** The chosen columns, each cleaned alone and laid on the table's rows (NaN where it has no value). */
function screenSeries(context: CommandContext): { series: NamedSeries[]; leftOut: string[] } {
  const { table } = context;
  let names: string[];
  let leftOut: string[] = [];
  if (context.common.series !== undefined) {
    names = context.common.series.split(',').map((s) => s.trim());
    if (names.some((n) => n === '')) throw new MooringInputError(`--series has an empty name in '${context.common.series}': separate the names with single commas.`);
  } else {
    ({ names, leftOut } = numericColumns(table));
  }
  if (names.length < 2) {
    throw new MooringInputError(`screen needs at least two series; ${names.length === 1 ? `only '${names[0]}' was found` : 'none was found'}${leftOut.length ? ` (not numeric: ${leftOut.join(', ')})` : ''}.`);
  }
  const rows = table.lines.length;
  const series = names.map((name) => {
    const clean = csvSeries(table, name, { log: context.common.log, skipGaps: context.common.skipGaps });
    const values = new Float64Array(rows).fill(Number.NaN);
    clean.rows.forEach((row, k) => (values[row] = clean.values[k]));
    return { name: clean.logged ? `ln(${clean.name})` : clean.name, values };
  });
  return { series, leftOut };
}

/** --part k/n: part k (1-based) of n. */
function partValue(raw: string | undefined): { part: number; parts: number } | undefined {
  if (raw === undefined) return undefined;
  const m = /^\s*(\d+)\s*\/\s*(\d+)\s*$/.exec(raw);
  const [part, parts] = m ? [Number(m[1]), Number(m[2])] : [0, 0];
  if (!m || parts < 1 || part < 1 || part > parts) {
    throw new MooringInputError(`--part must be k/n with 1 <= k <= n, such as 3/8 for the third of eight parts; got '${raw}'.`);
  }
  return { part, parts };
}

/** What the output needs of the input, carried into part files. */
function screenSource(context: CommandContext, leftOut: string[]): ScreenSource {
  const { table } = context;
  return {
    file: context.file,
    leftOut,
    notices: context.notices ?? [],
    halfLifeUnit: context.period?.unit ?? 'rows',
    spacing: context.period?.spacing ?? 'rows',
    lines: table.lines.slice(),
    dates: table.dateIndex >= 0 ? table.columns[table.dateIndex].slice() : null,
  };
}

/** The header of the part file of unordered pairs [first, end). */
export function partHeader(universe: ScreenUniverse, settings: ScreenSettings, source: ScreenSource, part: number, parts: number, first: number, end: number): PartHeader {
  return {
    format: 'mooring screen part', version: 1, part, parts, first, end,
    totalPairs: unorderedPairCount(universe.names.length), fingerprint: screenFingerprint(universe, settings),
    names: universe.names, rows: universe.rows, scales: Array.from(universe.scales), orders: universe.orders ?? [], settings, source,
  };
}

/** One part of the pairs into its file (--part k/n --out FILE): raw records, no adjustment; mooring merge combines the parts. */
function runPart(universe: ScreenUniverse, settings: ScreenSettings, source: ScreenSource, part: { part: number; parts: number }, out: string, threads: number | undefined): CommandOutput {
  const total = unorderedPairCount(universe.names.length);
  const [first, end] = partRange(part.part, part.parts, total);
  const writer = new PartWriter(out, partHeader(universe, settings, source, part.part, part.parts, first, end));
  let report: ThreadReport;
  try {
    report = screenRecordsInThreads(universe, settings, first, end, { threads }, (_, records) => writer.write(records));
  } finally {
    writer.close();
  }
  const json = { part: part.part, parts: part.parts, firstPair: first, endPair: end, pairs: end - first, directedPairs: 2 * (end - first), out, series: universe.names.length, threads: report };
  return {
    terminal: [
      `Part ${part.part} of ${part.parts}: unordered pairs ${first} to ${end - 1} of ${total} (${2 * (end - first)} directed pairs) written to ${out}.`,
      `Combine every part with: mooring merge ${Array.from({ length: Math.min(part.parts, 3) }, (_, i) => `part-${i + 1}.bin`).join(' ')}${part.parts > 3 ? ' ...' : ''} (the adjustment runs there, over all the parts).`,
    ].join('\n'),
    json,
  };
}

/** The screen command. */
export const screenCommand: Command = {
  name: 'screen',
  summary: 'every pair of many series tested for cointegration, ranked, with false-discovery control',
  description: [
    'Decides each series\' order of integration once (as mooring order and the report do, at --alpha with a constant), then runs the Engle-Granger test ' +
      'on every pair of series that wander with the same order, both ways round, with the defaults of mooring eg, and ranks the pairs by p-value. ' +
      'Each pair also gets its hedge ratio, the half-life of its spread and the spread\'s latest z-score.',
    'A pair with a series that settles around its own mean (order 0), or whose two series wander with different orders, cannot share a long-run path: ' +
      'it is set aside with the reason, and is not counted in the adjustment.',
    'Testing many pairs turns up some that pass by chance alone: the report says how many, and gives each pair a p-value adjusted ' +
      'for the false-discovery rate (Benjamini-Hochberg, over every directed pair tested). Treat a passing pair as a candidate to check, not a finding.',
    'By default every numeric column is screened; each pair uses the rows where both series have a price.',
  ],
  usage: 'mooring screen <file.csv> [--series A,B,...] [options]',
  options: [
    { name: 'alpha', value: 'LEVEL', help: 'level for the orders of integration, the chance sentence and the discoveries (default 0.05)' },
    { name: 'min-half-life', value: 'ROWS', help: 'show only pairs whose spread half-life is at least this many rows (days, weeks, ... where the file has dates)' },
    { name: 'max-half-life', value: 'ROWS', help: 'show only pairs whose spread half-life is at most this many rows' },
    { name: 'min-obs', value: 'N', help: 'test only pairs with at least N shared rows (default 20)' },
    { name: 'johansen', help: "also give each pair's Johansen trace rank (slower)" },
    { name: 'threads', value: 'N', help: 'most threads to use (default: every core; a small screen uses fewer, as starting a thread would cost more than it saves)' },
    { name: 'top', value: 'N', help: `pairs listed in the report and in --json (default ${DEFAULT_TOP}); only these are kept in memory` },
    { name: 'format', value: 'jsonl|csv', help: 'write every directed pair as it goes, tested, set aside or not (JSON lines after one line on the screen, or CSV), instead of the report' },
    { name: 'part', value: 'k/n', help: 'run only the k-th of n equal parts of the pairs and write their raw results to --out, for mooring merge (one part per task of a batch job)' },
    { name: 'out', value: 'FILE', help: 'the file a part is written to (with --part)' },
    LAGS_OPTION,
    MAX_LAGS_OPTION,
  ],
  examples: [
    'mooring screen prices.csv --log',
    'mooring screen prices.csv --series Brent,WTI,Gasoil,Diesel --max-half-life 20 --json',
    'mooring screen prices.csv --format csv > every-pair.csv',
    'mooring screen prices.csv --part 3/8 --out part-3.bin   (then: mooring merge part-*.bin)',
  ],
  beforeReading(files, args) {
    let bytes = 0;
    for (const file of files) {
      try {
        bytes += statSync(file).size;
      } catch {
        return; // reading it will say what is wrong
      }
    }
    const raw = args.values.get('threads');
    if (bytes >= EARLY_THREADS_BYTES) startScreenThreads({ threads: raw === undefined ? undefined : Number(raw) });
  },
  run(context) {
    const alpha = levelValue('alpha', context.args.values.get('alpha'));
    const minHalfLife = rowsValue('min-half-life', context.args.values.get('min-half-life'));
    const maxHalfLife = rowsValue('max-half-life', context.args.values.get('max-half-life'));
    const minObservations = wholeNumberValue('min-obs', context.args.values.get('min-obs'), 'rows');
    const threads = wholeNumberValue('threads', context.args.values.get('threads'), 'threads');
    if (threads === 0) throw new MooringInputError('--threads must be at least 1.');
    const top = wholeNumberValue('top', context.args.values.get('top'), 'pairs') ?? DEFAULT_TOP;
    const lagChoice = readLags(context.args);
    const format = choiceValue('format', context.args.values.get('format'), STREAM_FORMATS) as StreamFormat | undefined;
    const part = partValue(context.args.values.get('part'));
    const out = context.args.values.get('out');
    if (part && out === undefined) throw new MooringInputError(`--part ${part.part}/${part.parts} writes raw results to a file: name it with --out, such as --out part-${part.part}.bin.`);
    if (!part && out !== undefined) throw new MooringInputError('--out names the file of a part: use it with --part k/n (a whole screen prints its answer; --format csv > FILE keeps every pair).');
    if (part && format) throw new MooringInputError('--format applies to a whole screen; a part writes raw results for mooring merge, which takes --format.');
    const { series, leftOut } = screenSeries(context);
    const rows = context.table.lines.length;
    requireScreenMemory({ series: series.length, rows, top, part: part !== undefined });
    const settings = resolveScreenOptions({ alpha, minHalfLife, maxHalfLife, minObservations, johansen: context.args.switches.has('johansen'), ...lagChoice });
    const universe = withSeriesOrdersInThreads(screenUniverse(series), settings, { threads });
    series.length = 0; // the packed universe holds the numbers now
    const source = screenSource(context, leftOut);
    if (part) return runPart(universe, settings, source, part, out as string, threads);
    const total = unorderedPairCount(universe.names.length);
    const tally = new ScreenTally(universe, settings, top, LIST_LIMIT);
    // Every pair is streamed after the adjustment, which needs every p-value first: the records
    // wait in a temporary part file, read back a batch at a time.
    const folder = format ? mkdtempSync(join(tmpdir(), 'mooring-screen-')) : null;
    try {
      if (folder) requireDiskRoom(folder, 2 * total * RECORD_SIZE * 8, 'Writing every pair');
      const spill = folder ? new PartWriter(join(folder, 'all.bin'), partHeader(universe, settings, source, 1, 1, 0, total)) : null;
      let report: ThreadReport;
      try {
        report = screenRecordsInThreads(universe, settings, 0, total, { threads }, (first, records) => {
          tally.add(first, records);
          spill?.write(records);
        });
      } finally {
        spill?.close();
      }
      const { summary, adjustment } = tally.finish();
      const output = screenOutput({
        summary, adjustment, scales: universe.scales, source, top, threads: report,
        records: (onBatch) => {
          if (!spill) return;
          const { header, recordsAt } = readPartHeader(spill.path);
          readPartRecords(spill.path, header, recordsAt, onBatch);
        },
      }, format);
      if (!folder || !output.stream) return output;
      const stream = output.stream;
      return { ...output, stream: (write) => {
        try {
          stream(write);
        } finally {
          rmSync(folder, { recursive: true, force: true });
        }
      } };
    } catch (e) {
      if (folder) rmSync(folder, { recursive: true, force: true });
      throw e;
    }
  },
};
