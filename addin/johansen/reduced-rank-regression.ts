/**
 * Johansen's reduced-rank regression (Johansen 1988; Johansen 1991;
 * Johansen 1995, ch. 6): partial the short-run block out of the changes and the levels,
 * form the product moments of what is left, and solve one symmetric eigenproblem.
 *
 *   R0, R1   residuals of Δx_t and of the levels block on the short-run block
 *   S_ij     R_i' R_j / n
 *   λ        eigenvalues of S11^{-1} S10 S00^{-1} S01, i.e. the squared canonical
 *            correlations of R0 and R1, in descending order
 *   v        eigenvectors with v' S11 v = 1 (the unnormalised long-run relations)
 *
 * With S11 = L L' (Cholesky), the problem is the symmetric one
 * C u = λ u, C = L^{-1} S10 S00^{-1} S01 L^{-T}, and v = L^{-T} u: solving it this way
 * keeps the eigenvalues real and in [0, 1) and gives S11-orthonormal vectors directly.
 *
 * The residuals are never formed: S_ij come from the cross products of all the columns and
 * one Cholesky factorisation, or, where that would lose accuracy, from one Householder QR of
 * the short-run block (concentrated-moments.ts).
 */
import { CholeskyDecomposition, EigenvalueDecomposition, Matrix, solve } from 'ml-matrix';
import { MooringInputError } from '../errors';
import { momentsByCholesky, momentsByQr, type ConcentratedMoments } from './concentrated-moments';
import type { JohansenDesign } from './johansen-design';

/** What the eigenproblem gives: all p eigenvalues and S11-orthonormal eigenvectors. */
export interface ReducedRankFit {
  nobs: number;
  /** All p eigenvalues (p = columns of the levels block), descending, in [0, 1). */
  eigenvalues: number[];
  /** vectors[j]: the eigenvector of eigenvalue j (length p), scaled so v' S11 v = 1. */
  vectors: number[][];
  /** S01 = R0' R1 / n, m x p, for the loadings. */
  s01: Matrix;
  /** S11 = R1' R1 / n, p x p. */
  s11: Matrix;
  /** S00 = R0' R0 / n, m x m, for the tests on the relations and loadings (restrictions.ts). */
  s00: Matrix;
}

/** Eigenvalues this close to 1 mean a combination of the changes is fitted exactly. */
const EXACT_FIT = 1e-12;

/**
 * Solves the reduced-rank regression of the design. Throws a MooringInputError naming the
 * column when a series is an exact combination of others, or when the sample is too short
 * for the columns (the caller checks the row count first, so that is a backstop).
 */
export function reducedRankRegression(design: JohansenDesign): ReducedRankFit {
  requireEnoughRows(design);
  return eigenSolution(design.nobs, momentsByCholesky(design) ?? momentsByQr(design));
}

/**
 * The same regression with the moments always from Householder QR (momentsByQr): the route
 * the cross products are checked against in the tests, and the one they fall back to.
 */
export function reducedRankRegressionByQr(design: JohansenDesign): ReducedRankFit {
  requireEnoughRows(design);
  return eigenSolution(design.nobs, momentsByQr(design));
}

/** The backstop on the row count (the caller checks it first with its own message). */
function requireEnoughRows(design: JohansenDesign): void {
  const n = design.nobs;
  const k = design.shortRun.length;
  const p = design.levels.length;
  const m = design.changes.length;
  if (n - k < p + m + 1) {
    throw new MooringInputError(`Too few observations (${n}) for ${k + p} terms per equation and ${m} equations: add rows or use fewer lags.`);
  }
}

/** Eigenvalues and S11-orthonormal eigenvectors from the concentrated moments. */
function eigenSolution(n: number, moments: ConcentratedMoments): ReducedRankFit {
  const { s00, s01, s11 } = moments;
  const p = s11.rows;
  const cholesky11 = new CholeskyDecomposition(s11);
  const cholesky00 = new CholeskyDecomposition(s00);
  if (!cholesky11.isPositiveDefinite() || !cholesky00.isPositiveDefinite()) {
    throw new MooringInputError('The series are too close to exact combinations of one another for the test: remove the series that duplicates others.');
  }
  const lower = cholesky11.lowerTriangularMatrix;
  const middle = s01.transpose().mmul(cholesky00.solve(s01)); // S10 S00^{-1} S01, p x p
  const half = solve(lower, middle); // L^{-1} S10 S00^{-1} S01
  const c = solve(lower, half.transpose()); // L^{-1} (...) L^{-T}, symmetric up to rounding
  const symmetric = Matrix.zeros(p, p);
  for (let i = 0; i < p; i++) {
    for (let j = 0; j < p; j++) symmetric.set(i, j, 0.5 * (c.get(i, j) + c.get(j, i)));
  }
  const evd = new EigenvalueDecomposition(symmetric, { assumeSymmetric: true });
  const order = evd.realEigenvalues.map((value, index) => ({ value, index })).sort((a, b) => b.value - a.value);
  const eigenvalues = order.map((e) => Math.max(e.value, 0));
  if (eigenvalues[0] >= 1 - EXACT_FIT) {
    throw new MooringInputError(
      'A combination of the series changes is fitted exactly by their lagged levels and changes (an eigenvalue of 1): one series is an exact function of the others, or there are too many lags for the rows.',
    );
  }
  const u = new Matrix(p, p);
  for (let j = 0; j < p; j++) {
    for (let i = 0; i < p; i++) u.set(i, j, evd.eigenvectorMatrix.get(i, order[j].index));
  }
  const v = solve(lower.transpose(), u); // v = L^{-T} u, so v' S11 v = u'u = I
  const vectors = Array.from({ length: p }, (_, j) => v.getColumn(j));
  return { nobs: n, eigenvalues, vectors, s01, s11, s00 };
}
