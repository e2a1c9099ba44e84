/**
 * One unordered pair of a screen, both directions: the Engle-Granger step-1 regression from
 * means and cross products, the residual ADF (residual-adf-workspace.ts), and the spread's
 * half-life and latest z-score, written as two records (pair-record.ts).
 *
 * Step 1 with a constant needs no QR: with deviations from the means over the shared rows,
 * beta(y on x) = Sxy / Sxx, beta(x on y) = Sxy / Syy, the intercept is the mean of y less
 * beta times the mean of x, and R^2 = Sxy^2 / (Sxx Syy) for both directions (Engle & Granger
 * 1987, eq. for the static regression; ordinary least squares with one regressor).
 * Half-life: the AR(1) with a constant on the spread, lambda = cov(s_{t-1}, Δs_t) /
 * var(s_{t-1}) over t = 2..T, then ln 2 / -ln|1 + lambda| (spread/half-life.ts).
 */
import { EXACT_FIT_R_SQUARED } from '../cointegration/cointegrating-regression';
import { residualTauPValue } from '../cointegration/residual-tables';
import { MooringInputError } from '../errors';
import { johansenTest } from '../johansen/johansen';
import { halfLifeFromSpeed } from '../spread/half-life';
import { resolveMaxLag } from '../unitroot/max-lag';
import { FIELD, PAIR_STATUS, RECORD_SIZE } from './pair-record';
import { PairLagMoments, type LagKernel } from './batched/pair-lag-moments';
import { ResidualAdfWorkspace } from './residual-adf-workspace';
import { canPair } from './series-orders';
import type { ScreenSettings } from './screen-options';
import type { ScreenUniverse } from './screen-universe';

/** How a workspace forms the residual ADF's cross products. */
export interface PairWorkspaceOptions {
  /**
   * 'batched' (default): for two complete series, from series-level products shared by both
   * directions (batched/pair-lag-moments.ts); 'per-pair': from each residual, the reference path.
   * Pairs with gaps, and directions whose combination would cancel too much, take the per-pair path.
   */
  products?: 'batched' | 'per-pair';
  /** The batched path's inner products: WebAssembly SIMD where the host has it (default), or the JavaScript loops. */
  kernel?: LagKernel;
}

/** Buffers reused from pair to pair: the shared rows of both series and the residual. */
export class PairWorkspace {
  private readonly a: Float64Array;
  private readonly b: Float64Array;
  private readonly residual: Float64Array;
  private readonly adf = new ResidualAdfWorkspace();
  /** The series-level products (null on the per-pair path); its `fallbacks` counts directions tested per pair. */
  readonly moments: PairLagMoments | null;

  constructor(rows: number, options: PairWorkspaceOptions = {}) {
    this.a = new Float64Array(rows);
    this.b = new Float64Array(rows);
    this.residual = new Float64Array(rows);
    this.moments = options.products === 'per-pair' ? null : new PairLagMoments(options.kernel);
  }

  /** Tests series i on j (record 2k) and j on i (record 2k + 1) into `out` at record index `first`. */
  testPair(universe: ScreenUniverse, settings: ScreenSettings, i: number, j: number, out: Float64Array, first: number): void {
    const { rows, data } = universe;
    const base = first * RECORD_SIZE;
    if (universe.orders && !canPair(universe.orders[i], universe.orders[j])) {
      out.fill(Number.NaN, base, base + 2 * RECORD_SIZE);
      out[base + FIELD.status] = PAIR_STATUS.setAside;
      out[base + RECORD_SIZE + FIELD.status] = PAIR_STATUS.setAside;
      return;
    }
    const both = universe.complete[i] === 1 && universe.complete[j] === 1;
    let a: Float64Array;
    let b: Float64Array;
    let T: number;
    let lastRow: number;
    let meanA: number;
    let meanB: number;
    let saa: number;
    let sbb: number;
    if (both) {
      a = data.subarray(i * rows, (i + 1) * rows);
      b = data.subarray(j * rows, (j + 1) * rows);
      T = rows;
      lastRow = rows - 1;
      meanA = universe.means[i];
      meanB = universe.means[j];
      saa = universe.centredSquares[i];
      sbb = universe.centredSquares[j];
    } else {
      a = this.a;
      b = this.b;
      T = 0;
      lastRow = -1;
      for (let t = 0; t < rows; t++) {
        const va = data[i * rows + t];
        const vb = data[j * rows + t];
        if (va === va && vb === vb) {
          a[T] = va;
          b[T] = vb;
          T++;
          lastRow = t;
        }
      }
      meanA = 0;
      meanB = 0;
      for (let t = 0; t < T; t++) {
        meanA += a[t];
        meanB += b[t];
      }
      meanA /= T;
      meanB /= T;
      saa = 0;
      sbb = 0;
      for (let t = 0; t < T; t++) {
        saa += (a[t] - meanA) * (a[t] - meanA);
        sbb += (b[t] - meanB) * (b[t] - meanB);
      }
    }
    out.fill(Number.NaN, base, base + 2 * RECORD_SIZE);
    out[base + FIELD.nobs] = T;
    out[base + FIELD.lastRow] = lastRow;
    out[base + RECORD_SIZE + FIELD.nobs] = T;
    out[base + RECORD_SIZE + FIELD.lastRow] = lastRow;
    if (T < settings.minObservations) {
      out[base + FIELD.status] = PAIR_STATUS.tooFewRows;
      out[base + RECORD_SIZE + FIELD.status] = PAIR_STATUS.tooFewRows;
      return;
    }
    // A series that does not move has no hedge ratio (the relative rule of the series cleaner).
    const flat = (ss: number, mean: number) => !(Math.sqrt(ss / T) > 1e-10 * Math.max(Math.abs(mean), 1e-300));
    if (flat(saa, meanA) || flat(sbb, meanB)) {
      out[base + FIELD.status] = PAIR_STATUS.constant;
      out[base + RECORD_SIZE + FIELD.status] = PAIR_STATUS.constant;
      return;
    }
    let sab = 0;
    for (let t = 0; t < T; t++) sab += (a[t] - meanA) * (b[t] - meanB);
    const rSquared = (sab / saa) * (sab / sbb);
    const johansenRank = settings.johansen ? pairJohansenRank(a, b, T) : Number.NaN;
    const pmax = settings.lagRule === 'fixed' ? settings.fixedLags : resolveMaxLag(T, 'none', settings.maxLags < 0 ? undefined : settings.maxLags);
    const P = settings.lagRule === 'fixed' ? settings.fixedLags : pmax;
    // The series-level products serve both directions; a pair with gaps has its own rows.
    const moments = both && this.moments && rSquared < EXACT_FIT_R_SQUARED && P + 2 <= T ? this.moments : null;
    if (moments) moments.formPair(universe, i, j, P);
    this.direction(a, b, T, meanA, meanB, sab / sbb, rSquared, settings, out, base, pmax, moments, i, j);
    this.direction(b, a, T, meanB, meanA, sab / saa, rSquared, settings, out, base + RECORD_SIZE, pmax, moments, j, i);
    out[base + FIELD.johansenRank] = johansenRank;
    out[base + RECORD_SIZE + FIELD.johansenRank] = johansenRank;
  }

  /**
   * y on x with slope beta: residual, residual ADF, half-life and latest z-score into the record
   * at r. With `moments` (formed for series yi and xi), the residual's lag products come from the
   * series' where they keep their digits; otherwise from the residual itself.
   */
  private direction(
    y: Float64Array, x: Float64Array, T: number, meanY: number, meanX: number, beta: number, rSquared: number,
    settings: ScreenSettings, out: Float64Array, r: number, pmax: number,
    moments: PairLagMoments | null, yi: number, xi: number,
  ): void {
    out[r + FIELD.beta] = beta;
    out[r + FIELD.intercept] = meanY - beta * meanX;
    out[r + FIELD.rSquared] = rSquared;
    if (rSquared >= EXACT_FIT_R_SQUARED) {
      out[r + FIELD.status] = PAIR_STATUS.exactFit;
      out[r + FIELD.tau] = Number.NEGATIVE_INFINITY;
      out[r + FIELD.pValue] = 0;
      return;
    }
    const u = this.residual;
    const products = moments ? moments.direction(yi, xi, beta, rSquared, u) : null;
    if (!products) for (let t = 0; t < T; t++) u[t] = y[t] - meanY - beta * (x[t] - meanX);
    const adf = products
      ? this.adf.testWithLagProducts(u, T, pmax, settings.lagRule, settings.fixedLags, products)
      : this.adf.test(u, T, pmax, settings.lagRule, settings.fixedLags);
    if (!Number.isFinite(adf.tau)) {
      out[r + FIELD.status] = PAIR_STATUS.singular;
      return;
    }
    out[r + FIELD.status] = PAIR_STATUS.tested;
    out[r + FIELD.tau] = adf.tau;
    out[r + FIELD.lags] = adf.lags;
    out[r + FIELD.pValue] = residualTauPValue(adf.tau, 'const', 2) as number;
    spreadFacts(this.adf.sums, u[0], u[T - 1], T, out, r);
  }
}

/**
 * Half-life (AR(1) with a constant) and the last row's z-score (sample standard deviation)
 * of the spread u[0..T-1], from its plain sums (ResidualAdfWorkspace.sums). The spread is a
 * least-squares residual with a constant, so its mean is zero up to rounding and the
 * one-pass forms below lose no digits:
 *   var = (sum u^2 - T m^2) / (T - 1),
 *   lambda = [sum u_{t-1} Δu_t - (T-1) m_lag m_change] / [sum u_{t-1}^2 - (T-1) m_lag^2],
 * with m_lag = (sum u - u_T) / (T - 1) and m_change = (u_T - u_1) / (T - 1) over t = 2..T.
 */
function spreadFacts(sums: { sum: number; sumSquares: number; levelTimesChange: number }, first: number, last: number, T: number, out: Float64Array, r: number): void {
  const mean = sums.sum / T;
  const sd = Math.sqrt(Math.max(sums.sumSquares - T * mean * mean, 0) / (T - 1));
  out[r + FIELD.zscore] = sd > 0 ? (last - mean) / sd : Number.NaN;
  const n = T - 1;
  const mLag = (sums.sum - last) / n;
  const mChange = (last - first) / n;
  const sLL = sums.sumSquares - last * last - n * mLag * mLag;
  const sLC = sums.levelTimesChange - n * mLag * mChange;
  const lambda = sLC / sLL;
  out[r + FIELD.speed] = lambda;
  if (Number.isFinite(lambda)) out[r + FIELD.halfLife] = halfLifeFromSpeed(lambda).halfLife ?? Number.NaN;
}

/** Johansen trace rank at 5% of the pair (constant case, one lagged change), or NaN when the test refuses it. */
function pairJohansenRank(a: Float64Array, b: Float64Array, T: number): number {
  try {
    return johansenTest([a.subarray(0, T), b.subarray(0, T)], { case: 'constant', lags: 1 }).rank.trace;
  } catch (e) {
    if (e instanceof MooringInputError) return Number.NaN;
    throw e;
  }
}
