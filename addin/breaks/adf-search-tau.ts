/**
 * The ADF t-ratio without deterministic terms at a given lag, from the cross products of
 * its design (addin/regression/lagged-difference-gram.ts, built in O(n p)), for searching
 * many residual series quickly. The regression and its sample are those of adfRegression
 * (T - 1 - p rows); the columns are put in the order [lags 1..p, level] so that one Cholesky
 * factorisation G = L L' gives the level's t-ratio as z_k / sqrt(SSR / (n - k)) with
 * z = L^{-1} X'y and SSR = y'y - z'z (the last column's t in a nested fit).
 *
 * Used only to compare dates; the chosen date's ADF is refitted by QR for reporting.
 */
import { dickeyFullerGram } from '../regression/lagged-difference-gram';

/** ADF tau (no constant, no trend) of x with `lags` lagged changes; NaN when the design is singular. */
export function adfSearchTau(x: ArrayLike<number>, lags: number): number {
  const gram = dickeyFullerGram(x, 'none', lags);
  const k = gram.k; // 1 + lags: [level, lag 1..p] in the gram
  const n = gram.n;
  const order = [...Array.from({ length: lags }, (_, i) => i + 1), 0];
  const G = (i: number, j: number): number => gram.xtx[order[i] * k + order[j]];
  const L = new Float64Array(k * k);
  const z = new Float64Array(k);
  let explained = 0;
  for (let j = 0; j < k; j++) {
    const scaleJ = Math.sqrt(G(j, j));
    if (!(scaleJ > 0)) return Number.NaN;
    let d = 1;
    for (let m = 0; m < j; m++) d -= L[j * k + m] * L[j * k + m];
    if (!(d > 1e-12)) return Number.NaN;
    const ljj = Math.sqrt(d);
    L[j * k + j] = ljj;
    for (let i = j + 1; i < k; i++) {
      let s = G(i, j) / (Math.sqrt(G(i, i)) * scaleJ);
      for (let m = 0; m < j; m++) s -= L[i * k + m] * L[j * k + m];
      L[i * k + j] = s / ljj;
    }
    let s = gram.xty[order[j]] / scaleJ;
    for (let m = 0; m < j; m++) s -= L[j * k + m] * z[m];
    z[j] = s / ljj;
    explained += z[j] * z[j];
  }
  const ssr = gram.yty - explained;
  const dof = n - k;
  if (!(ssr > 0) || dof < 1) return Number.NaN;
  return z[k - 1] / Math.sqrt(ssr / dof);
}
