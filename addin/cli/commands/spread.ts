/** `mooring spread`: the spread of a pair under a hedge ratio, its half-life and z-scores. */
import { dynamicOlsHedgeRatio, reverseOlsHedgeRatio, totalLeastSquaresHedgeRatio } from '../../cointegration/hedge-ratio';
import { MooringInputError } from '../../errors';
import { halfLife } from '../../spread/half-life';
import { HALF_LIFE_DEFINITION, pairSpread } from '../../spread/pair-spread';
import { HALF_LIFE_INTERVAL_METHOD, halfLifeIntervalJson } from '../../spread/half-life-interval';
import { refuseRoundingNoise } from '../../spread/rounding-noise';
import { spreadSeries } from '../../spread/spread-series';
import { rollingZScore, zScore } from '../../spread/z-score';
import { rowPeriod } from '../../report/row-period';
import type { Command } from '../command';
import { choiceValue, wholeNumberValue } from '../option-values';
import { formatStatistic, heading, labelled } from '../render/format';
import { relationFromContext, relationJson, relationSampleTerminal, X_OPTION, Y_OPTION } from './relation-input';

const HEDGE_WORDS = ['ols', 'reverse-ols', 'tls', 'dols'] as const;
type HedgeWord = (typeof HEDGE_WORDS)[number];

const HEDGE_LABEL: Record<HedgeWord | 'given', string> = {
  ols: 'the least-squares line of y on x, the Engle-Granger line',
  'reverse-ols': 'OLS of x on y, turned round',
  tls: 'total least squares',
  dols: 'dynamic OLS',
  given: 'as given',
};

/** A decimal number for --beta or --intercept; undefined when absent. */
function decimalOption(option: string, raw: string | undefined): number | undefined {
  if (raw === undefined) return undefined;
  const t = raw.trim();
  if (!/^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(t)) throw new MooringInputError(`--${option} must be a number such as 1.25 or -0.4, not '${raw}'.`);
  const value = Number(t);
  if (!Number.isFinite(value)) throw new MooringInputError(`--${option} ${t} is beyond the largest number a double holds (about 1.8e308): give a number on the scale of the prices, such as 1.25 or -0.4.`);
  return value;
}

/** Digits of the spread's movement that must survive subtracting the intercept. */
const KEPT_DIGITS = 6;

/**
 * Refuses an intercept so large that y - intercept - beta x keeps fewer than KEPT_DIGITS digits
 * of how y - beta x moves: a double carries about 16 significant digits, so subtracting
 * 1e308 from a spread that moves by 1 leaves only rounding, and every statistic of the spread
 * would be made of that rounding.
 */
function requireInterceptOnScale(raw: string, intercept: number, beta: number, y: ArrayLike<number>, x: ArrayLike<number>, names: { y: string; x: string }): void {
  let low = Infinity;
  let high = -Infinity;
  let sum = 0;
  for (let t = 0; t < y.length; t++) {
    const v = y[t] - beta * x[t];
    if (v < low) low = v;
    if (v > high) high = v;
    sum += v;
  }
  const width = high - low;
  if (!(width > 0) || Math.abs(intercept) * Number.EPSILON * 10 ** KEPT_DIGITS <= width) return;
  const mean = sum / y.length;
  throw new MooringInputError(
    `--intercept ${raw.trim()} is far larger than the spread it shifts: ${names.y} - ${formatStatistic(beta)} ${names.x} moves between ` +
      `${formatStatistic(low)} and ${formatStatistic(high)}, and after subtracting ${raw.trim()} fewer than ${KEPT_DIGITS} digits of that movement would survive rounding (a double holds about 16). ` +
      `Give an intercept on the scale of the spread, such as its mean ${formatStatistic(mean)}, or leave --intercept out (0).`,
  );
}

/** The spread command. */
export const spreadCommand: Command = {
  name: 'spread',
  summary: 'spread of a pair under a hedge ratio: values, half-life and z-scores',
  description: [
    'Builds spread = y - intercept - beta x, with beta and the intercept from the hedge estimator you choose (OLS of y on x by default) ' +
      'or as given with --beta and --intercept. Reports how fast the spread returns to its mean (half-life, from a first-order autoregression) ' +
      'and how far it stands from its mean in standard deviations, over the whole sample and, with --window, over a trailing window.',
    `On the default line the half-life is the pair's one half-life, the same number the ecm and report commands give: ${HALF_LIFE_DEFINITION}. ` +
      'With another line it is the half-life of that spread, and the output says so.',
    'The JSON output carries every value of the spread and of its z-scores.',
  ],
  usage: 'mooring spread <file.csv> --y NAME --x NAME [options]',
  options: [
    Y_OPTION,
    X_OPTION,
    { name: 'hedge', value: HEDGE_WORDS.join('|'), help: 'how to estimate beta and the intercept (default ols: the least-squares line every other surface builds the spread on)' },
    { name: 'beta', value: 'NUMBER', help: 'use this hedge ratio instead of estimating one' },
    { name: 'intercept', value: 'NUMBER', help: 'with --beta: the intercept to subtract (default 0)' },
    { name: 'window', value: 'N', help: 'also give z-scores over a trailing window of N rows (at least 3)' },
    { name: 'period', value: 'WORD', help: 'what one row is, for the verdict: day, week, ... (default: period)' },
  ],
  examples: ['mooring spread prices.csv --y Diesel --x Gasoil --log --window 60 --period day', 'mooring spread prices.csv --y Diesel --x Gasoil --beta 1.1 --intercept 0.4 --json'],
  run(context) {
    const hedgeWord = choiceValue('hedge', context.args.values.get('hedge'), HEDGE_WORDS);
    const givenBeta = decimalOption('beta', context.args.values.get('beta'));
    const givenIntercept = decimalOption('intercept', context.args.values.get('intercept'));
    if (givenBeta !== undefined && hedgeWord !== undefined) throw new MooringInputError('Give either --beta or --hedge, not both: --beta fixes the hedge ratio, --hedge estimates it.');
    if (givenIntercept !== undefined && givenBeta === undefined) throw new MooringInputError('--intercept goes with --beta; without --beta the hedge estimator gives the intercept.');
    const window = wholeNumberValue('window', context.args.values.get('window'), 'rows');
    const period = context.args.values.get('period')?.trim() || (context.period && context.period.unit !== 'rows' ? context.period.period : 'period');
    // The trailing window is counted in the same period (rows where the file has no dates).
    const windowWord = period === 'period' ? 'row' : period;
    const input = relationFromContext(context, true);
    const y = input.y.series.values;
    const x = input.xs[0].series.values;
    const names = { y: input.names.y, x: input.names.xs[0] };
    if (givenIntercept !== undefined) requireInterceptOnScale(context.args.values.get('intercept') as string, givenIntercept, givenBeta as number, y, x, names);

    const method: HedgeWord | 'given' = givenBeta !== undefined ? 'given' : (hedgeWord ?? 'ols');
    // The default is the one spread of the pair (pair-spread.ts); another line gives that line's spread.
    const standard = method === 'ols' ? pairSpread(y, x, names, period) : null;
    const line =
      standard ? standard.line
      : method === 'given' ? { beta: givenBeta as number, intercept: givenIntercept ?? 0 }
      : method === 'reverse-ols' ? reverseOlsHedgeRatio(y, x)
      : method === 'tls' ? totalLeastSquaresHedgeRatio(y, x)
      : dynamicOlsHedgeRatio(y, x).ratio;
    const values = standard ? standard.values : spreadSeries(y, x, line.beta, line.intercept, names);
    // The one check of every surface (pairSpread makes it for the default line).
    if (!standard) refuseRoundingNoise(y, values, { y: names.y, xs: [names.x] });
    const life = standard ? standard.halfLife : halfLife(values, period);
    const definition = standard
      ? HALF_LIFE_DEFINITION
      : `ln 2 / -ln(1 + lambda), lambda from the AR(1) regression with a constant of this spread, on ${HEDGE_LABEL[method]} ` +
        '(not the pair\'s half-life, which uses the least-squares line: leave out --hedge and --beta for it)';
    const z = zScore(values);
    const rolling = window === undefined ? null : rollingZScore(values, window);

    const last = values.length - 1;
    const when = input.y.sample.lastDate ? ` (${input.y.sample.lastDate})` : '';
    const out = [
      heading(`Spread of ${names.y} against ${names.x}`),
      '',
      labelled('Spread', `${names.y} - ${formatStatistic(line.intercept)} - ${formatStatistic(line.beta)} ${names.x}`),
      labelled('Built on', `${HEDGE_LABEL[method]}: slope ${formatStatistic(line.beta)}${input.y.series.logged ? ' (in logs, an elasticity)' : ''}`),
      labelled('Observations', String(values.length)),
      labelled('Mean', formatStatistic(z.mean)),
      labelled('Standard deviation', formatStatistic(z.standardDeviation)),
      labelled('Half-life', `${life.halfLife === null ? (life.note ?? 'none') : `${formatStatistic(life.halfLife)} ${period}s${life.note ? ` (${life.note})` : ''}`}: ${definition}`),
      labelled('Half-life interval', `${life.interval.text} (${HALF_LIFE_INTERVAL_METHOD})`),
      labelled('Verdict', life.verdict),
      labelled('Latest value', `${formatStatistic(values[last])}${when}: z-score ${formatStatistic(z.values[last])} over the whole sample` +
        (rolling ? `, ${formatStatistic(rolling[last])} over the last ${window} ${windowWord}${window === 1 ? '' : 's'}` : '')),
      '',
      relationSampleTerminal(input),
    ];
    return {
      terminal: out.join('\n'),
      json: {
        ...relationJson(input),
        hedge: method,
        lineText: HEDGE_LABEL[method],
        beta: line.beta,
        intercept: line.intercept,
        values,
        halfLife: life.halfLife,
        halfLifeUnit: rowPeriod(null, period).unit,
        halfLifeNote: life.note ?? null,
        halfLifeDefinition: definition,
        halfLifeInterval: halfLifeIntervalJson(life.interval),
        lambda: life.lambda,
        verdict: life.verdict,
        mean: z.mean,
        standardDeviation: z.standardDeviation,
        zscore: z.values,
        window: window ?? null,
        windowUnit: rowPeriod(null, windowWord).unit,
        rollingZscore: rolling,
      },
    };
  },
};
