/**
 * Means and co-moments of k variables over a window that gains and loses rows, without
 * revisiting the rows inside it. For a new row v, with n rows before it and means m:
 *   d = v - m,  m += d / (n + 1),  C_ij += d_i d_j n / (n + 1);
 * and for a row leaving, the same steps run backwards:
 *   d = v - m,  m -= d / (n - 1),  C_ij -= d_i d_j n / (n - 1)
 * (Welford 1962's update, extended to cross products and to removal; Chan, Golub & LeVeque
 * 1983 discuss its accuracy). C_ij is the sum over the window of (v_i - m_i)(v_j - m_j).
 * Working with deviations from the running means keeps the digits that raw sums of squares
 * lose on prices far from zero.
 *
 * Removal cancels: a row far from the others (an outlier) adds a huge d_i^2 term to C_ii and
 * its removal takes it away again, leaving the rounding of the huge term in the small result.
 * The churn of variable i, the sum of |d_i^2 n / (n +- 1)| over every add and remove since the
 * last clear, bounds what was taken in and out; each update rounds with a relative error of
 * about eps, so C_ii carries an error of at most a few eps * churn_i per update, and C_ij (by
 * Cauchy-Schwarz) at most a few eps * sqrt(churn_i churn_j). lostDigits() tells the owner when
 * churn has grown LOST_DIGITS_LIMIT times past what is left, so it can rebuild the sums from
 * the rows (sliding-comoments.ts).
 */

/**
 * Churn over what is left beyond which the co-moments are rebuilt: 2^10, so a rebuilt window
 * is never needed while the sums keep all but about three of the sixteen digits a fresh pass
 * would keep (ordinary sliding keeps churn near twice what is left; only a removed outlier or a
 * fall in spread of a thousandfold passes the limit).
 */
export const LOST_DIGITS_LIMIT = 1024;

/** Means and co-moments of k variables over rows added and removed one at a time (see the file comment). */
export class RunningComoments {
  private n = 0;
  private readonly m: Float64Array;
  private readonly c: Float64Array;
  private readonly d: Float64Array;
  private readonly churn: Float64Array;

  constructor(readonly k: number) {
    this.m = new Float64Array(k);
    this.c = new Float64Array(k * k);
    this.d = new Float64Array(k);
    this.churn = new Float64Array(k);
  }

  /** Rows in the window. */
  get count(): number {
    return this.n;
  }

  /** Empties the window. */
  clear(): void {
    this.n = 0;
    this.m.fill(0);
    this.c.fill(0);
    this.churn.fill(0);
  }

  /** Adds one row (k values). */
  add(v: ArrayLike<number>): void {
    const { k, m, c, d } = this;
    const n = this.n;
    for (let i = 0; i < k; i++) {
      d[i] = v[i] - m[i];
      m[i] += d[i] / (n + 1);
    }
    const w = n / (n + 1);
    for (let i = 0; i < k; i++) {
      for (let j = i; j < k; j++) c[i * k + j] += d[i] * d[j] * w;
      this.churn[i] += d[i] * d[i] * w;
    }
    this.n = n + 1;
  }

  /** Removes one row that was added before (k values). */
  remove(v: ArrayLike<number>): void {
    const { k, m, c, d } = this;
    const n = this.n;
    if (n <= 1) {
      this.clear();
      return;
    }
    for (let i = 0; i < k; i++) {
      d[i] = v[i] - m[i];
      m[i] -= d[i] / (n - 1);
    }
    const w = n / (n - 1);
    for (let i = 0; i < k; i++) {
      for (let j = i; j < k; j++) c[i * k + j] -= d[i] * d[j] * w;
      this.churn[i] += d[i] * d[i] * w;
    }
    this.n = n - 1;
  }

  /**
   * Whether removals have cancelled enough digits that the sums should be rebuilt from the rows:
   * for some variable, the churn since the last clear exceeds LOST_DIGITS_LIMIT times the
   * co-moment left (see the file comment). Also true for a co-moment that rounding left
   * negative, or any that is no longer finite.
   */
  lostDigits(): boolean {
    const { k, c, churn } = this;
    for (let i = 0; i < k; i++) {
      const left = c[i * k + i];
      if (churn[i] !== 0 && !(churn[i] <= LOST_DIGITS_LIMIT * left)) return true;
    }
    return false;
  }

  /** Mean of variable i over the window. */
  mean(i: number): number {
    return this.m[i];
  }

  /** Sum over the window of (v_i - mean_i)(v_j - mean_j). */
  comoment(i: number, j: number): number {
    return i <= j ? this.c[i * this.k + j] : this.c[j * this.k + i];
  }
}
