/**
 * Householder QR factorisation of a tall matrix held as columns (Golub & Van Loan 2013,
 * Algorithm 5.2.1). The expensive step happens once in the constructor; the cheap
 * questions (Q'y, solve, nested residual sums of squares, R's inverse) are named methods.
 *
 * Why hand-written rather than ml-matrix's QrDecomposition: the lag search needs the
 * residual sum of squares of every leading block of columns from one factorisation, and the
 * screening of thousands of pairs needs column-major loops over Float64Arrays without
 * per-element method calls. The results are checked against ml-matrix in the tests.
 */
import { MooringInputError } from '../errors';

/** Relative size below which a pivot means the column lies in the span of those before it. */
export const RANK_TOLERANCE = 1e-10;

export class HouseholderQr {
  /** Rows. */
  readonly n: number;
  /** Columns. */
  readonly k: number;
  /** Householder vectors (below and on the diagonal) and R (above it), column by column. */
  private readonly work: Float64Array[];
  /** Diagonal of R. */
  private readonly rDiagonal: Float64Array;
  /** Scaling 2 / v'v of each reflector (0 for an identity reflector). */
  private readonly beta: Float64Array;
  /** Index of the first column found to depend on the ones before it, or -1. */
  readonly firstDependentColumn: number;

  constructor(columns: readonly ArrayLike<number>[], n?: number) {
    const k = columns.length;
    const rows = n ?? (k > 0 ? columns[0].length : 0);
    this.n = rows;
    this.k = k;
    this.work = columns.map((c) => Float64Array.from(c as ArrayLike<number>));
    this.rDiagonal = new Float64Array(k);
    this.beta = new Float64Array(k);
    let dependent = -1;
    for (let j = 0; j < k; j++) {
      const a = this.work[j];
      let originalNorm2 = 0;
      for (let i = 0; i < rows; i++) originalNorm2 += a[i] * a[i];
      let tail2 = 0;
      for (let i = j; i < rows; i++) tail2 += a[i] * a[i];
      const norm = Math.sqrt(tail2);
      if (j >= rows || !(norm > RANK_TOLERANCE * Math.sqrt(originalNorm2)) || norm === 0) {
        if (dependent < 0) dependent = j;
        this.rDiagonal[j] = 0;
        this.beta[j] = 0;
        continue;
      }
      const ajj = a[j];
      const alpha = ajj > 0 ? -norm : norm;
      a[j] = ajj - alpha;
      const vtv = tail2 - ajj * ajj + a[j] * a[j];
      const b = 2 / vtv;
      this.beta[j] = b;
      this.rDiagonal[j] = alpha;
      for (let c = j + 1; c < k; c++) {
        const col = this.work[c];
        let s = 0;
        for (let i = j; i < rows; i++) s += a[i] * col[i];
        s *= b;
        if (s !== 0) for (let i = j; i < rows; i++) col[i] -= s * a[i];
      }
    }
    this.firstDependentColumn = dependent;
  }

  /** True when every column adds a direction the earlier ones do not span. */
  isFullRank(): boolean {
    return this.firstDependentColumn < 0;
  }

  /** Q'y, the response rotated by the same reflectors (length n). */
  qtY(y: ArrayLike<number>): Float64Array {
    const out = Float64Array.from(y as ArrayLike<number>);
    const rows = this.n;
    for (let j = 0; j < this.k; j++) {
      const b = this.beta[j];
      if (b === 0) continue;
      const v = this.work[j];
      let s = 0;
      for (let i = j; i < rows; i++) s += v[i] * out[i];
      s *= b;
      for (let i = j; i < rows; i++) out[i] -= s * v[i];
    }
    return out;
  }

  /** Element (i, j) of R, i <= j. */
  r(i: number, j: number): number {
    return i === j ? this.rDiagonal[j] : this.work[j][i];
  }

  /** Solves R b = z[0..k) by back-substitution (the least-squares coefficients when z = Q'y). */
  backSubstitute(z: ArrayLike<number>): Float64Array {
    const k = this.k;
    const b = new Float64Array(k);
    for (let i = k - 1; i >= 0; i--) {
      let s = z[i];
      for (let j = i + 1; j < k; j++) s -= this.work[j][i] * b[j];
      b[i] = s / this.rDiagonal[i];
    }
    return b;
  }

  /** R^{-1}, upper triangular, as rows. */
  rInverse(): number[][] {
    const k = this.k;
    const inv: number[][] = Array.from({ length: k }, () => new Array<number>(k).fill(0));
    for (let j = 0; j < k; j++) {
      inv[j][j] = 1 / this.rDiagonal[j];
      for (let i = j - 1; i >= 0; i--) {
        let s = 0;
        for (let m = i + 1; m <= j; m++) s += this.work[m][i] * inv[m][j];
        inv[i][j] = -s / this.rDiagonal[i];
      }
    }
    return inv;
  }

  /**
   * Residual sum of squares of the regression of y on the first j columns, for j = 0..k,
   * from one factorisation: SSR_j = sum of (Q'y)_i^2 over i >= j.
   */
  nestedSsr(y: ArrayLike<number>): Float64Array {
    const z = this.qtY(y);
    const out = new Float64Array(this.k + 1);
    let tail = 0;
    for (let i = this.k; i < this.n; i++) tail += z[i] * z[i];
    out[this.k] = tail;
    for (let j = this.k - 1; j >= 0; j--) {
      tail += z[j] * z[j];
      out[j] = tail;
    }
    return out;
  }
}

/** Throws a clear error naming the first column that depends on the others. */
export function assertFullRank(qr: HouseholderQr, names?: readonly string[]): void {
  const j = qr.firstDependentColumn;
  if (j < 0) return;
  const name = names?.[j] ?? `column ${j + 1}`;
  if (qr.n <= j) {
    throw new MooringInputError(`Too few observations (${qr.n}) for ${qr.k} regressors: add rows or use fewer lags.`);
  }
  throw new MooringInputError(
    `The regression cannot separate '${name}' from the terms before it (it is constant, duplicated, or an exact combination of them): drop it or choose other deterministic terms.`,
  );
}
