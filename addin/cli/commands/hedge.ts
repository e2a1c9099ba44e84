/** `mooring hedge`: hedge ratios of --y on --x by OLS both ways, total least squares and dynamic OLS. */
import { dynamicOlsStandardErrorText } from '../../cointegration/dynamic-ols';
import { hedgeRatios, type HedgeRatio, type HedgeRatios } from '../../cointegration/hedge-ratio';
import type { HedgeUnits } from '../../cointegration/hedge-units';
import { MooringInputError } from '../../errors';
import type { Command } from '../command';
import { countOrWordValue, wholeNumberValue } from '../option-values';
import { formatPValue, formatStatistic, heading, labelled } from '../render/format';
import { readBandwidth } from '../test-options';
import { plainTable } from './plain-table';
import { relationFromContext, relationJson, relationSampleTerminal, X_OPTION, Y_OPTION } from './relation-input';

/** Short names for the table (the JSON and the engine keep the full labels). */
const SHORT_LABEL: Record<HedgeRatio['method'], string> = {
  ols: 'OLS, y on x',
  'reverse-ols': 'OLS, x on y, turned',
  'total-least-squares': 'orthogonal (TLS)',
  'dynamic-ols': 'dynamic OLS',
};

function ratioJson(r: HedgeRatio, units: HedgeUnits): Record<string, unknown> {
  return {
    method: r.method, label: r.label, beta: r.beta, intercept: r.intercept, standardError: r.standardError, tValue: r.tValue, pValue: r.pValue, note: r.note ?? null,
    slopeMeaning: units.slopeMeaning, hedgeUnits: units.hedgeUnits, hedgeUnitsText: units.text,
  };
}

/** The four lines in the order the table and the JSON show them, each with its units. */
function linesOf(result: HedgeRatios): [HedgeRatio, HedgeUnits][] {
  return [
    [result.ols, result.units.ols],
    [result.reverseOls, result.units.reverseOls],
    [result.totalLeastSquares, result.units.totalLeastSquares],
    [result.dynamicOls, result.units.dynamicOls],
  ];
}

/** The hedge command. */
export const hedgeCommand: Command = {
  name: 'hedge',
  summary: 'hedge ratios of one series on another: OLS both ways, orthogonal regression, dynamic OLS',
  description: [
    'Estimates the line y = intercept + beta x four ways. Only dynamic OLS (with leads and lags of the change in x) ' +
      'has a standard error that is valid for wandering prices; it is computed from the long-run variance of its residual.',
    'By default AIC chooses the number of leads and lags, up to the cube root of the number of rows; the bandwidth of the long-run variance ' +
      "is Andrews' AR(1) plug-in, the same standard error the report and the pane show.",
    'With --log the slopes are elasticities, not quantities to hold: each line is also given as units of --x to hold per unit of --y at the latest prices ' +
      '(slope x latest --y price / latest --x price).',
  ],
  usage: 'mooring hedge <file.csv> --y NAME --x NAME [options]',
  options: [
    Y_OPTION,
    X_OPTION,
    { name: 'leads-lags', value: 'N|aic', help: 'leads and lags of the change in x in dynamic OLS, or aic to choose them (the default)' },
    { name: 'max-leads-lags', value: 'N', help: 'largest number AIC may choose (default: the cube root of the rows)' },
    { name: 'bandwidth', value: 'N|auto', help: "exactly N lags in the Bartlett kernel, or auto (Andrews' AR(1) plug-in on the residual; the default)" },
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
    const logged = input.y.series.logged;
    const prices = { y: input.y.series.name, x: input.xs[0].series.name };
    const result = hedgeRatios(input.y.series.values, input.xs[0].series.values, { leadsLags, maxLeadsLags, bandwidth }, prices, logged);
    const lines = linesOf(result);
    const header = ['method', logged ? 'elasticity' : 'beta', 'intercept', 'std. error', 't', 'p-value', ...(logged ? ['units to hold'] : [])];
    const cells = lines.map(([r, units]) => [
      SHORT_LABEL[r.method],
      formatStatistic(r.beta),
      formatStatistic(r.intercept),
      r.standardError === null ? '-' : formatStatistic(r.standardError),
      r.tValue === null ? '-' : formatStatistic(r.tValue),
      r.pValue === null ? '-' : formatPValue(r.pValue),
      ...(logged ? [formatStatistic(units.hedgeUnits)] : []),
    ]);
    const fit = result.dynamicOlsFit;
    const terminal = [
      heading(`Hedge ratios of ${names.y} on ${names.x}`),
      '',
      labelled('Line', `${names.y} = intercept + beta ${names.x}`),
      ...(logged ? [labelled('In logs', `beta is an elasticity; units to hold = beta x ${prices.y} / ${prices.x} at the latest prices ` +
        `(${formatStatistic(result.units.dynamicOls.latestPriceY)} and ${formatStatistic(result.units.dynamicOls.latestPriceX)})`)] : []),
      '',
      ...plainTable(header, cells),
      '',
      labelled('Verdict', result.verdict),
      labelled('Dynamic OLS', `${fit.leadsLags} leads and lags (${fit.leadsLagsRule === 'aic' ? `chosen by AIC up to ${fit.maxLeadsLags}` : 'as given'}), ` +
        `${fit.nobs} rows; standard error ${dynamicOlsStandardErrorText(fit)}, p-value two-sided normal`),
      labelled('Static lines', 'no standard errors: with wandering prices the static regression t-ratio has no standard distribution'),
      '',
      relationSampleTerminal(input),
    ].join('\n');
    return {
      terminal,
      json: {
        ...relationJson(input),
        logged,
        latestPrices: { y: result.units.ols.latestPriceY, x: result.units.ols.latestPriceX },
        ols: ratioJson(result.ols, result.units.ols),
        reverseOls: ratioJson(result.reverseOls, result.units.reverseOls),
        totalLeastSquares: ratioJson(result.totalLeastSquares, result.units.totalLeastSquares),
        dynamicOls: {
          ...ratioJson(result.dynamicOls, result.units.dynamicOls),
          leadsLags: fit.leadsLags, leadsLagsRule: fit.leadsLagsRule, maxLeadsLags: fit.maxLeadsLags, bandwidth: fit.bandwidth, bandwidthRule: fit.bandwidthRule, nobs: fit.nobs,
          standardErrorMethod: dynamicOlsStandardErrorText(fit),
        },
        verdict: result.verdict,
      },
    };
  },
};
