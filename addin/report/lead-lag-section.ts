/**
 * Lead-lag evidence of a pair in both directions, through the causality module's decision
 * function leadLag: it picks the test that is valid for the pair's orders of integration and
 * cointegration status (F on the values, F on the changes, the error-correction form or
 * Toda-Yamamoto) and says why. The report hands it what it already knows, so nothing is
 * estimated twice: the orders (as evidence: an order where ADF and KPSS agree, "uncertain"
 * where they do not), the report's cointegration decision, the Engle-Granger residual as the
 * equilibrium error, and the lags from the pair's VAR order by the report's criterion (the
 * error-correction form keeps one lag fewer, the VAR order less one, as the module does when it
 * chooses itself; at least one lag in every test).
 */
import { chooseCausalityTest, type OrderEvidence } from '../causality/choose-causality-test';
import { leadLag, type LeadLagDirection } from '../causality/lead-lag';
import type { VarLagChoice } from '../var/choose-var-lags';
import { chooseVarLags } from '../var/choose-var-lags';
import type { LeadLagDirectionSummary, LeadLagReport } from './pair-types';
import { summariseTest } from './test-summary';

/** What the lead-lag step needs to know about one series. */
export interface OrderFacts {
  order: number;
  agree: boolean;
}

/** An order as the causality module's evidence: the order when ADF and KPSS agree, else "uncertain". */
export function orderEvidence(facts: OrderFacts): OrderEvidence {
  if (facts.order > 2) return 'above 2';
  return facts.agree ? (facts.order as 0 | 1 | 2) : 'uncertain';
}

/** One direction, each test's decision at the level the verdict uses (half the level for each of the error-correction form's two tests). */
function directionSummary(d: LeadLagDirection, alpha: number, lagRule: string): LeadLagDirectionSummary {
  const level = d.longRun === null ? alpha : alpha / 2;
  return {
    cause: d.cause,
    effect: d.effect,
    test: { ...summariseTest(d.test, level), lagRule },
    longRun: d.longRun === null ? null : { ...summariseTest(d.longRun, level), lagRule },
    leads: d.leads,
    level,
  };
}

/** Lead-lag in both directions by the valid test, with the leader and the verdict. */
export function leadLagSection(
  a: Float64Array,
  b: Float64Array,
  names: { a: string; b: string },
  facts: { a: OrderFacts; b: OrderFacts; cointegrated: boolean; equilibriumError: Float64Array },
  options: { alpha: number; lagRule: 'aic' | 'bic'; levelsOrder?: VarLagChoice },
): LeadLagReport {
  const orders: [OrderEvidence, OrderEvidence] = [orderEvidence(facts.a), orderEvidence(facts.b)];
  const method = chooseCausalityTest({ orderCause: orders[0], orderEffect: orders[1], cointegrated: facts.cointegrated }).method;
  const onChanges = method === 'f-differences';
  const order = onChanges || options.levelsOrder === undefined ? chooseVarLags(onChanges ? [diff(a), diff(b)] : [a, b], { names: [names.a, names.b] }) : options.levelsOrder;
  const chosen = order[options.lagRule];
  const lags = Math.max(1, method === 'error-correction' ? chosen - 1 : chosen);
  const source = onChanges ? "VAR order of the pair's changes" : method === 'error-correction' ? 'VAR order of the pair less one' : 'VAR order of the pair';
  const lagRule = `${options.lagRule} (${source}, up to ${order.maxLags}; at least 1)`;
  const result = leadLag(a, b, {
    alpha: options.alpha,
    lags,
    orders,
    cointegrated: facts.cointegrated,
    equilibriumError: facts.equilibriumError,
  }, [names.a, names.b]);
  const ab = result.aLeadsB.leads;
  const ba = result.bLeadsA.leads;
  const pattern: LeadLagReport['pattern'] = ab && ba ? 'both-ways' : ab || ba ? 'one-way' : 'neither';
  return {
    method: result.method,
    why: result.why,
    aLeadsB: directionSummary(result.aLeadsB, options.alpha, lagRule),
    bLeadsA: directionSummary(result.bLeadsA, options.alpha, lagRule),
    leader: pattern === 'one-way' ? (ab ? names.a : names.b) : null,
    pattern,
    verdict: result.verdict,
    cautions: result.cautions.slice(),
  };
}

function diff(x: Float64Array): Float64Array {
  const out = new Float64Array(x.length - 1);
  for (let i = 0; i < out.length; i++) out[i] = x[i + 1] - x[i];
  return out;
}
