/**
 * Choosing the orders of the ARDL(P, Q_1, ..., Q_k) model by an information criterion:
 * every P in 1..maxP (or the given P) and every Q_j in 1..maxQ (or the given Q_j), fitted
 * on one common sample (the first max(maxP, maxQ) rows held back, so the criteria compare
 * like with like), the smallest AIC or BIC kept; ties go to the smaller model, found first.
 * Orders start at 1 because the error-correction form needs y_{t-1} and Δx_t.
 *
 * Every candidate's columns are a subset of the largest model's on that common sample, so the
 * search forms the largest model's cross products once and reads each candidate's residual sum
 * of squares from a Cholesky factor of its block (columns scaled to unit length first). Those
 * sums only screen: every candidate whose screened criterion is within SCREEN_MARGIN of the best
 * (and any whose factor comes near a zero pivot) is fitted by QR, and the choice is made among
 * those QR fits by the same rule, so it is the one a QR fit of every candidate makes (the
 * margin is far above the screen's rounding, about 1e-10 of a sum of squares).
 */
import { MooringInputError } from '../errors';
import { gaussianLogLikelihood, leastSquares } from '../regression/least-squares';
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
  const shortlist = screenedCandidates(y, xs, boundsCase, p, q, names, holdBack, all, criterion);
  let best: { orders: ArdlOrders; value: number } | null = null;
  for (const orders of shortlist) {
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

/** Criterion units within which a screened candidate is confirmed by QR (relative to n + |best|). */
const SCREEN_MARGIN = 1e-6;

/** A pivot below this share of its column's scaled length sends the candidate to QR unscreened. */
const PIVOT_FLOOR = 1e-8;

/**
 * The candidates worth a QR fit (in the search's order): those whose criterion from the cross
 * products is within the margin of the best, and those the cross products cannot settle.
 */
function screenedCandidates(
  y: ArrayLike<number>, xs: readonly ArrayLike<number>[], boundsCase: BoundsCase, p: OrderChoice, q: readonly OrderChoice[],
  names: { y: string; x: readonly string[] }, holdBack: number, all: readonly ArdlOrders[], criterion: 'aic' | 'bic',
): ArdlOrders[] {
  const top = (c: OrderChoice) => ('fixed' in c ? c.fixed : c.max);
  const largest = ardlDesign(y, xs, { p: top(p), q: q.map(top) }, boundsCase, names, holdBack);
  const n = largest.nobs;
  const columns = [...largest.columns, largest.response];
  const K = columns.length;
  // Cross products of the columns scaled to unit length, the response last.
  const scale = columns.map((c) => Math.sqrt(c.reduce((s, v) => s + v * v, 0)) || 1);
  const gram = new Float64Array(K * K);
  for (let i = 0; i < K; i++) {
    for (let j = 0; j <= i; j++) {
      const a = columns[i];
      const b = columns[j];
      let s = 0;
      for (let t = 0; t < n; t++) s += a[t] * b[t];
      gram[i * K + j] = gram[j * K + i] = s / (scale[i] * scale[j]);
    }
  }
  const base = largest.levelStart + xs.length + 1; // terms, y_{t-1}, the x levels
  const xStart = (j: number) => base + (top(p) - 1) + q.slice(0, j).reduce((s, c) => s + top(c), 0);
  const factor = new Float64Array(K * K);
  const values: number[] = [];
  const unsettled: boolean[] = [];
  for (const orders of all) {
    const index = Array.from({ length: base }, (_, i) => i);
    for (let i = 1; i < orders.p; i++) index.push(base + i - 1);
    orders.q.forEach((qj, j) => {
      for (let i = 0; i < qj; i++) index.push(xStart(j) + i);
    });
    index.push(K - 1);
    const m = index.length;
    // Cholesky of the block; the last pivot is the residual sum of squares (of the scaled response).
    let ssr = Number.NaN;
    let settled = true;
    for (let a = 0; a < m && settled; a++) {
      for (let b = 0; b <= a; b++) {
        let s = gram[index[a] * K + index[b]];
        for (let c = 0; c < b; c++) s -= factor[a * K + c] * factor[b * K + c];
        if (a === b) {
          if (a === m - 1) ssr = s;
          else if (!(s > PIVOT_FLOOR)) settled = false;
          else factor[a * K + a] = Math.sqrt(s);
        } else {
          factor[a * K + b] = s / factor[b * K + b];
        }
      }
    }
    const k = m - 1;
    const usable = n - k >= 2;
    const rss = ssr * scale[K - 1] * scale[K - 1];
    settled = settled && rss > 0 && Number.isFinite(rss);
    unsettled.push(usable && !settled);
    const ll = settled ? gaussianLogLikelihood(rss, n) : Number.NaN;
    values.push(!usable || !settled ? Number.NaN : criterion === 'aic' ? -2 * ll + 2 * k : -2 * ll + k * Math.log(n));
  }
  let best = Infinity;
  for (const v of values) if (v < best) best = v;
  const margin = SCREEN_MARGIN * (n + (Number.isFinite(best) ? Math.abs(best) : 0));
  return all.filter((_, c) => unsettled[c] || values[c] <= best + margin);
}
