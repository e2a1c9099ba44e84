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
 */
/** Means and co-moments of k variables over rows added and removed one at a time (see the file comment). */
export class RunningComoments {
  private n = 0;
  private readonly m: Float64Array;
  private readonly c: Float64Array;
  private readonly d: Float64Array;

  constructor(readonly k: number) {
    this.m = new Float64Array(k);
    this.c = new Float64Array(k * k);
    this.d = new Float64Array(k);
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
    for (let i = 0; i < k; i++) for (let j = i; j < k; j++) c[i * k + j] += d[i] * d[j] * w;
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
    for (let i = 0; i < k; i++) for (let j = i; j < k; j++) c[i * k + j] -= d[i] * d[j] * w;
    this.n = n - 1;
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
