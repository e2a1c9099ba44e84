/**
 * Monte Carlo draws from the asymptotic null distributions of the Johansen trace and
 * maximum-eigenvalue statistics, by simulating the limiting Brownian functional directly.
 *
 * Under H0: rank = r with m = n - r common stochastic trends, both statistics converge to
 * functionals of an m-dimensional standard Brownian motion W (Johansen 1995: the limits
 * are stated in ch. 6 and derived in ch. 11 for the five deterministic cases; ch. 15
 * tabulates them by simulation, as done here):
 *
 *   Q = (∫ dW F')' (∫ F F' du)^{-1} (∫ F dW'),   trace -> tr Q,   maxEigen -> λmax(Q),
 *
 * where F is W augmented, or partly replaced, by deterministic functions of u in [0, 1]
 * and then corrected (least-squares residual, in the L2[0, 1] sense) for the unrestricted
 * deterministic terms:
 *
 *   none                 F = W
 *   restricted-constant  F = (W', 1)'
 *   constant             F = (W_1, ..., W_{m-1}, u)' corrected for 1        (m = 1: F = u)
 *   restricted-trend     F = (W', u)' corrected for 1
 *   trend                F = (W_1, ..., W_{m-1}, u^2)' corrected for (1, u)  (m = 1: F = u^2)
 *
 * Discretisation (T steps). ε_1..ε_T are iid N(0, I_m); S_t = ε_1 + ... + ε_t, S_0 = 0;
 * W(u) at u = (t-1)/T is S_{t-1}/√T, so dW over step t is ε_t/√T. With the row vector
 * G_t = (S_{t-1}/√T, 1, u_t, u_t^2) and u_t the midpoint (t - 1/2)/T of step t,
 *
 *   ∫ G G' du  ≈  (1/T) Σ_t G_t G_t'           ∫ G dW'  ≈  (1/√T) Σ_t G_t ε_t'.
 *
 * The stochastic part is taken at the left end of each step (Itô sums: G_t is known before
 * ε_t is drawn, as the lagged level is in the VAR); deterministic terms use the midpoint
 * rule because that integrates them with O(1/T^2) error. Correcting F for Z (the
 * unrestricted terms) is then done on these moment matrices (Frisch-Waugh-Lovell):
 *   ∫FF' = M_xx - M_xz M_zz^{-1} M_zx,   ∫F dW' = A_x - M_xz M_zz^{-1} A_z.
 * The finite-T error of the draws is O(1/T); callers may also take the same paths at T/2
 * steps (pairs of increments merged, `alsoHalfSteps`) to extrapolate it away.
 *
 * One set of Brownian paths serves all requested cases, so the five cases' draws are
 * correlated with one another but each case's draws are an iid sample.
 */
import { CholeskyDecomposition, EigenvalueDecomposition, Matrix, solve } from 'ml-matrix';
import { MooringInputError } from '../errors';
import { SeededRandom } from '../random';
import { JOHANSEN_CASES, type JohansenCase, requireCommonTrends, requireJohansenCase } from './deterministic-case';

/** Sorted draws of the two statistics for one case. */
export interface JohansenDraws {
  trace: Float64Array;
  maxEigen: Float64Array;
}

export interface JohansenSimulationOptions {
  /** n - r, the dimension of the Brownian motion (1..12). */
  nMinusR: number;
  /** Steps T of the random-walk approximation of W (even, at least 20). */
  steps: number;
  replications: number;
  seed: number;
  /** Which cases to draw (default: all five), all from the same paths. */
  cases?: readonly JohansenCase[];
  /** Also return the draws on the same paths at T/2 steps (for extrapolation in T). */
  alsoHalfSteps?: boolean;
}

export interface JohansenSimulation {
  /** Draws at T steps, sorted ascending, by case. */
  draws: Partial<Record<JohansenCase, JohansenDraws>>;
  /** Draws at T/2 steps from the same increments (merged in pairs), when asked for. */
  halfStepDraws?: Partial<Record<JohansenCase, JohansenDraws>>;
}

/**
 * Draws `replications` values of the limiting trace and maximum-eigenvalue statistics for
 * each requested case, sorted ascending. Pure: the same options give the same draws.
 * Method: simulation of the Brownian functional of Johansen (1995), see the file header.
 */
export function simulateJohansenDistributions(options: JohansenSimulationOptions): JohansenSimulation {
  const { nMinusR: m, steps, replications, seed, alsoHalfSteps = false } = options;
  const cases = options.cases ?? JOHANSEN_CASES;
  requireCommonTrends(m);
  for (const c of cases) requireJohansenCase(c);
  if (!Number.isInteger(steps) || steps < 20 || steps % 2 !== 0) {
    throw new MooringInputError(`The number of steps must be an even whole number of at least 20; got ${steps}.`);
  }
  if (!Number.isInteger(replications) || replications < 1) {
    throw new MooringInputError(`The number of replications must be a positive whole number; got ${replications}.`);
  }

  const rng = new SeededRandom(seed);
  const fine = new MomentAccumulator(m);
  const coarse = new MomentAccumulator(m);
  const eps = new Float64Array(m);
  const pair = new Float64Array(m);
  const out = emptyDraws(cases, replications);
  const outHalf = alsoHalfSteps ? emptyDraws(cases, replications) : undefined;
  const selections = cases.map((c) => caseSelection(c, m));

  for (let rep = 0; rep < replications; rep++) {
    fine.reset();
    coarse.reset();
    for (let t = 1; t <= steps; t++) {
      for (let k = 0; k < m; k++) eps[k] = rng.normal();
      fine.add(eps, (t - 0.5) / steps);
      if (alsoHalfSteps) {
        if (t % 2 === 1) pair.set(eps);
        else {
          for (let k = 0; k < m; k++) pair[k] = (pair[k] + eps[k]) * Math.SQRT1_2;
          coarse.add(pair, (t / 2 - 0.5) / (steps / 2));
        }
      }
    }
    recordStatistics(fine, selections, cases, out, rep);
    if (outHalf) recordStatistics(coarse, selections, cases, outHalf, rep);
  }
  for (const c of cases) {
    out[c]!.trace.sort();
    out[c]!.maxEigen.sort();
    outHalf?.[c]!.trace.sort();
    outHalf?.[c]!.maxEigen.sort();
  }
  return outHalf ? { draws: out, halfStepDraws: outHalf } : { draws: out };
}

/**
 * Sorted draws of the limiting trace and maximum-eigenvalue statistics for one case
 * (the same draws `simulateJohansenDistributions` gives for that case with the same options).
 */
export function simulateJohansenDistribution(
  caseName: JohansenCase,
  nMinusR: number,
  steps: number,
  replications: number,
  seed: number,
): JohansenDraws {
  requireJohansenCase(caseName);
  return simulateJohansenDistributions({ nMinusR, steps, replications, seed, cases: [caseName] }).draws[caseName]!;
}

/** Columns of G = (W_1..W_m, 1, u, u^2) that form F (x) and that F is corrected for (z). */
interface Selection {
  x: number[];
  z: number[];
}

function caseSelection(caseName: JohansenCase, m: number): Selection {
  const w = Array.from({ length: m }, (_, i) => i);
  const one = m;
  const u = m + 1;
  const u2 = m + 2;
  switch (caseName) {
    case 'none':
      return { x: w, z: [] };
    case 'restricted-constant':
      return { x: [...w, one], z: [] };
    case 'constant':
      // in the direction of the drift the level is dominated by the trend it carries, so u replaces one W (Johansen 1995, ch. 11)
      return { x: [...w.slice(0, m - 1), u], z: [one] };
    case 'restricted-trend':
      return { x: [...w, u], z: [one] };
    case 'trend':
      return { x: [...w.slice(0, m - 1), u2], z: [one, u] };
  }
}

function emptyDraws(cases: readonly JohansenCase[], n: number): Partial<Record<JohansenCase, JohansenDraws>> {
  const out: Partial<Record<JohansenCase, JohansenDraws>> = {};
  for (const c of cases) out[c] = { trace: new Float64Array(n), maxEigen: new Float64Array(n) };
  return out;
}

function recordStatistics(
  acc: MomentAccumulator,
  selections: Selection[],
  cases: readonly JohansenCase[],
  out: Partial<Record<JohansenCase, JohansenDraws>>,
  rep: number,
): void {
  const { gg, ge } = acc.scaledMoments();
  selections.forEach((sel, i) => {
    const eigen = functionalEigenvalues(gg, ge, sel);
    let trace = 0;
    let max = -Infinity;
    for (const v of eigen) {
      trace += v;
      if (v > max) max = v;
    }
    out[cases[i]]!.trace[rep] = trace;
    out[cases[i]]!.maxEigen[rep] = max;
  });
}

/** Eigenvalues of Q = A_F' (∫FF')^{-1} A_F for one case, from the moments of G. */
function functionalEigenvalues(gg: Matrix, ge: Matrix, sel: Selection): number[] {
  const all = Array.from({ length: ge.columns }, (_, k) => k);
  let fF = gg.selection(sel.x, sel.x);
  let fW = ge.selection(sel.x, all);
  if (sel.z.length > 0) {
    const zz = gg.selection(sel.z, sel.z);
    const zx = gg.selection(sel.z, sel.x);
    const k = solve(zz, zx); // regression of the x terms on the z terms
    fF = fF.sub(zx.transpose().mmul(k));
    fW = fW.sub(k.transpose().mmul(ge.selection(sel.z, all)));
    fF = symmetricPart(fF); // the product above is symmetric only up to rounding
  }
  const q = fW.transpose().mmul(new CholeskyDecomposition(fF).solve(fW));
  return new EigenvalueDecomposition(symmetricPart(q), { assumeSymmetric: true }).realEigenvalues;
}

function symmetricPart(a: Matrix): Matrix {
  return a.add(a.transpose()).mul(0.5);
}

/** Running sums Σ G_t G_t' and Σ G_t ε_t' over the steps of one path (unscaled). */
class MomentAccumulator {
  private readonly m: number;
  private readonly p: number;
  private readonly level: Float64Array;
  private readonly g: Float64Array;
  private readonly sumGG: Float64Array;
  private readonly sumGE: Float64Array;
  private steps = 0;

  constructor(m: number) {
    this.m = m;
    this.p = m + 3;
    this.level = new Float64Array(m);
    this.g = new Float64Array(this.p);
    this.sumGG = new Float64Array(this.p * this.p);
    this.sumGE = new Float64Array(this.p * m);
  }

  reset(): void {
    this.level.fill(0);
    this.sumGG.fill(0);
    this.sumGE.fill(0);
    this.steps = 0;
  }

  /** One step: G_t = (S_{t-1}, 1, u, u^2) with the level before this step's increment. */
  add(eps: Float64Array, u: number): void {
    const { m, p, g, level, sumGG, sumGE } = this;
    g.set(level);
    g[m] = 1;
    g[m + 1] = u;
    g[m + 2] = u * u;
    for (let i = 0; i < p; i++) {
      const gi = g[i];
      const row = i * p;
      for (let j = i; j < p; j++) sumGG[row + j] += gi * g[j];
      const rowE = i * m;
      for (let k = 0; k < m; k++) sumGE[rowE + k] += gi * eps[k];
    }
    for (let k = 0; k < m; k++) level[k] += eps[k];
    this.steps++;
  }

  /** (1/T) Σ G G' and (1/√T) Σ G ε' with the level block scaled by 1/√T (W = S/√T). */
  scaledMoments(): { gg: Matrix; ge: Matrix } {
    const { m, p, steps } = this;
    const scale = (i: number) => (i < m ? 1 / Math.sqrt(steps) : 1);
    const gg = new Matrix(p, p);
    for (let i = 0; i < p; i++) {
      for (let j = i; j < p; j++) {
        const v = (this.sumGG[i * p + j] * scale(i) * scale(j)) / steps;
        gg.set(i, j, v);
        gg.set(j, i, v);
      }
    }
    const ge = new Matrix(p, m);
    for (let i = 0; i < p; i++) {
      for (let k = 0; k < m; k++) ge.set(i, k, (this.sumGE[i * m + k] * scale(i)) / Math.sqrt(steps));
    }
    return { gg, ge };
  }
}
