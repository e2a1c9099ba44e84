/**
 * The cross-product matrix of a Dickey-Fuller design over the common sample of a lag
 * search, built in O(n p) rather than O(n p^2): the lagged-difference columns are shifted
 * copies of one series, so G(i, j) = G(i-1, j-1) plus the row entering at the start minus
 * the row leaving at the end.
 *
 * Design, in order: [lagged level, deterministic terms, Δx lags 1..pmax], response Δx.
 * Rows: the changes dx[t] for t = pmax .. T-2 (dx[t] = x[t+1] - x[t]), the lagged level
 * x[t], lag i = dx[t - i].
 *
 * To keep the cross products well conditioned, the level and the changes are first freed of
 * their mean (constant case) or linear trend (trend case) and scaled to unit size. Each such
 * shift lies in the span of the deterministic columns and each scaling is a change of units,
 * so residual sums of squares change only by one common factor and t-ratios not at all:
 * the lag choice is the same. The chosen model is refitted by QR on the original data.
 */
import { lagPairSums } from './lag-pair-sums';
import { powerOfTwoScale } from '../linalg/power-of-two-scale';
import type { Deterministic } from '../result';

export interface DickeyFullerGram {
  /** Cross products of the design columns, (k x k) row-major, k = 1 + deterministic + pmax. */
  xtx: Float64Array;
  /** Cross products of the design columns with the response. */
  xty: Float64Array;
  /** Sum of squares of the response. */
  yty: number;
  k: number;
  /** Rows of the common sample. */
  n: number;
  /** The response was divided by this; multiply SSRs by its square to return to the data's units. */
  responseScale: number;
  /** The lagged level was divided by this (after its shift); a level coefficient times responseScale / levelScale is in the data's units. */
  levelScale: number;
  /** The lagged level after its shift and scaling (all T values); row t of the design reads level[t]. */
  level: Float64Array;
  /** The changes after their shift and scaling (T - 1 values); the response of row t is dx[t], lag i is dx[t - i]. */
  dx: Float64Array;
  /** First row of the common sample (pmax); rows run a .. a + n - 1. */
  start: number;
}

export function dickeyFullerGram(x: ArrayLike<number>, deterministic: Deterministic, pmax: number): DickeyFullerGram {
  const T = x.length;
  const level = Float64Array.from(x as ArrayLike<number>);
  const dx = new Float64Array(T - 1);
  for (let t = 0; t < T - 1; t++) dx[t] = x[t + 1] - x[t];
  const levelScale = condition(level, deterministic);
  const responseScale = condition(dx, deterministic);

  const a = pmax;
  const b = T - 2;
  const n = b - a + 1;
  const nd = deterministic === 'none' ? 0 : deterministic === 'const' ? 1 : 2;
  const k = 1 + nd + pmax;
  const lagCol = (i: number): number => 1 + nd + (i - 1); // index of lag i >= 1

  // G_D(i, j) = sum_t dx[t-i] dx[t-j], 0 <= i <= j <= pmax, with i = 0 the response.
  const size = pmax + 1;
  const gd = new Float64Array(size * size);
  // With them, the lagged level's sums with the response and each lag: levelSums[j] = sum_t level[t] dx[t - j].
  const levelSums = lagSums(dx, level, a, b, pmax, gd);
  for (let i = 1; i <= pmax; i++) {
    for (let j = i; j <= pmax; j++) {
      gd[i * size + j] = gd[(i - 1) * size + (j - 1)] + dx[a - i] * dx[a - j] - dx[b + 1 - i] * dx[b + 1 - j];
    }
  }

  const xtx = new Float64Array(k * k);
  const xty = new Float64Array(k);
  const set = (r: number, c: number, v: number): void => {
    xtx[r * k + c] = v;
    xtx[c * k + r] = v;
  };
  for (let i = 1; i <= pmax; i++) {
    for (let j = i; j <= pmax; j++) set(lagCol(i), lagCol(j), gd[i * size + j]);
    xty[lagCol(i)] = gd[i];
  }

  // Level with itself, the response and each lag; deterministic terms with everything.
  const trendScale = 1 / n;
  let ll = 0;
  for (let t = a; t <= b; t++) ll += level[t] * level[t];
  set(0, 0, ll);
  xty[0] = levelSums[0];
  for (let j = 1; j <= pmax; j++) set(0, lagCol(j), levelSums[j]);
  if (nd > 0) {
    // constant column (all ones)
    let sl = 0;
    for (let t = a; t <= b; t++) sl += level[t];
    set(0, 1, sl);
    set(1, 1, n);
    const prefix = new Float64Array(T);
    for (let t = 0; t < T - 1; t++) prefix[t + 1] = prefix[t] + dx[t];
    const sumDx = (from: number, to: number): number => prefix[to + 1] - prefix[from];
    xty[1] = sumDx(a, b);
    for (let j = 1; j <= pmax; j++) set(1, lagCol(j), sumDx(a - j, b - j));
  }
  if (nd > 1) {
    // trend column r = (t - a + 1) / n, scaled for conditioning (a change of units)
    let rl = 0;
    let ry = 0;
    let rr = 0;
    let r1 = 0;
    for (let t = a; t <= b; t++) {
      const r = (t - a + 1) * trendScale;
      rl += r * level[t];
      ry += r * dx[t];
      rr += r * r;
      r1 += r;
    }
    set(0, 2, rl);
    set(1, 2, r1);
    set(2, 2, rr);
    xty[2] = ry;
    for (let j = 1; j <= pmax; j++) {
      let s = 0;
      for (let t = a; t <= b; t++) s += (t - a + 1) * trendScale * dx[t - j];
      set(2, lagCol(j), s);
    }
  }
  return { xtx, xty, yty: gd[0], k, n, responseScale, levelScale, level, dx, start: a };
}

/** Removes the mean (const) or least-squares line (trend), scales to unit root-mean-square, returns the scale. */
function condition(v: Float64Array, deterministic: Deterministic): number {
  const n = v.length;
  if (deterministic === 'const') {
    let m = 0;
    for (let i = 0; i < n; i++) m += v[i];
    m /= n;
    for (let i = 0; i < n; i++) v[i] -= m;
  } else if (deterministic === 'trend') {
    const tMean = (n - 1) / 2;
    let m = 0;
    let st = 0;
    let stt = 0;
    for (let i = 0; i < n; i++) m += v[i];
    m /= n;
    for (let i = 0; i < n; i++) {
      st += (i - tMean) * (v[i] - m);
      stt += (i - tMean) * (i - tMean);
    }
    const slope = stt > 0 ? st / stt : 0;
    for (let i = 0; i < n; i++) v[i] -= m + slope * (i - tMean);
  }
  // The root mean square of v * f, f a power of two that brings v near one (exact): the squares
  // of v itself overflow for values past about 1e154 and vanish below about 1e-154.
  const f = powerOfTwoScale(v);
  let ss = 0;
  for (let i = 0; i < n; i++) ss += v[i] * f * (v[i] * f);
  const scaledRms = Math.sqrt(ss / n);
  if (!(scaledRms > 0)) return 1;
  for (let i = 0; i < n; i++) v[i] = (v[i] * f) / scaledRms;
  return scaledRms / f;
}

/** For j = 0..pmax: out[j] = sum_t dx[t] dx[t - j] and (returned) sum_t level[t] dx[t - j], over t = a..b (lag-pair-sums.ts). */
function lagSums(dx: Float64Array, level: Float64Array, a: number, b: number, pmax: number, out: Float64Array): Float64Array {
  return lagPairSums(dx, level, 0, dx, a, b, pmax + 1, out, 0);
}
