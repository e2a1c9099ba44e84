/**
 * The residual ADF of Engle-Granger step 2 (no deterministic terms; Engle & Granger 1987),
 * for many residuals in a row, in buffers allocated once. Same rules as the single test
 * (adfCore with 'none'), so a screened pair gets the same lag and the same tau:
 *
 * 1. Lag choice on the common sample of the search (T - 1 - pmax rows) from one Cholesky
 *    factorisation of the design's cross products (the method of adf-lag-search.ts): the
 *    lagged changes are shifted copies of one series, so their cross products follow from
 *    the first row by adding the row entering and removing the row leaving.
 * 2. The chosen lag p refitted on all T - 1 - p rows it can use. Its cross products are those
 *    of step 1 plus the pmax - p earlier rows, and with the lagged level ordered last the
 *    t-ratio of its coefficient is z_k / s, from the same factorisation (z = L^{-1} X'y,
 *    s^2 = SSR / (n - k)). The single test refits by QR; the two agree to about 1e-13 in tau
 *    (tests/screen measures it).
 *
 * The level and the changes are scaled to unit root-mean-square first, a change of units
 * that leaves t-ratios and the lag choice unchanged and keeps the cross products well sized.
 */
import { gaussianLogLikelihood } from '../regression/least-squares';
import { nestedFitsInto } from '../regression/nested-cholesky';
import { TSTAT_STOP, type LagRule } from '../unitroot/adf-lag-search';

/** What the residual ADF reports for one residual. */
export interface ResidualAdfAnswer {
  tau: number;
  /** Lagged changes used. */
  lags: number;
  /** Rows of the test regression, T - 1 - lags. */
  nobs: number;
}

/** A residual's products for testWithLagProducts, in its own units. */
export interface LagProducts {
  /** sum over t = P .. T-2 of Δu[t] Δu[t-j], j = 0..P. */
  changes: Float64Array;
  /** sum over t = P .. T-2 of u[t] Δu[t-j], j = 0..P. */
  levels: Float64Array;
  /** sum of u[t], t = 0 .. T-1. */
  sum: number;
  /** sum of u[t]^2, t = 0 .. T-1. */
  sumSquares: number;
  /** sum of Δu[t]^2, t = 0 .. T-2. */
  changeSquares: number;
  /** sum of u[t] Δu[t], t = 0 .. T-2. */
  levelTimesChange: number;
}

/** Buffers for the residual ADF, grown to the largest residual and lag count seen; ask it test() once per residual. */
export class ResidualAdfWorkspace {
  private level = new Float64Array(0);
  private dx = new Float64Array(0);
  private gram = new Float64Array(0); // (pmax+1)^2, row 0 = response with lags, then lag-lag
  private levelCross = new Float64Array(0); // level with the response (0) and lag j (j)
  private xtx = new Float64Array(0);
  private xty = new Float64Array(0);
  private factor = new Float64Array(0);
  private z = new Float64Array(0);
  private ssr = new Float64Array(0);
  private lastT = new Float64Array(0);
  private levelSquares = 0; // sum of level^2 over rows P .. T-2
  private capacityRows = -1;
  private capacityLags = -1;

  /**
   * Plain sums of the last residual tested, from the pass that reads it: sum u_t, sum u_t^2,
   * and sum over t < T-1 of u_t (u_{t+1} - u_t). Its mean, spread and AR(1) follow from these.
   */
  readonly sums = { sum: 0, sumSquares: 0, levelTimesChange: 0 };

  private reserve(T: number, pmax: number): void {
    if (T > this.capacityRows) {
      this.capacityRows = T;
      this.level = new Float64Array(T);
      this.dx = new Float64Array(T);
    }
    if (pmax > this.capacityLags) {
      this.capacityLags = pmax;
      const size = pmax + 1;
      this.gram = new Float64Array(size * size);
      this.levelCross = new Float64Array(size);
      this.xtx = new Float64Array(size * size);
      this.xty = new Float64Array(size);
      this.factor = new Float64Array(size * size);
      this.z = new Float64Array(size);
      this.ssr = new Float64Array(size + 1);
      this.lastT = new Float64Array(size + 1);
    }
  }

  /**
   * ADF without deterministic terms on u[0..T-1], with `fixedLags` lags (>= 0) or lags chosen
   * by `rule` from 0..pmax. Returns tau = NaN only when the design is singular at every lag
   * (a residual that is constant or that repeats itself exactly).
   */
  test(u: ArrayLike<number>, T: number, pmax: number, rule: LagRule | 'fixed', fixedLags = 0): ResidualAdfAnswer {
    const P = rule === 'fixed' ? fixedLags : pmax;
    this.reserve(T, P);
    const { level, dx } = this;
    let su = 0;
    let sl = 0;
    let sd = 0;
    let sc = 0;
    for (let t = 0; t < T - 1; t++) {
      const v = u[t];
      const d = u[t + 1] - v;
      level[t] = v;
      dx[t] = d;
      su += v;
      sl += v * v;
      sd += d * d;
      sc += v * d;
    }
    const last = u[T - 1];
    level[T - 1] = last;
    su += last;
    sl += last * last;
    this.sums.sum = su;
    this.sums.sumSquares = sl;
    this.sums.levelTimesChange = sc;
    const rmsLevel = Math.sqrt(sl / T);
    const rmsChange = Math.sqrt(sd / (T - 1));
    const levelScale = rmsLevel > 0 ? rmsLevel : 1;
    const changeScale = rmsChange > 0 ? rmsChange : 1;
    for (let t = 0; t < T - 1; t++) {
      level[t] /= levelScale;
      dx[t] /= changeScale;
    }
    level[T - 1] /= levelScale;
    this.crossProducts(T, P);
    const lags = rule === 'fixed' ? fixedLags : this.chooseLags(T, P, rule, rmsChange > 0 ? rmsChange : 1);
    return { tau: this.tauAt(T, P, lags), lags, nobs: T - 1 - lags };
  }

  /**
   * The same test with the residual's products formed elsewhere (the batched screen,
   * batched/pair-lag-moments.ts): over the search's rows t = P .. T-2, `changes[j]` = sum of
   * Δu[t] Δu[t-j] and `levels[j]` = sum of u[t] Δu[t-j], j = 0..P, and over all rows the plain
   * sums, in the residual's own units. Only the first P + 1 and the last P + 1 rows of u are read
   * (the lag-lag products by shifted rows and the refit need them); the rest need not be filled.
   */
  testWithLagProducts(u: ArrayLike<number>, T: number, pmax: number, rule: LagRule | 'fixed', fixedLags: number, given: LagProducts): ResidualAdfAnswer {
    const P = rule === 'fixed' ? fixedLags : pmax;
    this.reserve(T, P);
    const { level, dx, gram, levelCross } = this;
    this.sums.sum = given.sum;
    this.sums.sumSquares = given.sumSquares;
    this.sums.levelTimesChange = given.levelTimesChange;
    const rmsLevel = Math.sqrt(given.sumSquares / T);
    const rmsChange = Math.sqrt(given.changeSquares / (T - 1));
    const levelScale = rmsLevel > 0 ? rmsLevel : 1;
    const changeScale = rmsChange > 0 ? rmsChange : 1;
    const last = u[T - 1];
    let outside = last * last; // rows 0 .. P-1 and T-1 lie outside the search's rows
    for (let t = 0; t < P; t++) {
      const v = u[t];
      outside += v * v;
      level[t] = v / levelScale;
      dx[t] = (u[t + 1] - v) / changeScale;
    }
    for (let t = Math.max(P, T - 1 - P); t < T - 1; t++) dx[t] = (u[t + 1] - u[t]) / changeScale;
    this.levelSquares = Math.max(given.sumSquares - outside, 0) / (levelScale * levelScale);
    const perChange = 1 / (changeScale * changeScale);
    const perLevel = 1 / (levelScale * changeScale);
    for (let j = 0; j <= P; j++) {
      gram[j] = given.changes[j] * perChange;
      levelCross[j] = given.levels[j] * perLevel;
    }
    this.shiftedProducts(T, P);
    const lags = rule === 'fixed' ? fixedLags : this.chooseLags(T, P, rule, rmsChange > 0 ? rmsChange : 1);
    return { tau: this.tauAt(T, P, lags), lags, nobs: T - 1 - lags };
  }

  /** Cross products over rows t = P .. T-2 of the response dx[t], lags dx[t-i] (i = 1..P) and the level. */
  private crossProducts(T: number, P: number): void {
    const { level, dx, gram, levelCross } = this;
    const size = P + 1;
    const a = P;
    const b = T - 2;
    // Row 0 (the response with lag j) and the level with lag j, four lags per pass over the
    // rows: each dx[t - j] is loaded once for both products. Every sum still runs over t in
    // order, so the numbers are those of one loop per lag.
    let ll = 0;
    for (let t = a; t <= b; t++) ll += level[t] * level[t];
    this.levelSquares = ll;
    let j = 0;
    for (; j + 3 <= P; j += 4) {
      let r0 = 0, r1 = 0, r2 = 0, r3 = 0, l0 = 0, l1 = 0, l2 = 0, l3 = 0;
      for (let t = a; t <= b; t++) {
        const d = dx[t];
        const l = level[t];
        const d0 = dx[t - j];
        const d1 = dx[t - j - 1];
        const d2 = dx[t - j - 2];
        const d3 = dx[t - j - 3];
        r0 += d * d0;
        r1 += d * d1;
        r2 += d * d2;
        r3 += d * d3;
        l0 += l * d0;
        l1 += l * d1;
        l2 += l * d2;
        l3 += l * d3;
      }
      gram[j] = r0;
      gram[j + 1] = r1;
      gram[j + 2] = r2;
      gram[j + 3] = r3;
      levelCross[j] = l0;
      levelCross[j + 1] = l1;
      levelCross[j + 2] = l2;
      levelCross[j + 3] = l3;
    }
    for (; j <= P; j++) {
      let r = 0;
      let l = 0;
      for (let t = a; t <= b; t++) {
        r += dx[t] * dx[t - j];
        l += level[t] * dx[t - j];
      }
      gram[j] = r;
      levelCross[j] = l;
    }
    this.shiftedProducts(T, P);
  }

  /** Lag i with lag j (1 <= i <= j <= P) from row 0: shifted rows, one entering and one leaving. */
  private shiftedProducts(T: number, P: number): void {
    const { dx, gram } = this;
    const size = P + 1;
    const a = P;
    const b = T - 2;
    for (let i = 1; i <= P; i++) {
      for (let j = i; j <= P; j++) {
        gram[i * size + j] = gram[(i - 1) * size + (j - 1)] + dx[a - i] * dx[a - j] - dx[b + 1 - i] * dx[b + 1 - j];
      }
    }
  }

  /** The AIC, BIC or t-rule choice among 0..P lags on the common sample (the order [level, lags 1..P] of adf-lag-search.ts). */
  private chooseLags(T: number, P: number, rule: LagRule, responseScale: number): number {
    const { level, gram, levelCross, xtx, xty } = this;
    const size = P + 1;
    const k = P + 1;
    xtx[0] = this.levelSquares;
    xty[0] = levelCross[0];
    for (let j = 1; j <= P; j++) {
      xtx[j] = levelCross[j];
      xtx[j * k] = levelCross[j];
      xty[j] = gram[j];
      for (let i = 1; i <= j; i++) {
        xtx[i * k + j] = gram[i * size + j];
        xtx[j * k + i] = gram[i * size + j];
      }
    }
    const n = T - 1 - P;
    const usable = this.nestedFits(k, gram[0], n);
    const usableLags = Math.max(0, Math.min(P, usable - 1));
    if (rule === 'tstat') {
      for (let p = usableLags; p >= 1; p--) if (this.lastT[1 + p] >= TSTAT_STOP) return p;
      return 0;
    }
    const unit = responseScale * responseScale;
    let best = 0;
    let bestValue = Number.POSITIVE_INFINITY;
    for (let p = 0; p <= usableLags; p++) {
      const kk = 1 + p;
      const llf = gaussianLogLikelihood(this.ssr[kk] * unit, n);
      const value = rule === 'aic' ? -2 * llf + 2 * kk : -2 * llf + kk * Math.log(n);
      if (value < bestValue) {
        bestValue = value;
        best = p;
      }
    }
    return best;
  }

  /**
   * Cholesky of xtx (k x k) column by column, with z = L^{-1} xty: ssr[j] and |t| of the last
   * column for the first j columns (nested-cholesky.ts). Returns the columns usable before a
   * pivot fails.
   */
  private nestedFits(k: number, yty: number, n: number): number {
    return nestedFitsInto(this.xtx, this.xty, yty, k, n, { factor: this.factor, z: this.z, ssr: this.ssr, lastT: this.lastT });
  }

  /** tau of the regression with p lags on rows p .. T-2, the lagged level ordered last (see the file comment). */
  private tauAt(T: number, P: number, p: number): number {
    const { level, dx, gram, levelCross, xtx, xty } = this;
    const size = P + 1;
    const k = p + 1;
    // Rows P..T-2 from the search's cross products, then the rows p..P-1 it left out.
    let yty = gram[0];
    let ll = this.levelSquares;
    for (let i = 1; i <= p; i++) {
      xty[i - 1] = gram[i];
      xtx[(i - 1) * k + p] = levelCross[i];
      for (let j = i; j <= p; j++) xtx[(i - 1) * k + (j - 1)] = gram[i * size + j];
    }
    xty[p] = levelCross[0];
    for (let t = p; t < P; t++) {
      const r = dx[t];
      const l = level[t];
      yty += r * r;
      ll += l * l;
      xty[p] += l * r;
      for (let i = 1; i <= p; i++) {
        const di = dx[t - i];
        xty[i - 1] += di * r;
        xtx[(i - 1) * k + p] += di * l;
        for (let j = i; j <= p; j++) xtx[(i - 1) * k + (j - 1)] += di * dx[t - j];
      }
    }
    xtx[p * k + p] = ll;
    for (let i = 0; i < k; i++) for (let j = i + 1; j < k; j++) xtx[j * k + i] = xtx[i * k + j];
    const n = T - 1 - p;
    const usable = this.nestedFits(k, yty, n);
    if (usable < k || n - k <= 0) return Number.NaN;
    const rss = this.ssr[k];
    return rss > 0 ? this.z[k - 1] / Math.sqrt(rss / (n - k)) : Number.NaN;
  }
}
