/** `mooring kalman`: the moving hedge ratio of --y on --x by the Kalman filter (addin/kalman/moving-hedge.ts). */
import { MooringInputError } from '../../errors';
import { movingHedge } from '../../kalman/moving-hedge';
import type { Command } from '../command';
import { bullet, formatStatistic, heading, labelled } from '../render/format';
import { plainTable } from './plain-table';
import { relationFromContext, relationJson, relationSampleTerminal, X_OPTION, Y_OPTION } from './relation-input';

/** A variance for --state-var or --obs-var: a number of 0 or more, such as 1e-5; undefined when absent. */
function varianceOption(option: string, raw: string | undefined): number | undefined {
  if (raw === undefined) return undefined;
  const t = raw.trim();
  if (!/^\+?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(t)) throw new MooringInputError(`--${option} must be a variance of 0 or more such as 0.0001 or 1e-5, not '${raw}'.`);
  return Number(t);
}

/** Rows shown in the terminal: the first after the set-up, then evenly spaced, then the last. */
function shownRows(n: number, first: number, count: number): number[] {
  const out = new Set<number>([first, n - 1]);
  const span = n - 1 - first;
  for (let k = 1; k < count - 1; k++) out.add(first + Math.round((span * k) / (count - 1)));
  return [...out].sort((a, b) => a - b);
}

const show = (v: number | null): string => (v === null ? '-' : formatStatistic(v));

/** The kalman command. */
export const kalmanCommand: Command = {
  name: 'kalman',
  summary: 'a hedge ratio that moves: intercept and slope of --y on --x through time by the Kalman filter',
  description: [
    'Follows the line y = a_t + b_t x through time: the intercept a_t and the slope b_t each take a random step every row (variance Q), ' +
      'and y scatters around the line (variance R). The first two rows only set the line up (exact diffuse start: nothing is assumed about it before the data).',
    'By default Q and R are estimated by maximum likelihood; --state-var and --obs-var fix them (give both).',
    'Filtered values use the rows up to each row (what was known that day); smoothed values use every row (hindsight). ' +
      'The filtered spread is y minus the line known the row before, and its standardised form divides it by its standard deviation: the signal traders build from this.',
    'A ratio that drifts is itself evidence that the fixed relation is unstable.',
  ],
  usage: 'mooring kalman <file.csv> --y NAME --x NAME [options]',
  options: [
    Y_OPTION,
    X_OPTION,
    { name: 'state-var', value: 'Q', help: 'variance of each step of the intercept and the slope (default: estimated, with --obs-var)' },
    { name: 'obs-var', value: 'R', help: 'variance of y around the line (default: estimated, with --state-var)' },
  ],
  examples: ['mooring kalman prices.csv --y Diesel --x Gasoil --log', 'mooring kalman prices.csv --y Diesel --x Gasoil --state-var 1e-6 --obs-var 1e-4 --json'],
  run(context) {
    const stateVar = varianceOption('state-var', context.args.values.get('state-var'));
    const obsVar = varianceOption('obs-var', context.args.values.get('obs-var'));
    const input = relationFromContext(context, true);
    const names = { y: input.names.y, x: input.names.xs[0] };
    const r = movingHedge(input.y.series.values, input.xs[0].series.values, names, { stateVar, obsVar });
    const rows = input.y.series.rows;
    const table = context.table;
    const dateColumn = table.dateIndex >= 0 ? table.columns[table.dateIndex] : null;
    const dates = Array.from(rows, (row) => dateColumn?.[row]?.trim() || null);
    const where = (t: number) => dates[t] ?? `row ${t + 1}`;
    const n = r.rows;
    const pathTable = plainTable(
      ['row', 'ratio', 'std.', 'smoothed', 'std.', 'spread', 'z'],
      shownRows(n, Math.max(r.diffuseRows - 1, 0), 8).map((t) => [where(t), show(r.beta[t]), show(r.betaStd[t]), show(r.betaSmoothed[t]), show(r.betaSmoothedStd[t]), show(r.spread[t]), show(r.spreadStandardised[t])]),
    );
    const out = [
      heading(`Moving hedge ratio of ${names.y} on ${names.x}`),
      '',
      labelled('Latest', `${r.latest.text}${dates[n - 1] ? `, on ${dates[n - 1]}` : ''}`),
      labelled('Fixed line', `least-squares ratio ${formatStatistic(r.fixedBeta)} over all ${n} rows`),
      labelled('Drift', r.driftText),
      labelled('Variances', `Q = ${r.stateVar.toPrecision(4)} (each step of intercept and slope), R = ${r.obsVar.toPrecision(4)} (around the line), ` +
        `${r.variances === 'estimated' ? 'by maximum likelihood' : 'as given'}; log-likelihood ${formatStatistic(r.logLikelihood)} (exact diffuse)`),
      labelled('Set-up rows', `${r.diffuseRows}: no filtered value or spread there`),
      '',
      ...pathTable,
      '',
      bullet(r.assumptions),
      bullet(r.driftMeaning),
      ...r.warnings.map((w) => bullet(w, 2, '!')),
      '',
      relationSampleTerminal(input),
    ];
    return {
      terminal: out.join('\n'),
      json: {
        ...relationJson(input),
        rows: n,
        dates,
        beta: r.beta,
        intercept: r.intercept,
        betaStd: r.betaStd,
        interceptStd: r.interceptStd,
        betaSmoothed: r.betaSmoothed,
        betaSmoothedStd: r.betaSmoothedStd,
        interceptSmoothed: r.interceptSmoothed,
        interceptSmoothedStd: r.interceptSmoothedStd,
        spread: r.spread,
        spreadStandardised: r.spreadStandardised,
        stateVar: r.stateVar,
        obsVar: r.obsVar,
        variances: r.variances,
        logLikelihood: r.logLikelihood,
        diffuseRows: r.diffuseRows,
        latest: r.latest,
        fixedBeta: r.fixedBeta,
        shareOutsideBand: r.shareOutsideBand,
        smoothedRange: r.smoothedRange,
        driftText: r.driftText,
        assumptions: r.assumptions,
        driftMeaning: r.driftMeaning,
        warnings: r.warnings,
      },
    };
  },
};
