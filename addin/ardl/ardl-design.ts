/**
 * The columns of the error-correction (conditional) form of an ARDL(P, Q_1, ..., Q_k) model
 * in levels (Pesaran, Shin & Smith 2001, eq. 6 / 23):
 *
 *   Δy_t = free terms + [restricted term] + π_y y_{t-1} + Σ_j π_j x_{j,t-1}
 *          + Σ_{i=1}^{P-1} γ_i Δy_{t-i} + Σ_j Σ_{i=0}^{Q_j-1} δ_{j,i} Δx_{j,t-i} + e_t
 *
 * Column order: free terms, restricted term, y_{t-1}, x_{j,t-1}, lagged Δy, Δx (the
 * reference library's order, so coefficients compare one to one).
 * Sample: rows t = h..T-1 (0-based) with h = max(P, Q_1, ..., Q_k), or a larger h given by
 * the caller so that models with different orders share one sample in the order search.
 * The trend counts 1, 2, ... from the first row of the data, so a trend value is the same
 * whichever rows are held back.
 */
import { BOUNDS_CASE_TERMS, type BoundsCase } from './bounds-case';

/** The orders of the model in levels: P for y, Q_j for each x (each at least 1). */
export interface ArdlOrders {
  p: number;
  q: number[];
}

export interface ArdlDesign {
  /** Δy_t over the sample. */
  response: Float64Array;
  columns: Float64Array[];
  names: string[];
  /** Index of y_{t-1}; the x levels follow it. */
  levelStart: number;
  /** Indexes tested by the F statistic: the restricted term (if any), y_{t-1} and the x levels. */
  tested: number[];
  /** Index of the restricted term, or -1. */
  restrictedIndex: number;
  nobs: number;
  /** First data row used (0-based). */
  start: number;
}

/** Smallest number of leading rows the orders need: max(P, Q_1, ..., Q_k). */
export function holdBackOf(orders: ArdlOrders): number {
  return Math.max(orders.p, ...orders.q);
}

/** Builds the design of the error-correction form for y, the x's, the orders and the case. */
export function ardlDesign(
  y: ArrayLike<number>,
  xs: readonly ArrayLike<number>[],
  orders: ArdlOrders,
  boundsCase: BoundsCase,
  names: { y: string; x: readonly string[] },
  holdBack = holdBackOf(orders),
): ArdlDesign {
  const T = y.length;
  const h = holdBack;
  const n = T - h;
  const terms = BOUNDS_CASE_TERMS[boundsCase];
  const columns: Float64Array[] = [];
  const colNames: string[] = [];
  const window = (f: (t: number) => number) => {
    const c = new Float64Array(n);
    for (let i = 0; i < n; i++) c[i] = f(h + i);
    return c;
  };
  const term = (kind: 'constant' | 'trend') => window((t) => (kind === 'constant' ? 1 : t + 1));
  for (const kind of terms.unrestricted) {
    columns.push(term(kind));
    colNames.push(`the free ${kind}`);
  }
  let restrictedIndex = -1;
  if (terms.restricted !== null) {
    restrictedIndex = columns.length;
    columns.push(term(terms.restricted));
    colNames.push(`the ${terms.restricted} inside the relation`);
  }
  const levelStart = columns.length;
  columns.push(window((t) => y[t - 1]));
  colNames.push(`the level of '${names.y}' lagged 1`);
  xs.forEach((x, j) => {
    columns.push(window((t) => x[t - 1]));
    colNames.push(`the level of '${names.x[j]}' lagged 1`);
  });
  const tested = [...(restrictedIndex >= 0 ? [restrictedIndex] : []), ...Array.from({ length: xs.length + 1 }, (_, j) => levelStart + j)];
  for (let i = 1; i < orders.p; i++) {
    columns.push(window((t) => y[t - i] - y[t - i - 1]));
    colNames.push(`the change of '${names.y}' lagged ${i}`);
  }
  xs.forEach((x, j) => {
    for (let i = 0; i < orders.q[j]; i++) {
      columns.push(window((t) => x[t - i] - x[t - i - 1]));
      colNames.push(i === 0 ? `the change of '${names.x[j]}'` : `the change of '${names.x[j]}' lagged ${i}`);
    }
  });
  return { response: window((t) => y[t] - y[t - 1]), columns, names: colNames, levelStart, tested, restrictedIndex, nobs: n, start: h };
}
