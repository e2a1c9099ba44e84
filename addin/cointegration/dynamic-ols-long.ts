/**
 * Dynamic OLS on long series from cross products (regression/window-design.ts) instead of a
 * Householder QR of the n x (3 + 2k) design: at a million rows and kmax = 100 the design alone
 * is 1.6 GB and its QR O(n k^2). The columns are windows of three series (the level of x, its
 * changes, the response), so the cross products cost O(n) per distinct shift.
 *
 * Conditioning, each a change of parameters that leaves residuals and t-ratios as they are:
 * the level and the changes of x are freed of their means (shifts in the span of the constant),
 * and the response is y less its static least-squares line on x over the sample (a combination
 * of the level and the constant, which every candidate holds). The response then carries only
 * the equilibrium error, so the nested residual sums of squares y'y - z'z lose few digits.
 *
 * The lead-and-lag choice reads the nested residual sums of squares from one Cholesky of the
 * cross products (regression/nested-cholesky.ts). The chosen model's slope, intercept,
 * residuals and ordinary standard error come from the refined solve
 * (regression/refined-least-squares.ts), accepted only where its last correction moves the
 * slope by at most REFINE_TOLERANCE of its standard error; otherwise null and the caller fits
 * by QR. Tested equal to the QR route to 1e-10 (tests/cointegration/dynamic-ols-long.test.ts).
 */
import { gaussianLogLikelihood } from '../regression/least-squares';
import { nestedFitsFromGram } from '../regression/nested-cholesky';
import { choleskyFactor, refinedLeastSquares } from '../regression/refined-least-squares';
import { WindowDesign, type WindowColumn } from '../regression/window-design';

/** Rows times columns squared above which the cross-product route pays for itself (as the ADF's). */
export const DOLS_GRAM_WORK = 5e7;

/** Smallest share of a column's sum of squares a pivot may keep on the refined route (full rank in double precision). */
const REFINE_PIVOT_FLOOR = 1e-12;
/** Smallest share of its own sum of squares the level's pivot may keep to be read from the factor directly. */
const PIVOT_FLOOR = 1e-2;
/** The last correction may move the slope by at most this share of its standard error (or of the slope, if larger). */
const REFINE_TOLERANCE = 1e-12;

/** The three series the design's windows read, conditioned as the file comment says. */
interface DolsSources {
  level: Float64Array;
  changes: Float64Array;
  response: Float64Array;
  levelMean: number;
  changeMean: number;
  /** The static line taken out of y: y = lineIntercept + lineSlope x + response. */
  lineSlope: number;
  lineIntercept: number;
}

/** Sources for rows from..to (0-based, inclusive). changes[t] = x[t] - x[t-1] - changeMean (t >= 1). */
function dolsSources(y: ArrayLike<number>, x: ArrayLike<number>, from: number, to: number): DolsSources {
  const T = x.length;
  const n = to - from + 1;
  let mx = 0;
  let my = 0;
  for (let t = from; t <= to; t++) {
    mx += x[t];
    my += y[t];
  }
  mx /= n;
  my /= n;
  let sxx = 0;
  let sxy = 0;
  for (let t = from; t <= to; t++) {
    sxx += (x[t] - mx) * (x[t] - mx);
    sxy += (x[t] - mx) * (y[t] - my);
  }
  const lineSlope = sxx > 0 ? sxy / sxx : 0;
  const level = new Float64Array(T);
  const response = new Float64Array(T);
  for (let t = 0; t < T; t++) {
    level[t] = x[t] - mx;
    response[t] = y[t] - my - lineSlope * level[t];
  }
  const changes = new Float64Array(T);
  let md = 0;
  for (let t = 1; t < T; t++) md += x[t] - x[t - 1];
  md = T > 1 ? md / (T - 1) : 0;
  for (let t = 1; t < T; t++) changes[t] = x[t] - x[t - 1] - md;
  return { level, changes, response, levelMean: mx, changeMean: md, lineSlope, lineIntercept: my - lineSlope * mx };
}

const LEVEL = 0;
const CHANGES = 1;
const RESPONSE = 2;
const CONSTANT: WindowColumn = { source: -1, offset: 0 };

/** The change columns for k leads and lags, rows starting at `from`: shift 0, lag 1, lead 1, ..., lag k, lead k. */
function changeColumns(k: number, from: number): WindowColumn[] {
  const out: WindowColumn[] = [{ source: CHANGES, offset: from }];
  for (let j = 1; j <= k; j++) out.push({ source: CHANGES, offset: from - j }, { source: CHANGES, offset: from + j });
  return out;
}

/**
 * AIC choice of k in 0..kmax on the common sample of kmax (rows kmax + 1 .. T - 1 - kmax, as in
 * dynamic-ols.ts), or null where the cross products cannot separate every column (the caller's
 * QR route then answers, and names the column).
 */
export function chooseLeadsLagsByGram(y: ArrayLike<number>, x: ArrayLike<number>, kmax: number): number | null {
  const T = y.length;
  const from = kmax + 1;
  const to = T - 1 - kmax;
  const n = to - from + 1;
  const s = dolsSources(y, x, from, to);
  const columns = [{ source: LEVEL, offset: from }, CONSTANT, ...changeColumns(kmax, from)];
  const design = new WindowDesign([s.level, s.changes, s.response], columns, n);
  const responseWindow = { source: RESPONSE, offset: from };
  const { xtx, xty } = design.gram([responseWindow]);
  const yty = design.dot(responseWindow, responseWindow);
  const k = columns.length;
  const fits = nestedFitsFromGram(xtx, xty[0], yty, k, n);
  if (fits.usable < k) return null;
  let best = 0;
  let bestAic = Infinity;
  for (let j = 0; j <= kmax; j++) {
    const size = 3 + 2 * j;
    const aic = -2 * gaussianLogLikelihood(fits.ssr[size], n) + 2 * size;
    if (aic < bestAic) {
      bestAic = aic;
      best = j;
    }
  }
  return best;
}

export interface DolsRefinedFit {
  beta: number;
  intercept: number;
  /** Ordinary (non-HAC) standard error of beta. */
  olsStandardError: number;
  /** SSR / (n - columns). */
  sigma2: number;
  residuals: Float64Array;
  nobs: number;
}

/** The DOLS regression with k leads and lags over rows k + 1 .. T - 1 - k by the refined route, or null (fit by QR). */
export function dynamicOlsByGram(y: ArrayLike<number>, x: ArrayLike<number>, k: number): DolsRefinedFit | null {
  const T = y.length;
  const from = k + 1;
  const to = T - 1 - k;
  const n = to - from + 1;
  const s = dolsSources(y, x, from, to);
  // The level last, so its pivot gives beta's standard error.
  const columns = [CONSTANT, ...changeColumns(k, from), { source: LEVEL, offset: from }];
  const m = columns.length;
  if (n - m < 1) return null;
  const design = new WindowDesign([s.level, s.changes, s.response], columns, n);
  const { xtx } = design.gram();
  const L = choleskyFactor(xtx, m, m, REFINE_PIVOT_FLOOR);
  if (L === null) return null;
  const response = s.response.subarray(from, from + n);
  const fit = refinedLeastSquares(design, L, m, response);
  if (fit === null || !(fit.ssr > 0)) return null;
  // The level's pivot squared: the sum of squares of the level's residual on the other columns.
  const last = (m - 1) * m + (m - 1);
  let pivotSquared = L[last] * L[last];
  if (!(pivotSquared > PIVOT_FLOOR * xtx[last])) {
    const own = refinedLeastSquares(design, L, m - 1, s.level.subarray(from, from + n));
    if (own === null) return null;
    pivotSquared = own.ssr;
  }
  if (!(pivotSquared > 0)) return null;
  const sigma2 = fit.ssr / (n - m);
  const olsStandardError = Math.sqrt(sigma2 / pivotSquared);
  const b = fit.coefficients;
  const slope = b[m - 1];
  if (!(Math.abs(fit.lastCorrection[m - 1]) <= REFINE_TOLERANCE * Math.max(Math.abs(slope), olsStandardError))) return null;
  let changeSum = 0;
  for (let j = 1; j < m - 1; j++) changeSum += b[j];
  const beta = s.lineSlope + slope;
  const intercept = s.lineIntercept + b[0] - slope * s.levelMean - s.changeMean * changeSum;
  if (!Number.isFinite(beta) || !Number.isFinite(intercept) || !Number.isFinite(olsStandardError)) return null;
  return { beta, intercept, olsStandardError, sigma2, residuals: fit.residuals, nobs: n };
}
