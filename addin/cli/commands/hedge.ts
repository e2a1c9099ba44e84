/** `mooring hedge`: hedge ratios of --y on --x by OLS both ways, total least squares and dynamic OLS. */
import { hedgeRatios, type HedgeRatio } from '../../cointegration/hedge-ratio';
import { MooringInputError } from '../../errors';
import type { Command } from '../command';
import { countOrWordValue, wholeNumberValue } from '../option-values';
import { formatPValue, formatStatistic, heading, labelled } from '../render/format';
import { BANDWIDTH_OPTION, readBandwidth } from '../test-options';
import { plainTable } from './plain-table';
import { relationFromContext, relationJson, relationSampleTerminal, X_OPTION, Y_OPTION } from './relation-input';

/** Short names for the table (the JSON and the engine keep the full labels). */
const SHORT_LABEL: Record<HedgeRatio['method'], string> = {
  ols: 'OLS, y on x',
  'reverse-ols': 'OLS, x on y, turned',
  'total-least-squares': 'orthogonal (TLS)',
  'dynamic-ols': 'dynamic OLS',
};

function ratioJson(r: HedgeRatio): Record<string, unknown> {
  return { method: r.method, label: r.label, beta: r.beta, intercept: r.intercept, standardError: r.standardError, tValue: r.tValue, pValue: r.pValue, note: r.note ?? null };
}

/** The hedge command. */
export const hedgeCommand: Command = {
  name: 'hedge',
  summary: 'hedge ratios of one series on another: OLS both ways, orthogonal regression, dynamic OLS',
  description: [
    'Estimates the line y = intercept + beta x four ways. Only dynamic OLS (with leads and lags of the change in x) ' +
      'has a standard error that is valid for wandering prices; it is computed from the long-run variance of its residual.',
    'By default AIC chooses the number of leads and lags, up to the cube root of the number of rows.',
  ],
  usage: 'mooring hedge <file.csv> --y NAME --x NAME [options]',
  options: [
    Y_OPTION,
    X_OPTION,
    { name: 'leads-lags', value: 'N|aic', help: 'leads and lags of the change in x in dynamic OLS, or aic to choose them (the default)' },
    { name: 'max-leads-lags', value: 'N', help: 'largest number AIC may choose (default: the cube root of the rows)' },
    BANDWIDTH_OPTION,
  ],
  examples: ['mooring hedge prices.csv --y Diesel --x Gasoil --log', 'mooring hedge prices.csv --y Diesel --x Gasoil --leads-lags 2 --json'],
  run(context) {
    const leadsLags = countOrWordValue('leads-lags', context.args.values.get('leads-lags'), 'leads and lags', ['aic'] as const) ?? 'aic';
    const maxLeadsLags = wholeNumberValue('max-leads-lags', context.args.values.get('max-leads-lags'), 'leads and lags');
    if (typeof leadsLags === 'number' && maxLeadsLags !== undefined) {
      throw new MooringInputError(`--max-leads-lags applies only with --leads-lags aic; with --leads-lags ${leadsLags} leave it out.`);
    }
    const bandwidth = readBandwidth(context.args);
    const input = relationFromContext(context, true);
    const names = { y: input.names.y, x: input.names.xs[0] };
    const result = hedgeRatios(input.y.series.values, input.xs[0].series.values, { leadsLags, maxLeadsLags, bandwidth }, names);
    const ratios = [result.ols, result.reverseOls, result.totalLeastSquares, result.dynamicOls];
    const header = ['method', 'beta', 'intercept', 'std. error', 't', 'p-value'];
    const cells = ratios.map((r) => [
      SHORT_LABEL[r.method],
      formatStatistic(r.beta),
      formatStatistic(r.intercept),
      r.standardError === null ? '-' : formatStatistic(r.standardError),
      r.tValue === null ? '-' : formatStatistic(r.tValue),
      r.pValue === null ? '-' : formatPValue(r.pValue),
    ]);
    const fit = result.dynamicOlsFit;
    const terminal = [
      heading(`Hedge ratios of ${names.y} on ${names.x}`),
      '',
      labelled('Line', `${names.y} = intercept + beta ${names.x}`),
      '',
      ...plainTable(header, cells),
      '',
      labelled('Verdict', result.verdict),
      labelled('Dynamic OLS', `${fit.leadsLags} leads and lags (${fit.leadsLagsRule === 'aic' ? `chosen by AIC up to ${fit.maxLeadsLags}` : 'as given'}), ` +
        `${fit.nobs} rows, bandwidth ${fit.bandwidth}; standard error from the long-run variance, p-value two-sided normal`),
      labelled('Static lines', 'no standard errors: with wandering prices the static regression t-ratio has no standard distribution'),
      '',
      relationSampleTerminal(input),
    ].join('\n');
    return {
      terminal,
      json: {
        ...relationJson(input),
        ols: ratioJson(result.ols),
        reverseOls: ratioJson(result.reverseOls),
        totalLeastSquares: ratioJson(result.totalLeastSquares),
        dynamicOls: { ...ratioJson(result.dynamicOls), leadsLags: fit.leadsLags, leadsLagsRule: fit.leadsLagsRule, maxLeadsLags: fit.maxLeadsLags, bandwidth: fit.bandwidth, nobs: fit.nobs },
        verdict: result.verdict,
      },
    };
  },
};
