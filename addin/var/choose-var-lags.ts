/**
 * VAR lag order by information criteria (Lutkepohl 2005). Every order p = 0..M is
 * fitted with a constant on the same rows t = M + 1..T (n = T - M), so the criteria compare like
 * with like. With Sigma = E'E / n and free = pK^2 + K coefficients:
 *   AIC = ln|Sigma| + 2 free / n,   BIC = ln|Sigma| + ln(n) free / n,
 *   HQ  = ln|Sigma| + 2 ln(ln n) free / n,
 *   FPE = ((n + Kp + 1) / (n - Kp - 1))^K |Sigma|.
 * The smallest value wins; a tie goes to the smaller p. These are the reference library's
 * conventions, so the orders and values compare exactly.
 *
 * Speed: the lag columns are shifted copies of the K series, so the Gram matrix of the largest
 * design is built in O(n K^2 M) and one Cholesky of it gives every order's residual cross
 * products (nested-var-residuals.ts). The design is first rewritten in changes (var-change-gram.ts:
 * the lagged level and lagged changes, same residuals), which keeps prices' normal equations well
 * conditioned at any length; then in levels (var-lag-gram.ts); when neither is numerically safe
 * (near-collinear lags, a near-exact fit), one Householder QR of the largest design gives them
 * instead (var-lag-cross-products-qr.ts). The Gram path conditions the data (mean-free, unit
 * scale) and adds 2 sum ln(scale_k) back to ln|Sigma|, so both paths return the same values:
 * on price-like random walks they differ by about 1e-12 in ln|Sigma|, and the Gram path steps
 * aside when its error estimate passes 5e-10.
 */
import { CholeskyDecomposition, Matrix } from 'ml-matrix';
import { MooringInputError } from '../errors';
import { powerOfTwoScale, scaled } from '../linalg/power-of-two-scale';
import { nestedVarResiduals } from './nested-var-residuals';
import { checkedBlock, checkedLagCount } from './var-design';
import { varLagCrossProductsByQr } from './var-lag-cross-products-qr';
import { varChangeGram } from './var-change-gram';
import { varLagGram } from './var-lag-gram';

/** The four criteria (and ln|Sigma|) of one VAR order. */
export interface VarLagRow {
  lags: number;
  aic: number;
  bic: number;
  hq: number;
  fpe: number;
  /** ln|E'E / n|. */
  logDetSigma: number;
}

/** The order each criterion chooses, the search settings and the full table. */
export interface VarLagChoice {
  aic: number;
  bic: number;
  hq: number;
  fpe: number;
  /** Largest order tried. */
  maxLags: number;
  /** How maxLags was set: "given" or the default rule in words. */
  maxLagsRule: string;
  /** Common sample size of every order: T - maxLags. */
  nobs: number;
  /** One row per order p = 0..maxLags. */
  table: VarLagRow[];
}

/** Largest order the search can fit: floor((T - K - 1) / (1 + K)), so the largest model keeps K residual degrees of freedom. */
export function largestVarLags(rows: number, variables: number): number {
  return Math.floor((rows - variables - 1) / (1 + variables));
}

/**
 * Default largest order: round(12 (T/100)^(1/4)), capped at largestVarLags. A ceiling that grows
 * slowly with the sample (common practice, after Schwert 1989, from memory; also the reference library's default).
 */
export function defaultVarMaxLags(rows: number, variables: number): number {
  return Math.min(Math.round(12 * (rows / 100) ** 0.25), largestVarLags(rows, variables));
}

/** ln det of a symmetric positive definite matrix, from its Cholesky factor. */
function logDeterminant(sigma: number[][]): number {
  const chol = new CholeskyDecomposition(new Matrix(sigma));
  if (!chol.isPositiveDefinite()) {
    throw new MooringInputError(
      'The residuals of the VAR are exactly collinear, so the lag criteria cannot be computed: one series may be a copy or an exact combination of the others.',
    );
  }
  const L = chol.lowerTriangularMatrix;
  let s = 0;
  for (let i = 0; i < sigma.length; i++) s += 2 * Math.log(L.get(i, i));
  return s;
}

/** How the residual cross products were found: the Gram path, or the QR path ("auto" tries the Gram path first). */
export type VarLagMethod = 'auto' | 'qr';

/**
 * E'E of every order (row-major K x K) and the term that returns ln|E'E| to the data's units.
 * "auto" uses the Gram path unless it declines, then the QR path; "qr" goes straight to QR.
 */
function residualCrossProducts(
  series: readonly Float64Array[],
  maxLags: number,
  names: readonly string[],
  method: VarLagMethod,
): { crossProducts: Float64Array[]; logScale: number } {
  if (method === 'auto' && maxLags >= 1) {
    const changes = varChangeGram(series, maxLags);
    const crossProducts = nestedVarResiduals(changes, series.length, maxLags);
    if (crossProducts !== null) {
      crossProducts[0] = changes.orderZero;
      return { crossProducts, logScale: changes.logScale };
    }
  }
  if (method === 'auto') {
    const gram = varLagGram(series, maxLags);
    const crossProducts = nestedVarResiduals(gram, series.length, maxLags);
    if (crossProducts !== null) return { crossProducts, logScale: gram.logScale };
  }
  return { crossProducts: varLagCrossProductsByQr(series, maxLags, names), logScale: 0 };
}

function argminFirst(values: readonly number[]): number {
  let best = 0;
  for (let i = 1; i < values.length; i++) if (values[i] < values[best]) best = i;
  return best;
}

/**
 * Chooses the VAR order of the block (one array per series) by AIC, BIC, HQ and FPE.
 * `method: 'qr'` skips the Gram path (for checks; the answers agree to rounding).
 */
export function chooseVarLags(
  block: readonly ArrayLike<number>[],
  options: { maxLags?: number; names?: readonly string[]; method?: VarLagMethod } = {},
): VarLagChoice {
  const series = checkedBlock(block, options.names);
  const K = series.length;
  const T = series[0].length;
  const largest = largestVarLags(T, K);
  if (largest < 1) {
    throw new MooringInputError(
      `Choosing a VAR order for ${K} series needs at least ${2 * K + 2} rows (one lag); the series have ${T}. Use a longer history.`,
    );
  }
  let maxLags: number;
  let maxLagsRule: string;
  if (options.maxLags === undefined) {
    maxLags = defaultVarMaxLags(T, K);
    maxLagsRule = `default: round(12 (T/100)^(1/4)) = ${Math.round(12 * (T / 100) ** 0.25)}, capped at ${largest} for ${T} rows and ${K} series`;
  } else {
    maxLags = checkedLagCount(options.maxLags, 'The largest VAR order (maxLags)');
    if (maxLags > largest) {
      throw new MooringInputError(
        `A largest VAR order of ${maxLags} is too many for ${T} rows and ${K} series: the largest allowed is ${largest} (floor((T - K - 1) / (1 + K))).`,
      );
    }
    maxLagsRule = 'given';
  }

  const n = T - maxLags;
  const names = series.map((_, k) => options.names?.[k] ?? `series ${k + 1}`);
  // The orders are free of units; the cross products are not (they overflow for prices of 1e300
  // and vanish for 1e-300): each series is brought near one by a power of two f_k (exact), and
  // ln|Sigma| of the data is that of the scaled series less 2 sum ln f_k.
  const factors = series.map((s) => powerOfTwoScale(s));
  const unitSeries = series.map((s, k) => scaled(s, factors[k]));
  const found = residualCrossProducts(unitSeries, maxLags, names, options.method ?? 'auto');
  const { crossProducts } = found;
  const logScale = found.logScale - 2 * factors.reduce((sum, f) => sum + Math.log(f), 0);
  const table: VarLagRow[] = [];
  for (let p = 0; p <= maxLags; p++) {
    const e = crossProducts[p];
    const sigma = Array.from({ length: K }, (_, a) => Array.from({ length: K }, (_, b) => e[a * K + b] / n));
    const logDetSigma = logDeterminant(sigma) + logScale;
    const free = p * K * K + K;
    const coefficientsPerEquation = K * p + 1;
    table.push({
      lags: p,
      aic: logDetSigma + (2 * free) / n,
      bic: logDetSigma + (Math.log(n) * free) / n,
      hq: logDetSigma + (2 * Math.log(Math.log(n)) * free) / n,
      fpe: ((n + coefficientsPerEquation) / (n - coefficientsPerEquation)) ** K * Math.exp(logDetSigma),
      logDetSigma,
    });
  }
  const pick = (key: 'aic' | 'bic' | 'hq' | 'fpe'): number => table[argminFirst(table.map((r) => r[key]))].lags;
  return { aic: pick('aic'), bic: pick('bic'), hq: pick('hq'), fpe: pick('fpe'), maxLags, maxLagsRule, nobs: n, table };
}
