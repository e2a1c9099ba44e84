/**
 * The bounds test for a long-run (level) relation of Pesaran, Shin & Smith (2001): does y
 * settle to a relation with the x's, whether the x's are stationary, wandering or a mix?
 *
 * The error-correction form of the ARDL(P, Q_1..Q_k) model (ardl-design.ts) is fitted by
 * Householder QR. Then
 *   F = [(SSR_r - SSR_u) / q] / [SSR_u / (n - p)]: the levels y_{t-1}, x_{j,t-1} (and, in
 *       cases 2 and 4, the term inside the relation) are all zero; q of them (their Wald
 *       statistic over q, the same number);
 *   t = π_y / se(π_y), the t-ratio of y_{t-1} (the paper's second statistic; tabulated for
 *       cases 1, 3 and 5).
 * Bounds: F above the upper (all-I(1)) bound says a relation, below the lower (all-I(0))
 * bound says none whatever the orders, in between the answer waits on the orders.
 * Long run: θ_j = -π_j / π_y with delta-method standard errors; speed of adjustment π_y.
 */
import { MooringInputError } from '../errors';
import { leastSquares } from '../regression/least-squares';
import type { ResultDetail, TestResult } from '../result';
import { BOUNDS_CASE_DETERMINISTIC, BOUNDS_CASE_LABEL, requireBoundsCase, type BoundsCase } from './bounds-case';
import { BOUNDS_LEVELS, boundsPValue, criticalBounds, type BoundPair, type BoundsLevel, type BoundsPValue, type CriticalBounds } from './bounds-tables';
import { ardlDesign, type ArdlOrders } from './ardl-design';
import { chooseArdlOrders, type OrderChoice } from './ardl-orders';

export interface ArdlOptions {
  /** Case 1..5 (default 3: a free constant). */
  case?: BoundsCase;
  /** P: fixed, or chosen by a criterion up to a largest order (default AIC up to 4). */
  lags?: OrderChoice;
  /** Q for each x (one entry used for all when shorter), same forms (default AIC up to 4). */
  order?: OrderChoice[];
  /** Level of the verdict: 0.1, 0.05, 0.025 or 0.01 (default 0.05). */
  alpha?: number;
}

export type BoundsOutcome = 'relation' | 'no-relation' | 'inconclusive';

export interface LongRunTerm {
  name: string;
  coefficient: number;
  standardError: number;
}

export interface ArdlBoundsResult {
  case: BoundsCase;
  caseLabel: string;
  orders: ArdlOrders;
  /** How P and the Q's were set: 'fixed', 'aic' or 'bic'. */
  orderRule: { lags: string; order: string };
  nobs: number;
  /** The F statistic as the one result shape (critical: upper bounds; pValue: with I(1) regressors). */
  fTest: TestResult;
  /** The t statistic as the one result shape (critical and p-values null in cases 2 and 4). */
  tTest: TestResult;
  critical: Record<BoundsLevel, BoundPair>;
  tCritical: Record<BoundsLevel, BoundPair> | null;
  pValue: BoundsPValue | null;
  tPValue: BoundsPValue | null;
  criticalSource: string;
  tCriticalSource: string | null;
  /** Long-run coefficients of the x's (and the term inside the relation in cases 2 and 4). */
  longRun: LongRunTerm[];
  /** π_y: the share of a gap from the long-run relation closed each row (negative when it closes). */
  speed: { coefficient: number; standardError: number };
  alpha: number;
  outcome: BoundsOutcome;
  tOutcome: BoundsOutcome | null;
  verdict: string;
  warnings: string[];
}

const DEFAULT_SEARCH: OrderChoice = { criterion: 'aic', max: 4 };

function levelOf(alpha: number): BoundsLevel {
  const level = BOUNDS_LEVELS.find((l) => Math.abs(Number(l.replace('%', '')) / 100 - alpha) < 1e-9);
  if (!level) throw new MooringInputError(`The bounds test's tables give the 10%, 5%, 2.5% and 1% levels; got ${alpha}. Use 0.1, 0.05, 0.025 or 0.01.`);
  return level;
}

function outcomeOf(value: number, pair: BoundPair, upperTail: boolean): BoundsOutcome {
  if (upperTail) return value > pair.upper ? 'relation' : value < pair.lower ? 'no-relation' : 'inconclusive';
  return value < pair.upper ? 'relation' : value > pair.lower ? 'no-relation' : 'inconclusive';
}

function ruleOf(choice: OrderChoice): string {
  return 'fixed' in choice ? 'fixed' : choice.criterion;
}

/**
 * Runs the bounds test of y on the x's (cleaned series of equal length, oldest first).
 * Throws a MooringInputError on unusable input.
 */
export function ardlBoundsTest(y: ArrayLike<number>, xs: readonly ArrayLike<number>[], options: ArdlOptions = {}, names?: { y: string; x: string[] }): ArdlBoundsResult {
  const boundsCase = options.case ?? 3;
  requireBoundsCase(boundsCase);
  const k = xs.length;
  if (k < 1) throw new MooringInputError('The bounds test needs at least one x series.');
  if (xs.some((x) => x.length !== y.length)) throw new MooringInputError('The x series and y must have the same number of rows.');
  const label = names ?? { y: 'y', x: xs.map((_, j) => `x${j + 1}`) };
  const alpha = options.alpha ?? 0.05;
  const level = levelOf(alpha);
  const lagChoice = options.lags ?? DEFAULT_SEARCH;
  const orderChoices = Array.from({ length: k }, (_, j) => options.order?.[Math.min(j, (options.order?.length ?? 1) - 1)] ?? DEFAULT_SEARCH);
  for (const c of [lagChoice, ...orderChoices]) {
    const v = 'fixed' in c ? c.fixed : c.max;
    if (!Number.isInteger(v) || v < 1) throw new MooringInputError(`Orders of the ARDL model are whole numbers from 1 up; got ${v}.`);
  }
  const topOrder = [lagChoice, ...orderChoices].reduce((top, c) => Math.max(top, 'fixed' in c ? c.fixed : c.max), -Infinity);
  const columnsAtMost = 2 + 1 + k + (topOrder - 1) + k * topOrder;
  if (y.length - topOrder < columnsAtMost + 5) {
    throw new MooringInputError(`Too few rows (${y.length}) for the orders asked (up to ${topOrder}) and ${k} x series: add rows or lower the orders.`);
  }

  const { orders } = chooseArdlOrders(y, xs, boundsCase, lagChoice, orderChoices, label);
  const design = ardlDesign(y, xs, orders, boundsCase, label);
  const fit = leastSquares(design.response, design.columns, { names: design.names });
  const n = design.nobs;
  const p = design.columns.length;
  const restrictedColumns = design.columns.filter((_, i) => !design.tested.includes(i));
  const ssrRestricted = restrictedColumns.length > 0
    ? leastSquares(design.response, restrictedColumns, { names: design.names.filter((_, i) => !design.tested.includes(i)), withoutCovariance: true }).ssr
    : design.response.reduce((s, v) => s + v * v, 0);
  const q = design.tested.length;
  const f = (ssrRestricted - fit.ssr) / q / (fit.ssr / (n - p));
  const yLevel = design.levelStart;
  const speed = { coefficient: fit.coefficients[yLevel], standardError: fit.standardErrors[yLevel] };
  const t = fit.tValues[yLevel];

  const fBounds = criticalBounds('F', boundsCase, k, n) as CriticalBounds;
  const tBounds = criticalBounds('t', boundsCase, k, n);
  const fP = boundsPValue('F', boundsCase, k, n, f);
  const tP = boundsPValue('t', boundsCase, k, n, t);

  const longRun: LongRunTerm[] = [];
  const delta = (index: number, name: string) => {
    const b = speed.coefficient;
    const a = fit.coefficients[index];
    const g1 = -1 / b;
    const g0 = a / (b * b);
    const V = fit.covariance;
    const variance = g1 * g1 * V[index][index] + 2 * g1 * g0 * V[index][yLevel] + g0 * g0 * V[yLevel][yLevel];
    longRun.push({ name, coefficient: -a / b, standardError: Math.sqrt(Math.max(variance, 0)) });
  };
  if (design.restrictedIndex >= 0) delta(design.restrictedIndex, boundsCase === 2 ? 'constant' : 'trend');
  xs.forEach((_, j) => delta(yLevel + 1 + j, label.x[j]));

  const outcome = outcomeOf(f, fBounds.critical[level], true);
  const tOutcome = tBounds ? outcomeOf(t, tBounds.critical[level], false) : null;
  const warnings: string[] = [];
  if (fBounds.kind === 'paper' && n <= 100) {
    warnings.push(`Only ${n} rows, but Mooring's small-sample simulation covers at most 4 x series: the bounds are the paper's asymptotic ones, which are too low for short samples (the test finds relations too often).`);
  }
  if (speed.coefficient >= 0) warnings.push(`The speed of adjustment is not negative (${speed.coefficient.toPrecision(3)}): y does not move back toward the long-run relation, so its coefficients describe no resting point.`);
  warnings.push('The bounds test assumes at most one long-run relation, with y the series that adjusts, and no I(2) series.');

  const words = verdictWords(outcome, tOutcome, level, label, f, fBounds.critical[level]);
  const details: ResultDetail[] = [
    ...BOUNDS_LEVELS.map((l) => ({ key: `lowerBound${l.replace('.', '_').replace('%', '')}`, label: `${l} lower bound (all I(0))`, value: fBounds.critical[l].lower })),
    { key: 'pValueLower', label: 'p-value with I(0) regressors', value: fP?.lower ?? null },
    { key: 'criticalSource', label: 'Critical values from', value: fBounds.source },
  ];
  const common = {
    lags: orders.p - 1,
    lagRule: ruleOf(lagChoice),
    nobs: n,
    deterministic: BOUNDS_CASE_DETERMINISTIC[boundsCase],
    nullHypothesis: `no long-run relation of '${label.y}' with ${label.x.map((x) => `'${x}'`).join(', ')} (the levels drop out of the model)`,
    alternative: 'a long-run relation that pulls y back',
  };
  const upperCritical = (b: Record<BoundsLevel, BoundPair>) => Object.fromEntries(BOUNDS_LEVELS.map((l) => [l, b[l].upper]));
  const fTest: TestResult = {
    test: 'ARDL bounds F',
    title: `Bounds test (ARDL ${orders.p}, ${orders.q.join(', ')}) of '${label.y}' on ${label.x.map((x) => `'${x}'`).join(', ')}`,
    statisticName: 'F',
    statistic: f,
    pValue: fP ? fP.upper : null,
    pValueNote: fP ? `with every x I(1); ${fP.lower} with every x I(0) (${fP.source})` : 'no p-value: the simulation covers 1 to 4 x series; compare with the bounds',
    ...(fP?.upperBound ? { pValueBound: fP.upperBound } : {}),
    critical: upperCritical(fBounds.critical),
    rejectTail: 'upper',
    ...common,
    warnings,
    details,
  };
  const tTest: TestResult = {
    test: 'ARDL bounds t',
    title: `Bounds t test of the speed of adjustment of '${label.y}'`,
    statisticName: 't',
    statistic: t,
    pValue: tP ? tP.upper : null,
    pValueNote: tP ? `with every x I(1); ${tP.lower} with every x I(0) (${tP.source})` : 'the paper tabulates the t bounds for cases 1, 3 and 5 only',
    ...(tP?.upperBound ? { pValueBound: tP.upperBound } : {}),
    critical: tBounds ? upperCritical(tBounds.critical) : {},
    rejectTail: 'lower',
    ...common,
    warnings: [],
    details: tBounds ? BOUNDS_LEVELS.map((l) => ({ key: `lowerBound${l.replace('.', '_').replace('%', '')}`, label: `${l} lower bound (all I(0))`, value: tBounds.critical[l].lower })) : [],
  };

  return {
    case: boundsCase,
    caseLabel: BOUNDS_CASE_LABEL[boundsCase],
    orders,
    orderRule: { lags: ruleOf(lagChoice), order: orderChoices.map(ruleOf).every((r) => r === 'fixed') ? 'fixed' : ruleOf(orderChoices.find((c) => !('fixed' in c)) as OrderChoice) },
    nobs: n,
    fTest,
    tTest,
    critical: fBounds.critical,
    tCritical: tBounds?.critical ?? null,
    pValue: fP,
    tPValue: tP,
    criticalSource: fBounds.source,
    tCriticalSource: tBounds?.source ?? null,
    longRun,
    speed,
    alpha,
    outcome,
    tOutcome,
    verdict: words,
    warnings,
  };
}

function verdictWords(outcome: BoundsOutcome, tOutcome: BoundsOutcome | null, level: BoundsLevel, label: { y: string; x: string[] }, f: number, pair: BoundPair): string {
  const xs = label.x.map((x) => `'${x}'`).join(', ');
  const whether = label.x.length > 1 ? 'whether they are stationary or wander' : 'whether it is stationary or wanders';
  const head =
    outcome === 'relation'
      ? `F = ${f.toFixed(2)} is above the upper ${level} bound (${pair.upper}): '${label.y}' keeps a long-run relation with ${xs}, ${whether}.`
      : outcome === 'no-relation'
        ? `F = ${f.toFixed(2)} is below the lower ${level} bound (${pair.lower}): no long-run relation of '${label.y}' with ${xs} shows, ${whether}.`
        : `F = ${f.toFixed(2)} lies between the ${level} bounds (${pair.lower} and ${pair.upper}): inconclusive; the answer depends on whether ${xs} ${label.x.length > 1 ? 'are' : 'is'} stationary or wander${label.x.length > 1 ? '' : 's'}.`;
  if (outcome !== 'relation' || tOutcome === null) return head;
  return tOutcome === 'relation'
    ? `${head} The t test of the speed of adjustment agrees.`
    : ` ${head} But the t test of the speed of adjustment does not clear its upper bound: the levels of the x's may matter without y moving back (a degenerate case); treat the relation with care.`.trim();
}
