/**
 * The VAR lag search's cross products in the changes form. A VAR(p) in levels with a constant,
 *   y_t = c + A_1 y_{t-1} + ... + A_p y_{t-p} + e_t,
 * has the same residuals as the regression of the change Δy_t on
 *   [1, y_{t-1}, Δy_{t-1}, ..., Δy_{t-p+1}]
 * (the columns span the same space, and Δy_t differs from y_t by y_{t-1}, a column of the design;
 * Hamilton 1994, sec. 17.7, the same rewriting the ADF regression uses). The orders stay nested:
 * order p takes the first 1 + K p columns. For prices (random walks) the levels form is nearly
 * collinear (y_{t-1} and y_{t-2} differ by one step) and its fit nearly exact, so its normal
 * equations lose the digits the lag criteria need, and at long histories the search fell back to
 * a Householder QR of the whole design; in the changes form the columns are nearly orthogonal
 * and the response is the part left to explain, so one Cholesky of the cross products serves.
 *
 * Sums: every change column is a shifted copy of one series, so the cross products of two of them
 * follow C(i, j) = C(i-1, j-1) + (row entering) - (row leaving), as in var-lag-gram.ts; only sums
 * with the response, with the lagged level, and at lag difference 0 pass over the data: O(n K^2 M).
 *
 * Conditioning: each level is freed of its mean and scaled to unit root-mean-square (scale_a, as
 * in var-lag-gram.ts), and each change freed of its mean (a shift in the span of the constant), so
 * the residuals of equation a are those of the data divided by scale_a. Order 0 (the constant
 * alone) has a different response; its cross products, the centred levels', are returned apart.
 */
import { lagPairSums } from '../regression/lag-pair-sums';

/** Cross products of [1, y_{t-1}, Δy_{t-1}, ..., Δy_{t-M+1}] and the responses Δy_t on rows t = M .. T-1. */
export interface VarChangeGram {
  /** X'X, (k x k) row-major, k = 1 + K M. */
  xtx: Float64Array;
  /** X'Δy_a for each response a: (k x K) row-major, element (j, a) at j K + a. */
  xty: Float64Array;
  /** Δy_a'Δy_b, (K x K) row-major. */
  yty: Float64Array;
  /** E'E of order 0: the levels' cross products about their means on the common sample. */
  orderZero: Float64Array;
  k: number;
  /** Rows of the common sample, T - M. */
  n: number;
  /** 2 sum_a ln(scale_a): add to ln|E'E| of the conditioned data to return to the data's units. */
  logScale: number;
}

export function varChangeGram(block: readonly Float64Array[], maxLags: number): VarChangeGram {
  const K = block.length;
  const T = block[0].length;
  const M = maxLags;
  const n = T - M;
  const y: Float64Array[] = [];
  const d: Float64Array[] = [];
  let logScale = 0;
  for (const series of block) {
    const c = Float64Array.from(series);
    logScale += 2 * Math.log(conditionLevel(c));
    y.push(c);
    d.push(centredChanges(c));
  }

  // Order 0: centred levels on rows M..T-1 (two passes).
  const orderZero = new Float64Array(K * K);
  const means = y.map((v) => {
    let s = 0;
    for (let t = M; t < T; t++) s += v[t];
    return s / n;
  });
  for (let a = 0; a < K; a++) {
    for (let b = a; b < K; b++) {
      let s = 0;
      const ya = y[a];
      const yb = y[b];
      const ma = means[a];
      const mb = means[b];
      for (let t = M; t < T; t++) s += (ya[t] - ma) * (yb[t] - mb);
      orderZero[a * K + b] = orderZero[b * K + a] = s;
    }
  }

  const k = 1 + K * M;
  const levelColumn = (a: number): number => 1 + a;
  const changeColumn = (lag: number, a: number): number => 1 + lag * K + a; // lag = 1..M-1
  const xtx = new Float64Array(k * k);
  const xty = new Float64Array(k * K);
  const yty = new Float64Array(K * K);
  const set = (r: number, c: number, v: number): void => {
    xtx[r * k + c] = v;
    xtx[c * k + r] = v;
  };
  xtx[0] = n;

  // Sums with the constant: the lagged level, the response and each change lag.
  for (let a = 0; a < K; a++) {
    const ya = y[a];
    const da = d[a];
    let sl = 0;
    for (let t = M; t < T; t++) sl += ya[t - 1];
    set(0, levelColumn(a), sl);
    let s = 0;
    for (let t = M; t < T; t++) s += da[t];
    xty[a] = s;
    for (let i = 1; i < M; i++) {
      s += da[M - i] - da[T - i];
      set(0, changeColumn(i, a), s);
    }
  }

  // D_ab(j) = sum_t d_a[t] d_b[t - j], j = 0..M-1; the lagged level with the response and each change lag.
  const size = M; // change lags 0..M-1
  const dd = new Float64Array(K * K * size);
  for (let a = 0; a < K; a++) {
    const da = d[a];
    const ya = y[a];
    for (let b = 0; b < K; b++) {
      const db = d[b];
      const yb = y[b];
      // Each D_ab(j) and each sum of y_a[t-1] d_b[t-j] (j = 0: with the response) runs over the rows
      // in order as a sum of its own; four lags share one pass (the same doubles, fewer passes).
      const ly = lagSums(da, ya, db, M, T, dd, (a * K + b) * size);
      if (b >= a) {
        let s = 0;
        for (let t = M; t < T; t++) s += ya[t - 1] * yb[t - 1];
        set(levelColumn(a), levelColumn(b), s);
      }
      xty[levelColumn(a) * K + b] = ly[0];
      for (let j = 1; j < M; j++) set(levelColumn(a), changeColumn(j, b), ly[j]);
    }
  }
  const D = (a: number, b: number, j: number): number => dd[(a * K + b) * size + j];

  // Change lags with each other (C(i, j) down each diagonal from its edge) and with the response.
  const c = new Float64Array(size * size);
  for (let a = 0; a < K; a++) {
    const da = d[a];
    for (let b = 0; b < K; b++) {
      const db = d[b];
      yty[a * K + b] = D(a, b, 0);
      for (let j = 1; j < M; j++) xty[changeColumn(j, b) * K + a] = D(a, b, j);
      for (let j = 0; j < M; j++) c[j] = D(a, b, j);
      for (let i = 1; i < M; i++) c[i * size] = D(b, a, i);
      for (let i = 1; i < M; i++) {
        for (let j = 1; j < M; j++) c[i * size + j] = c[(i - 1) * size + (j - 1)] + da[M - i] * db[M - j] - da[T - i] * db[T - j];
      }
      for (let i = 1; i < M; i++) {
        const row = changeColumn(i, a) * k;
        for (let j = 1; j < M; j++) xtx[row + changeColumn(j, b)] = c[i * size + j];
      }
    }
  }
  return { xtx, xty, yty, orderZero, k, n, logScale };
}

/** Removes the mean and scales to unit root-mean-square in place; returns the scale (1 for a constant series). */
function conditionLevel(v: Float64Array): number {
  const n = v.length;
  let m = 0;
  for (let i = 0; i < n; i++) m += v[i];
  m /= n;
  let ss = 0;
  for (let i = 0; i < n; i++) {
    v[i] -= m;
    ss += v[i] * v[i];
  }
  const rms = Math.sqrt(ss / n);
  if (!(rms > 0)) return 1;
  for (let i = 0; i < n; i++) v[i] /= rms;
  return rms;
}

/** d[t] = v[t] - v[t-1] for t >= 1, less the mean of those changes; d[0] = 0 (never used). */
function centredChanges(v: Float64Array): Float64Array {
  const T = v.length;
  const d = new Float64Array(T);
  let m = 0;
  for (let t = 1; t < T; t++) {
    d[t] = v[t] - v[t - 1];
    m += d[t];
  }
  m /= Math.max(T - 1, 1);
  for (let t = 1; t < T; t++) d[t] -= m;
  return d;
}

/** For j = 0..M-1: out[at + j] = sum_t da[t] db[t-j], and (returned) sum_t ya[t-1] db[t-j], over t = M..T-1 (lag-pair-sums.ts). */
function lagSums(da: Float64Array, ya: Float64Array, db: Float64Array, M: number, T: number, out: Float64Array, at: number): Float64Array {
  return lagPairSums(da, ya, -1, db, M, T - 1, M, out, at);
}
