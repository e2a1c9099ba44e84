/**
 * The shape of one command of the `mooring` command line. Each command is one module under
 * addin/cli/commands/ exporting a Command; the table in commands/index.ts lists them. The
 * runner owns everything around a command: parsing, reading the CSV, help, the cautions,
 * choosing terminal or JSON output, and turning errors into exit codes.
 */
import type { CsvTable } from '../csv/read-csv';
import type { RowPeriod } from '../report/row-period';
import type { OptionSpec, ParsedArguments } from './arguments';

/** Options every command takes. */
export const COMMON_OPTIONS: readonly OptionSpec[] = [
  { name: 'series', value: 'NAME', help: 'the column to use (may be left out when the file holds one series)' },
  { name: 'log', help: 'use natural logs of the values (every value must be positive)' },
  { name: 'skip-gaps', help: 'drop blank, text and error cells inside the series instead of stopping' },
  { name: 'json', help: 'print one JSON object instead of the readable report' },
  { name: 'from', value: 'DATE', help: 'first date of the sample, such as 2023-01-02 (included)' },
  { name: 'to', value: 'DATE', help: 'last date of the sample (included)' },
  { name: 'dates', value: 'NAME[,NAME]', help: 'the date column(s), when not found by themselves (spreadsheet day numbers included)' },
  { name: 'date-order', value: 'dmy|mdy', help: 'read dates such as 03/04/2024 as day/month/year or month/day/year, when the data do not tell' },
  { name: 'fill-forward', value: 'N', help: 'when joining calendars, carry a price forward over at most N missing dates (default 0: only dates every series has)' },
  { name: 'delimiter', value: 'comma|semicolon|tab', help: 'what separates the fields (default: found from the first line)' },
  { name: 'decimal', value: 'point|comma', help: 'the decimal mark of the numbers (default: found from the file)' },
];

/** The common options, read. */
export interface CommonOptions {
  series?: string;
  log: boolean;
  skipGaps: boolean;
  json: boolean;
}

/** What a command receives: the file, its table, its arguments. */
export interface CommandContext {
  command: string;
  /** The file name as given on the command line (several joined by ' + '). */
  file: string;
  /** The rows of the file (or of the files, joined on their dates), oldest first, cut to --from/--to. */
  table: CsvTable;
  args: ParsedArguments;
  common: CommonOptions;
  /** What was done to the rows before the command (dialect, order, join, window), in words. */
  notices?: string[];
  /** What one row is, found once from the dates: the unit of every half-life, lag and window. */
  period?: RowPeriod;
  /** The window of rows as the shared preparation words ("from row 261, to row 520"), '' for all rows. */
  window?: string;
}

/** What a command returns: both renderings; the runner prints one. */
export interface CommandOutput {
  /** The readable report, without the cautions (the runner appends them). */
  terminal: string;
  /** The fields of the JSON object (the runner adds command, file and cautions). */
  json: Record<string, unknown>;
  /**
   * Output too large to build (every pair of a screen): when present the runner calls it instead
   * of printing the report or the JSON object, and it writes its text a piece at a time. The
   * pieces are written as they are (the command makes data-borne text safe itself).
   */
  stream?: (write: (s: string) => void) => void;
}

/** One command. */
export interface Command {
  /** The word that selects it, lower case. */
  name: string;
  /** One line for the list of commands. */
  summary: string;
  /** Paragraphs for the command's own help. */
  description: readonly string[];
  /** Usage line, e.g. "mooring adf <file.csv> --series NAME [options]". */
  usage: string;
  /** The command's own options; the common ones are added by the runner. */
  options: readonly OptionSpec[];
  /** Example command lines for the help. */
  examples?: readonly string[];
  /** Runs the command; bad input throws MooringInputError. */
  run(context: CommandContext): CommandOutput;
  /**
   * Work a command may start before its files are read, to run while they are (the screen starts
   * its worker threads). It never refuses anything: `run` checks the options.
   */
  beforeReading?(files: readonly string[], args: ParsedArguments): void;
  /**
   * For a command whose files are not price CSVs (merge reads screen parts): runs instead of
   * `run`, with the file names as given, and says what the JSON envelope should name.
   */
  runOnFiles?(files: readonly string[], args: ParsedArguments, common: CommonOptions): FilesOutput;
}

/** What a command that reads its own files returns: its output and the envelope's fields. */
export interface FilesOutput {
  output: CommandOutput;
  file: string;
  notices: string[];
  halfLifeUnit: string;
  spacing: string;
}
