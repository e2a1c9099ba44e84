/**
 * `mooring screen`: every pair of the file's series (or of --series A,B,...) whose two series
 * wander with the same order tested for cointegration both ways round, ranked by evidence
 * (the other pairs listed apart, with the reason), with Benjamini-Hochberg adjusted
 * p-values and the sentence on how many would pass by chance alone. Each column is cleaned on
 * its own and each pair tested on the rows both have, so a series that starts later still
 * pairs with the others.
 */
import { csvSeries, seriesNames } from '../../csv/csv-series';
import type { CsvTable } from '../../csv/read-csv';
import { MooringInputError } from '../../errors';
import { screenPairsInThreads } from '../../screen/parallel-node';
import type { NamedSeries, ScreenPair, ScreenResult } from '../../screen/screen-pairs';
import { decimalTextValue } from '../../series/cell-kinds';
import type { Command, CommandContext } from '../command';
import { levelValue, wholeNumberValue } from '../option-values';
import { bullet, formatPValue, formatStatistic, heading, labelled } from '../render/format';
import { textTable } from '../render/text-table';
import { LAGS_OPTION, MAX_LAGS_OPTION, readLags } from '../test-options';

/** Pairs listed in the terminal report unless --top says otherwise. */
const DEFAULT_TOP = 20;

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

/** The ranked pairs as a table: each column as wide as its widest cell, two spaces between, so 'not available' never runs into its neighbour. */
function pairTable(shown: readonly ScreenPair[]): string[] {
  return textTable(
    ['rank', 'pair (y on x)', 'tau', 'p-value', 'adjusted', 'beta', 'half-life', 'z-score'],
    shown.map((p, i) => [
      String(i + 1), `${p.y} on ${p.x}`, formatStatistic(p.statistic), formatPValue(p.pValue), formatPValue(p.adjustedPValue),
      formatStatistic(p.beta), p.halfLife === null ? 'none' : formatStatistic(p.halfLife), formatStatistic(p.zscore),
    ]),
    [1],
  );
}

function terminalReport(result: ScreenResult, top: number, leftOut: string[], threads: string): string {
  const shown = result.pairs.slice(0, top);
  const out = [
    heading(`Pair screen of ${result.names.length} series`),
    '',
    labelled('Series', result.names.join(', ')),
    ...(leftOut.length ? [labelled('Left out', `${leftOut.join(', ')} (not numeric)`)] : []),
    labelled('Orders', result.orders.map((o) => `${o.name} ${o.orderText ?? 'undecided'}`).join(', ')),
    labelled('Tested', `${result.family.size} directed pairs (Engle-Granger, constant, lags by the rule)`),
    labelled('Adjustment', `Benjamini-Hochberg over ${result.family.description}`),
    labelled('Threads', threads),
    '',
    bullet(result.chanceSentence, 0, '*'),
    '',
    ...(shown.length === 0 ? ['  No pair meets the half-life range.'] : pairTable(shown)),
  ];
  if (result.pairs.length > shown.length) out.push(`  ... ${result.pairs.length - shown.length} more pairs (--top N shows more; --json lists all)`);
  if (result.setAside.length > 0) {
    out.push(
      '',
      labelled('Set aside', `${result.setAside.length} directed pairs, not ranked: a pair needs two wandering series of the same order (--json lists them under setAside)`),
      ...result.setAsideSummary.map((line) => bullet(line)),
    );
  }
  if (result.untested.length > 0) out.push('', labelled('Not tested', `${result.untested.length} directed pairs; --json lists them with the reason`));
  out.push('', ...result.cautions.map((c) => bullet(c)));
  return out.join('\n');
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
    { name: 'min-half-life', value: 'ROWS', help: 'show only pairs whose spread half-life is at least this' },
    { name: 'max-half-life', value: 'ROWS', help: 'show only pairs whose spread half-life is at most this' },
    { name: 'min-obs', value: 'N', help: 'test only pairs with at least N shared rows (default 20)' },
    { name: 'johansen', help: "also give each pair's Johansen trace rank (slower)" },
    { name: 'threads', value: 'N', help: 'most threads to use (default: every core; a small screen uses fewer, as starting a thread would cost more than it saves)' },
    { name: 'top', value: 'N', help: `pairs listed in the report (default ${DEFAULT_TOP}; --json lists all)` },
    LAGS_OPTION,
    MAX_LAGS_OPTION,
  ],
  examples: ['mooring screen prices.csv --log', 'mooring screen prices.csv --series Brent,WTI,Gasoil,Diesel --max-half-life 20 --json'],
  run(context) {
    const alpha = levelValue('alpha', context.args.values.get('alpha'));
    const minHalfLife = rowsValue('min-half-life', context.args.values.get('min-half-life'));
    const maxHalfLife = rowsValue('max-half-life', context.args.values.get('max-half-life'));
    const minObservations = wholeNumberValue('min-obs', context.args.values.get('min-obs'), 'rows');
    const threads = wholeNumberValue('threads', context.args.values.get('threads'), 'threads');
    if (threads === 0) throw new MooringInputError('--threads must be at least 1.');
    const top = wholeNumberValue('top', context.args.values.get('top'), 'pairs') ?? DEFAULT_TOP;
    const lagChoice = readLags(context.args);
    const { series, leftOut } = screenSeries(context);
    const { result, report } = screenPairsInThreads(
      series,
      { alpha, minHalfLife, maxHalfLife, minObservations, johansen: context.args.switches.has('johansen'), ...lagChoice },
      { threads },
    );
    const dates = context.table.dateIndex >= 0 ? context.table.columns[context.table.dateIndex] : null;
    const threadText = `${report.threads}${report.note ? ` (${report.note})` : ''}`;
    return {
      terminal: terminalReport(result, top, leftOut, threadText),
      json: {
        series: result.names,
        leftOut,
        alpha: result.alpha,
        orders: result.orders,
        orderTests: result.orderTests,
        family: result.family,
        rawPasses: result.rawPasses,
        expectedByChance: result.expectedByChance,
        discoveries: result.discoveries,
        chanceSentence: result.chanceSentence,
        pairs: result.pairs.map((p) => ({ ...p, lastLine: context.table.lines[p.lastRow], lastDate: dates?.[p.lastRow]?.trim() || null })),
        matrix: result.matrix,
        adjustedMatrix: result.adjustedMatrix,
        setAside: result.setAside,
        setAsideSummary: result.setAsideSummary,
        untested: result.untested,
        screenCautions: result.cautions,
        threads: report,
      },
    };
  },
};
