/**
 * Choosing the orders of the ARDL(P, Q_1, ..., Q_k) model by an information criterion:
 * every P in 1..maxP (or the given P) and every Q_j in 1..maxQ (or the given Q_j), fitted
 * on one common sample (the first max(maxP, maxQ) rows held back, so the criteria compare
 * like with like), the smallest AIC or BIC kept; ties go to the smaller model, found first.
 * Orders start at 1 because the error-correction form needs y_{t-1} and Δx_t.
 */
import { MooringInputError } from '../errors';
import { leastSquares } from '../regression/least-squares';
import type { BoundsCase } from './bounds-case';
import { ardlDesign, type ArdlOrders } from './ardl-design';

/** A fixed order, or a criterion with the largest order to try. */
export type OrderChoice = { fixed: number } | { criterion: 'aic' | 'bic'; max: number };

/** Every combination of the candidate orders (P first, then each Q_j). */
function candidates(p: OrderChoice, q: readonly OrderChoice[]): ArdlOrders[] {
  const range = (c: OrderChoice) => ('fixed' in c ? [c.fixed] : Array.from({ length: c.max }, (_, i) => i + 1));
  let out: number[][] = range(p).map((v) => [v]);
  for (const choice of q) out = out.flatMap((prefix) => range(choice).map((v) => [...prefix, v]));
  return out.map(([pp, ...qq]) => ({ p: pp, q: qq }));
}

/** The largest order any candidate uses: the common hold-back of the search. */
export function searchHoldBack(p: OrderChoice, q: readonly OrderChoice[]): number {
  const top = (c: OrderChoice) => ('fixed' in c ? c.fixed : c.max);
  return Math.max(top(p), ...q.map(top));
}

/**
 * Chooses the orders. With every order fixed, returns them unchanged. Throws a
 * MooringInputError if the search would try more than 5,000 models.
 */
export function chooseArdlOrders(
  y: ArrayLike<number>,
  xs: readonly ArrayLike<number>[],
  boundsCase: BoundsCase,
  p: OrderChoice,
  q: readonly OrderChoice[],
  names: { y: string; x: readonly string[] },
): { orders: ArdlOrders; criterion: 'aic' | 'bic' | null } {
  const all = candidates(p, q);
  const criterion = [p, ...q].map((c) => ('criterion' in c ? c.criterion : null)).find((c) => c !== null) ?? null;
  if (criterion === null) return { orders: all[0], criterion: null };
  if (all.length > 5000) {
    throw new MooringInputError(`The order search would fit ${all.length} models: lower the largest order or fix some orders.`);
  }
  const holdBack = searchHoldBack(p, q);
  let best: { orders: ArdlOrders; value: number } | null = null;
  for (const orders of all) {
    const design = ardlDesign(y, xs, orders, boundsCase, names, holdBack);
    if (design.nobs - design.columns.length < 2) continue;
    const fit = leastSquares(design.response, design.columns, { names: design.names, withoutCovariance: true });
    const value = criterion === 'aic' ? fit.aic : fit.bic;
    if (best === null || value < best.value - 1e-12) best = { orders, value };
  }
  if (best === null) {
    throw new MooringInputError('Too few rows for any of the orders tried: add rows or lower the largest order.');
  }
  return { orders: best.orders, criterion };
}
