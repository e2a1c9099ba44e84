/**
 * The ARDL order search screens candidates by cross products and confirms the near-best by QR
 * (addin/ardl/ardl-orders.ts). Property: it chooses exactly the orders a QR fit of every
 * candidate chooses (the search as it was, written out here independently with ardlDesign and
 * leastSquares), for every case, both criteria, one and two x series, on seeded series that
 * relate, series that do not, a near-collinear pair and prices far from zero.
 */
import { describe, expect, it } from 'vitest';
import { chooseArdlOrders, searchHoldBack, type OrderChoice } from '../../addin/ardl/ardl-orders';
import { ardlDesign, type ArdlOrders } from '../../addin/ardl/ardl-design';
import type { BoundsCase } from '../../addin/ardl/bounds-case';
import { SeededRandom, autoregressive1, randomWalk } from '../../addin/random';
import { leastSquares } from '../../addin/regression/least-squares';

/** Every candidate fitted by QR; the smallest criterion kept, ties to the first. */
function searchByQr(y: Float64Array, xs: Float64Array[], boundsCase: BoundsCase, p: OrderChoice, q: OrderChoice[], criterion: 'aic' | 'bic'): ArdlOrders {
  const range = (c: OrderChoice) => ('fixed' in c ? [c.fixed] : Array.from({ length: c.max }, (_, i) => i + 1));
  let all: number[][] = range(p).map((v) => [v]);
  for (const c of q) all = all.flatMap((prefix) => range(c).map((v) => [...prefix, v]));
  const names = { y: 'y', x: xs.map((_, j) => `x${j + 1}`) };
  const holdBack = searchHoldBack(p, q);
  let best: { orders: ArdlOrders; value: number } | null = null;
  for (const [pp, ...qq] of all) {
    const orders = { p: pp, q: qq };
    const design = ardlDesign(y, xs, orders, boundsCase, names, holdBack);
    if (design.nobs - design.columns.length < 2) continue;
    const fit = leastSquares(design.response, design.columns, { names: design.names, withoutCovariance: true });
    const value = criterion === 'aic' ? fit.aic : fit.bic;
    if (best === null || value < best.value - 1e-12) best = { orders, value };
  }
  return best!.orders;
}

function inputs(seed: number): { label: string; y: Float64Array; xs: Float64Array[] }[] {
  const rng = new SeededRandom(seed);
  const n = 300;
  const x1 = randomWalk(rng, n, { start: 50 });
  const x2 = autoregressive1(rng, n, 0.5);
  const spread = autoregressive1(rng, n, 0.7);
  const related = x1.map((v, t) => 2 + 0.8 * v + 0.5 * x2[t] + spread[t]);
  const unrelated = randomWalk(rng, n, { start: 20 });
  const twin = x1.map((v, t) => v + 1e-6 * spread[t]);
  return [
    { label: 'related, two x', y: related, xs: [x1, x2] },
    { label: 'unrelated, one x', y: unrelated, xs: [x1] },
    { label: 'near-collinear x', y: related, xs: [x1, twin] },
    { label: 'prices near 1e6', y: related.map((v) => 1e6 + v), xs: [x1.map((v) => 1e6 + v)] },
  ];
}

describe('ARDL order search: the screened search chooses what a QR fit of every candidate chooses', () => {
  for (const seed of [7, 19, 401]) {
    for (const input of inputs(seed)) {
      it(`seed ${seed}, ${input.label}: every case, AIC and BIC, orders up to 4`, () => {
        for (const boundsCase of [1, 2, 3, 4, 5] as BoundsCase[]) {
          for (const criterion of ['aic', 'bic'] as const) {
            const p: OrderChoice = { criterion, max: 4 };
            const q: OrderChoice[] = input.xs.map(() => ({ criterion, max: 4 }));
            const names = { y: 'y', x: input.xs.map((_, j) => `x${j + 1}`) };
            let expected: ArdlOrders | Error;
            try {
              expected = searchByQr(input.y, input.xs, boundsCase, p, q, criterion);
            } catch (e) {
              expected = e as Error;
            }
            if (expected instanceof Error) {
              expect(() => chooseArdlOrders(input.y, input.xs, boundsCase, p, q, names)).toThrow(expected.message);
            } else {
              expect(chooseArdlOrders(input.y, input.xs, boundsCase, p, q, names).orders).toEqual(expected);
            }
          }
        }
      });
    }
  }

  it('with one order fixed and the other searched', () => {
    const [{ y, xs }] = inputs(3);
    const p: OrderChoice = { fixed: 2 };
    const q: OrderChoice[] = [{ criterion: 'aic', max: 4 }, { fixed: 1 }];
    expect(chooseArdlOrders(y, xs, 3, p, q, { y: 'y', x: ['x1', 'x2'] }).orders).toEqual(searchByQr(y, xs, 3, p, q, 'aic'));
  });
});
