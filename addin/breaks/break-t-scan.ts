/**
 * The t-ratio of one coefficient at every candidate break date, in O(n k) work overall
 * instead of one full regression per date.
 *
 * The regression at candidate c is  y = a z + F g + D_c d + e,  where z is the column whose
 * t-ratio is wanted, F the columns that do not move with the date (fitted once), and D_c one
 * or two break columns that start at row c:
 *   step_c(r) = 1 for r >= c, else 0;   ramp_c(r) = (r - c + 1)/n for r >= c, else 0.
 * By the Frisch-Waugh-Lovell theorem (Davidson & MacKinnon 2004, sec. 2.4) the coefficient a,
 * the residual sum of squares and the a-a element of (X'X)^{-1} equal those of the regression of
 * M y on [M z, M D_c] with M = I - F(F'F)^{-1}F'. The products that regression needs are
 *   (Mz)'(MD) = z~'D,  (My)'(MD) = y~'D,  (MD_i)'(MD_j) = D_i'D_j - w_i'w_j,  w = R^{-T} F'D,
 * with F = QR, y~ = My, z~ = Mz, and every F'D, z~'D, y~'D a running sum over rows r >= c
 * (times (r + 1)/n for a ramp) gathered as c walks back from the end. Each date then costs a
 * triangular solve in F's size and a 2x2 or 3x3 Cholesky solve.
 *
 * Used only to find the date; the test refits the chosen date's regression by QR to report
 * its statistic, as the lag search does for the chosen lag.
 */
import { MooringInputError } from '../errors';
import { HouseholderQr, assertFullRank } from '../linalg/householder-qr';
import { leastSquares } from '../regression/least-squares';

/** A break column: a shift in level from row c on ('step') or a shift in slope from row c on ('ramp'). */
export type BreakColumnKind = 'step' | 'ramp';

/** The break column of the given kind starting at row c, over n rows (the ramp divided by n, as in the scan). */
export function breakColumn(kind: BreakColumnKind, c: number, n: number): Float64Array {
  const out = new Float64Array(n);
  for (let r = Math.max(c, 0); r < n; r++) out[r] = kind === 'step' ? 1 : (r - c + 1) / n;
  return out;
}

export interface BreakTScan {
  /** First candidate row (the first row the break columns touch). */
  firstRow: number;
  /** tValues[i]: t-ratio of z when the break starts at row firstRow + i; +Infinity where that fit is degenerate. */
  tValues: Float64Array;
  /** Start row with the smallest t-ratio (the first such row on ties). */
  bestRow: number;
  bestT: number;
}

/** Sum of j from 1 to m, and of j squared, in closed form (exact in doubles for any sample size here). */
function sumTo(m: number): number {
  return (m * (m + 1)) / 2;
}
function sumSquaresTo(m: number): number {
  return (m * (m + 1) * (2 * m + 1)) / 6;
}

/**
 * Scans break start rows firstRow..lastRow (0 < firstRow <= lastRow < n) and returns the
 * t-ratio of `target` at each, with the break columns `kinds` added to `fixed`.
 */
export function scanBreakTValues(
  y: ArrayLike<number>,
  target: ArrayLike<number>,
  fixed: readonly ArrayLike<number>[],
  kinds: readonly BreakColumnKind[],
  firstRow: number,
  lastRow: number,
  fixedNames?: readonly string[],
): BreakTScan {
  const n = y.length;
  const kF = fixed.length;
  const q = 1 + kinds.length;
  const dof = n - kF - q;
  if (dof < 1) throw new MooringInputError(`Too few observations (${n}) for ${kF + q} regressors: add rows or use fewer lags.`);
  if (!(firstRow >= 1 && lastRow >= firstRow && lastRow <= n - 1)) {
    throw new MooringInputError('Internal: candidate break rows fall outside the regression sample.');
  }
  const qr = new HouseholderQr(fixed, n);
  assertFullRank(qr, fixedNames);
  const R = new Float64Array(kF * kF); // R[i * kF + j] = R(i, j), i <= j
  for (let i = 0; i < kF; i++) for (let j = i; j < kF; j++) R[i * kF + j] = qr.r(i, j);
  const yt = leastSquares(y, fixed, { withoutCovariance: true }).residuals;
  const zt = leastSquares(target, fixed, { withoutCovariance: true }).residuals;
  let yy = 0;
  let zz = 0;
  let zy = 0;
  for (let r = 0; r < n; r++) {
    yy += yt[r] * yt[r];
    zz += zt[r] * zt[r];
    zy += zt[r] * yt[r];
  }

  // Running sums over rows r >= c: plain (f0, y0, z0) and weighted by (r + 1)/n (f1, y1, z1).
  const f0 = new Float64Array(kF);
  const f1 = new Float64Array(kF);
  let y0 = 0;
  let y1 = 0;
  let z0 = 0;
  let z1 = 0;
  const v = kinds.map(() => new Float64Array(kF)); // F'D for each break column
  const w = kinds.map(() => new Float64Array(kF)); // R^{-T} F'D
  const G = new Float64Array(q * q);
  const g = new Float64Array(q);
  const scratch = { L: new Float64Array(q * q), u: new Float64Array(q), x: new Float64Array(q), e: new Float64Array(q) };
  const count = lastRow - firstRow + 1;
  const tValues = new Float64Array(count).fill(Number.POSITIVE_INFINITY);

  for (let c = n - 1; c >= firstRow; c--) {
    const weight = (c + 1) / n;
    for (let j = 0; j < kF; j++) {
      const value = fixed[j][c];
      f0[j] += value;
      f1[j] += value * weight;
    }
    y0 += yt[c];
    y1 += yt[c] * weight;
    z0 += zt[c];
    z1 += zt[c] * weight;
    if (c > lastRow) continue;

    const shift = c / n; // ramp_c = (r + 1)/n - c/n on rows r >= c
    const m = n - c;
    for (let d = 0; d < kinds.length; d++) {
      const step = kinds[d] === 'step';
      const vd = v[d];
      for (let j = 0; j < kF; j++) vd[j] = step ? f0[j] : f1[j] - shift * f0[j];
      forwardSolveTransposed(R, kF, vd, w[d]);
      G[d + 1] = G[(d + 1) * q] = step ? z0 : z1 - shift * z0;
      g[d + 1] = step ? y0 : y1 - shift * y0;
    }
    G[0] = zz;
    g[0] = zy;
    for (let a = 0; a < kinds.length; a++) {
      for (let b = a; b < kinds.length; b++) {
        const ka = kinds[a];
        const kb = kinds[b];
        let dd: number;
        if (ka === 'step' && kb === 'step') dd = m;
        else if (ka === 'ramp' && kb === 'ramp') dd = sumSquaresTo(m) / (n * n);
        else dd = sumTo(m) / n;
        let ww = 0;
        for (let j = 0; j < kF; j++) ww += w[a][j] * w[b][j];
        G[(a + 1) * q + (b + 1)] = G[(b + 1) * q + (a + 1)] = dd - ww;
      }
    }
    tValues[c - firstRow] = tRatioOfFirst(G, g, yy, q, dof, scratch);
  }

  let best = 0;
  for (let i = 1; i < count; i++) if (tValues[i] < tValues[best]) best = i;
  if (!Number.isFinite(tValues[best])) {
    throw new MooringInputError('No candidate break date gives a usable regression: the series may be constant or an exact step or line.');
  }
  return { firstRow, tValues, bestRow: firstRow + best, bestT: tValues[best] };
}

/** Solves R' w = v for w (R upper triangular, row-major k x k). */
function forwardSolveTransposed(R: Float64Array, k: number, vIn: Float64Array, out: Float64Array): void {
  for (let i = 0; i < k; i++) {
    let s = vIn[i];
    for (let j = 0; j < i; j++) s -= R[j * k + i] * out[j];
    out[i] = s / R[i * k + i];
  }
}

/**
 * t-ratio of the first coefficient of the q-column regression with cross products G and
 * right-hand side g: b = G^{-1} g, SSR = y'y - g'b, t = b_0 / sqrt(SSR/dof (G^{-1})_00).
 * +Infinity when G is singular to working precision or the fit is exact.
 */
function tRatioOfFirst(
  G: Float64Array,
  g: Float64Array,
  yy: number,
  q: number,
  dof: number,
  scratch: { L: Float64Array; u: Float64Array; x: Float64Array; e: Float64Array },
): number {
  const { L, u, x, e } = scratch;
  // Cholesky G = L L' on the matrix scaled to unit diagonal, so the pivot test is relative.
  for (let i = 0; i < q; i++) if (!(G[i * q + i] > 0)) return Number.POSITIVE_INFINITY;
  for (let j = 0; j < q; j++) {
    const sj = Math.sqrt(G[j * q + j]);
    let d = 1;
    for (let m = 0; m < j; m++) d -= L[j * q + m] * L[j * q + m];
    if (!(d > 1e-12)) return Number.POSITIVE_INFINITY;
    const ljj = Math.sqrt(d);
    L[j * q + j] = ljj;
    for (let i = j + 1; i < q; i++) {
      let s = G[i * q + j] / (Math.sqrt(G[i * q + i]) * sj);
      for (let m = 0; m < j; m++) s -= L[i * q + m] * L[j * q + m];
      L[i * q + j] = s / ljj;
    }
  }
  // Scaled system: (S G S)(S^{-1} b) = S g with S = diag(1/sqrt(G_ii)).
  for (let i = 0; i < q; i++) {
    let s = g[i] / Math.sqrt(G[i * q + i]);
    for (let m = 0; m < i; m++) s -= L[i * q + m] * u[m];
    u[i] = s / L[i * q + i];
  }
  let explained = 0;
  for (let i = 0; i < q; i++) explained += u[i] * u[i];
  const ssr = yy - explained;
  if (!(ssr > 1e-13 * yy)) return Number.POSITIVE_INFINITY;
  // Scaled b = L'^{-1} u; scaled (G^{-1})_00 = ||L^{-1} e_0||^2.
  for (let i = q - 1; i >= 0; i--) {
    let s = u[i];
    for (let m = i + 1; m < q; m++) s -= L[m * q + i] * x[m];
    x[i] = s / L[i * q + i];
  }
  let inv00 = 0;
  for (let i = 0; i < q; i++) {
    let s = i === 0 ? 1 : 0;
    for (let m = 0; m < i; m++) s -= L[i * q + m] * e[m];
    e[i] = s / L[i * q + i];
    inv00 += e[i] * e[i];
  }
  const s0 = Math.sqrt(G[0]);
  const b0 = x[0] / s0;
  const varB0 = (ssr / dof) * (inv00 / (s0 * s0));
  return b0 / Math.sqrt(varB0);
}
