/**
 * Lead-lag analysis of a pair in both directions (a -> b and b -> a) with a test that is valid
 * for the data: the orders of integration (given, or found by ADF and KPSS) and the cointegration
 * status pick the test (chooseCausalityTest), both directions run with the same lags, and the
 * answer is a plain verdict with cautions.
 */
import { MooringInputError } from '../errors';
import { integrationOrder } from '../unitroot/integration-order';
import { checkedBlock } from '../var/var-design';
import type { LagChoice } from './causality-lags';
import { LEAD_LAG_CAUTION, levelText, pText, type PairNames } from './causality-wording';
import { METHOD_LABEL, chooseCausalityTest, type CausalityChoice, type CausalityMethod, type OrderEvidence } from './choose-causality-test';
import { cautiousGivenOrder, cautiousOrder, orderEvidence } from './extra-lags';
import { directionLeads, grangerTest, type CausalityDirection } from './granger-test';
import { PairWork } from './pair-work';

/** 'auto' picks the valid test; 'f', 'ty' and 'ecm' ask for the F test, Toda-Yamamoto or the error-correction form. */
export type LeadLagMethod = 'auto' | 'f' | 'ty' | 'ecm';

/**
 * Which data the F test runs on: 'auto' lets the orders of integration decide (the changes when
 * both series are I(1), else the values); 'levels' is Granger's F test on the values as given
 * (the textbook test, whatever the series do); 'changes' the F test on their first differences.
 * 'levels' and 'changes' ask for the F test, so they go with method 'auto' or 'f' only.
 */
export type LeadLagData = 'auto' | 'levels' | 'changes';

/** The data words leadLag accepts. */
export const LEAD_LAG_DATA: readonly LeadLagData[] = ['auto', 'levels', 'changes'];

/** Options of leadLag. */
export interface LeadLagOptions {
  /** Level for the verdict and the unit-root tests (default 0.05). */
  alpha?: number;
  /** Lags of both series: a number, or 'aic'/'bic' (default 'aic'). */
  lags?: LagChoice;
  maxLags?: number;
  method?: LeadLagMethod;
  /** Which data the F test uses (default 'auto'); 'levels' or 'changes' ask for the F test on them. */
  data?: LeadLagData;
  /** Orders of integration of [a, b]; found by ADF and KPSS when left out. */
  orders?: readonly [OrderEvidence, OrderEvidence];
  /** Whether a and b are cointegrated (e.g. from Engle-Granger or Johansen); unknown when left out. */
  cointegrated?: boolean;
  /** Equilibrium error for the error-correction form (one value per row). */
  equilibriumError?: ArrayLike<number>;
  /** Also run the other valid tests ("alsoValid") in both directions. */
  withCompanions?: boolean;
}

/** One direction of leadLag, with its reading at the chosen level. */
export interface LeadLagDirection extends CausalityDirection {
  /** True when this direction shows a lead at the chosen level. */
  leads: boolean;
}

/** Both directions, the test used and why, the verdict and the cautions. */
export interface LeadLagResult {
  names: [string, string];
  alpha: number;
  method: CausalityMethod;
  /**
   * The data the headline test ran on: 'levels' for the F test on the values and Toda-Yamamoto
   * (a VAR in levels), 'changes' for the F test on changes and the error-correction form (changes
   * on lagged changes and the lagged gap).
   */
  data: 'levels' | 'changes';
  why: string;
  alsoValid: CausalityMethod[];
  orders: { a: OrderEvidence; b: OrderEvidence; source: 'given' | 'tested' | 'not needed' };
  aLeadsB: LeadLagDirection;
  bLeadsA: LeadLagDirection;
  /** The other valid tests, both directions, when asked for. */
  companions: LeadLagDirection[];
  verdict: string;
  cautions: string[];
}

const LEAD_LAG_METHODS: readonly LeadLagMethod[] = ['auto', 'f', 'ty', 'ecm'];

interface OrderFacts {
  a: OrderEvidence;
  b: OrderEvidence;
  source: 'given' | 'tested' | 'not needed';
  /** dmax for Toda-Yamamoto, or null when not known. */
  extraLags: number | null;
}

function orderFacts(pair: readonly Float64Array[], names: readonly [string, string], options: LeadLagOptions, alpha: number, needed: boolean): OrderFacts {
  if (options.orders !== undefined) {
    if (!Array.isArray(options.orders) || options.orders.length !== 2) {
      throw new MooringInputError('orders must list two orders of integration, one for each series (0, 1, 2 or "uncertain").');
    }
    const [a, b] = options.orders;
    return { a, b, source: 'given', extraLags: Math.max(cautiousGivenOrder(a), cautiousGivenOrder(b)) };
  }
  if (!needed) return { a: 'uncertain', b: 'uncertain', source: 'not needed', extraLags: null };
  // Only "0, 1, or 2 and more" matters for the choice and for dmax, so the second differences are not tested.
  const ra = integrationOrder(pair[0], { alpha, highestDifference: 1 }, names[0]);
  const rb = integrationOrder(pair[1], { alpha, highestDifference: 1 }, names[1]);
  return { a: orderEvidence(ra), b: orderEvidence(rb), source: 'tested', extraLags: Math.max(cautiousOrder(ra), cautiousOrder(rb)) };
}

/** The data a method runs on, for the record (see LeadLagResult.data). */
export function dataOfMethod(method: CausalityMethod): 'levels' | 'changes' {
  return method === 'f-levels' || method === 'toda-yamamoto' ? 'levels' : 'changes';
}

/** The F test on the data asked for, with the reason and any caution the orders call for. */
function fTestOn(data: 'levels' | 'changes', facts: OrderFacts, cointegrated: boolean | undefined): CausalityChoice & { caution?: string } {
  if (data === 'levels') {
    const stationary = facts.a === 0 && facts.b === 0;
    return {
      method: 'f-levels',
      why: 'The F test on the values as given was asked for.',
      alsoValid: ['toda-yamamoto'],
      caution: stationary
        ? undefined
        : 'The F test on the values is valid only for stationary series; these series are not both known to be stationary, so its p-values can be far too small. Toda-Yamamoto is valid here.',
    };
  }
  const caution =
    cointegrated === true
      ? 'The pair is cointegrated: the F test on changes ignores the pull back to the equilibrium and can miss a long-run lead; the error-correction form covers it.'
      : facts.a === 2 || facts.b === 2
        ? 'At least one series still wanders after one difference (I(2)), so the F test on its changes is not valid; Toda-Yamamoto is.'
        : facts.a === 0 && facts.b === 0
          ? 'Both series are stationary already: their changes are differenced once too often, which can hide a lead that the F test on the values would find.'
          : undefined;
  return { method: 'f-differences', why: 'The F test on the changes was asked for.', alsoValid: ['toda-yamamoto'], caution };
}

/** The method actually run for a requested one, with the reason and any caution. */
function requestedChoice(method: LeadLagMethod, data: LeadLagData, facts: OrderFacts, cointegrated: boolean | undefined): CausalityChoice & { caution?: string } {
  if (data !== 'auto') {
    if (method === 'ty' || method === 'ecm') {
      throw new MooringInputError(
        `The data choice '${data}' is for the F test: ${method === 'ty' ? 'Toda-Yamamoto always runs on the values as given' : 'the error-correction form always uses the changes and the gap'}. Leave the data at auto, or ask for the F test.`,
      );
    }
    return fTestOn(data, facts, cointegrated);
  }
  if (method === 'auto') return chooseCausalityTest({ orderCause: facts.a, orderEffect: facts.b, cointegrated });
  if (method === 'ty') {
    return { method: 'toda-yamamoto', why: 'Toda-Yamamoto was asked for; it is valid whatever the orders of integration and the cointegration status.', alsoValid: [] };
  }
  if (method === 'ecm') {
    const caution =
      cointegrated === true
        ? undefined
        : 'The error-correction form assumes the pair is cointegrated, which has not been established here; without cointegration its long-run test means nothing.';
    return { method: 'error-correction', why: 'The error-correction form was asked for.', alsoValid: ['toda-yamamoto'], caution };
  }
  if (facts.a === 1 && facts.b === 1) {
    const caution =
      cointegrated === true
        ? 'The pair is cointegrated: the F test on changes ignores the pull back to the equilibrium and can miss a long-run lead; the error-correction form covers it.'
        : undefined;
    return { method: 'f-differences', why: 'The F test was asked for; both series are I(1), so it runs on their changes, which are stationary.', alsoValid: ['toda-yamamoto'], caution };
  }
  const stationary = facts.a === 0 && facts.b === 0;
  return {
    method: 'f-levels',
    why: 'The F test was asked for, on the values as given.',
    alsoValid: ['toda-yamamoto'],
    caution: stationary
      ? undefined
      : 'The F test on the values is valid only for stationary series; these series are not both known to be stationary, so its p-values can be far too small. Toda-Yamamoto is valid here.',
  };
}

function directionText(d: LeadLagDirection, alpha: number): string {
  const p =
    d.longRun === null
      ? pText(d.test.pValue)
      : `short run ${pText(d.test.pValue)}, long run ${pText(d.longRun.pValue)}, each at ${levelText(alpha / 2)}`;
  return d.leads ? `${d.cause} leads ${d.effect} (${p})` : `no evidence that ${d.cause} leads ${d.effect} (${p})`;
}

/** Plain verdict on both directions. */
export function leadLagVerdict(ab: LeadLagDirection, ba: LeadLagDirection, method: CausalityMethod, alpha: number): string {
  const first = directionText(ab, alpha);
  // Capitalise our own opening words only; a series name keeps its spelling (ln(Gasoil)).
  const opening = first.startsWith('no evidence') ? `N${first.slice(1)}` : first;
  const sentence = `${opening}; ${directionText(ba, alpha)}.`;
  const feedback = ab.leads && ba.leads ? ' Each series helps predict the other (feedback), so neither is a clean leader.' : '';
  return `${sentence}${feedback} (${METHOD_LABEL[method].replace(/^the /, '')}, ${levelText(alpha)} level.)`;
}

/** Lead-lag tests of a and b in both directions, with a valid test chosen for the data. */
export function leadLag(a: ArrayLike<number>, b: ArrayLike<number>, options: LeadLagOptions = {}, names: readonly [string, string] = ['A', 'B']): LeadLagResult {
  const alpha = options.alpha ?? 0.05;
  if (!(alpha > 0 && alpha < 0.5)) throw new MooringInputError(`The significance level must lie between 0 and 0.5; got ${alpha}.`);
  const method = options.method ?? 'auto';
  if (!LEAD_LAG_METHODS.includes(method)) {
    throw new MooringInputError(`Unknown method '${String(method)}': use one of ${LEAD_LAG_METHODS.join(', ')}.`);
  }
  const data = options.data ?? 'auto';
  if (!LEAD_LAG_DATA.includes(data)) {
    throw new MooringInputError(`Unknown data choice '${String(data)}': use one of ${LEAD_LAG_DATA.join(', ')}.`);
  }
  if (names[0] === names[1]) throw new MooringInputError(`Both series are called '${names[0]}': give them different names.`);
  const pair = checkedBlock([a, b], names);
  const facts = orderFacts(pair, names, options, alpha, method !== 'ecm');
  const choice = requestedChoice(method, data, facts, options.cointegrated);
  // Both directions (and the companions) share the lag order and the VAR fit (pair-work.ts).
  const work = new PairWork([pair[0], pair[1]], options.lags, options.maxLags);

  const run = (m: CausalityMethod, forward: boolean): LeadLagDirection => {
    const [cause, effect] = forward ? [pair[0], pair[1]] : [pair[1], pair[0]];
    const pairNames: PairNames = forward ? { cause: names[0], effect: names[1] } : { cause: names[1], effect: names[0] };
    const extraLags = m === 'toda-yamamoto' && facts.extraLags !== null ? facts.extraLags : undefined;
    const direction = grangerTest(
      cause,
      effect,
      {
        method: m,
        lags: options.lags,
        maxLags: options.maxLags,
        extraLags,
        extraLagsRule: extraLags === undefined ? undefined : `highest order of integration (${facts.source}): ${names[0]} ${facts.a}, ${names[1]} ${facts.b}`,
        equilibriumError: options.equilibriumError,
        alpha,
        work,
      },
      pairNames,
    );
    return { ...direction, leads: directionLeads(direction, alpha) };
  };

  const aLeadsB = run(choice.method, true);
  const bLeadsA = run(choice.method, false);
  const companions = options.withCompanions ? choice.alsoValid.flatMap((m) => [run(m, true), run(m, false)]) : [];
  const cautions = [LEAD_LAG_CAUTION];
  if (choice.caution) cautions.push(choice.caution);
  if (choice.method === 'error-correction') {
    cautions.push('The error-correction verdict counts a lead in the short run or the long run; each test is judged at half the level so a false lead stays within the level.');
  }
  for (const w of new Set([...aLeadsB.test.warnings, ...bLeadsA.test.warnings])) cautions.push(w);
  return {
    names: [names[0], names[1]],
    alpha,
    method: choice.method,
    data: dataOfMethod(choice.method),
    why: choice.why,
    alsoValid: choice.alsoValid,
    orders: { a: facts.a, b: facts.b, source: facts.source },
    aLeadsB,
    bLeadsA,
    companions,
    verdict: leadLagVerdict(aLeadsB, bLeadsA, choice.method, alpha),
    cautions,
  };
}
