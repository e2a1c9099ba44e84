/**
 * `mooring report`: the full pairwise diagnostic of two or more series in one command. The
 * engine's diagnose() makes the report; this reads the columns, hands them over through the
 * cleaner, and renders the result as the readable terminal report, as one JSON object
 * (--json, the report under "report"), and as a self-contained HTML file (--out).
 *
 * The HTML file is written through report-file.ts (Node's fs, because the runner's io has no
 * writer), which refuses to replace a file Mooring did not write unless --force is given.
 */
import { decimalTextValue } from '../../series/cell-kinds';
import { csvBlock, seriesNames } from '../../csv/csv-series';
import { AS_GIVEN, describePreparation } from '../../series/preparation';
import type { CsvTable } from '../../csv/read-csv';
import { MooringInputError } from '../../errors';
import { JOHANSEN_CASES, type JohansenCase } from '../../johansen/deterministic-case';
import { diagnose } from '../../report/pairwise-diagnostic';
import { prepareDiagnosticInput } from '../../report/prepare-input';
import type { Command, CommandContext } from '../command';
import { choiceValue, levelValue, wholeNumberValue } from '../option-values';
import { renderDiagnosticHtml } from '../render/diagnostic-html';
import { renderDiagnosticTerminal } from '../render/diagnostic-terminal';
import { checkReportPath, writeReportFile } from '../report-file';
import { readUnitRootTest, UNIT_ROOT_OPTION } from '../test-options';

/** A column counts as numbers when more than half of its filled fields read as plain decimals. */
function isNumericColumn(fields: readonly string[]): boolean {
  let filled = 0;
  let numbers = 0;
  for (const f of fields) {
    if (f.trim() === '') continue;
    filled++;
    if (decimalTextValue(f) !== null) numbers++;
  }
  return filled > 0 && numbers * 2 > filled;
}

/** The names --series lists, or every numeric column; with the columns left out and why. */
export function reportColumns(table: CsvTable, given: string | undefined): { names: string[]; leftOut: string[] } {
  if (given !== undefined) {
    const names = given.split(',').map((s) => s.trim());
    if (names.some((n) => n === '')) throw new MooringInputError(`--series has an empty name in '${given}': separate the names with single commas.`);
    if (names.length < 2) throw new MooringInputError(`report compares series in pairs: name at least two with --series A,B (the series are: ${seriesNames(table).join(', ')}).`);
    const lower = names.map((n) => n.toLowerCase());
    const repeated = names.find((_, i) => lower.indexOf(lower[i]) !== i);
    if (repeated !== undefined) throw new MooringInputError(`'${repeated}' is named twice in --series: name each series once.`);
    return { names, leftOut: [] };
  }
  const names: string[] = [];
  const leftOut: string[] = [];
  table.header.forEach((h, j) => {
    if (j === table.dateIndex) return;
    (isNumericColumn(table.columns[j]) ? names : leftOut).push(h);
  });
  if (names.length < 2) {
    throw new MooringInputError(`report needs at least two columns of numbers; this file has ${names.length === 0 ? 'none' : `only ${names[0]}`}${leftOut.length > 0 ? ` (not numbers: ${leftOut.join(', ')})` : ''}.`);
  }
  return { names, leftOut };
}

function runReport(context: CommandContext): { terminal: string; json: Record<string, unknown> } {
  const { args, table, file } = context;
  const alpha = levelValue('alpha', args.values.get('alpha'));
  const lagRule = choiceValue('lag-rule', args.values.get('lag-rule'), ['aic', 'bic'] as const);
  const johansenCase = choiceValue('johansen-case', args.values.get('johansen-case'), ['auto', ...JOHANSEN_CASES] as readonly (JohansenCase | 'auto')[]);
  const deterministic = choiceValue('deterministic', args.values.get('deterministic'), ['const', 'trend'] as const);
  const unitRootTest = readUnitRootTest(args);
  const rollingWindow = wholeNumberValue('rolling-window', args.values.get('rolling-window'), 'rows');
  const period = args.values.get('period')?.trim() || undefined;
  const out = args.values.get('out');
  if (out !== undefined && !/\.html?$/i.test(out)) throw new MooringInputError(`--out names the HTML report, so it should end in .html; got '${out}'.`);
  const force = args.switches.has('force');
  if (force && out === undefined) throw new MooringInputError('--force allows --out to replace an existing file, so it goes with --out FILE.html.');
  if (out !== undefined) checkReportPath(out, force);

  const { names, leftOut } = reportColumns(table, context.common.series);
  const block = csvBlock(table, names, { log: context.common.log, skipGaps: context.common.skipGaps });
  const dates = table.dateIndex >= 0 ? table.columns[table.dateIndex] : null;
  const input = prepareDiagnosticInput(block, { dateOf: (i) => dates?.[i]?.trim() || null, source: file === '-' ? 'standard input' : file });
  const preparation = [describePreparation({ ...AS_GIVEN, log: context.common.log, skipGaps: context.common.skipGaps }), context.window ?? ''].filter((w) => w !== '').join(', ');
  const report = diagnose(input, { log: context.common.log, alpha, lagRule, johansenCase, deterministic, rollingWindow, period, preparation, unitRootTest });
  // What was done to the rows before the diagnostic (order, join, window) is part of its warnings.
  if (context.notices && context.notices.length > 0) report.warnings = [...context.notices, ...report.warnings];
  if (out !== undefined) writeReportFile(out, renderDiagnosticHtml(report));
  const leftOutLine = leftOut.length > 0 ? `\n\n  Left out (not columns of numbers): ${leftOut.join(', ')}` : '';
  return {
    terminal: renderDiagnosticTerminal(report, { htmlPath: out }) + leftOutLine,
    json: { report, htmlFile: out ?? null, leftOut },
  };
}

/** The report command. */
export const reportCommand: Command = {
  name: 'report',
  summary: 'full pairwise diagnostic of two or more series: orders, cointegration, relation, half-life, lead-lag',
  description: [
    'Runs every test of the pair diagnostic on each pair of the chosen series (all columns of numbers when --series is left out): ' +
      'the order of integration of each series, Engle-Granger both ways, Phillips-Ouliaris and Johansen, the long-run relation ' +
      '(static and dynamic OLS), the half-life of the spread and who closes it, where the spread stands now, and which series leads. ' +
      'With more than two series it also tests the system as a whole.',
    'The findings come first, in plain words, then the numbers behind them and the warnings. --json prints the whole report as one ' +
      'object (under "report"); --out also writes a self-contained HTML report with charts. An existing file at that path is ' +
      'replaced only when it is a report Mooring wrote; any other file is left alone unless --force is given.',
  ],
  usage: 'mooring report <file.csv> [--series A,B[,...]] [options]',
  options: [
    { name: 'alpha', value: 'LEVEL', help: 'significance level of every decision (default 0.05)' },
    { name: 'out', value: 'FILE.html', help: 'also write the report as a self-contained HTML file; an existing file is replaced only if Mooring wrote it' },
    { name: 'force', help: 'with --out: replace the file even if Mooring did not write it' },
    { name: 'period', value: 'WORD', help: 'what one row is (day, week, ...); default found from the dates' },
    { name: 'lag-rule', value: 'aic|bic', help: 'criterion for the lag orders (default aic)' },
    { name: 'johansen-case', value: 'auto|CASE', help: `Johansen deterministic case: auto (chosen from the drift; the default) or one of ${JOHANSEN_CASES.join(', ')}` },
    { name: 'deterministic', value: 'const|trend', help: 'terms in the unit-root and residual tests (default const)' },
    UNIT_ROOT_OPTION,
    { name: 'rolling-window', value: 'N', help: 'rows in the trailing window of the rolling z-score (default 60)' },
  ],
  examples: [
    'mooring report prices.csv --log',
    'mooring report prices.csv --series Diesel,Gasoil --log --out diesel-gasoil.html',
    'mooring report prices.csv --series Diesel,Gasoil,Freight --alpha 0.01 --json',
    'mooring report prices.csv --series Diesel,Gasoil --log --unit-root dfgls',
  ],
  run: runReport,
};
