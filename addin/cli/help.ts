/** The help texts of `mooring`: the overview of all commands, and one command's own page. */
import type { OptionSpec } from './arguments';
import { COMMON_OPTIONS, type Command } from './command';
import { wrapWords } from './render/format';

const WIDTH = 78;

function paragraph(text: string, indent = 0): string {
  return wrapWords(text, WIDTH - indent).map((l) => ' '.repeat(indent) + l).join('\n');
}

function optionLines(specs: readonly OptionSpec[]): string[] {
  const left = specs.map((s) => `--${s.name}${s.value ? ` ${s.value}` : ''}`);
  const width = Math.min(28, Math.max(...left.map((l) => l.length)));
  return specs.flatMap((s, i) => {
    const head = `  ${left[i].padEnd(width)}  `;
    const room = WIDTH - 4 - width;
    const [first, ...rest] = wrapWords(s.help, room);
    if (head.length > width + 4) return [`  ${left[i]}`, ...wrapWords(s.help, room).map((l) => ' '.repeat(width + 4) + l)];
    return [head + first, ...rest.map((l) => ' '.repeat(width + 4) + l)];
  });
}

/** The overview: what mooring is, the commands, the common options, exit codes. */
export function overallHelp(commands: readonly Command[]): string {
  const nameWidth = Math.max(...commands.map((c) => c.name.length));
  return [
    'mooring: unit-root and cointegration tests on price histories in CSV files',
    '',
    'Usage:  mooring <command> <file.csv> [more.csv ...] [options]',
    '        mooring <command> --help      the options of one command',
    '',
    'Commands:',
    ...commands.map((c) => `  ${c.name.padEnd(nameWidth)}  ${c.summary}`),
    '',
    'Options of every command:',
    ...optionLines(COMMON_OPTIONS),
    '',
    paragraph('The first line of the file names the columns. Date columns (headed date, time, period and the like, ' +
      'a header naming a date over spreadsheet day numbers, or dates such as 2024-03-15, 15/03/2024 or 3/15/2024) are found ' +
      'by themselves (or named with --dates); they are never read as numbers. Rows that run newest first are put in date order; ' +
      'repeated or shuffled dates are refused. Several files, or several date columns, are joined on the dates every series ' +
      'has, and the output says how many rows each lost. Semicolon files with decimal commas are read. Half-lives and windows ' +
      'are given in the spacing of the dates (days, weeks, months). Give - as the file to read standard input.'),
    '',
    'Exit status: 0 done; 2 bad input, with one line on standard error; 1 an internal error.',
    '',
  ].join('\n');
}

/** One command's page: usage, what it does, its options and the common ones, examples. */
export function commandHelp(command: Command): string {
  const lines = [`Usage:  ${command.usage}`, ''];
  for (const p of command.description) lines.push(paragraph(p), '');
  if (command.options.length > 0) lines.push('Options:', ...optionLines(command.options), '');
  lines.push('Options of every command:', ...optionLines(COMMON_OPTIONS), '');
  if (command.examples && command.examples.length > 0) lines.push('Examples:', ...command.examples.map((e) => `  ${e}`), '');
  return lines.join('\n');
}
