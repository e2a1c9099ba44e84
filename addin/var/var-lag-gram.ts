/**
 * The cross-product matrix of the largest design of a VAR lag search, built in O(n K^2 M)
 * rather than O(n K^2 M^2): every lag column is a shifted copy of one series, so
 *   C_ab(i, j) = sum_t y_a[t - i] y_b[t - j]   over the common sample t = M .. T-1 (0-based)
 * obeys C_ab(i, j) = C_ab(i-1, j-1) + y_a[M - i] y_b[M - j] - y_a[T - i] y_b[T - j]
 * (the row entering at the start minus the row leaving at the end), and only the sums with
 * i = 0 or j = 0 need a pass over the data. The constant column's sums follow the same way:
 * S_a(i) = S_a(i-1) + y_a[M - i] - y_a[T - i].
 *
 * Design, in varDesign's order: [1, lag 1 of every series, lag 2 of every series, ..., lag M];
 * responses y_a[t], a = 0..K-1.
 *
 * Conditioning: each series is first freed of its mean and scaled to unit root-mean-square.
 * The shift lies in the span of the constant column and the scaling is a change of units, so
 * the residuals of equation a are those of the data divided by scale_a, and
 * ln|E'E| of the data = ln|E'E here| + 2 sum_a ln(scale_a) (returned as logScale).
 * The same idea, for one series, is lagged-difference-gram.ts.
 */

/** Cross products of the conditioned VAR(M) design on the common sample of the lag search. */
export interface VarLagGram {
  /** X'X, (k x k) row-major, k = 1 + K M. */
  xtx: Float64Array;
  /** X'y_a for each response a: (k x K) row-major, element (j, a) at j K + a. */
  xty: Float64Array;
  /** y_a'y_b, (K x K) row-major. */
  yty: Float64Array;
  /** Columns of the design. */
  k: number;
  /** Rows of the common sample, T - M. */
  n: number;
  /** 2 sum_a ln(scale_a): add to ln|E'E| of the conditioned data to return to the data's units. */
  logScale: number;
}

/** The Gram matrix of [1, y_{t-1}, ..., y_{t-M}] and the responses y_t on rows t = M .. T-1. */
export function varLagGram(block: readonly Float64Array[], maxLags: number): VarLagGram {
  const K = block.length;
  const T = block[0].length;
  const M = maxLags;
  const n = T - M;
  const y: Float64Array[] = [];
  let logScale = 0;
  for (const series of block) {
    const c = Float64Array.from(series);
    logScale += 2 * Math.log(condition(c));
    y.push(c);
  }

  // D_ab(j) = sum_t y_a[t] y_b[t - j], j = 0..M: the only sums over the data.
  const size = M + 1;
  const d = new Float64Array(K * K * size);
  for (let a = 0; a < K; a++) {
    const ya = y[a];
    for (let b = 0; b < K; b++) {
      const yb = y[b];
      const base = (a * K + b) * size;
      for (let j = 0; j <= M; j++) {
        let s = 0;
        for (let t = M; t < T; t++) s += ya[t] * yb[t - j];
        d[base + j] = s;
      }
    }
  }
  const D = (a: number, b: number, j: number): number => d[(a * K + b) * size + j];

  // C_ab(i, j) for i, j = 0..M, from the edges i = 0 (D_ab(j)) and j = 0 (D_ba(i)) down each diagonal.
  const c = new Float64Array(K * K * size * size);
  for (let a = 0; a < K; a++) {
    const ya = y[a];
    for (let b = 0; b < K; b++) {
      const yb = y[b];
      const base = (a * K + b) * size * size;
      for (let j = 0; j <= M; j++) c[base + j] = D(a, b, j);
      for (let i = 1; i <= M; i++) c[base + i * size] = D(b, a, i);
      for (let i = 1; i <= M; i++) {
        for (let j = 1; j <= M; j++) {
          c[base + i * size + j] = c[base + (i - 1) * size + (j - 1)] + ya[M - i] * yb[M - j] - ya[T - i] * yb[T - j];
        }
      }
    }
  }

  const k = 1 + K * M;
  const column = (lag: number, a: number): number => 1 + (lag - 1) * K + a;
  const xtx = new Float64Array(k * k);
  const xty = new Float64Array(k * K);
  const yty = new Float64Array(K * K);
  xtx[0] = n;
  for (let a = 0; a < K; a++) {
    const ya = y[a];
    // S_a(i) = sum_t y_a[t - i]
    let s = 0;
    for (let t = M; t < T; t++) s += ya[t];
    xty[a] = s;
    for (let i = 1; i <= M; i++) {
      s += ya[M - i] - ya[T - i];
      const col = column(i, a);
      xtx[col] = s;
      xtx[col * k] = s;
    }
    for (let b = 0; b < K; b++) {
      yty[a * K + b] = D(a, b, 0);
      for (let j = 1; j <= M; j++) xty[column(j, b) * K + a] = D(a, b, j);
      const base = (a * K + b) * size * size;
      for (let i = 1; i <= M; i++) {
        const row = column(i, a) * k;
        for (let j = 1; j <= M; j++) xtx[row + column(j, b)] = c[base + i * size + j];
      }
    }
  }
  return { xtx, xty, yty, k, n, logScale };
}

/** Removes the mean and scales to unit root-mean-square in place; returns the scale (1 for a constant series). */
function condition(v: Float64Array): number {
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
