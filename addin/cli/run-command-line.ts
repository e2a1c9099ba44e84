/**
 * The runner of the command line, over any command table: help, parsing, reading the CSV,
 * running the command, printing the terminal report (with the cautions) or one JSON object,
 * and mapping every failure to one line on standard error with an exit code: 2 for bad
 * input, 1 for an internal error. Output goes through `io`, so tests run it in-process.
 * Everything written passes through terminal-text.ts first, so no control character from the
 * data reaches the terminal raw; names from the data longer than a screen can use are shortened
 * on the terminal (render/shown-name.ts), never in JSON.
 */
import { decimalChoice, delimiterChoice, type DialectChoice } from '../csv/dialect';
import { readCsv, type CsvTable } from '../csv/read-csv';
import { isMooringInputError, MooringInputError } from '../errors';
import { closestWord, parseArguments } from './arguments';
import { COMMON_OPTIONS, type Command, type CommandOutput, type CommonOptions } from './command';
import { commandHelp, overallHelp } from './help';
import { preparedInput } from './prepared-input';
import { CAUTIONS, renderCautions } from './render/cautions';
import { bullet, heading } from './render/format';
import { shownMessage, shownNames, withShownNames } from './render/shown-name';
import { writeJson } from './render/json-writer';
import { jsonText, terminalText } from './render/terminal-text';
import type { ParsedArguments } from './arguments';

/** Where the runner reads and writes. */
export interface CliIo {
  stdout(s: string): void;
  stderr(s: string): void;
  /** The text of a file; throws (as fs does) when it cannot be read. */
  readFile(path: string): string;
}

/** Exit code: done. */
export const EXIT_OK = 0;
/** Exit code: an internal error (a defect of ours, reported on one line). */
export const EXIT_INTERNAL = 1;
/** Exit code: bad input (a MooringInputError, an unknown option, a missing file). */
export const EXIT_BAD_INPUT = 2;

const HELP_WORDS = new Set(['--help', '-h', 'help']);

/** Runs one command line against the table; returns the exit code. Never throws. */
export function runCommandLine(argv: readonly string[], io: CliIo, commands: readonly Command[]): number {
  // The long names met so far (option values, then the file's header), for the messages.
  const names = new Map<string, string>();
  try {
    return dispatch(argv, io, commands, names);
  } catch (e) {
    if (isMooringInputError(e)) {
      io.stderr(`mooring: ${terminalText(oneLine(shownMessage(e.message, names)), true)}\n`);
      return EXIT_BAD_INPUT;
    }
    const message = e instanceof Error ? `${e.name}: ${e.message}` : String(e);
    io.stderr(`mooring: internal error (${terminalText(oneLine(shownMessage(message, names)), true)}); please report it with the command that caused it\n`);
    return EXIT_INTERNAL;
  }
}

function dispatch(argv: readonly string[], io: CliIo, commands: readonly Command[], names: Map<string, string>): number {
  if (argv.length === 0) throw new MooringInputError(`No command given; the commands are ${commands.map((c) => c.name).join(', ')} (mooring --help describes them).`);
  const [first, ...rest] = argv;
  if (HELP_WORDS.has(first.toLowerCase())) {
    if (rest.length === 0) {
      io.stdout(overallHelp(commands));
      return EXIT_OK;
    }
    io.stdout(commandHelp(findCommand(rest[0], commands)));
    return EXIT_OK;
  }
  const command = findCommand(first, commands);
  const end = rest.indexOf('--');
  if ((end < 0 ? rest : rest.slice(0, end)).some((w) => w === '--help' || w === '-h')) {
    io.stdout(commandHelp(command));
    return EXIT_OK;
  }
  const args = parseArguments(rest, [...COMMON_OPTIONS, ...command.options], command.name);
  learnNames(names, optionNames(args));
  if (args.positionals.length === 0) {
    throw new MooringInputError(`${command.name} needs ${command.runOnFiles ? "its files" : "a CSV file"}: ${command.usage}.`);
  }
  const files = args.positionals;
  const common: CommonOptions = {
    series: args.values.get('series'),
    log: args.switches.has('log'),
    skipGaps: args.switches.has('skip-gaps'),
    json: args.switches.has('json'),
  };
  if (command.runOnFiles) {
    const own = command.runOnFiles(files, args, common);
    return print(own.output, command.name, own.file, own.notices, { unit: own.halfLifeUnit, spacing: own.spacing }, common, io);
  }
  const file = files.join(' + ');
  const dialect = { delimiter: delimiterChoice(args.values.get('delimiter')), decimal: decimalChoice(args.values.get('decimal')) };
  command.beforeReading?.(files, args);
  const input = preparedInput(files.map((f) => ({ file: f, table: readTable(f, io, dialect) })), args);
  learnNames(names, [...optionNames(args), ...input.table.header]);
  // A report for the terminal runs on the shortened names; JSON, streams and parts keep them whole.
  const onTerminal = !common.json && !args.values.has('format') && !args.values.has('part');
  if (!onTerminal || names.size === 0) {
    const output = command.run({ command: command.name, file, table: input.table, args, common, notices: input.notices, period: input.period, window: input.window });
    return print(output, command.name, file, input.notices, input.period, common, io);
  }
  const shownArgs = argsWithShownNames(args, names);
  const notices = input.notices.map((n) => withShownNames(n, names));
  const output = command.run({
    command: command.name, file, table: tableWithShownNames(input.table, names), args: shownArgs, common: { ...common, series: shownArgs.values.get('series') },
    notices, period: input.period, window: input.window,
  });
  return print({ ...output, terminal: withShownNames(output.terminal, names) }, command.name, file, notices, input.period, common, io);
}

/** Every option value split at its commas (where lists of names are given); a value without a comma whole. */
function optionNames(args: ParsedArguments): string[] {
  return [...args.values.values()].flatMap((v) => v.split(',').map((p) => p.trim()));
}

/** Replaces the map's contents with the shortened forms of the long names among `candidates`. */
function learnNames(names: Map<string, string>, candidates: readonly string[]): void {
  const found = shownNames(candidates);
  names.clear();
  for (const [name, shown] of found) names.set(name, shown);
}

/** The arguments with every long name (a whole value, or one of its comma-separated parts) shortened. */
function argsWithShownNames(args: ParsedArguments, names: ReadonlyMap<string, string>): ParsedArguments {
  const values = new Map([...args.values].map(([option, v]): [string, string] =>
    [option, names.get(v) ?? v.split(',').map((part) => names.get(part.trim()) ?? part).join(',')]));
  return { ...args, values };
}

/** The table with its long column names shortened (the fields untouched). */
function tableWithShownNames(table: CsvTable, names: ReadonlyMap<string, string>): CsvTable {
  return { ...table, header: table.header.map((h) => names.get(h) ?? h), dateColumn: table.dateColumn === null ? null : (names.get(table.dateColumn) ?? table.dateColumn) };
}

/** Prints a command's output: its stream, one JSON object, or the report with the cautions. */
function print(
  output: CommandOutput, name: string, file: string, notices: readonly string[], period: { unit: string; spacing: string }, common: CommonOptions, io: CliIo,
): number {
  if (output.stream) {
    output.stream((s) => io.stdout(s));
  } else if (common.json) {
    const { json } = output;
    const warnings = Array.isArray(json.warnings) ? [...notices, ...(json.warnings as unknown[])] : notices.slice();
    const object = {
      command: name, file, ...json, warnings,
      halfLifeUnit: json.halfLifeUnit ?? period.unit, spacing: period.spacing, cautions: CAUTIONS.slice(),
    };
    // Written in pieces (the text of JSON.stringify): a report on a million rows is 350 MB of it.
    writeJson(object, jsonValue, 2, (piece) => io.stdout(jsonText(piece)));
    io.stdout('\n');
  } else {
    const data = notices.length > 0 ? `${heading('About the data')}\n${notices.map((n) => bullet(n, 2, '!')).join('\n')}\n\n` : '';
    io.stdout(`${terminalText(data + output.terminal)}\n\n${renderCautions()}\n`);
  }
  return EXIT_OK;
}

function findCommand(word: string, commands: readonly Command[]): Command {
  const command = commands.find((c) => c.name === word.toLowerCase());
  if (command) return command;
  const near = closestWord(word.toLowerCase(), commands.map((c) => c.name));
  const hint = near ? ` (did you mean ${near}?)` : '';
  throw new MooringInputError(`Unknown command '${word}'${hint}; the commands are ${commands.map((c) => c.name).join(', ')}.`);
}

function readTable(file: string, io: CliIo, dialect: DialectChoice): CsvTable {
  let text: string;
  try {
    text = io.readFile(file);
  } catch (e) {
    throw new MooringInputError(`Cannot read '${file}': ${readFailure(e)}.`);
  }
  try {
    return readCsv(text, dialect);
  } catch (e) {
    if (isMooringInputError(e)) throw new MooringInputError(`${file}: ${e.message}`, e.where);
    throw e;
  }
}

function readFailure(e: unknown): string {
  const code = (e as { code?: unknown } | null)?.code;
  switch (code) {
    case 'ENOENT': return 'no such file; check the name and the folder';
    case 'EISDIR': return 'it is a folder, not a file';
    case 'EACCES':
    case 'EPERM': return 'permission denied';
    default: return e instanceof Error ? e.message : String(e);
  }
}

/** JSON replacer: typed arrays as plain arrays, non-finite numbers as null. */
function jsonValue(_key: string, value: unknown): unknown {
  if (ArrayBuffer.isView(value) && !(value instanceof DataView)) return Array.from(value as unknown as ArrayLike<number>);
  if (typeof value === 'number' && !Number.isFinite(value)) return null;
  return value;
}

/** A message on one line: line breaks and runs of spaces become single spaces. */
export function oneLine(message: string): string {
  return message.replace(/\s*[\r\n]+\s*/g, ' ').trim();
}
