/**
 * Which lead-lag test is valid for a pair, from the two orders of integration and whether the
 * pair is cointegrated:
 *   both I(0)                      -> F test on the values (Granger 1969);
 *   both I(1), not cointegrated    -> F test on the changes (the changes are stationary);
 *   both I(1), cointegrated        -> error-correction form (Granger 1988), with Toda-Yamamoto
 *                                     as the always-valid companion (differencing alone would
 *                                     drop the long-run link, so the F on changes is misspecified);
 *   mixed or uncertain, or I(2)    -> Toda-Yamamoto (1995), valid whatever the orders.
 * The F test on the values of trending series is never chosen: its F distribution fails there
 * (Sims, Stock & Watson 1990; Toda & Phillips 1993).
 */
import { MooringInputError } from '../errors';

/** The four lead-lag tests. */
export type CausalityMethod = 'f-levels' | 'f-differences' | 'toda-yamamoto' | 'error-correction';

/** An order of integration, or "uncertain" when the unit-root tests disagree or were not run. */
export type OrderEvidence = 0 | 1 | 2 | 'above 2' | 'uncertain';

/** What is known about the pair: both orders of integration and, if tested, cointegration. */
export interface CausalitySituation {
  orderCause: OrderEvidence;
  orderEffect: OrderEvidence;
  /** Whether the pair is cointegrated; undefined when it was not tested. */
  cointegrated?: boolean;
}

/** The test to run, why it is valid, and the other valid tests. */
export interface CausalityChoice {
  method: CausalityMethod;
  /** One sentence saying why this test is valid here. */
  why: string;
  /** Other tests that are also valid here, for a second opinion. */
  alsoValid: CausalityMethod[];
}

/** Plain names of the methods, for sentences. */
export const METHOD_LABEL: Record<CausalityMethod, string> = {
  'f-levels': 'the F test on the values',
  'f-differences': 'the F test on the changes',
  'toda-yamamoto': 'the Toda-Yamamoto test',
  'error-correction': 'the error-correction test',
};

/** Chooses the valid lead-lag test for the situation, with a one-sentence reason. */
export function chooseCausalityTest(situation: CausalitySituation): CausalityChoice {
  const { orderCause, orderEffect, cointegrated } = situation;
  for (const order of [orderCause, orderEffect]) {
    if (order === 'above 2') {
      throw new MooringInputError(
        'A series integrated of an order above 2 (still wandering after two differences) has no valid lead-lag test here: check the data for errors or work with its changes.',
      );
    }
    if (![0, 1, 2, 'uncertain'].includes(order)) {
      throw new MooringInputError(`Unknown order of integration '${String(order)}': use 0, 1, 2 or 'uncertain'.`);
    }
  }
  if (cointegrated !== undefined && typeof cointegrated !== 'boolean') {
    throw new MooringInputError(`'cointegrated' must be true, false or left out; got ${String(cointegrated)}.`);
  }
  if (orderCause === 0 && orderEffect === 0) {
    return {
      method: 'f-levels',
      why: 'Both series are stationary, I(0), so the F test on their values is valid and the most powerful of the four.',
      alsoValid: ['toda-yamamoto'],
    };
  }
  if (orderCause === 1 && orderEffect === 1 && cointegrated === true) {
    return {
      method: 'error-correction',
      why: 'Both series are I(1) and cointegrated, so the error-correction form is valid: it tests the short-run lead through the lagged changes and the long-run lead through the pull back to the equilibrium, which an F test on changes alone would miss.',
      alsoValid: ['toda-yamamoto'],
    };
  }
  if (orderCause === 1 && orderEffect === 1 && cointegrated === false) {
    return {
      method: 'f-differences',
      why: 'Both series are I(1) and not cointegrated, so their changes are stationary and carry all the lead-lag information: the F test on the changes is valid.',
      alsoValid: ['toda-yamamoto'],
    };
  }
  const reason =
    orderCause === 1 && orderEffect === 1
      ? 'Both series are I(1) but whether they are cointegrated was not established'
      : orderCause === 'uncertain' || orderEffect === 'uncertain'
        ? 'The order of integration of at least one series is uncertain'
        : orderCause === orderEffect
          ? `Both series are I(${orderCause})`
          : `The series have different orders of integration (I(${orderCause}) and I(${orderEffect}))`;
  return {
    method: 'toda-yamamoto',
    why: `${reason}, so the Toda-Yamamoto test is used: it stays valid whatever the orders and whether or not the pair is cointegrated.`,
    alsoValid: [],
  };
}
