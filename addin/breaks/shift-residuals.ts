/**
 * Residuals of a regression with a shift that starts at observation s, for any s, without
 * refitting the columns that do not move with s.
 *
 * The regression is  y = F g + D_s b + e  with F fixed (T x k) and the shift block
 *   D_s = [phi_s, x_1 phi_s, ..., x_q phi_s],  phi_s(t) = 1 for t >= s, else 0,
 * where x_1..x_q are the series whose slopes may shift (none for a pure level shift).
 * By the Frisch-Waugh-Lovell theorem (Davidson & MacKinnon 2004, sec. 2.4)
 *   e = y~ - (D - F C) b,  C = (F'F)^{-1} F'D,  b = (D~'D~)^{-1} D'y~,  D~'D~ = D'D - (F'D)'C,
 * with y~ the residual of y on F (fitted once by QR). Every product with D_s is a sum over
 * t >= s, read from suffix sums built once, so each s costs O(T (k + q)) for the residual
 * itself and O(k^2 q) for the rest. Used to search the dates; the chosen date is refitted by QR.
 */
import { HouseholderQr, assertFullRank } from '../linalg/householder-qr';
import { leastSquares } from '../regression/least-squares';

export class ShiftResiduals {
  readonly T: number;
  private readonly fixed: readonly ArrayLike<number>[];
  /** g_0 = 1, g_d = the d-th series whose slope may shift. */
  private readonly factors: Float64Array[];
  private readonly yTilde: Float64Array;
  private readonly yTildeSquares: number;
  private readonly R: Float64Array;
  /** suffixFD[d][i][s] = sum over t >= s of F_i(t) g_d(t). */
  private readonly suffixFD: Float64Array[][];
  /** suffixDD[a][b][s] = sum over t >= s of g_a(t) g_b(t), a <= b. */
  private readonly suffixDD: Float64Array[][];
  /** suffixDY[d][s] = sum over t >= s of g_d(t) y~(t). */
  private readonly suffixDY: Float64Array[];
  private readonly k: number;
  private readonly q: number;
  // Scratch, reused at every date.
  private readonly v: Float64Array[];
  private readonly c: Float64Array[];
  private readonly A: Float64Array;
  private readonly L: Float64Array;
  private readonly b: Float64Array;
  private readonly g: Float64Array;

  constructor(y: ArrayLike<number>, fixed: readonly ArrayLike<number>[], shiftingSlopes: readonly ArrayLike<number>[], fixedNames?: readonly string[]) {
    const T = y.length;
    this.T = T;
    this.fixed = fixed;
    const k = fixed.length;
    this.k = k;
    const ones = new Float64Array(T).fill(1);
    this.factors = [ones, ...shiftingSlopes.map((x) => Float64Array.from(x as ArrayLike<number>))];
    const q = this.factors.length;
    this.q = q;
    const qr = new HouseholderQr(fixed, T);
    assertFullRank(qr, fixedNames);
    this.R = new Float64Array(k * k);
    for (let i = 0; i < k; i++) for (let j = i; j < k; j++) this.R[i * k + j] = qr.r(i, j);
    this.yTilde = leastSquares(y, fixed, { withoutCovariance: true, names: fixedNames }).residuals;
    let yy = 0;
    for (let t = 0; t < T; t++) yy += this.yTilde[t] * this.yTilde[t];
    this.yTildeSquares = yy;

    const suffix = (f: (t: number) => number): Float64Array => {
      const out = new Float64Array(T + 1);
      for (let t = T - 1; t >= 0; t--) out[t] = out[t + 1] + f(t);
      return out;
    };
    this.suffixFD = this.factors.map((gd) => fixed.map((Fi) => suffix((t) => Fi[t] * gd[t])));
    this.suffixDD = this.factors.map((ga, a) => this.factors.map((gb, b) => (b >= a ? suffix((t) => ga[t] * gb[t]) : new Float64Array(0))));
    this.suffixDY = this.factors.map((gd) => suffix((t) => gd[t] * this.yTilde[t]));

    this.v = this.factors.map(() => new Float64Array(k));
    this.c = this.factors.map(() => new Float64Array(k));
    this.A = new Float64Array(q * q);
    this.L = new Float64Array(q * q);
    this.b = new Float64Array(q);
    this.g = new Float64Array(k);
  }

  /**
   * Writes the residuals for a shift starting at s (0 < s < T) into out and returns their sum
   * of squares, or -1 when the shift columns are collinear with the fixed ones at this s or
   * y is fitted exactly (no residual worth testing).
   */
  residualsAt(s: number, out: Float64Array): number {
    const { k, q, R, A, L, b, g } = this;
    for (let d = 0; d < q; d++) {
      const vd = this.v[d];
      for (let i = 0; i < k; i++) vd[i] = this.suffixFD[d][i][s];
      solveNormal(R, k, vd, this.c[d]);
    }
    for (let a = 0; a < q; a++) {
      for (let bb = a; bb < q; bb++) {
        let vc = 0;
        for (let i = 0; i < k; i++) vc += this.v[a][i] * this.c[bb][i];
        A[a * q + bb] = A[bb * q + a] = this.suffixDD[a][bb][s] - vc;
      }
    }
    // b = A^{-1} r by Cholesky of A scaled to unit diagonal; r_d = D_d'y~.
    for (let i = 0; i < q; i++) if (!(A[i * q + i] > 0)) return -1;
    for (let j = 0; j < q; j++) {
      let dj = 1;
      for (let m = 0; m < j; m++) dj -= L[j * q + m] * L[j * q + m];
      if (!(dj > 1e-12)) return -1;
      L[j * q + j] = Math.sqrt(dj);
      for (let i = j + 1; i < q; i++) {
        let sum = A[i * q + j] / Math.sqrt(A[i * q + i] * A[j * q + j]);
        for (let m = 0; m < j; m++) sum -= L[i * q + m] * L[j * q + m];
        L[i * q + j] = sum / L[j * q + j];
      }
    }
    let explained = 0;
    for (let i = 0; i < q; i++) {
      let sum = this.suffixDY[i][s] / Math.sqrt(A[i * q + i]);
      for (let m = 0; m < i; m++) sum -= L[i * q + m] * b[m];
      b[i] = sum / L[i * q + i];
      explained += b[i] * b[i];
    }
    const ssr = this.yTildeSquares - explained;
    if (!(ssr > 1e-13 * this.yTildeSquares)) return -1;
    for (let i = q - 1; i >= 0; i--) {
      let sum = b[i];
      for (let m = i + 1; m < q; m++) sum -= L[m * q + i] * b[m];
      b[i] = sum / L[i * q + i];
    }
    for (let i = 0; i < q; i++) b[i] /= Math.sqrt(A[i * q + i]);
    // e = y~ - D b + F (C b)
    g.fill(0);
    for (let d = 0; d < q; d++) for (let i = 0; i < k; i++) g[i] += this.c[d][i] * b[d];
    const T = this.T;
    out.set(this.yTilde);
    for (let i = 0; i < k; i++) {
      const Fi = this.fixed[i];
      const gi = g[i];
      for (let t = 0; t < T; t++) out[t] += Fi[t] * gi;
    }
    for (let d = 0; d < q; d++) {
      const gd = this.factors[d];
      const bd = b[d];
      for (let t = s; t < T; t++) out[t] -= gd[t] * bd;
    }
    return ssr;
  }
}

/** Solves (R'R) c = v for c: forward substitution with R', then back substitution with R. */
function solveNormal(R: Float64Array, k: number, v: Float64Array, c: Float64Array): void {
  for (let i = 0; i < k; i++) {
    let s = v[i];
    for (let j = 0; j < i; j++) s -= R[j * k + i] * c[j];
    c[i] = s / R[i * k + i];
  }
  for (let i = k - 1; i >= 0; i--) {
    let s = c[i];
    for (let j = i + 1; j < k; j++) s -= R[i * k + j] * c[j];
    c[i] = s / R[i * k + i];
  }
}
