/**
 * Plain arithmetic for checking the demo generator's structure: small least squares by the
 * normal equations, a Dickey-Fuller tau, autocorrelation, correlation and a Granger F.
 *
 * Deliberately independent of the engine under addin/, so the demo checks do not depend on
 * the code the demo is meant to show off. Regressions here have at most five columns and
 * well-scaled data, where the normal equations are accurate enough for coarse checks.
 */

/** Least-squares fit of y on the columns of X: coefficients, their standard errors, residuals. */
export interface PlainFit {
  coef: number[];
  se: number[];
  residuals: number[];
  /** Residual sum of squares. */
  rss: number;
}

/** Least squares by the normal equations X'X b = X'y, solved by Gaussian elimination with pivoting. */
export function plainOls(y: ArrayLike<number>, columns: ArrayLike<number>[]): PlainFit {
  const n = y.length;
  const k = columns.length;
  const a: number[][] = [];
  for (let i = 0; i < k; i++) {
    const row: number[] = [];
    for (let j = 0; j < k; j++) row.push(dot(columns[i], columns[j]));
    a.push(row);
  }
  const inverse = invert(a);
  const coef = inverse.map((row) => row.reduce((s, v, j) => s + v * dot(columns[j], y), 0));
  const residuals: number[] = [];
  for (let t = 0; t < n; t++) {
    let fitted = 0;
    for (let j = 0; j < k; j++) fitted += coef[j] * columns[j][t];
    residuals.push(y[t] - fitted);
  }
  const rss = dot(residuals, residuals);
  const s2 = rss / (n - k);
  return { coef, se: inverse.map((row, i) => Math.sqrt(s2 * row[i])), residuals, rss };
}

/** Dickey-Fuller tau with a constant and no lagged differences: t of rho in dx_t = c + rho x_{t-1}. */
export function dickeyFullerTau(x: ArrayLike<number>): number {
  const dx: number[] = [];
  const lagged: number[] = [];
  for (let t = 1; t < x.length; t++) {
    dx.push(x[t] - x[t - 1]);
    lagged.push(x[t - 1]);
  }
  const fit = plainOls(dx, [ones(dx.length), lagged]);
  return fit.coef[1] / fit.se[1];
}

/** Engle-Granger residual tau: Dickey-Fuller tau (no constant needed, residuals have mean 0) of the OLS residuals of y on a constant and x. */
export function engleGrangerTau(y: ArrayLike<number>, x: ArrayLike<number>): { tau: number; beta: number; intercept: number; residuals: number[] } {
  const fit = plainOls(y, [ones(y.length), x]);
  return { tau: dickeyFullerTau(fit.residuals), intercept: fit.coef[0], beta: fit.coef[1], residuals: fit.residuals };
}

/** F statistic for adding lags 1..p of `cause` to a regression of `effect` on a constant and its own lags 1..p (levels). */
export function grangerF(effect: ArrayLike<number>, cause: ArrayLike<number>, p: number): { f: number; df1: number; df2: number } {
  const y: number[] = [];
  const own: number[][] = Array.from({ length: p }, () => []);
  const other: number[][] = Array.from({ length: p }, () => []);
  for (let t = p; t < effect.length; t++) {
    y.push(effect[t]);
    for (let l = 1; l <= p; l++) {
      own[l - 1].push(effect[t - l]);
      other[l - 1].push(cause[t - l]);
    }
  }
  const restricted = plainOls(y, [ones(y.length), ...own]);
  const full = plainOls(y, [ones(y.length), ...own, ...other]);
  const df2 = y.length - (1 + 2 * p);
  return { f: ((restricted.rss - full.rss) / p) / (full.rss / df2), df1: p, df2 };
}

/** Lag-1 sample autocorrelation (deviations from the sample mean). */
export function lag1Autocorrelation(x: ArrayLike<number>): number {
  const m = mean(x);
  let num = 0;
  let den = 0;
  for (let t = 0; t < x.length; t++) {
    den += (x[t] - m) ** 2;
    if (t > 0) num += (x[t] - m) * (x[t - 1] - m);
  }
  return num / den;
}

/** Sample correlation of two equal-length series. */
export function correlation(a: ArrayLike<number>, b: ArrayLike<number>): number {
  const ma = mean(a);
  const mb = mean(b);
  let sab = 0;
  let saa = 0;
  let sbb = 0;
  for (let t = 0; t < a.length; t++) {
    sab += (a[t] - ma) * (b[t] - mb);
    saa += (a[t] - ma) ** 2;
    sbb += (b[t] - mb) ** 2;
  }
  return sab / Math.sqrt(saa * sbb);
}

/** Sample variance (n - 1 denominator). */
export function variance(x: ArrayLike<number>): number {
  const m = mean(x);
  let s = 0;
  for (let t = 0; t < x.length; t++) s += (x[t] - m) ** 2;
  return s / (x.length - 1);
}

/** First differences x_t - x_{t-1}. */
export function differences(x: ArrayLike<number>): number[] {
  const out: number[] = [];
  for (let t = 1; t < x.length; t++) out.push(x[t] - x[t - 1]);
  return out;
}

/** Half-life in days of an AR(1) coefficient phi. */
export function halfLife(phi: number): number {
  return Math.log(0.5) / Math.log(phi);
}

function mean(x: ArrayLike<number>): number {
  let s = 0;
  for (let t = 0; t < x.length; t++) s += x[t];
  return s / x.length;
}

function ones(n: number): number[] {
  return new Array<number>(n).fill(1);
}

function dot(a: ArrayLike<number>, b: ArrayLike<number>): number {
  let s = 0;
  for (let t = 0; t < a.length; t++) s += a[t] * b[t];
  return s;
}

/** Inverse of a small square matrix, by Gauss-Jordan elimination with partial pivoting. */
function invert(a: number[][]): number[][] {
  const k = a.length;
  const m = a.map((row, i) => [...row.slice(0, k), ...Array.from({ length: k }, (_, j) => (i === j ? 1 : 0))]);
  for (let c = 0; c < k; c++) {
    let pivot = c;
    for (let r = c + 1; r < k; r++) if (Math.abs(m[r][c]) > Math.abs(m[pivot][c])) pivot = r;
    [m[c], m[pivot]] = [m[pivot], m[c]];
    const p = m[c][c];
    for (let j = 0; j < 2 * k; j++) m[c][j] /= p;
    for (let r = 0; r < k; r++) {
      if (r === c) continue;
      const f = m[r][c];
      for (let j = 0; j < 2 * k; j++) m[r][j] -= f * m[c][j];
    }
  }
  return m.map((row) => row.slice(k));
}
