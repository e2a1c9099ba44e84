/**
 * Residual cross products E'E of the nested VARs p = 0..M (the first 1 + Kp columns of the
 * largest design) from its Gram matrix, with one Cholesky factorisation: with X'X = L L' and
 * Z = L^{-1} X'Y (one column per equation, forward substitution),
 *   (E'E)_ab after the first m columns = y_a'y_b - sum_{j < m} Z_ja Z_jb
 * (the multi-equation form of nested-cholesky.ts; Golub & Van Loan 2013, section 5.3.2 on the
 * normal equations).
 *
 * Accuracy: forming X'X squares the condition of the design, and the subtraction cancels when
 * the fit is close. So the answer is given only when it is safe, and null is returned otherwise
 * (the caller then uses the QR path):
 * - every Cholesky pivot keeps at least PIVOT_FLOOR of its column's own sum of squares, and
 * - the first-order error of ln|E'E|, bounded by u K sum_a (y_a'y_a) (E'E)^{-1}_aa for an
 *   error of u sqrt(y_a'y_a y_b'y_b) in each (E'E)_ab (u = k times the unit roundoff, k the
 *   number of columns), stays below LOG_DET_ERROR_CEILING.
 */
import type { VarLagGram } from './var-lag-gram';

/** Smallest share of a column's sum of squares its Cholesky pivot may keep. */
const PIVOT_FLOOR = 1e-8;
/**
 * Largest first-order error estimate allowed in ln|E'E| before the QR path is preferred. On
 * random walks, cointegrated and near-collinear sets, trending and twice-integrated series
 * (K = 2..4, T = 60..2,500), the Gram path's ln|E'E| differed from the QR path's by 5% to 50%
 * of this estimate; random walks of 2,500 rows estimate near 1e-11 (K = 2) to 1e-10 (K = 4).
 */
const LOG_DET_ERROR_CEILING = 5e-10;
/** Relative error assumed per Gram-derived cross product, per column of the design. */
const UNIT_ERROR = 2 ** -52;

/** E'E (K x K, row-major, conditioned units) of every order p = 0..M, or null where the Gram path is not safe. */
export function nestedVarResiduals(gram: VarLagGram, variables: number, maxLags: number): Float64Array[] | null {
  const { xtx, xty, yty, k } = gram;
  const K = variables;
  const L = new Float64Array(k * k);
  const z = new Float64Array(k * K);
  const explained = new Float64Array(K * K);
  const out: Float64Array[] = [];
  const unit = UNIT_ERROR * k;
  let next = 0; // columns taken so far
  for (let p = 0; p <= maxLags; p++) {
    const upto = 1 + K * p;
    for (let j = next; j < upto; j++) {
      let dd = xtx[j * k + j];
      for (let m = 0; m < j; m++) dd -= L[j * k + m] * L[j * k + m];
      if (!(dd > PIVOT_FLOOR * xtx[j * k + j])) return null;
      const ljj = Math.sqrt(dd);
      L[j * k + j] = ljj;
      for (let i = j + 1; i < k; i++) {
        let s = xtx[i * k + j];
        for (let m = 0; m < j; m++) s -= L[i * k + m] * L[j * k + m];
        L[i * k + j] = s / ljj;
      }
      for (let a = 0; a < K; a++) {
        let s = xty[j * K + a];
        for (let m = 0; m < j; m++) s -= L[j * k + m] * z[m * K + a];
        z[j * K + a] = s / ljj;
      }
      for (let a = 0; a < K; a++) {
        for (let b = a; b < K; b++) explained[a * K + b] += z[j * K + a] * z[j * K + b];
      }
    }
    next = upto;
    const e = new Float64Array(K * K);
    for (let a = 0; a < K; a++) {
      for (let b = a; b < K; b++) e[a * K + b] = e[b * K + a] = yty[a * K + b] - explained[a * K + b];
    }
    const amplification = logDetAmplification(e, yty, K);
    if (!(unit * amplification <= LOG_DET_ERROR_CEILING)) return null;
    out.push(e);
  }
  return out;
}

/**
 * K sum_a (y_a'y_a) (E'E)^{-1}_aa, the factor by which an error of u sqrt(y_a'y_a y_b'y_b) in
 * each entry can move ln|E'E| (first order); Infinity when E'E is not positive definite.
 * With E'E = R'R and W = R^{-1}, (E'E)^{-1} = W W', so (E'E)^{-1}_aa is the squared norm of row a of W.
 */
function logDetAmplification(e: Float64Array, yty: Float64Array, K: number): number {
  const r = new Float64Array(K * K); // upper triangular, row-major
  for (let i = 0; i < K; i++) {
    let dd = e[i * K + i];
    for (let m = 0; m < i; m++) dd -= r[m * K + i] * r[m * K + i];
    if (!(dd > 0)) return Number.POSITIVE_INFINITY;
    const rii = Math.sqrt(dd);
    r[i * K + i] = rii;
    for (let j = i + 1; j < K; j++) {
      let s = e[i * K + j];
      for (let m = 0; m < i; m++) s -= r[m * K + i] * r[m * K + j];
      r[i * K + j] = s / rii;
    }
  }
  // W = R^{-1}, upper triangular, by back-substitution column by column.
  const w = new Float64Array(K * K);
  for (let j = 0; j < K; j++) {
    w[j * K + j] = 1 / r[j * K + j];
    for (let i = j - 1; i >= 0; i--) {
      let s = 0;
      for (let m = i + 1; m <= j; m++) s += r[i * K + m] * w[m * K + j];
      w[i * K + j] = -s / r[i * K + i];
    }
  }
  let total = 0;
  for (let a = 0; a < K; a++) {
    let inv = 0;
    for (let j = a; j < K; j++) inv += w[a * K + j] * w[a * K + j];
    total += yty[a * K + a] * inv;
  }
  return K * total;
}
