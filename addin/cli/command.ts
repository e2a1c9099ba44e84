/**
 * The shape of one command of the `mooring` command line. Each command is one module under
 * addin/cli/commands/ exporting a Command; the table in commands/index.ts lists them. The
 * runner owns everything around a command: parsing, reading the CSV, help, the cautions,
 * choosing terminal or JSON output, and turning errors into exit codes.
 */
import type { CsvTable } from '../csv/read-csv';
import type { OptionSpec, ParsedArguments } from './arguments';

/** Options every command takes. */
export const COMMON_OPTIONS: readonly OptionSpec[] = [
  { name: 'series', value: 'NAME', help: 'the column to use (may be left out when the file holds one series)' },
  { name: 'log', help: 'use natural logs of the values (every value must be positive)' },
  { name: 'skip-gaps', help: 'drop blank, text and error cells inside the series instead of stopping' },
  { name: 'json', help: 'print one JSON object instead of the readable report' },
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
  /** The file name as given on the command line. */
  file: string;
  table: CsvTable;
  args: ParsedArguments;
  common: CommonOptions;
}

/** What a command returns: both renderings; the runner prints one. */
export interface CommandOutput {
  /** The readable report, without the cautions (the runner appends them). */
  terminal: string;
  /** The fields of the JSON object (the runner adds command, file and cautions). */
  json: Record<string, unknown>;
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
}
