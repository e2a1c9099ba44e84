/**
 * Likelihood-ratio tests on a Johansen system (Johansen 1995, ch. 7 and 8; Johansen &
 * Juselius 1990), from the same product moments as the rank test (reduced-rank-regression.ts):
 *
 * Is the long-run relation a given one? H0: β = H φ, with H the given vector (and, where the
 * case puts a constant or trend inside the relation, a free coefficient on it). With λ*_j the
 * eigenvalues of |λ H'S11H - H'S10 S00^{-1} S01 H| = 0,
 *   LR = n Σ_{j≤r} ln[(1 - λ*_j) / (1 - λ_j)],  χ² with r (p - s) degrees of freedom
 * (p rows of β, s columns of H; here r = 1 and s = 1 or 2, so m - 1).
 *
 * Does series i never adjust (weak exogeneity)? H0: row i of α is zero. Conditioning on the
 * change of series i (subscript b) and keeping the others (a), the eigenvalues λ*_j of
 * |λ S11.b - S1a.b S_aa.b^{-1} S_a1.b| = 0 give the same LR with r degrees of freedom
 * (Johansen 1995, Theorem 8.1), where S_ij.b = S_ij - S_ib S_bb^{-1} S_bj.
 */
import { CholeskyDecomposition, EigenvalueDecomposition, Matrix, solve } from 'ml-matrix';
import { chiSquareCriticalValues, chiSquareUpperP } from '../distributions';
import { MooringInputError } from '../errors';
import type { Deterministic, TestResult } from '../result';
import type { JohansenCase } from './deterministic-case';
import { johansenDesign } from './johansen-design';
import { checkJohansenInput } from './johansen-input';
import type { JohansenOptions } from './johansen';
import { reducedRankRegression, type ReducedRankFit } from './reduced-rank-regression';

/** One test of the restrictions, in the one result shape and the fields of the JSON. */
export interface RestrictionTest {
  statistic: number;
  df: number;
  pValue: number;
  result: TestResult;
}

export interface ExogeneityTest extends RestrictionTest {
  series: string;
}

/** Eigenvalues (descending) of the symmetric-definite pencil |λ B - A| = 0. */
export function pencilEigenvalues(a: Matrix, b: Matrix): number[] {
  const chol = new CholeskyDecomposition(b);
  if (!chol.isPositiveDefinite()) {
    throw new MooringInputError('The restricted relation leaves the series exactly dependent on one another: choose another vector or remove a series.');
  }
  const lower = chol.lowerTriangularMatrix;
  const half = solve(lower, a);
  const c = solve(lower, half.transpose());
  const n = c.rows;
  const sym = Matrix.zeros(n, n);
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) sym.set(i, j, 0.5 * (c.get(i, j) + c.get(j, i)));
  const values = new EigenvalueDecomposition(sym, { assumeSymmetric: true }).realEigenvalues;
  return values.map((v) => Math.min(Math.max(v, 0), 1 - 1e-15)).sort((x, y) => y - x);
}

/** LR = n Σ_{j<r} ln[(1 - restricted_j) / (1 - free_j)], never below zero (rounding). */
function likelihoodRatio(n: number, restricted: number[], free: number[], r: number): number {
  let s = 0;
  for (let j = 0; j < r; j++) s += Math.log1p(-(restricted[j] ?? 0)) - Math.log1p(-free[j]);
  return Math.max(n * s, 0);
}

/** Fits the system once for the restriction tests. */
export function restrictionFit(block: ArrayLike<number>[], options: JohansenOptions, names?: string[]): { fit: ReducedRankFit; names: string[]; m: number; p: number; deterministic: Deterministic } {
  const input = checkJohansenInput(block, options, names);
  const design = johansenDesign(input.block, input.lags, input.caseName, input.names);
  const fit = reducedRankRegression(design);
  return { fit, names: input.names, m: input.block.length, p: design.levels.length, deterministic: DETERMINISTIC[input.caseName] };
}

const DETERMINISTIC: Record<JohansenCase, Deterministic> = { none: 'none', 'restricted-constant': 'const', constant: 'const', 'restricted-trend': 'trend', trend: 'trend' };

function asResult(
  test: string,
  title: string,
  statistic: number,
  df: number,
  pValue: number,
  nobs: number,
  lags: number,
  deterministic: Deterministic,
  nullHypothesis: string,
  alternative: string,
  warnings: string[],
): TestResult {
  return {
    test,
    title,
    statisticName: 'LR',
    statistic,
    pValue,
    critical: chiSquareCriticalValues(df),
    rejectTail: 'upper',
    lags,
    lagRule: 'fixed',
    nobs,
    deterministic,
    nullHypothesis,
    alternative,
    warnings,
    details: [{ key: 'degreesOfFreedom', label: 'Degrees of freedom (chi-square)', value: df }],
  };
}

/**
 * The LR test that the (single) long-run relation is the given vector up to scale: "is the
 * spread simply A - B?". vector has one weight per series; a constant or trend inside the
 * relation stays free.
 */
export function betaRestrictionTest(block: ArrayLike<number>[], vector: readonly number[], options: JohansenOptions = {}, names?: string[]): RestrictionTest {
  const { fit, names: labels, m, p, deterministic } = restrictionFit(block, options, names);
  if (vector.length !== m) {
    throw new MooringInputError(`The relation to test needs one weight per series (${m}: ${labels.join(', ')}); got ${vector.length}.`);
  }
  if (vector.some((v) => !Number.isFinite(v)) || vector.every((v) => v === 0)) {
    throw new MooringInputError('The relation to test needs finite weights, not all zero, such as 1,-1.');
  }
  const columns = p > m ? 2 : 1;
  const H = Matrix.zeros(p, columns);
  vector.forEach((v, i) => H.set(i, 0, v));
  if (columns === 2) H.set(p - 1, 1, 1);
  const middle = fit.s01.transpose().mmul(solve(fit.s00, fit.s01));
  const a = H.transpose().mmul(middle).mmul(H);
  const b = H.transpose().mmul(fit.s11).mmul(H);
  const restricted = pencilEigenvalues(a, b);
  const r = 1;
  const df = r * (p - columns);
  const statistic = likelihoodRatio(fit.nobs, restricted, fit.eigenvalues, r);
  const pValue = chiSquareUpperP(statistic, df);
  const relation = vector.map((v, i) => `${v} x ${labels[i]}`).join(' + ');
  const result = asResult(
    'Johansen relation restriction',
    `Is the long-run relation ${relation} (up to scale)?`,
    statistic,
    df,
    pValue,
    fit.nobs,
    options.lags ?? 1,
    deterministic,
    `the one long-run relation is ${relation} (up to scale)`,
    'the relation has other weights',
    ['The test assumes exactly one long-run relation; check the rank test first.'],
  );
  return { statistic, df, pValue, result };
}

/**
 * The LR test, for each series, that its adjustment coefficients are zero (it never moves to
 * close a gap: weakly exogenous), with r relations (default 1).
 */
export function exogeneityTests(block: ArrayLike<number>[], options: JohansenOptions & { rank?: number } = {}, names?: string[]): ExogeneityTest[] {
  const { fit, names: labels, m, deterministic } = restrictionFit(block, options, names);
  const r = options.rank ?? 1;
  if (!Number.isInteger(r) || r < 1 || r > m - 1) {
    throw new MooringInputError(`The adjustment test needs a number of relations from 1 to ${m - 1}; got ${String(r)}.`);
  }
  const s00 = fit.s00;
  const s01 = fit.s01;
  const s11 = fit.s11;
  const p = s11.rows;
  return labels.map((name, i) => {
    const others = Array.from({ length: m }, (_, j) => j).filter((j) => j !== i);
    const sbb = s00.get(i, i);
    const saa = Matrix.zeros(m - 1, m - 1);
    const sa1 = Matrix.zeros(m - 1, p);
    others.forEach((ja, u) => {
      others.forEach((jb, v) => saa.set(u, v, s00.get(ja, jb) - (s00.get(ja, i) * s00.get(i, jb)) / sbb));
      for (let c = 0; c < p; c++) sa1.set(u, c, s01.get(ja, c) - (s00.get(ja, i) * s01.get(i, c)) / sbb);
    });
    const s11b = Matrix.zeros(p, p);
    for (let c = 0; c < p; c++) for (let d = 0; d < p; d++) s11b.set(c, d, s11.get(c, d) - (s01.get(i, c) * s01.get(i, d)) / sbb);
    const a = sa1.transpose().mmul(solve(saa, sa1));
    const restricted = pencilEigenvalues(a, s11b);
    const statistic = likelihoodRatio(fit.nobs, restricted, fit.eigenvalues, r);
    const pValue = chiSquareUpperP(statistic, r);
    const result = asResult(
      'Johansen adjustment (weak exogeneity)',
      `Does ${name} move to close the gap?`,
      statistic,
      r,
      pValue,
      fit.nobs,
      options.lags ?? 1,
      deterministic,
      `${name} does not move to close a gap to the long-run relation${r > 1 ? 's' : ''} (its adjustment coefficients are zero)`,
      `${name} moves back toward the relation`,
      [`The test takes ${r} long-run relation${r > 1 ? 's' : ''} as given; check the rank test first.`],
    );
    return { series: name, statistic, df: r, pValue, result };
  });
}
