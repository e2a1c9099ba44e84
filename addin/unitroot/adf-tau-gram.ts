/**
 * The ADF regression's tau and level coefficient for long series, from the cross products of
 * its design (regression/lagged-difference-gram.ts: built in O(n p) because the lagged changes
 * are shifted copies of one series) instead of a Householder QR of the n x (p + d + 1) design,
 * which costs O(n p^2) and, at a million rows and Schwert's 120 lags, tens of seconds.
 *
 * The columns are taken in the order [deterministic, lags 1..p, level], so that one Cholesky
 * G = L L' gives the level's coefficient as z_k / L_kk and its t-ratio as z_k / sqrt(SSR / (n - k)),
 * z = L^{-1} X'y and SSR = y'y - z'z (Golub & Van Loan 2013, sec. 5.3.2). The design is mean-free
 * (or trend-free) and at unit scale, a change of parameters that leaves tau as it is.
 *
 * Forming G squares the design's condition and SSR = y'y - z'z cancels when the fit is close, so
 * the answer is given only where both stay small (every pivot keeps PIVOT_FLOOR of its column's
 * size, and SSR keeps SSR_FLOOR of y'y); otherwise null, and the caller fits by QR. Where it is
 * given, tau agrees with the QR fit to about 1e-13 (tested).
 *
 * Where those floors are not met but the design is still of full rank in double precision
 * (strongly tied lags, as in the second changes of a price, or a close fit), the same Cholesky
 * solves the normal equations and the solution is refined from the true residuals
 * r = y - X b, each step O(n p): solve G c = X'r, b += c, until the correction stops mattering
 * (Higham 2002, ch. 12 and sec. 20.5, refinement of the seminormal equations). The residual sum of squares
 * is then r'r and the level's pivot the sum of squares of its own refined residual on the other
 * columns, so neither cancels. If the corrections do not settle, null (QR).
 */
import type { Deterministic } from '../result';
import { dickeyFullerGram, type DickeyFullerGram } from '../regression/lagged-difference-gram';

/** Smallest share of a column's own sum of squares its Cholesky pivot may keep (keeps the design far from collinear). */
const PIVOT_FLOOR = 1e-2;
/** Smallest share of y'y the residual sum of squares may keep (cancellation of at most ~4 digits). */
const SSR_FLOOR = 1e-4;

/** Smallest share of a column's sum of squares a pivot may keep on the refined route (full rank in double precision). */
export const REFINE_PIVOT_FLOOR = 1e-12;
/** Most refinement steps. */
const REFINE_STEPS = 8;
/**
 * The last correction to the level coefficient may move tau by at most this share (of |tau|, or
 * of 1 where |tau| < 1). On seeded second changes at 6,000 rows the last step moves tau by 2e-16
 * to 1e-12 of it; with 30 and 60 lags tau then equals QR to 5e-13, with 120 tied lags to 1.6e-12,
 * where QR itself is 6e-13 (tau) and 1.8e-12 (gamma) from a long-double fit and the refined
 * route 1e-12 (tests/reference/adf-long-double.py). On the benchmark's 1,000,000-row second
 * changes (120 lags) the refined tau is 7e-14 from the long-double fit and QR's 1.4e-11.
 */
const REFINE_TAU_TOLERANCE = 1e-12;

/** Rows times columns squared above which the cross-product route pays for itself. */
export const ADF_GRAM_WORK = 5e7;

export interface AdfTauByGram {
  tau: number;
  /** Coefficient on the lagged level, in the data's units. */
  gamma: number;
  nobs: number;
}

/**
 * tau and gamma of the ADF regression with `lags` lagged changes, or null where the cross products
 * are not safe. `gram`, when given, must be dickeyFullerGram(x, deterministic, lags) (the lag
 * search's, when it chose its largest lag: the same sample and columns).
 */
export function adfTauByGram(x: ArrayLike<number>, lags: number, deterministic: Deterministic, gram: DickeyFullerGram = dickeyFullerGram(x, deterministic, lags)): AdfTauByGram | null {
  const k = gram.k;
  const n = gram.n;
  if (n - k < 1) return null;
  // Gram order is [level, deterministic..., lags...]; take the level last.
  const order = [...Array.from({ length: k - 1 }, (_, i) => i + 1), 0];
  const L = new Float64Array(k * k);
  const z = new Float64Array(k);
  let explained = 0;
  for (let j = 0; j < k; j++) {
    const gj = order[j];
    let d = gram.xtx[gj * k + gj];
    for (let m = 0; m < j; m++) d -= L[j * k + m] * L[j * k + m];
    if (!(d > PIVOT_FLOOR * gram.xtx[gj * k + gj])) return refinedTau(gram, order);
    const ljj = Math.sqrt(d);
    L[j * k + j] = ljj;
    for (let i = j + 1; i < k; i++) {
      let s = gram.xtx[order[i] * k + gj];
      for (let m = 0; m < j; m++) s -= L[i * k + m] * L[j * k + m];
      L[i * k + j] = s / ljj;
    }
    let s = gram.xty[gj];
    for (let m = 0; m < j; m++) s -= L[j * k + m] * z[m];
    z[j] = s / ljj;
    explained += z[j] * z[j];
  }
  const ssr = gram.yty - explained;
  if (!(ssr > SSR_FLOOR * gram.yty)) return refinedTau(gram, order);
  const tau = z[k - 1] / Math.sqrt(ssr / (n - k));
  const coefficient = z[k - 1] / L[(k - 1) * k + (k - 1)];
  const gamma = (coefficient * gram.responseScale) / gram.levelScale;
  if (!Number.isFinite(tau) || !Number.isFinite(gamma)) return null;
  return { tau, gamma, nobs: n };
}

/**
 * The Cholesky factor (row-major k x k, lower) of the gram's cross products with its columns
 * taken in `order`; null where a pivot keeps no more than REFINE_PIVOT_FLOOR of its column's
 * sum of squares (the refined route then declines and QR answers).
 */
export function orderedCholesky(gram: DickeyFullerGram, order: number[]): Float64Array | null {
  const { k } = gram;
  const L = new Float64Array(k * k);
  for (let j = 0; j < k; j++) {
    const gj = order[j];
    let d = gram.xtx[gj * k + gj];
    for (let m = 0; m < j; m++) d -= L[j * k + m] * L[j * k + m];
    if (!(d > REFINE_PIVOT_FLOOR * gram.xtx[gj * k + gj])) return null;
    const ljj = Math.sqrt(d);
    L[j * k + j] = ljj;
    for (let i = j + 1; i < k; i++) {
      let s = gram.xtx[order[i] * k + gj];
      for (let m = 0; m < j; m++) s -= L[i * k + m] * L[j * k + m];
      L[i * k + j] = s / ljj;
    }
  }
  return L;
}

/**
 * tau and gamma by Cholesky of the cross products plus refinement from the true residuals
 * (see the file's note); `order` lists the gram's columns with the level last.
 */
function refinedTau(gram: DickeyFullerGram, order: number[]): AdfTauByGram | null {
  const { k, n } = gram;
  const L = orderedCholesky(gram, order);
  if (L === null) return null;
  const design = new OrderedDesign(gram, order);
  const y = gram.dx.subarray(gram.start, gram.start + n);
  const full = refinedFit(design, L, k, k, y);
  if (full === null) return null;
  // The level's pivot squared is the sum of squares of the level's residual on the other columns.
  const levelColumn = gram.level.subarray(gram.start, gram.start + n);
  const own = refinedFit(design, L, k, k - 1, levelColumn);
  if (own === null) return null;
  const ssr = full.ssr;
  const pivotSquared = own.ssr;
  if (!(ssr > 0) || !(pivotSquared > 0)) return null;
  const coefficient = full.b[k - 1];
  const se = Math.sqrt(ssr / (n - k) / pivotSquared);
  if (!(Math.abs(full.lastCorrection[k - 1]) <= REFINE_TAU_TOLERANCE * Math.max(Math.abs(coefficient), se))) return null;
  const tau = coefficient / se;
  const gamma = (coefficient * gram.responseScale) / gram.levelScale;
  if (!Number.isFinite(tau) || !Number.isFinite(gamma)) return null;
  return { tau, gamma, nobs: n };
}

/** The Dickey-Fuller design's columns in Cholesky order, applied row by row without forming it. */
export class OrderedDesign {
  private readonly nd: number;
  constructor(
    private readonly gram: DickeyFullerGram,
    private readonly order: number[],
  ) {
    this.nd = gram.k - 1 - gram.start; // the lags number gram.start (the sample's first row)
  }

  private isLag(c: number): boolean {
    return c > this.nd;
  }

  /** out = y - X_m b, X_m the first m ordered columns. */
  residual(b: Float64Array, m: number, y: Float64Array, out: Float64Array): void {
    const { n, start, level, dx } = this.gram;
    out.set(y);
    for (let j = 0; j < m; j++) {
      const c = this.order[j];
      if (j + 3 < m && this.isLag(c) && this.order[j + 3] === c + 3) {
        // Four lags in one pass over the rows, subtracted in the same order as one at a time.
        const [b0, b1, b2, b3] = [b[j], b[j + 1], b[j + 2], b[j + 3]];
        const from = start - (c - this.nd);
        for (let t = 0; t < n; t++) {
          const i = from + t;
          out[t] = out[t] - b0 * dx[i] - b1 * dx[i - 1] - b2 * dx[i - 2] - b3 * dx[i - 3];
        }
        j += 3;
        continue;
      }
      const bj = b[j];
      if (bj === 0) continue;
      if (c === 0) {
        for (let t = 0; t < n; t++) out[t] -= bj * level[start + t];
      } else if (c === 1 && this.nd > 0) {
        for (let t = 0; t < n; t++) out[t] -= bj;
      } else if (c === 2 && this.nd > 1) {
        const step = bj / n;
        for (let t = 0; t < n; t++) out[t] -= step * (t + 1);
      } else {
        const lag = c - this.nd;
        const from = start - lag;
        for (let t = 0; t < n; t++) out[t] -= bj * dx[from + t];
      }
    }
  }

  /** out = X_m' r. */
  crossWith(r: Float64Array, m: number, out: Float64Array): void {
    const { n, start, level, dx } = this.gram;
    for (let j = 0; j < m; j++) {
      const c = this.order[j];
      if (j + 3 < m && this.isLag(c) && this.order[j + 3] === c + 3) {
        // Four lags in one pass over the rows, each sum in the same order as one at a time.
        const from = start - (c - this.nd);
        let s0 = 0;
        let s1 = 0;
        let s2 = 0;
        let s3 = 0;
        for (let t = 0; t < n; t++) {
          const i = from + t;
          const rt = r[t];
          s0 += dx[i] * rt;
          s1 += dx[i - 1] * rt;
          s2 += dx[i - 2] * rt;
          s3 += dx[i - 3] * rt;
        }
        out[j] = s0;
        out[j + 1] = s1;
        out[j + 2] = s2;
        out[j + 3] = s3;
        j += 3;
        continue;
      }
      let s = 0;
      if (c === 0) {
        for (let t = 0; t < n; t++) s += level[start + t] * r[t];
      } else if (c === 1 && this.nd > 0) {
        for (let t = 0; t < n; t++) s += r[t];
      } else if (c === 2 && this.nd > 1) {
        for (let t = 0; t < n; t++) s += ((t + 1) / n) * r[t];
      } else {
        const from = start - (c - this.nd);
        for (let t = 0; t < n; t++) s += dx[from + t] * r[t];
      }
      out[j] = s;
    }
  }
}

/** Solves (L_m L_m') v = rhs in place, L_m the leading m x m block of the k-wide factor. */
function choleskySolve(L: Float64Array, k: number, m: number, v: Float64Array): void {
  for (let i = 0; i < m; i++) {
    let s = v[i];
    for (let j = 0; j < i; j++) s -= L[i * k + j] * v[j];
    v[i] = s / L[i * k + i];
  }
  for (let i = m - 1; i >= 0; i--) {
    let s = v[i];
    for (let j = i + 1; j < m; j++) s -= L[j * k + i] * v[j];
    v[i] = s / L[i * k + i];
  }
}

export interface RefinedFit {
  b: Float64Array;
  ssr: number;
  lastCorrection: Float64Array;
}

/** Least squares of y on the first m ordered columns, refined from the true residuals; null if the corrections do not settle. */
export function refinedFit(design: OrderedDesign, L: Float64Array, kk: number, m: number, y: Float64Array): RefinedFit | null {
  const n = y.length;
  const r = new Float64Array(n);
  const b = new Float64Array(m);
  const c = new Float64Array(m);
  // b = 0 first: the residual is y, and the first "correction" is the plain normal-equations solution.
  let previous = Infinity;
  for (let step = 0; step <= REFINE_STEPS; step++) {
    design.residual(b, m, y, r);
    design.crossWith(r, m, c);
    choleskySolve(L, kk, m, c);
    let size = 0;
    let bSize = 0;
    for (let j = 0; j < m; j++) {
      b[j] += c[j];
      size = Math.max(size, Math.abs(c[j]));
      bSize = Math.max(bSize, Math.abs(b[j]));
    }
    if (step === 0) continue;
    // Settled: the correction is at rounding level, or it has stopped shrinking (the limit of
    // double precision for this design); the caller checks that it no longer moves tau.
    if (size <= 4 * Number.EPSILON * bSize || size > 0.5 * previous) {
      let ssr = 0;
      for (let t = 0; t < n; t++) ssr += r[t] * r[t];
      return { b, ssr, lastCorrection: c };
    }
    previous = size;
  }
  return null;
}
