/** `mooring ecm`: the error-correction model of a pair: who closes a gap to the relation, and how fast. */
import { errorCorrectionModel, type AdjustmentEquation } from '../../cointegration/error-correction';
import { MooringInputError } from '../../errors';
import { HALF_LIFE_DEFINITION, pairSpread, SPREAD_LINE_TEXT } from '../../spread/pair-spread';
import { HALF_LIFE_INTERVAL_METHOD, halfLifeIntervalJson } from '../../spread/half-life-interval';
import { rowPeriod } from '../../report/row-period';
import type { Command } from '../command';
import { countOrWordValue, wholeNumberValue } from '../option-values';
import { bullet, formatPValue, formatStatistic, heading, labelled } from '../render/format';
import { ALL_DETERMINISTIC, deterministicOption, readDeterministic } from '../test-options';
import { plainTable } from './plain-table';
import { relationFromContext, relationJson, relationSampleTerminal, X_OPTION, Y_OPTION } from './relation-input';

function equationJson(eq: AdjustmentEquation): Record<string, unknown> {
  return {
    series: eq.series,
    alpha: eq.alpha,
    standardError: eq.standardError,
    tValue: eq.tValue,
    pValue: eq.pValue,
    gapSpeed: eq.gapSpeed,
    halfLifeAlone: eq.halfLifeAlone,
    halfLifeAloneNote: eq.halfLifeAloneNote ?? null,
    rSquared: eq.rSquared,
    coefficients: eq.coefficients.map((c) => ({ ...c })),
  };
}

/** The ecm command. */
export const ecmCommand: Command = {
  name: 'ecm',
  summary: 'error-correction model of a pair: speed of adjustment and half-life of a gap',
  description: [
    'Fits the change of each series on yesterday\'s gap to the long-run relation (the residual of --y on --x), ' +
      'lagged changes of both and a constant. A negative coefficient on the gap in the --y equation means --y moves back toward the relation.',
    'Both equations are shown, so you can see which side does the adjusting. By default AIC chooses the lags.',
    `The half-life is the pair's one half-life, the same number the spread and report commands give: ${HALF_LIFE_DEFINITION}. ` +
      'The model\'s own half-lives (both prices adjusting, and each price alone) are shown under their own names.',
  ],
  usage: 'mooring ecm <file.csv> --y NAME --x NAME [options]',
  options: [
    Y_OPTION,
    X_OPTION,
    deterministicOption(ALL_DETERMINISTIC),
    { name: 'lags', value: 'N|aic', help: 'lagged changes of both series in each equation, or aic to choose them (the default)' },
    { name: 'max-lags', value: 'N', help: "largest lag AIC may choose (default: Schwert's rule, 12 (n/100)^(1/4))" },
    { name: 'period', value: 'WORD', help: 'what one row is, for the verdict: day, week, month, ... (default: period)' },
  ],
  examples: ['mooring ecm prices.csv --y Diesel --x Gasoil --log --period day'],
  run(context) {
    const deterministic = readDeterministic(context.args, ALL_DETERMINISTIC, 'const');
    const lags = countOrWordValue('lags', context.args.values.get('lags'), 'lagged changes', ['aic'] as const) ?? 'aic';
    const maxLags = wholeNumberValue('max-lags', context.args.values.get('max-lags'), 'lags');
    if (typeof lags === 'number' && maxLags !== undefined) {
      throw new MooringInputError(`--max-lags applies only with --lags aic; with --lags ${lags} leave it out.`);
    }
    const period = context.args.values.get('period')?.trim() || (context.period && context.period.unit !== 'rows' ? context.period.period : undefined);
    const input = relationFromContext(context, true);
    const names = { y: input.names.y, x: input.names.xs[0] };
    const y = input.y.series.values;
    const x = input.xs[0].series.values;
    const result = errorCorrectionModel(y, x, { deterministic, lags, maxLags, period }, names);
    const unit = period ?? 'period';
    const spread = pairSpread(y, x, names, unit);
    const life = spread.halfLife;
    const halfLifeText = (eq: AdjustmentEquation): string => (eq.halfLifeAlone === null ? (eq.gapSpeed >= 0 ? 'no adjustment' : 'gap grows') : `${formatStatistic(eq.halfLifeAlone)} ${unit}s`);
    const table = plainTable(
      ['equation', 'gap coef.', 'std. error', 't', 'p-value', 'half-life alone'],
      [result.y, result.x].map((eq) => [`change in ${eq.series}`, formatStatistic(eq.alpha), formatStatistic(eq.standardError), formatStatistic(eq.tValue), formatPValue(eq.pValue), halfLifeText(eq)]),
    );
    const out = [
      heading(`Error-correction model of ${names.y} and ${names.x}`),
      '',
      labelled('Long-run relation', `gap = ${result.relation}`),
      labelled('Lags', `${result.lags} lagged change${result.lags === 1 ? '' : 's'} of each series (${result.lagRule === 'aic' ? `chosen by AIC up to ${result.maxLags}` : 'as given'})`),
      labelled('Observations', String(result.nobs)),
      '',
      ...table,
      '',
      labelled('Half-life', `${life.halfLife === null ? (life.note ?? 'none') : `${formatStatistic(life.halfLife)} ${unit}s`}: ${HALF_LIFE_DEFINITION} ` +
        `(${names.y} - ${formatStatistic(spread.line.intercept)} - ${formatStatistic(spread.line.beta)} ${names.x})`),
      labelled('Half-life interval', `${life.interval.text} (${HALF_LIFE_INTERVAL_METHOD})`),
      labelled('ECM half-life', result.ecmHalfLife === null ? (result.ecmHalfLifeNote ?? 'none') : `${formatStatistic(result.ecmHalfLife)} ${unit}s: implied by the error-correction model, both prices adjusting`),
      labelled('Verdict', result.verdict),
    ];
    if (result.warnings.length > 0) {
      out.push('', 'Warnings');
      for (const w of result.warnings) out.push(bullet(w, 2, '!'));
    }
    out.push('', relationSampleTerminal(input));
    return {
      terminal: out.join('\n'),
      json: {
        ...relationJson(input),
        lags: result.lags,
        lagRule: result.lagRule,
        maxLags: result.maxLags,
        nobs: result.nobs,
        deterministic,
        beta: result.beta,
        intercept: result.intercept,
        trendCoefficient: result.trendCoefficient,
        relation: result.relation,
        equations: { y: equationJson(result.y), x: equationJson(result.x) },
        combinedSpeed: result.combinedSpeed,
        halfLife: life.halfLife,
        halfLifeUnit: rowPeriod(null, unit).unit,
        halfLifeNote: life.note ?? null,
        halfLifeDefinition: HALF_LIFE_DEFINITION,
        halfLifeInterval: halfLifeIntervalJson(life.interval),
        spreadLine: { ...spread.line, text: SPREAD_LINE_TEXT },
        ecmHalfLife: result.ecmHalfLife,
        ecmHalfLifeNote: result.ecmHalfLifeNote ?? null,
        verdict: result.verdict,
        warnings: result.warnings.slice(),
      },
    };
  },
};
