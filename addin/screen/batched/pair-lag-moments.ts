/**
 * The batched form of the screen's residual ADF for a pair of complete series. After centring,
 * the residual is linear in the pair, u = y_c - beta x_c, so every cross product its lag search
 * needs over the search's rows t = P .. T-2 is a 2 x 2 combination of series-level ones:
 *   sum Δu[t] Δu[t-k] = D_yy(k) - beta (D_yx(k) + D_xy(k)) + beta^2 D_xx(k),
 *   sum u[t] Δu[t-k]  = L_yy(k) - beta (L_yx(k) + L_xy(k)) + beta^2 L_xx(k),
 * with D_sr(k) = sum Δs[t] Δr[t-k] and L_sr(k) = sum s_c[t] Δr[t-k]. A series' products with
 * itself are formed once per series (kept for the universe); the two cross products D_ij and
 * D_ji of a pair in one register-blocked pass (lag-cross-products.ts), shared by both
 * directions; the levels follow from the changes by shifting rows. Per direction there remain
 * the combination, one Cholesky of the (P + 1) x (P + 1) Gram matrix whose last row gives every
 * nested lag's residual sum of squares, and the refit at the chosen lag
 * (ResidualAdfWorkspace.testWithLagProducts) -- half the multiply-adds of forming the products
 * from each residual, in a faster loop.
 *
 * Conditioning: the combination cancels. Its rounding error, relative to the residual's own
 * products, is about eps times
 *   kappa_D = (sqrt(D_yy(0)) + |beta| sqrt(D_xx(0)))^2 / sum Δu^2     (changes),
 *   kappa_L = sqrt(kappa_D (1 + R) / (1 - R))                        (levels, R = |corr(y, x)|),
 * the second bounded by about sqrt(kappa_D) / sqrt(1 - R^2). Where the larger passes
 * CANCELLATION_LIMIT, the direction is tested from its residual as before (the per-pair path).
 */
import type { LagProducts } from '../residual-adf-workspace';
import type { ScreenUniverse } from '../screen-universe';
import { crossLagProducts, levelLagProducts, shiftLevelProducts } from './lag-cross-products';
import { SLOT, wasmLagArena, type LagArena } from './wasm-lag-kernel';

/** Which inner-product kernel forms the series-level products: WebAssembly SIMD where the host has it, or JavaScript loops. */
export type LagKernel = 'wasm' | 'js';

/**
 * Largest amplification of rounding error the combination may carry. Measured on near-collinear
 * pairs (tests/screen/batched-screen.test.ts), the largest gap in tau from the per-pair path grows
 * about in proportion to the limit: 5e-13 at 1e3, 8e-12 at 3e3, 3e-11 at 1e4. 2e3 keeps it some
 * twenty times inside the 1e-10 asked for; in the benchmark's universe no pair comes near it.
 */
export const CANCELLATION_LIMIT = 2e3;

/** Series-level lag products of the two series of one pair, in buffers reused from pair to pair. */
export class PairLagMoments {
  private universe: ScreenUniverse | null = null;
  private lags = -1;
  /** Per series s, P + 1 values from s * (P + 1): D_ss and L_ss; known[s] = 1 once formed. */
  private selfChanges = new Float64Array(0);
  private selfLevels = new Float64Array(0);
  /** Per series, the sum of its centred level (zero up to rounding). */
  private selfSums = new Float64Array(0);
  private known = new Uint8Array(0);
  private rowSeries = -1;
  private changesI: Float64Array = new Float64Array(0);
  private centredI: Float64Array = new Float64Array(0);
  private changesJ: Float64Array = new Float64Array(0);
  private centredJ: Float64Array = new Float64Array(0);
  /** D_ij, D_ji, L_ij (centred i against changes of j), L_ji of the pair last formed. */
  readonly ij = { changes: new Float64Array(0), levels: new Float64Array(0) };
  readonly ji = { changes: new Float64Array(0), levels: new Float64Array(0) };
  /** The combination of one direction (its row 0 of changes and of levels). */
  private combined: LagProducts = { changes: new Float64Array(0), levels: new Float64Array(0), sum: 0, sumSquares: 0, changeSquares: 0, levelTimesChange: 0 };
  private i = -1;
  private j = -1;
  private arena: LagArena | null = null;
  private readonly kernel: LagKernel;

  /** Directions tested from their residual because the combination would cancel too much. */
  fallbacks = 0;

  /** `kernel`: 'wasm' (default) uses the SIMD kernel where the host runs it and the loops elsewhere; 'js' always the loops. */
  constructor(kernel: LagKernel = 'wasm') {
    this.kernel = kernel;
  }

  /** The kernel in use once a pair has been formed ('wasm' or 'js'). */
  get kernelInUse(): LagKernel {
    return this.arena ? 'wasm' : 'js';
  }

  /** Ready for `universe` (complete series of `rows` rows) with P lags: the buffers and the per-series cache. */
  private prepare(universe: ScreenUniverse, P: number): void {
    if (this.universe === universe && this.lags === P) return;
    const { rows } = universe;
    const N = universe.names.length;
    this.universe = universe;
    this.lags = P;
    this.selfChanges = new Float64Array(N * (P + 1));
    this.selfLevels = new Float64Array(N * (P + 1));
    this.selfSums = new Float64Array(N);
    this.known = new Uint8Array(N);
    this.rowSeries = -1;
    this.arena = this.kernel === 'wasm' ? wasmLagArena(rows, P) : null;
    const slots = this.arena?.slots ?? [0, 1, 2, 3].map(() => new Float64Array(rows));
    [this.changesI, this.centredI, this.changesJ, this.centredJ] = [slots[SLOT.changesI], slots[SLOT.centredI], slots[SLOT.changesJ], slots[SLOT.centredJ]];
    for (const side of [this.ij, this.ji]) {
      side.changes = new Float64Array(P + 1);
      side.levels = new Float64Array(P + 1);
    }
    this.combined = { changes: new Float64Array(P + 1), levels: new Float64Array(P + 1), sum: 0, sumSquares: 0, changeSquares: 0, levelTimesChange: 0 };
  }

  /** Changes and centred level of series s into the given buffers. */
  private static fill(universe: ScreenUniverse, s: number, changes: Float64Array, centred: Float64Array): void {
    const { rows, data } = universe;
    const mean = universe.means[s];
    const at = s * rows;
    for (let t = 0; t < rows - 1; t++) {
      changes[t] = data[at + t + 1] - data[at + t];
      centred[t] = data[at + t] - mean;
    }
    centred[rows - 1] = data[at + rows - 1] - mean;
  }

  /** D_ss and L_ss of series s, in slot `changes` and `centred` (series i's or j's), formed on first use. */
  private self(s: number, changes: number, centred: number): void {
    if (this.known[s] === 1) return;
    const P = this.lags;
    const a = P;
    const b = this.universe!.rows - 2;
    const d = this.selfChanges.subarray(s * (P + 1), (s + 1) * (P + 1));
    const levels = this.selfLevels.subarray(s * (P + 1), (s + 1) * (P + 1));
    const dx = changes === SLOT.changesI ? this.changesI : this.changesJ;
    const level = centred === SLOT.centredI ? this.centredI : this.centredJ;
    if (this.arena) {
      this.arena.crossLagProducts(changes, changes, a, b, P);
      d.set(this.arena.ij);
      levels[0] = this.arena.dot(centred, changes, a, b);
      shiftLevelProducts(level, dx, d, a, b, P, levels);
    } else {
      crossLagProducts(dx, dx, a, b, P, d, this.ij.changes); // D_ss twice over; the second copy is scratch
      levelLagProducts(level, dx, d, a, b, P, levels);
    }
    let sum = 0;
    for (let t = 0; t <= b + 1; t++) sum += level[t];
    this.selfSums[s] = sum;
    this.known[s] = 1;
  }

  /** Forms the products of complete series i and j (i != j) for P lags over rows P .. rows - 2. */
  formPair(universe: ScreenUniverse, i: number, j: number, P: number): void {
    this.prepare(universe, P);
    const a = P;
    const b = universe.rows - 2;
    if (this.rowSeries !== i) {
      PairLagMoments.fill(universe, i, this.changesI, this.centredI);
      this.self(i, SLOT.changesI, SLOT.centredI);
      this.rowSeries = i;
    }
    PairLagMoments.fill(universe, j, this.changesJ, this.centredJ);
    this.self(j, SLOT.changesJ, SLOT.centredJ);
    const { arena } = this;
    if (arena) {
      arena.crossLagProducts(SLOT.changesI, SLOT.changesJ, a, b, P);
      this.ij.changes.set(arena.ij);
      this.ji.changes.set(arena.ji);
      this.ij.levels[0] = arena.dot(SLOT.centredI, SLOT.changesJ, a, b);
      this.ji.levels[0] = arena.dot(SLOT.centredJ, SLOT.changesI, a, b);
      shiftLevelProducts(this.centredI, this.changesJ, this.ij.changes, a, b, P, this.ij.levels);
      shiftLevelProducts(this.centredJ, this.changesI, this.ji.changes, a, b, P, this.ji.levels);
    } else {
      crossLagProducts(this.changesI, this.changesJ, a, b, P, this.ij.changes, this.ji.changes);
      levelLagProducts(this.centredI, this.changesJ, this.ij.changes, a, b, P, this.ij.levels);
      levelLagProducts(this.centredJ, this.changesI, this.ji.changes, a, b, P, this.ji.levels);
    }
    this.i = i;
    this.j = j;
  }

  /**
   * The residual's products for the direction y on x with slope beta (y, x the pair last formed,
   * in either order; rSquared of the pair), and its first and last P + 1 rows written into `u`
   * (the refit needs them); or null when the combination would cancel past CANCELLATION_LIMIT
   * (then test the residual itself). The sum of squares of the levels, whose cancellation is the
   * square of theirs, is taken from the residual directly, row by row as the per-pair path does.
   */
  direction(y: number, x: number, beta: number, rSquared: number, u: Float64Array): LagProducts | null {
    const P = this.lags;
    const forward = y === this.i && x === this.j;
    if (!forward && !(y === this.j && x === this.i)) throw new RangeError(`Pair (${y}, ${x}) was not formed.`);
    const yx = forward ? this.ij : this.ji;
    const xy = forward ? this.ji : this.ij;
    const yy = y * (P + 1);
    const xx = x * (P + 1);
    const { selfChanges: sc, selfLevels: sl } = this;
    const combined = this.combined;
    const { changes, levels } = combined;
    const b2 = beta * beta;
    for (let k = 0; k <= P; k++) {
      changes[k] = sc[yy + k] - beta * (yx.changes[k] + xy.changes[k]) + b2 * sc[xx + k];
      levels[k] = sl[yy + k] - beta * (yx.levels[k] + xy.levels[k]) + b2 * sl[xx + k];
    }
    const size = Math.sqrt(sc[yy]) + Math.abs(beta) * Math.sqrt(sc[xx]);
    const kappaChanges = (size * size) / changes[0];
    const r = Math.sqrt(Math.min(Math.max(rSquared, 0), 1));
    const kappaLevels = Math.sqrt((kappaChanges * (1 + r)) / (1 - r));
    if (!(changes[0] > 0 && kappaChanges <= CANCELLATION_LIMIT && kappaLevels <= CANCELLATION_LIMIT)) {
      this.fallbacks++;
      return null;
    }
    const yc = forward ? this.centredI : this.centredJ;
    const xc = forward ? this.centredJ : this.centredI;
    const T = this.universe!.rows;
    let squares = 0;
    if (this.arena) {
      squares = this.arena.residualSquares(forward ? SLOT.centredI : SLOT.centredJ, forward ? SLOT.centredJ : SLOT.centredI, beta, T);
    } else {
      for (let t = 0; t < T; t++) {
        const v = yc[t] - beta * xc[t];
        squares += v * v;
      }
    }
    for (let t = 0; t <= P; t++) u[t] = yc[t] - beta * xc[t];
    for (let t = Math.max(P + 1, T - 1 - P); t < T; t++) u[t] = yc[t] - beta * xc[t];
    let changeSquares = changes[0];
    let levelTimesChange = levels[0];
    for (let t = 0; t < P; t++) {
      const d = u[t + 1] - u[t];
      changeSquares += d * d;
      levelTimesChange += u[t] * d;
    }
    combined.sum = this.selfSums[y] - beta * this.selfSums[x];
    combined.sumSquares = squares;
    combined.changeSquares = changeSquares;
    combined.levelTimesChange = levelTimesChange;
    return combined;
  }
}
