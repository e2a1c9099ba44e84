/**
 * The Kalman filter of a regression whose intercept and slope wander as random walks:
 *
 *   y_t = a_t + b_t x_t + e_t,            var(e_t) = R
 *   (a, b)_{t+1} = (a, b)_t + eta_t,      var(eta_t) = Q I
 *
 * with the exact diffuse initialisation of Durbin & Koopman (2012, "Time Series Analysis by
 * State Space Methods", 2nd ed., section 5.2): the first state is (a, b)_1 ~ N(0, kappa I) with
 * kappa -> infinity, carried exactly by splitting each state variance into P = kappa P_inf + P_star.
 * While F_inf = Z P_inf Z' > 0 (the diffuse rows, generically the first two) the update uses the
 * expansions of eqs. 5.12-5.14; afterwards P_inf is zero and the filter is the ordinary one
 * (section 4.3). The state's transition is the identity, which keeps every step a few scalar lines.
 *
 * The log-likelihood is the exact diffuse one (section 7.2.2, eq. 7.4): each diffuse row adds
 * -1/2 (log 2 pi + log F_inf), every other row -1/2 (log 2 pi + log F + v^2 / F).
 *
 * 2 x 2 symmetric matrices are held as [p11, p12, p22].
 */

/** A symmetric 2 x 2 matrix [p11, p12, p22]. */
export type Sym2 = [number, number, number];

/**
 * Below this F_inf, relative to the size of the terms it is summed from (|p11| + 2 |p12 x| + |p22| x^2),
 * a row's F_inf is rounding and the row is not diffuse (its design repeats an earlier one). Each diffuse
 * row lowers the rank of P_inf by one (P_inf - M M' / F_inf), so the period ends after two of them.
 */
const DIFFUSE_TOLERANCE = 1e-11;

export interface FilterInput {
  y: ArrayLike<number>;
  x: ArrayLike<number>;
  /** Variance of each state's step, Q. */
  stateVar: number;
  /** Variance of the observation noise, R. */
  obsVar: number;
}

/** Every quantity of one pass, kept for the smoother and the result (one entry per row). */
export interface FilterPath {
  n: number;
  /** Predicted state a_t = E(alpha_t | y_1..y_{t-1}): intercept and slope. */
  predictedA: Float64Array;
  predictedB: Float64Array;
  /** Predicted variances: P_star and P_inf, three numbers per row. */
  predictedStar: Float64Array;
  predictedInf: Float64Array;
  /** Filtered state a_{t|t} and its variance (P_star part; P_inf part nonzero only in the diffuse rows). */
  filteredA: Float64Array;
  filteredB: Float64Array;
  filteredStar: Float64Array;
  filteredInf: Float64Array;
  /** One-step-ahead error v_t = y_t - a_t - b_t x_t and its variance F_t (F_star in a diffuse row). */
  v: Float64Array;
  F: Float64Array;
  /** F_inf of each row: > 0 in a diffuse row, 0 afterwards. */
  Finf: Float64Array;
  /** 1 where the row was a diffuse row (F_inf > 0). */
  diffuse: Uint8Array;
  /** Rows up to the end of the diffuse period (P_inf zero from this row on). */
  diffuseRows: number;
  /** Count of rows with F_inf > 0 (the rows whose likelihood term is log F_inf). */
  diffuseSteps: number;
  logLikelihood: number;
}

const LOG_2PI = Math.log(2 * Math.PI);

/** Runs the filter with storage for the smoother. */
export function diffuseFilter(input: FilterInput): FilterPath {
  const { y, x, stateVar: q, obsVar: r } = input;
  const n = y.length;
  const out: FilterPath = {
    n,
    predictedA: new Float64Array(n), predictedB: new Float64Array(n),
    predictedStar: new Float64Array(3 * n), predictedInf: new Float64Array(3 * n),
    filteredA: new Float64Array(n), filteredB: new Float64Array(n),
    filteredStar: new Float64Array(3 * n), filteredInf: new Float64Array(3 * n),
    v: new Float64Array(n), F: new Float64Array(n), Finf: new Float64Array(n),
    diffuse: new Uint8Array(n), diffuseRows: 0, diffuseSteps: 0, logLikelihood: 0,
  };
  runFilter(y, x, q, r, out);
  return out;
}

/** The log-likelihood only, with no storage (the search for Q and R). */
export function diffuseLogLikelihood(y: ArrayLike<number>, x: ArrayLike<number>, stateVar: number, obsVar: number): { logLikelihood: number; sumScaled: number; sumLogF: number; sumLogFinf: number; diffuseSteps: number } {
  return runFilter(y, x, stateVar, obsVar, null);
}

function runFilter(y: ArrayLike<number>, x: ArrayLike<number>, q: number, r: number, out: FilterPath | null) {
  const n = y.length;
  let a = 0;
  let b = 0;
  // P_star = 0, P_inf = I: the exact diffuse start.
  let s11 = 0, s12 = 0, s22 = 0;
  let i11 = 1, i12 = 0, i22 = 1;
  let stillDiffuse = true;
  let sumScaled = 0; // sum of v^2 / F over the non-diffuse-step rows
  let sumLogF = 0;
  let sumLogFinf = 0;
  let diffuseSteps = 0;
  let diffuseRows = 0;
  for (let t = 0; t < n; t++) {
    const xt = x[t];
    if (out) {
      out.predictedA[t] = a; out.predictedB[t] = b;
      out.predictedStar[3 * t] = s11; out.predictedStar[3 * t + 1] = s12; out.predictedStar[3 * t + 2] = s22;
      out.predictedInf[3 * t] = i11; out.predictedInf[3 * t + 1] = i12; out.predictedInf[3 * t + 2] = i22;
    }
    const v = y[t] - a - b * xt;
    // M_star = P_star Z', F_star = Z M_star + R
    const ms0 = s11 + s12 * xt;
    const ms1 = s12 + s22 * xt;
    const Fstar = ms0 + ms1 * xt + r;
    let Finf = 0;
    let mi0 = 0;
    let mi1 = 0;
    if (stillDiffuse) {
      mi0 = i11 + i12 * xt;
      mi1 = i12 + i22 * xt;
      Finf = mi0 + mi1 * xt;
      const size = Math.abs(i11) + 2 * Math.abs(i12 * xt) + Math.abs(i22) * xt * xt;
      if (!(Finf > DIFFUSE_TOLERANCE * size)) Finf = 0;
    }
    if (Finf > 0) {
      // Diffuse row (Durbin & Koopman 2012, eqs. 5.12-5.14 with T = I):
      // K0 = M_inf / F_inf, K1 = M_star / F_inf - M_inf F_star / F_inf^2,
      // P_inf <- P_inf - M_inf M_inf' / F_inf, P_star <- P_star - M_star K0' - M_inf K1' + Q.
      const k00 = mi0 / Finf, k01 = mi1 / Finf;
      const k10 = ms0 / Finf - (mi0 * Fstar) / (Finf * Finf);
      const k11 = ms1 / Finf - (mi1 * Fstar) / (Finf * Finf);
      a += k00 * v;
      b += k01 * v;
      const n11 = i11 - mi0 * k00, n12 = i12 - mi0 * k01, n22 = i22 - mi1 * k01;
      const t11 = s11 - ms0 * k00 - mi0 * k10;
      const t12 = s12 - ms0 * k01 - mi0 * k11;
      const t22 = s22 - ms1 * k01 - mi1 * k11;
      i11 = n11; i12 = n12; i22 = n22;
      s11 = t11; s12 = t12; s22 = t22;
      sumLogFinf += Math.log(Finf);
      diffuseSteps++;
      if (out) { out.diffuse[t] = 1; out.F[t] = Fstar; out.Finf[t] = Finf; }
    } else {
      // Ordinary row (section 4.3.1): K = M / F, P <- P - M M' / F + Q.
      const k0 = ms0 / Fstar, k1 = ms1 / Fstar;
      a += k0 * v;
      b += k1 * v;
      s11 -= ms0 * k0; s12 -= ms0 * k1; s22 -= ms1 * k1;
      sumScaled += (v * v) / Fstar;
      sumLogF += Math.log(Fstar);
      if (out) { out.F[t] = Fstar; out.Finf[t] = 0; }
    }
    if (out) {
      out.v[t] = v;
      out.filteredA[t] = a; out.filteredB[t] = b;
      out.filteredStar[3 * t] = s11; out.filteredStar[3 * t + 1] = s12; out.filteredStar[3 * t + 2] = s22;
      out.filteredInf[3 * t] = stillDiffuse ? i11 : 0; out.filteredInf[3 * t + 1] = stillDiffuse ? i12 : 0; out.filteredInf[3 * t + 2] = stillDiffuse ? i22 : 0;
    }
    if (stillDiffuse) {
      // The diffuse period ends once P_inf has lost both its dimensions (exactly zero, not rounding).
      if (diffuseSteps === 2) {
        stillDiffuse = false;
        i11 = 0; i12 = 0; i22 = 0;
        diffuseRows = t + 1;
      }
    }
    s11 += q; s22 += q;
  }
  if (stillDiffuse) diffuseRows = n;
  const logLikelihood = -0.5 * (n * LOG_2PI + sumLogFinf + sumLogF + sumScaled);
  if (out) {
    out.diffuseRows = diffuseRows;
    out.diffuseSteps = diffuseSteps;
    out.logLikelihood = logLikelihood;
  }
  return { logLikelihood, sumScaled, sumLogF, sumLogFinf, diffuseSteps };
}
