/** `mooring forecast`: where the series and their spread are heading if the relation holds (addin/forecast/vecm-forecast.ts). */
import { futureDates } from '../../forecast/future-dates';
import { vecmForecast } from '../../forecast/vecm-forecast';
import { JOHANSEN_CASES } from '../../johansen/deterministic-case';
import { MooringInputError } from '../../errors';
import type { Command } from '../command';
import { choiceValue, levelValue, wholeNumberValue } from '../option-values';
import { bullet, formatStatistic, heading, labelled } from '../render/format';
import { renderSampleTerminal, sampleJson } from '../render/sample';
import { blockFromContext, seriesList } from '../series-input';
import { plainTable } from './plain-table';

/** The forecast command. */
export const forecastCommand: Command = {
  name: 'forecast',
  summary: 'where the series and their spread are heading if the long-run relation holds (error-correction forecast)',
  description: [
    'Fits the vector error-correction model by Johansen\'s maximum likelihood (the estimates the johansen command reports) and runs it forward ' +
      '--horizon steps: each series with its 95% interval, on the dates that follow the last row in the data\'s own spacing, and the first ' +
      'long-run relation\'s spread on its way back towards equilibrium, with its band.',
    'The rank (number of long-run relations) defaults to the trace test\'s choice at --alpha; --case and --lags as for johansen.',
    'The intervals come from the model\'s residual covariance and ignore the uncertainty of the estimated coefficients, so they are somewhat too narrow. ' +
      'A forecast assumes the relation holds; relations break.',
  ],
  usage: 'mooring forecast <file.csv> --series A,B[,...] --horizon H [options]',
  options: [
    { name: 'horizon', value: 'H', help: 'steps (rows) ahead to forecast' },
    { name: 'rank', value: 'R', help: 'long-run relations in the model (default: the trace test\'s choice)' },
    { name: 'case', value: JOHANSEN_CASES.join('|'), help: 'deterministic terms (default constant)' },
    { name: 'lags', value: 'K', help: 'lagged changes in the model (default 1)' },
    { name: 'alpha', value: 'LEVEL', help: 'level of the trace test that chooses the rank (default 0.05)' },
  ],
  examples: ['mooring forecast prices.csv --series Gasoil,Diesel --horizon 20 --log', 'mooring forecast prices.csv --series Gasoil,Diesel,Freight --rank 1 --lags 2 --horizon 10 --json'],
  run(context) {
    const names = seriesList(context.common.series, 'forecast');
    const horizon = wholeNumberValue('horizon', context.args.values.get('horizon'), 'steps ahead');
    if (horizon === undefined) throw new MooringInputError('forecast needs --horizon H: how many rows ahead to forecast (20 is about a month of trading days).');
    const rankText = context.args.values.get('rank');
    const rank = rankText === undefined ? undefined : /^\s*\d+\s*$/.test(rankText) ? Number(rankText) : Number.NaN;
    if (rank !== undefined && !Number.isInteger(rank)) throw new MooringInputError(`--rank must be a whole number of long-run relations such as 1, not '${rankText}'.`);
    const caseName = choiceValue('case', context.args.values.get('case'), JOHANSEN_CASES) ?? 'constant';
    const lags = wholeNumberValue('lags', context.args.values.get('lags'), 'lagged changes') ?? 1;
    const alpha = levelValue('alpha', context.args.values.get('alpha')) ?? 0.05;
    const block = blockFromContext(context, names);
    const labels = block.map((s) => s.label);
    const r = vecmForecast(block.map((s) => s.series.values), labels, { case: caseName, lags, rank, alpha, horizon });
    const table = context.table;
    const dateColumn = table.dateIndex >= 0 ? table.columns[table.dateIndex] : null;
    const rows = block[0].series.rows;
    const dates = dateColumn ? Array.from(rows, (row) => dateColumn[row]?.trim() || null) : null;
    const ahead = futureDates(dates, horizon);
    const label = (h: number) => ahead?.[h] ?? `row +${h + 1}`;
    const fan = plainTable(
      ['step', ...labels.flatMap((n) => [n, 'low', 'high'])],
      r.forecast.map((row, h) => [label(h), ...row.flatMap((v, i) => [formatStatistic(v), formatStatistic(r.lower[h][i]), formatStatistic(r.upper[h][i])])]),
    );
    const out = [
      heading(`Forecast of ${labels.join(', ')}, ${horizon} step${horizon === 1 ? '' : 's'} ahead`),
      '',
      labelled('Model', `error-correction model, ${r.rank} long-run relation${r.rank === 1 ? '' : 's'} (${r.rankChosenBy === 'given' ? 'as given' : `the trace test's choice at ${alpha}`}), case ${r.case}, ${r.lags} lagged change${r.lags === 1 ? '' : 's'}`),
      '',
      ...fan,
      '',
    ];
    const spread = r.spread;
    if (spread) {
      out.push(labelled('Spread', `${spread.text}: now ${formatStatistic(spread.history[spread.history.length - 1])}, equilibrium (its mean over the fit) ${formatStatistic(spread.mean)}`));
      out.push(labelled('Its path', spread.path.map((v, h) => `${label(h)} ${formatStatistic(v)} (${formatStatistic(spread.lower[h])} to ${formatStatistic(spread.upper[h])})`).join('; ')));
    }
    out.push('', bullet(r.bandNote), ...r.warnings.map((w) => bullet(w, 2, '!')), '', renderSampleTerminal({ ...block[0].sample, column: labels.join(', ') }));
    return {
      terminal: out.join('\n'),
      json: {
        series: labels,
        sample: sampleJson(block[0].sample),
        case: r.case,
        lags: r.lags,
        rank: r.rank,
        rankChosenBy: r.rankChosenBy,
        horizon,
        dates: ahead ?? r.forecast.map((_, h) => null),
        forecast: r.forecast,
        lower: r.lower,
        upper: r.upper,
        standardError: r.standardError,
        residualCovariance: r.residualCovariance,
        spread: r.spread,
        bandNote: r.bandNote,
        warnings: r.warnings,
      },
    };
  },
};
