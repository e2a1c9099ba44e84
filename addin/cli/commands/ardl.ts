/**
 * `mooring ardl`: the bounds test for a long-run relation of Pesaran, Shin & Smith (2001),
 * which holds whether the series are stationary, wandering or a mix (ardlBoundsTest).
 */
import { BOUNDS_CASE_LABEL, BOUNDS_CASES, type BoundsCase } from '../../ardl/bounds-case';
import { ardlBoundsTest, type ArdlBoundsResult } from '../../ardl/bounds-test';
import { BOUNDS_LEVELS, type BoundPair, type BoundsLevel, type BoundsPValue } from '../../ardl/bounds-tables';
import type { OrderChoice } from '../../ardl/ardl-orders';
import { MooringInputError } from '../../errors';
import type { Command } from '../command';
import { levelValue, wholeNumberValue } from '../option-values';
import { bullet, formatPValue, formatStatistic, heading, labelled } from '../render/format';
import { plainTable } from './plain-table';
import { relationFromContext, relationJson, relationSampleTerminal, XS_OPTION, Y_OPTION } from './relation-input';

/** Reads `P`, `aic` or `bic` for --lags (one value) or --order (one per x, or one for all). */
function orderChoices(option: string, raw: string | undefined, count: number | null, max: number): OrderChoice[] | undefined {
  if (raw === undefined) return undefined;
  const parts = raw.split(',').map((s) => s.trim().toLowerCase());
  if (count === null && parts.length !== 1) throw new MooringInputError(`--${option} takes one value (a whole number from 1, aic or bic), not '${raw}'.`);
  if (count !== null && parts.length !== 1 && parts.length !== count) {
    throw new MooringInputError(`--${option} takes one value for every x series or one for all (${count} x series), not '${raw}'.`);
  }
  return parts.map((p) => {
    if (p === 'aic' || p === 'bic') return { criterion: p, max };
    if (/^\d{1,3}$/.test(p) && Number(p) >= 1) return { fixed: Number(p) };
    throw new MooringInputError(`--${option} must be a whole number from 1, aic or bic, not '${p}': the orders are those of the model in levels, so 1 means y's own lag only.`);
  });
}

function pValueJson(p: BoundsPValue | null): Record<string, unknown> | null {
  return p ? { lower: p.lower, upper: p.upper, lowerBound: p.lowerBound, upperBound: p.upperBound, source: p.source } : null;
}

function boundsRows(label: string, value: number, critical: Record<BoundsLevel, BoundPair> | null): string[][] {
  if (!critical) return [[label, formatStatistic(value), 'not tabulated for this case', '', '', '']];
  return [[label, formatStatistic(value), ...BOUNDS_LEVELS.map((l) => `${critical[l].lower} / ${critical[l].upper}`)]];
}

/** The JSON of the result (the fields the issue names, plus the sources). */
export function ardlJson(result: ArdlBoundsResult): Record<string, unknown> {
  return {
    case: result.case,
    caseDescription: result.caseLabel,
    lags: result.orders.p,
    order: result.orders.q,
    orderRule: result.orderRule,
    nobs: result.nobs,
    statistic: result.fTest.statistic,
    tStatistic: result.tTest.statistic,
    critical: result.critical,
    tCritical: result.tCritical,
    criticalSource: result.criticalSource,
    tCriticalSource: result.tCriticalSource,
    pValue: pValueJson(result.pValue),
    tPValue: pValueJson(result.tPValue),
    longRun: result.longRun,
    speedOfAdjustment: result.speed,
    alpha: result.alpha,
    outcome: result.outcome,
    tOutcome: result.tOutcome,
    verdict: result.verdict,
    warnings: result.warnings,
  };
}

/** The ardl command. */
export const ardlCommand: Command = {
  name: 'ardl',
  summary: 'bounds test for a long-run relation when some series are stationary and others wander',
  description: [
    'Fits the error-correction form of an ARDL(P, Q) model of --y on the --x series and tests whether the levels matter ' +
      '(Pesaran, Shin & Smith 2001). The F statistic is compared with two bounds: above the upper one (every x wandering) ' +
      'there is a long-run relation, below the lower one (every x stationary) there is none, in between the answer waits on the orders of the x series.',
    '--lags P and --order Q are the orders of the model in levels: the error-correction form then has P-1 lagged changes of y ' +
      'and the changes of each x at lags 0 to Q-1. Each is a whole number from 1, or aic / bic to choose it (largest order --max-order, default 4).',
    '--case: ' + BOUNDS_CASES.map((c) => `${c} ${BOUNDS_CASE_LABEL[c]}`).join('; ') + '. The default is 3.',
    'Critical values: up to 100 rows, Mooring\'s seeded simulation at the sample\'s size (the asymptotic bounds are too low there); ' +
      'beyond, the paper\'s asymptotic tables. The result says which was used. p-values come from the simulation.',
  ],
  usage: 'mooring ardl <file.csv> --y NAME --x NAME[,NAME...] [options]',
  options: [
    Y_OPTION,
    XS_OPTION,
    { name: 'case', value: '1..5', help: 'deterministic terms (default 3: a free constant)' },
    { name: 'lags', value: 'P|aic|bic', help: 'order of y in levels (default aic)' },
    { name: 'order', value: 'Q[,Q2...]|aic|bic', help: 'order of each x in levels (default aic)' },
    { name: 'max-order', value: 'N', help: 'largest order tried by aic or bic (default 4)' },
    { name: 'alpha', value: 'LEVEL', help: 'level of the verdict: 0.1, 0.05, 0.025 or 0.01 (default 0.05)' },
  ],
  examples: ['mooring ardl prices.csv --y Gasoil --x Diesel --log', 'mooring ardl prices.csv --y Gasoil --x Diesel,Freight --case 3 --lags 2 --order 2,1 --json'],
  run(context) {
    const input = relationFromContext(context, false);
    const caseRaw = context.args.values.get('case');
    let boundsCase: BoundsCase | undefined;
    if (caseRaw !== undefined) {
      const v = Number(caseRaw.trim());
      if (!BOUNDS_CASES.includes(v as BoundsCase)) throw new MooringInputError(`--case must be 1, 2, 3, 4 or 5, not '${caseRaw}'.`);
      boundsCase = v as BoundsCase;
    }
    const max = wholeNumberValue('max-order', context.args.values.get('max-order'), 'lags') ?? 4;
    if (max < 1) throw new MooringInputError('--max-order must be at least 1.');
    const lags = orderChoices('lags', context.args.values.get('lags'), null, max)?.[0];
    const order = orderChoices('order', context.args.values.get('order'), input.xs.length, max);
    const alpha = levelValue('alpha', context.args.values.get('alpha')) ?? 0.05;
    const result = ardlBoundsTest(
      input.y.series.values,
      input.xs.map((s) => s.series.values),
      { case: boundsCase, lags, order, alpha },
      { y: input.names.y, x: input.names.xs },
    );
    const p = result.pValue;
    const tp = result.tPValue;
    const terminal = [
      heading(`Bounds test for a long-run relation of ${input.names.y} with ${input.names.xs.join(', ')}`),
      '',
      labelled('Case', `${result.case}: ${result.caseLabel}`),
      labelled('Model', `ARDL(${result.orders.p}, ${result.orders.q.join(', ')}) in levels (${result.orderRule.lags === 'fixed' && result.orderRule.order === 'fixed' ? 'orders given' : `orders by ${[result.orderRule.lags, result.orderRule.order].find((r) => r !== 'fixed')?.toUpperCase()}`})`),
      labelled('Observations', String(result.nobs)),
      '',
      ...plainTable(['', 'value', ...BOUNDS_LEVELS.map((l) => `${l} I(0) / I(1)`)], [
        ...boundsRows('F', result.fTest.statistic, result.critical),
        ...boundsRows('t', result.tTest.statistic, result.tCritical),
      ]),
      labelled('p-value of F', p ? `${formatPValue(p.lower, p.lowerBound ?? undefined)} (x stationary) to ${formatPValue(p.upper, p.upperBound ?? undefined)} (x wandering)` : 'not available (the simulation covers 1 to 4 x series)'),
      labelled('p-value of t', tp ? `${formatPValue(tp.lower, tp.lowerBound ?? undefined)} to ${formatPValue(tp.upper, tp.upperBound ?? undefined)}` : 'not available'),
      labelled('Bounds from', result.criticalSource),
      ...(p ? [labelled('p-values from', p.source)] : []),
      '',
      'Long run (y = ...):',
      ...result.longRun.map((t) => `  ${t.name}: ${formatStatistic(t.coefficient)} (standard error ${formatStatistic(t.standardError)})`),
      labelled('Speed of adjustment', `${formatStatistic(result.speed.coefficient)} (standard error ${formatStatistic(result.speed.standardError)})`),
      '',
      ...[result.verdict, ...result.warnings].map((w) => bullet(w)),
      '',
      relationSampleTerminal(input),
    ];
    return { terminal: terminal.join('\n'), json: { ...relationJson(input), ...ardlJson(result) } };
  },
};
