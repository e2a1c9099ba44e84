/**
 * Maximum likelihood for the two variances of the wandering line (diffuse-filter.ts).
 *
 * The likelihood is concentrated over the scale (Harvey 1989, "Forecasting, Structural Time
 * Series Models and the Kalman Filter", section 3.4; Durbin & Koopman 2012, section 2.10.2 for the
 * local level): with R = sigma^2 and Q = q sigma^2 the filter run with R = 1, Q = q gives every
 * v_t and F_t up to the factor sigma^2 (the diffuse part P_inf does not scale), so
 *   sigma_hat^2 = sum over the non-diffuse rows of v_t^2 / F_t, divided by their count m, and
 *   log L_c(q) = -1/2 (n log 2 pi + sum log F_inf + sum log F_t + m log sigma_hat^2 + m).
 * One dimension is left, the ratio q, searched in log q: a grid of steps of 2 from e^-30 to e^8
 * (the best grid point brackets a maximum between its neighbours however flat the surface),
 * then golden-section refinement of that bracket to 1e-6 in log q (a change of q by one part in
 * a million moves the log-likelihood far below the 0.01 the reference check allows). A maximum
 * at the grid's low end means the data show no measurable drift (q reported as e^-30).
 */
import { MooringInputError } from '../errors';
import { diffuseLogLikelihood } from './diffuse-filter';

const LOG_2PI = Math.log(2 * Math.PI);
const LOW = -30;
const HIGH = 8;
const STEP = 2;
const GOLDEN = (Math.sqrt(5) - 1) / 2;

export interface VarianceEstimate {
  stateVar: number;
  obsVar: number;
  logLikelihood: number;
  /** True when the search stopped at its low end: no measurable drift. */
  atLowerEnd: boolean;
}

/** Concentrated log-likelihood at log q, and sigma_hat^2 there. */
function concentrated(y: ArrayLike<number>, x: ArrayLike<number>, logQ: number): { value: number; scale: number } {
  const run = diffuseLogLikelihood(y, x, Math.exp(logQ), 1);
  const m = y.length - run.diffuseSteps;
  const scale = run.sumScaled / m;
  if (!(scale > 0) || !Number.isFinite(scale)) return { value: Number.NEGATIVE_INFINITY, scale };
  const value = -0.5 * (y.length * LOG_2PI + run.sumLogFinf + run.sumLogF + m * Math.log(scale) + m);
  return { value: Number.isFinite(value) ? value : Number.NEGATIVE_INFINITY, scale };
}

/** The (Q, R) that maximise the exact diffuse log-likelihood. */
export function estimateVariances(y: ArrayLike<number>, x: ArrayLike<number>): VarianceEstimate {
  let bestAt = LOW;
  let best = Number.NEGATIVE_INFINITY;
  for (let u = LOW; u <= HIGH; u += STEP) {
    const c = concentrated(y, x, u).value;
    if (c > best) {
      best = c;
      bestAt = u;
    }
  }
  if (!Number.isFinite(best)) {
    throw new MooringInputError('The moving hedge ratio cannot be estimated: y is an exact line in x (no noise is left to weigh), or the rows repeat. Check that one column is not a copy or a formula of the other.');
  }
  let lo = Math.max(LOW, bestAt - STEP);
  let hi = Math.min(HIGH, bestAt + STEP);
  let c = hi - GOLDEN * (hi - lo);
  let d = lo + GOLDEN * (hi - lo);
  let fc = concentrated(y, x, c).value;
  let fd = concentrated(y, x, d).value;
  while (hi - lo > 1e-6) {
    if (fc >= fd) {
      hi = d; d = c; fd = fc;
      c = hi - GOLDEN * (hi - lo);
      fc = concentrated(y, x, c).value;
    } else {
      lo = c; c = d; fc = fd;
      d = lo + GOLDEN * (hi - lo);
      fd = concentrated(y, x, d).value;
    }
  }
  let logQ = (lo + hi) / 2;
  let found = concentrated(y, x, logQ);
  // Keep the grid point if the refinement did not beat it (a maximum on the boundary).
  if (found.value < best) {
    logQ = bestAt;
    found = concentrated(y, x, logQ);
  }
  const atLowerEnd = logQ - LOW < 1e-3;
  return { stateVar: Math.exp(logQ) * found.scale, obsVar: found.scale, logLikelihood: found.value, atLowerEnd };
}
