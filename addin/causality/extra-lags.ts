/**
 * dmax for the Toda-Yamamoto test: the highest order of integration of the two series
 * (Toda & Yamamoto 1995), each order found by integrationOrder (ADF from the top down, KPSS
 * confirming).
 *
 * Where ADF and KPSS disagree the order is uncertain, and we take one order more (at most 2):
 * an extra lag too many costs the test a little power, one too few costs it its validity
 * (Toda & Yamamoto 1995, from memory: over-fitting the VAR leaves the Wald limit intact).
 */
import { MooringInputError } from '../errors';
import { integrationOrder, type IntegrationOrderResult } from '../unitroot/integration-order';
import type { PairNames } from './causality-wording';
import type { OrderEvidence } from './choose-causality-test';

/** dmax and how it was set. */
export interface ExtraLagsChoice {
  extraLags: number;
  /** "given", or how the orders set it. */
  rule: string;
  /** Orders used, or null when dmax was given. */
  orders: { cause: number; effect: number } | null;
  warnings: string[];
}

/** The order a decision rests on: the found order, one more when ADF and KPSS disagree (capped at 2). */
export function cautiousOrder(result: IntegrationOrderResult): number {
  if (result.order === 'above 2') {
    throw new MooringInputError(
      `${result.name} still has a unit root after two differences (integrated of an order above 2): lead-lag tests here are not valid for it. Check the data for errors or test its changes.`,
    );
  }
  return result.agree ? result.order : Math.min(result.order + 1, 2);
}

/** An order as evidence for chooseCausalityTest: the order when ADF and KPSS agree, else "uncertain". */
export function orderEvidence(result: IntegrationOrderResult): OrderEvidence {
  return result.agree ? result.order : 'uncertain';
}

/** An order given by the user, as a dmax contribution: "uncertain" counts as 2, the safe side. */
export function cautiousGivenOrder(order: OrderEvidence): number {
  if (order === 'above 2') {
    throw new MooringInputError('A series integrated of an order above 2 has no valid lead-lag test here: check the data for errors or test its changes.');
  }
  return order === 'uncertain' ? 2 : order;
}

/** dmax from the integration orders of the pair [cause, effect]. */
export function extraLagsFromOrders(pair: readonly Float64Array[], names: PairNames, alpha: number): ExtraLagsChoice {
  // dmax only needs to know whether an order is 0, 1, or 2 and more: the second differences are not tested.
  const causeOrder = integrationOrder(pair[0], { alpha, highestDifference: 1 }, names.cause);
  const effectOrder = integrationOrder(pair[1], { alpha, highestDifference: 1 }, names.effect);
  const cause = cautiousOrder(causeOrder);
  const effect = cautiousOrder(effectOrder);
  const warnings: string[] = [];
  for (const r of [causeOrder, effectOrder]) {
    if (!r.agree) warnings.push(`The order of integration of ${r.name} is uncertain (ADF and KPSS disagree); one extra lag more is used to stay valid.`);
  }
  return {
    extraLags: Math.max(cause, effect),
    rule: `highest order of integration (${names.cause}: ${cause}, ${names.effect}: ${effect}; ADF and KPSS at ${Math.round(alpha * 1000) / 10}%)`,
    orders: { cause, effect },
    warnings,
  };
}
