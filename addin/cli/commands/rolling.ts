/**
 * `mooring rolling`: does the relation of --y and --x hold through time? The Engle-Granger
 * p-value, the hedge ratio and the spread's half-life over rolling windows of --window rows
 * (or, with --expanding, windows that all start on the first row), every --step rows back
 * from the last. JSON gives one array per statistic with each window's end row and date.
 */
import { csvRowLabel } from '../../csv/csv-series';
import { MooringInputError } from '../../errors';
import { rollingRelation, type RollingRelation } from '../../stability/rolling-relation';
import type { Command } from '../command';
import { wholeNumberValue } from '../option-values';
import { bullet, formatPValue, formatStatistic, heading, labelled } from '../render/format';
import { textTable } from '../render/text-table';
import { relationFromContext, relationJson, relationSampleTerminal, X_OPTION, Y_OPTION } from './relation-input';

/** Windows shown in the terminal table (evenly spaced, the latest always among them). */
const SHOWN_WINDOWS = 12;

/** "104 weeks", "1 day", "60 rows": a count of rows in the words of the data's spacing. */
function rowsText(n: number, period: string): string {
  return `${n} ${period}${n === 1 ? '' : 's'}`;
}

function windowTable(r: RollingRelation, endLabel: (k: number) => string, period: string): string[] {
  const total = r.endRow.length;
  const count = Math.min(SHOWN_WINDOWS, total);
  const picks = count === 1 ? [0] : [...new Set(Array.from({ length: count }, (_, i) => Math.round(((total - 1) * i) / (count - 1))))];
  // Each column as wide as its widest cell, two spaces between: 'not available' never runs into its neighbour.
  return textTable(
    ['window ends', `${period}s`, 'p-value', 'beta', `half-life (${period}s)`],
    picks.map((k) => [endLabel(k), String(r.nobs[k]), formatPValue(r.pValue[k]), formatStatistic(r.beta[k]), r.halfLife[k] === null ? 'none' : formatStatistic(r.halfLife[k])]),
  );
}

/** The rolling command. */
export const rollingCommand: Command = {
  name: 'rolling',
  summary: 'Engle-Granger p-value, hedge ratio and half-life of a pair through time',
  description: [
    'Runs the Engle-Granger test of --y on --x, and finds the hedge ratio and the half-life of the spread, in each window of --window rows ' +
      '(rolling), or from the first row to each end with --expanding. Windows end on the last row and every --step rows before it.',
    'A relation that passed over the whole sample may have passed only in part of it: a run of large p-values at the end means it no longer holds.',
  ],
  usage: 'mooring rolling <file.csv> --y NAME --x NAME --window N [--step S] [--expanding] [options]',
  options: [
    Y_OPTION,
    X_OPTION,
    { name: 'window', value: 'N', help: 'rows in each window (rolling), or in the first window (expanding); at least 21, the fewest the test can use' },
    { name: 'step', value: 'S', help: 'rows between window ends (default 1)' },
    { name: 'expanding', help: 'windows that start on the first row and grow' },
  ],
  examples: ['mooring rolling prices.csv --y Diesel --x Gasoil --log --window 250 --step 5', 'mooring rolling prices.csv --y Diesel --x Gasoil --window 500 --expanding --json'],
  run(context) {
    const window = wholeNumberValue('window', context.args.values.get('window'), 'rows');
    if (window === undefined) throw new MooringInputError('rolling needs --window N: the rows in each window (250 is about a year of trading days).');
    const step = wholeNumberValue('step', context.args.values.get('step'), 'rows') ?? 1;
    const expanding = context.args.switches.has('expanding');
    const input = relationFromContext(context, true);
    const names = { y: input.names.y, x: input.names.xs[0] };
    // What one row is (found once from the dates): windows and half-lives are counted in it.
    const period = context.period?.period ?? 'row';
    const unit = context.period?.unit ?? 'rows';
    const r = rollingRelation(input.y.series.values, input.xs[0].series.values, { window, step, expanding, period }, names);
    const rows = input.y.series.rows;
    const table = context.table;
    const dates = table.dateIndex >= 0 ? table.columns[table.dateIndex] : null;
    const dateOf = (i: number) => dates?.[rows[i]]?.trim() || null;
    const label = csvRowLabel(table);
    const out = [
      heading(`${expanding ? 'Expanding' : 'Rolling'} relation of ${names.y} on ${names.x}`),
      '',
      labelled('Windows', `${r.endRow.length}, each ${expanding ? `from the first row and at least ${rowsText(window, period)} long` : `${rowsText(window, period)} long`}, one ending every ${step === 1 ? period : rowsText(step, period)}, counting back from the last`),
      '',
      ...r.summary.map((s) => bullet(s)),
      '',
      ...windowTable(r, (k) => label(rows[r.endRow[k]]), period),
      '',
      relationSampleTerminal(input),
    ];
    return {
      terminal: out.join('\n'),
      json: {
        ...relationJson(input),
        window,
        step,
        windowUnit: unit,
        expanding,
        endRow: r.endRow,
        endLine: r.endRow.map((i) => table.lines[rows[i]]),
        endDate: r.endRow.map(dateOf),
        startDate: r.startRow.map(dateOf),
        nobs: r.nobs,
        pValue: r.pValue,
        statistic: r.statistic,
        lags: r.lags,
        beta: r.beta,
        intercept: r.intercept,
        rSquared: r.rSquared,
        halfLife: r.halfLife,
        halfLifeUnit: unit,
        summary: r.summary,
      },
    };
  },
};
