/**
 * The date search of the Gregory-Hansen test: how the residual ADF's lags are set, and the
 * scan over candidate shift dates for the smallest ADF t.
 *
 * Lags. A fixed number is used at every date. A rule ('aic', 'bic', 'tstat') is applied
 * either once, to the residual of the same regression without the shift, the count then
 * used at every date (the default, as the reference library does for Zivot-Andrews), or
 * afresh at each date (as Gregory & Hansen 1996, sec. 3, did). Why 'once' is the default:
 * in our seeded simulation of two independent random walks (1,000 replications, seed
 * 9000 + T), choosing at each date by AIC rejected at the 5% point 10.3% (level) and 13.9%
 * (level-trend) of the time at T = 150 and 7.7% and 9.9% at T = 400, against 5.1%, 7.2%, 4.7%
 * and 5.6% for a count chosen once: taking the minimum over dates of statistics that each
 * pick their own lags makes the minimum too extreme for the published points.
 */
import { leastSquares } from '../regression/least-squares';
import type { GregoryHansenModel } from '../tables/gregory-hansen-table';
import type { LagOption } from '../unitroot/adf-core';
import { chooseAdfLags, type LagRule } from '../unitroot/adf-lag-search';
import { adfSearchTau } from './adf-search-tau';
import { gregoryHansenColumns } from './gregory-hansen-design';
import { ShiftResiduals } from './shift-residuals';

/** When a lag rule is applied: once, before the search, or at each candidate date. */
export type LagTiming = 'once' | 'each-date';

export const LAG_TIMINGS: readonly LagTiming[] = ['once', 'each-date'];

/** R^2 at or above which y counts as an exact combination of the regressors: 1 - 100 sqrt(machine epsilon). */
export const EXACT_FIT_R_SQUARED = 1 - 100 * Math.sqrt(Number.EPSILON);

/** How the residual ADF's lags are set at each date: one count for all, or a rule at each. */
export interface ShiftLagPlan {
  /** The count used at every date, or null when the rule is applied at each date. */
  everyDate: number | null;
  rule: 'fixed' | LagRule;
  maxLags: number;
}

/** The fixed columns of the regression without the shift: the xs, the constant and (level-trend) the trend. */
export function unshiftedColumns(xs: readonly Float64Array[], model: GregoryHansenModel): Float64Array[] {
  const T = xs[0].length;
  return gregoryHansenColumns(xs, model, T).slice(0, xs.length + (model === 'level-trend' ? 2 : 1));
}

/** Resolves the lag option into a plan; with timing 'once' the rule is applied to the no-shift residual. */
export function planShiftLags(y: Float64Array, xs: readonly Float64Array[], model: GregoryHansenModel, lags: LagOption, maxLags: number, timing: LagTiming): ShiftLagPlan {
  if (typeof lags === 'number') return { everyDate: lags, rule: 'fixed', maxLags };
  if (timing === 'each-date') return { everyDate: null, rule: lags, maxLags };
  const residual = leastSquares(y, unshiftedColumns(xs, model), { withoutCovariance: true }).residuals;
  return { everyDate: chooseAdfLags(residual, 'none', maxLags, lags).lags, rule: lags, maxLags };
}

/**
 * The start s in h..T-h of the new regime with the smallest residual ADF t (the first on
 * ties), by the fast residuals of shift-residuals.ts and the cross-product ADF of
 * adf-search-tau.ts; null when y is fitted exactly at every date.
 */
export function searchShiftDates(
  y: Float64Array,
  xs: Float64Array[],
  model: GregoryHansenModel,
  h: number,
  plan: ShiftLagPlan,
  columnNames: readonly string[],
): { s: number; tau: number } | null {
  const T = y.length;
  const fixed = unshiftedColumns(xs, model);
  const shifter = new ShiftResiduals(y, fixed, model === 'regime' ? xs : [], columnNames.slice(0, fixed.length));
  let tss = 0;
  for (let t = 0; t < T; t++) tss += y[t] * y[t];
  const e = new Float64Array(T);
  let best: { s: number; tau: number } | null = null;
  for (let s = h; s <= T - h; s++) {
    const ssr = shifter.residualsAt(s, e);
    if (ssr < 0 || ssr <= (1 - EXACT_FIT_R_SQUARED) * tss) continue; // collinear, or an exact fit: nothing to test
    const p = plan.everyDate ?? chooseAdfLags(e, 'none', plan.maxLags, plan.rule as LagRule).lags;
    const tau = adfSearchTau(e, p);
    if (Number.isFinite(tau) && (best === null || tau < best.tau)) best = { s, tau };
  }
  return best;
}
