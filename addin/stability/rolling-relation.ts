/**
 * How a pair's long-run relation moves through time: over rolling windows (the last `window`
 * rows up to each end) or expanding ones (every row from the first), the hedge ratio, the
 * half-life of the spread, and the Engle-Granger (1987) p-value.
 *
 * - Hedge ratio: least squares of y on x with a constant in each window, from running means
 *   and co-moments: beta = Cxy / Cxx, intercept = mean(y) - beta mean(x).
 * - Half-life: the AR(1) with a constant of the window's spread s = y - beta x (the window's
 *   own beta), lambda = cov(s_{t-1}, Δs_t) / var(s_{t-1}) over the window's t >= its second
 *   row; with L = y_{t-1} - beta x_{t-1} and D = Δy_t - beta Δx_t both follow from running
 *   co-moments of (y_{t-1}, x_{t-1}, Δy_t, Δx_t):
 *     cov(L, D) = C(y-, Δy) - beta (C(y-, Δx) + C(x-, Δy)) + beta^2 C(x-, Δx),
 *     var(L)    = C(y-, y-) - 2 beta C(y-, x-) + beta^2 C(x-, x-);
 *   then ln 2 / -ln|1 + lambda| (spread/half-life.ts).
 * - p-value: the residual ADF must be refitted in each window (its lag search depends on
 *   every residual); it uses the screen's cross-product lag search, and `step` thins the windows.
 * Each window's numbers equal the single-pair functions run on that window's rows.
 */
import { EXACT_FIT_R_SQUARED, requireAlignedSeries } from '../cointegration/cointegrating-regression';
import { residualTauPValue } from '../cointegration/residual-tables';
import { MooringInputError } from '../errors';
import { powerOfTwoScale, scaled } from '../linalg/power-of-two-scale';
import { ResidualAdfWorkspace } from '../screen/residual-adf-workspace';
import { halfLifeFromSpeed } from '../spread/half-life';
import { resolveMaxLag } from '../unitroot/max-lag';
import { SlidingComoments } from './sliding-comoments';
import { windowPlan } from './window-plan';
import { rollingSummary } from './rolling-summary';

/** The windows to look at. */
export interface RollingOptions {
  /** Rows in each rolling window; for expanding windows, rows in the first. */
  window: number;
  /** Rows between window ends (default 1); the last window always ends on the last row. */
  step?: number;
  /** Windows that all start on the first row (default false: rolling). */
  expanding?: boolean;
  /**
   * What one row is, for the summary's words: "day", "week", "month", ... (report/row-period.ts);
   * default "row". Only words change: every number stays a count of rows.
   */
  period?: string;
}

/** One column per statistic, one entry per window, oldest window first. */
export interface RollingRelation {
  expanding: boolean;
  window: number;
  step: number;
  /** First and last row (0-based) of each window. */
  startRow: number[];
  endRow: number[];
  nobs: number[];
  /** Hedge ratio; null where x does not move in the window. */
  beta: (number | null)[];
  intercept: (number | null)[];
  rSquared: (number | null)[];
  /** Half-life of the window's spread in rows; null where it does not revert. */
  halfLife: (number | null)[];
  /** Engle-Granger tau; null for an exact fit or where x does not move. */
  statistic: (number | null)[];
  /** Engle-Granger p-value; 0 for an exact fit; null where x does not move. */
  pValue: (number | null)[];
  lags: (number | null)[];
  /** The story in sentences: windows passing at 5%, the latest window, the range of the hedge ratio, and cautions. */
  summary: string[];
}

/** Rolling or expanding Engle-Granger, hedge ratio and half-life of y on x (see the file comment). */
export function rollingRelation(givenY: ArrayLike<number>, givenX: ArrayLike<number>, options: RollingOptions, names = { y: 'y', x: 'x' }): RollingRelation {
  if (!options || typeof options !== 'object') throw new MooringInputError('Give the window: rollingRelation(y, x, { window: 250 }).');
  const T = requireAlignedSeries([givenY, givenX], [names.y, names.x]);
  // Every statistic but the line is free of units; the co-moments are not (they overflow for
  // prices of 1e300 and vanish for 1e-300): both series are brought to a size near one by a
  // power of two, and the hedge ratio and intercept are converted back below.
  const fy = powerOfTwoScale(givenY);
  const fx = powerOfTwoScale(givenX);
  const y = scaled(givenY, fy);
  const x = scaled(givenX, fx);
  const step = options.step ?? 1;
  const expanding = options.expanding === true;
  const plan = windowPlan(T, options.window, step, expanding);
  const levels = new SlidingComoments(2, (t, out) => {
    out[0] = x[t];
    out[1] = y[t];
  });
  const changes = new SlidingComoments(4, (t, out) => {
    out[0] = y[t - 1];
    out[1] = x[t - 1];
    out[2] = y[t] - y[t - 1];
    out[3] = x[t] - x[t - 1];
  });
  const adf = new ResidualAdfWorkspace();
  const residual = new Float64Array(expanding ? T : options.window);
  const out: RollingRelation = {
    expanding, window: options.window, step, startRow: plan.start, endRow: plan.end, nobs: [],
    beta: [], intercept: [], rSquared: [], halfLife: [], statistic: [], pValue: [], lags: [], summary: [],
  };
  let flatWindows = 0;
  plan.end.forEach((e, k) => {
    const s = plan.start[k];
    const n = e - s + 1;
    levels.moveTo(s, e);
    changes.moveTo(s + 1, e);
    const L = levels.moments;
    const cxx = L.comoment(0, 0);
    const cxy = L.comoment(0, 1);
    const cyy = L.comoment(1, 1);
    out.nobs.push(n);
    if (!(Math.sqrt(cxx / n) > 1e-10 * Math.abs(L.mean(0))) || !(cyy > 0)) {
      flatWindows++;
      for (const column of [out.beta, out.intercept, out.rSquared, out.halfLife, out.statistic, out.pValue, out.lags]) column.push(null);
      return;
    }
    const beta = cxy / cxx;
    const intercept = L.mean(1) - beta * L.mean(0);
    const rSquared = (cxy / cxx) * (cxy / cyy);
    out.beta.push((beta * fx) / fy);
    out.intercept.push(intercept / fy);
    out.rSquared.push(rSquared);
    if (rSquared >= EXACT_FIT_R_SQUARED) {
      out.halfLife.push(null);
      out.statistic.push(null);
      out.pValue.push(0);
      out.lags.push(null);
      return;
    }
    const C = changes.moments;
    const covLD = C.comoment(0, 2) - beta * (C.comoment(0, 3) + C.comoment(1, 2)) + beta * beta * C.comoment(1, 3);
    const varL = C.comoment(0, 0) - 2 * beta * C.comoment(0, 1) + beta * beta * C.comoment(1, 1);
    const lambda = covLD / varL;
    out.halfLife.push(Number.isFinite(lambda) ? halfLifeFromSpeed(lambda).halfLife : null);
    for (let t = s; t <= e; t++) residual[t - s] = y[t] - intercept - beta * x[t];
    const test = adf.test(residual, n, resolveMaxLag(n, 'none'), 'aic');
    const ok = Number.isFinite(test.tau);
    out.statistic.push(ok ? test.tau : null);
    out.pValue.push(ok ? residualTauPValue(test.tau, 'const', 2) : null);
    out.lags.push(ok ? test.lags : null);
  });
  out.summary = rollingSummary(out, names, flatWindows, options.period);
  return out;
}
