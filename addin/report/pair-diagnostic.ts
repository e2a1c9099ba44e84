/**
 * The full diagnosis of one pair, in the order each step needs the one before:
 * Engle-Granger both ways and the Johansen rank (the evidence), the lead-lag tests (whose
 * test depends on that evidence), then the normalisation (the follower written on its
 * leader), Phillips-Ouliaris, the long-run relation, the spread and its adjustment.
 *
 * A step the data cannot support (a copied column leaves no gap for an error-correction
 * model) is recorded as unavailable with the engine's reason instead of sinking the report;
 * anything other than a MooringInputError is a defect and is let through.
 */
import { isMooringInputError } from '../errors';
import { chooseVarLags } from '../var/choose-var-lags';
import type { JohansenCase } from '../johansen/johansen';
import type { Deterministic } from '../result';
import { johansenSection } from './johansen-choice';
import { pairRestrictions } from './pair-restrictions';
import { leadLagSection, type OrderFacts } from './lead-lag-section';
import { pairSpread } from '../spread/pair-spread';
import { spreadSeries } from '../spread/spread-series';
import { longRunRelation } from './long-run-relation';
import { adjustmentSection, spreadSection } from './pair-adjustment';
import { movingHedgeSection } from './pair-moving-hedge';
import { forecastSection } from './pair-forecast';
import { engleGrangerPair, pairCointegration, phillipsOuliarisSummary } from './pair-cointegration';
import type { BoundsSummary, PairReport, UnavailablePart } from './pair-types';
import { ardlBoundsTest } from '../ardl/bounds-test';
import { cointegrationVerdict, pairVerdicts } from './pair-verdicts';
import { pairWarnings } from './pair-warnings';

/** Everything a pair's diagnosis needs from the report around it. */
export interface PairContext {
  alpha: number;
  deterministic: Deterministic;
  lagRule: 'aic' | 'bic';
  johansenCase: JohansenCase | 'auto';
  period: string;
  rollingWindow: number;
  logged: boolean;
  rowLabels: readonly string[];
  dates: readonly string[] | null;
  /** Each series' order of integration and whether ADF and KPSS agree, by name. */
  orders: Record<string, OrderFacts>;
}

/** Runs one step, recording a refusal as an unavailable part; returns null then. */
function attempt<T>(part: string, unavailable: UnavailablePart[], step: () => T): T | null {
  try {
    return step();
  } catch (e) {
    if (!isMooringInputError(e)) throw e;
    unavailable.push({ part, reason: e.message });
    return null;
  }
}

/** The bounds test of a on b (case 3, orders by AIC up to 4) in the report's summary shape. */
function boundsSummary(a: Float64Array, b: Float64Array, names: { a: string; b: string }): BoundsSummary {
  const r = ardlBoundsTest(a, [b], { case: 3 }, { y: names.a, x: [names.b] });
  return {
    dependent: names.a,
    regressor: names.b,
    statistic: r.fTest.statistic,
    tStatistic: r.tTest.statistic,
    critical5: r.critical['5%'],
    pValue: r.pValue ? { lower: r.pValue.lower, upper: r.pValue.upper } : null,
    criticalSource: r.criticalSource,
    outcome: r.outcome,
    verdict: r.verdict,
  };
}

/** The diagnosis of the pair (a, b). */
export function diagnosePair(a: Float64Array, b: Float64Array, names: { a: string; b: string }, context: PairContext): PairReport {
  const unavailable: UnavailablePart[] = [];
  const { alpha, deterministic, lagRule } = context;
  const eg = engleGrangerPair(a, b, names, { alpha, deterministic, lagRule });
  const levelsOrder = attempt('VAR order', unavailable, () => chooseVarLags([a, b], { names: [names.a, names.b] })) ?? undefined;
  const johansen = attempt('Johansen test', unavailable, () =>
    johansenSection([a, b], [names.a, names.b], { alpha, lagRule, johansenCase: context.johansenCase, varOrder: levelsOrder }));
  const factsA = context.orders[names.a];
  const factsB = context.orders[names.b];
  const bothIntegrated = factsA.order === 1 && factsB.order === 1;
  const cointegrated = bothIntegrated && eg.evidence !== 'none';
  const leadLag = attempt('lead-lag test', unavailable, () => {
    const equilibriumError = spreadSeries(a, b, eg.aOnB.beta, eg.aOnB.intercept ?? 0, { y: names.a, x: names.b });
    return leadLagSection(a, b, names, { a: factsA, b: factsB, cointegrated, equilibriumError }, { alpha, lagRule, levelsOrder });
  });

  // The follower is written on its leader; without one leader the pair keeps its given order.
  const bFollows = cointegrated && leadLag?.leader === names.a;
  const [y, x] = bFollows ? [b, a] : [a, b];
  const yx = bFollows ? { y: names.b, x: names.a } : { y: names.a, x: names.b };
  const normalisationReason = bFollows
    ? `${names.a} leads, so the relation is written for ${names.b}, the follower, on its leader.`
    : cointegrated && leadLag?.leader === names.b
      ? `${names.b} leads, so the relation is written for ${names.a}, the follower, on its leader.`
      : `No single leader, so the relation is written for ${names.a}, the first of the pair, on ${names.b}.`;

  // A copied column (one series an exact multiple of the other) leaves a spread of rounding noise: nothing to model.
  const exactFit = eg.aOnB.statistic === null || eg.bOnA.statistic === null;
  if (exactFit) {
    const reason = `${names.a} and ${names.b} move as one up to scale (the Engle-Granger residual is exactly zero): check that one column is not a copy or a formula of the other.`;
    for (const part of ['long-run relation', 'spread', 'error-correction model']) unavailable.push({ part, reason });
  }
  const phillipsOuliaris = attempt('Phillips-Ouliaris test', unavailable, () => phillipsOuliarisSummary(y, x, yx, { alpha, deterministic }));
  const relation = exactFit ? null : attempt('long-run relation', unavailable, () =>
    longRunRelation(y, x, yx, { logged: context.logged, rowLabels: context.rowLabels, normalisationReason }));
  // The one spread of the pair (least-squares line with a constant, whatever the tests' deterministic terms) and its half-life.
  const pair = exactFit ? null : attempt('spread', unavailable, () => pairSpread(y, x, yx, context.period));
  const spread = pair === null ? null : attempt('spread', unavailable, () =>
    spreadSection(pair, yx, {
      rowLabels: context.rowLabels,
      dates: context.dates,
      rollingWindow: context.rollingWindow,
      period: context.period,
      logged: context.logged,
    }));
  const adjustment = pair === null || spread === null
    ? null
    : attempt('error-correction model', unavailable, () => adjustmentSection(y, x, pair, yx, { alpha, deterministic, period: context.period }));

  const movingHedge = exactFit ? null : attempt('moving hedge ratio', unavailable, () => movingHedgeSection(y, x, yx));
  const forecast = exactFit || !cointegrated || johansen === null ? null
    : attempt('forecast', unavailable, () => forecastSection(y, x, yx, { case: johansen.case, lags: johansen.lags }, context.dates));

  const restrictions = exactFit || johansen === null ? null
    : attempt('Johansen restriction tests', unavailable, () => pairRestrictions(a, b, names, johansen));
  const orderNumbers = { [names.a]: factsA.order, [names.b]: factsB.order };
  // One price I(0), the other I(1): the bounds test answers where the residual tests cannot.
  const mixed = !bothIntegrated && [factsA.order, factsB.order].sort().join() === '0,1';
  const bounds = mixed ? attempt('bounds test', unavailable, () => boundsSummary(a, b, names)) : null;
  const verdict = cointegrationVerdict({ engleGranger: eg, evidence: eg.evidence, bothIntegrated }, yx.y, yx.x, orderNumbers, bounds);
  const partial: Omit<PairReport, 'verdicts' | 'warnings'> = {
    a: names.a,
    b: names.b,
    cointegration: pairCointegration({ engleGranger: eg, phillipsOuliaris, johansen, bothIntegrated, bounds, restrictions }, verdict),
    leadLag,
    relation,
    adjustment,
    spread,
    movingHedge,
    forecast,
    unavailable,
  };
  return {
    ...partial,
    verdicts: pairVerdicts(partial),
    warnings: pairWarnings(partial, { orders: orderNumbers, observations: a.length, period: context.period }),
  };
}
