/**
 * Gets the series a command works on from its CSV table: the column named by --series (or
 * the only series in the file), cleaned with --log and --skip-gaps, and a description of the
 * sample for the report.
 */
import { csvBlock, csvSeries, seriesNames } from '../csv/csv-series';
import type { CsvTable } from '../csv/read-csv';
import { MooringInputError } from '../errors';
import type { CleanSeries } from '../series/clean-series';
import type { CommandContext } from './command';

/** One skipped row of the sample. */
export interface SkippedRow {
  line: number;
  date: string | null;
  reason: string;
}

/** Where the numbers came from and which rows they cover. */
export interface SampleInfo {
  file: string;
  column: string;
  logged: boolean;
  observations: number;
  firstLine: number;
  lastLine: number;
  firstDate: string | null;
  lastDate: string | null;
  skipped: SkippedRow[];
}

/** A cleaned series with the name results should use and its sample. */
export interface SeriesInput {
  series: CleanSeries;
  /** The name for titles and hypotheses: the column, or ln(column) under --log. */
  label: string;
  sample: SampleInfo;
}

/** The series the command's --series names, or the only one in the file. */
export function seriesFromContext(context: CommandContext): SeriesInput {
  const names = seriesNames(context.table);
  let name = context.common.series;
  if (name === undefined) {
    if (names.length !== 1) {
      throw new MooringInputError(`${context.command} needs --series NAME to choose a column; the series are: ${names.join(', ')}.`);
    }
    name = names[0];
  }
  const series = csvSeries(context.table, name, { log: context.common.log, skipGaps: context.common.skipGaps });
  return { series, label: labelOf(series), sample: sampleOf(context.table, context.file, series) };
}

/** Several series by name, cleaned and aligned by line (for commands on pairs and blocks). */
export function blockFromContext(context: CommandContext, names: readonly string[]): SeriesInput[] {
  const block = csvBlock(context.table, names, { log: context.common.log, skipGaps: context.common.skipGaps });
  return block.map((series) => ({ series, label: labelOf(series), sample: sampleOf(context.table, context.file, series) }));
}

function labelOf(series: CleanSeries): string {
  return series.logged ? `ln(${series.name})` : series.name;
}

/** The sample a cleaned CSV series covers. */
export function sampleOf(table: CsvTable, file: string, series: CleanSeries): SampleInfo {
  const dates = table.dateIndex >= 0 ? table.columns[table.dateIndex] : null;
  const dateAt = (index: number) => dates?.[index]?.trim() || null;
  const first = series.rows[0];
  const last = series.rows[series.rows.length - 1];
  return {
    file,
    column: series.name,
    logged: series.logged,
    observations: series.values.length,
    firstLine: table.lines[first],
    lastLine: table.lines[last],
    firstDate: dateAt(first),
    lastDate: dateAt(last),
    skipped: series.dropped.map((d) => ({ line: table.lines[d.index], date: dateAt(d.index), reason: d.reason })),
  };
}

/**
 * The names in `--series A,B[,...]`, checked: no empty names, no name twice, at least
 * `minimum` of them. `command` names the command in the messages.
 */
export function seriesList(given: string | undefined, command: string, minimum = 2): string[] {
  const count = minimum === 2 ? 'two' : String(minimum);
  if (given === undefined) throw new MooringInputError(`${command} needs --series A,B[,...]: ${count} or more columns, separated by commas.`);
  const names = given.split(',').map((s) => s.trim());
  if (names.some((n) => n === '')) throw new MooringInputError(`--series has an empty name in '${given}': separate the names with single commas.`);
  if (names.length < minimum) throw new MooringInputError(`${command} needs at least ${count} series in --series; got only '${names[0]}'.`);
  const lower = names.map((n) => n.toLowerCase());
  const repeated = names.find((_, i) => lower.indexOf(lower[i]) !== i);
  if (repeated !== undefined) throw new MooringInputError(`'${repeated}' is named twice in --series: each series may appear once.`);
  return names;
}
