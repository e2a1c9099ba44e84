/**
 * A regression design whose columns are windows of a few long series: column c, row t reads
 * source[c.source][c.offset + t] (or 1 for the constant). Dynamic OLS (the level and shifted
 * changes of x) and the error-correction model (the lagged error and lagged changes of both
 * series) are built this way, so neither the n x k design nor its QR factorisation need be
 * held: at a million rows and 200 columns that is 1.6 GB and, by QR, O(n k^2) work.
 *
 * The cross products come in O(n) per distinct shift rather than per pair of columns: two
 * windows of the same pair of series a fixed distance apart differ from the pair one row along
 * only by the row leaving at the start and the row entering at the end (the same idea as
 * lagged-difference-gram.ts). Residuals and X'r are formed a block of rows at a time, so a
 * block stays in cache while every column passes over it; each element's sum runs in the same
 * order as one column at a time.
 */

/** One column: rows t = 0..n-1 read sources[source][offset + t]; source -1 is the constant 1. */
export interface WindowColumn {
  source: number;
  offset: number;
}

/** Rows per block in the residual and cross-product passes (a block of each array stays in cache). */
const BLOCK_ROWS = 2048;

export class WindowDesign {
  readonly k: number;

  constructor(
    readonly sources: readonly Float64Array[],
    readonly columns: readonly WindowColumn[],
    readonly n: number,
  ) {
    this.k = columns.length;
  }

  /** Sum over the rows of a * b, each a column or a response window. */
  dot(a: WindowColumn, b: WindowColumn): number {
    const n = this.n;
    if (a.source < 0 && b.source < 0) return n;
    if (a.source < 0 || b.source < 0) {
      const c = a.source < 0 ? b : a;
      const v = this.sources[c.source];
      let s = 0;
      for (let t = 0; t < n; t++) s += v[c.offset + t];
      return s;
    }
    const u = this.sources[a.source];
    const v = this.sources[b.source];
    let s = 0;
    for (let t = 0; t < n; t++) s += u[a.offset + t] * v[b.offset + t];
    return s;
  }

  /**
   * X'X (k x k, row-major) with X'y for each response window, by sliding sums: entries that pair
   * the same two series at the same distance share one full sum, moved one row at a time.
   */
  gram(responses: readonly WindowColumn[] = []): { xtx: Float64Array; xty: Float64Array[] } {
    const k = this.k;
    const xtx = new Float64Array(k * k);
    const xty = responses.map(() => new Float64Array(k));
    interface Entry {
      base: number;
      write: (v: number) => void;
    }
    const groups = new Map<string, { a: number; b: number; d: number; entries: Entry[] }>();
    const add = (p: WindowColumn, q: WindowColumn, write: (v: number) => void): void => {
      // Canonical order: the constant second; else the lower source first; same source, the larger offset first.
      let [first, second] = [p, q];
      if (first.source < 0 || (second.source >= 0 && (first.source > second.source || (first.source === second.source && first.offset < second.offset)))) {
        [first, second] = [second, first];
      }
      const d = second.source < 0 ? 0 : first.offset - second.offset;
      const base = second.source < 0 ? first.offset : second.offset;
      const key = `${first.source},${second.source},${d}`;
      let g = groups.get(key);
      if (!g) {
        g = { a: first.source, b: second.source, d, entries: [] };
        groups.set(key, g);
      }
      g.entries.push({ base, write });
    };
    for (let i = 0; i < k; i++) {
      for (let j = i; j < k; j++) {
        add(this.columns[i], this.columns[j], (v) => {
          xtx[i * k + j] = v;
          xtx[j * k + i] = v;
        });
      }
    }
    responses.forEach((response, r) => {
      for (let j = 0; j < k; j++) add(response, this.columns[j], (v) => (xty[r][j] = v));
    });
    for (const g of groups.values()) this.slide(g.a, g.b, g.d, g.entries);
    return { xtx, xty };
  }

  /** One group's sums: the first in full, each later base offset from the one before. */
  private slide(a: number, b: number, d: number, entries: { base: number; write: (v: number) => void }[]): void {
    const n = this.n;
    entries.sort((p, q) => p.base - q.base);
    if (a < 0) {
      for (const e of entries) e.write(n);
      return;
    }
    const u = this.sources[a];
    const constant = b < 0;
    const v = constant ? u : this.sources[b];
    let o = entries[0].base;
    let s = 0;
    if (constant) for (let t = 0; t < n; t++) s += u[o + t];
    else for (let t = 0; t < n; t++) s += u[o + d + t] * v[o + t];
    for (const e of entries) {
      while (o < e.base) {
        if (constant) s += u[o + n] - u[o];
        else s += u[o + d + n] * v[o + n] - u[o + d] * v[o];
        o++;
      }
      e.write(s);
    }
  }

  /** The response window as its own array. */
  window(c: WindowColumn): Float64Array {
    if (c.source < 0) return new Float64Array(this.n).fill(1);
    return this.sources[c.source].slice(c.offset, c.offset + this.n);
  }

  /** out = y - X_m b, X_m the first m columns (subtracted in column order for each row). */
  residual(b: ArrayLike<number>, m: number, y: ArrayLike<number>, out: Float64Array): void {
    const n = this.n;
    for (let t = 0; t < n; t++) out[t] = y[t];
    for (let from = 0; from < n; from += BLOCK_ROWS) {
      const to = Math.min(n, from + BLOCK_ROWS);
      for (let j = 0; j < m; j++) {
        const bj = b[j];
        const c = this.columns[j];
        if (c.source < 0) {
          for (let t = from; t < to; t++) out[t] -= bj;
        } else {
          const v = this.sources[c.source];
          const o = c.offset;
          for (let t = from; t < to; t++) out[t] -= bj * v[o + t];
        }
      }
    }
  }

  /** out[j] = (column j)' r for the first m columns (each sum over the rows in order). */
  crossWith(r: ArrayLike<number>, m: number, out: Float64Array): void {
    const n = this.n;
    out.fill(0, 0, m);
    for (let from = 0; from < n; from += BLOCK_ROWS) {
      const to = Math.min(n, from + BLOCK_ROWS);
      for (let j = 0; j < m; j++) {
        const c = this.columns[j];
        let s = out[j];
        if (c.source < 0) {
          for (let t = from; t < to; t++) s += r[t];
        } else {
          const v = this.sources[c.source];
          const o = c.offset;
          for (let t = from; t < to; t++) s += v[o + t] * r[t];
        }
        out[j] = s;
      }
    }
  }
}
