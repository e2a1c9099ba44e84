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
 * Why the residuals are never formed: one Householder QR of the short-run block gives
 * Q'y for each column y of the other two blocks, and the residual of y is Q'y with its
 * first k entries dropped (in an orthonormal basis), so S_ij are dot products of those tails.
 */
import { CholeskyDecomposition, EigenvalueDecomposition, Matrix, solve } from 'ml-matrix';
import { MooringInputError } from '../errors';
import { HouseholderQr } from '../linalg/householder-qr';
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
  const { nobs: n, changes, levels, shortRun } = design;
  const k = shortRun.length;
  const p = levels.length;
  const m = changes.length;
  if (n - k < p + m + 1) {
    throw new MooringInputError(`Too few observations (${n}) for ${k + p} terms per equation and ${m} equations: add rows or use fewer lags.`);
  }

  const qr = new HouseholderQr(shortRun, n);
  if (!qr.isFullRank()) {
    const j = qr.firstDependentColumn;
    const name = design.shortRunNames[j];
    throw new MooringInputError(
      j < design.shortRun.length - design.unrestrictedCount
        ? `The test cannot separate ${name} from the lagged changes before it: one series copies or mixes others (for example C = 2A + B + constant). Remove the series responsible.`
        : `The test cannot separate ${name} from the lagged changes: some series (or mix of series) moves by the same amount every row. Remove the series responsible.`,
    );
  }
  const levelTails = levels.map((c) => qr.qtY(c).subarray(k));
  const changeTails = changes.map((c) => qr.qtY(c).subarray(k));
  requireSeparable(levelTails, changeTails, design);

  const s00 = productMoments(changeTails, changeTails, n);
  const s01 = productMoments(changeTails, levelTails, n);
  const s11 = productMoments(levelTails, levelTails, n);

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

/** Cross products a_i' b_j / n of two lists of equal-length vectors, as a matrix. */
function productMoments(a: readonly Float64Array[], b: readonly Float64Array[], n: number): Matrix {
  const out = new Matrix(a.length, b.length);
  const same = a === b;
  for (let i = 0; i < a.length; i++) {
    for (let j = same ? i : 0; j < b.length; j++) {
      const x = a[i];
      const y = b[j];
      let s = 0;
      for (let t = 0; t < x.length; t++) s += x[t] * y[t];
      out.set(i, j, s / n);
      if (same) out.set(j, i, s / n);
    }
  }
  return out;
}

/**
 * Refuses designs where a level or a change is an exact combination of the others once
 * the short-run block is partialled out (one QR of the residual tails, levels first).
 */
function requireSeparable(levelTails: Float64Array[], changeTails: Float64Array[], design: JohansenDesign): void {
  const check = new HouseholderQr([...levelTails, ...changeTails], levelTails[0].length);
  const j = check.firstDependentColumn;
  if (j < 0) return;
  const m = design.changes.length;
  if (j < m) {
    throw new MooringInputError(
      `The test cannot separate ${design.levelNames[j]} from the other series and the deterministic terms: it is an exact combination of them. Remove it; a relation that holds exactly needs no test.`,
    );
  }
  if (j < levelTails.length) {
    throw new MooringInputError(
      `A combination of the series follows ${design.inRelation === 'trend' ? 'a straight-line trend' : 'a constant'} exactly, so the test cannot separate ${design.levelNames[j]}: remove the series that duplicates others.`,
    );
  }
  const name = design.changeNames[j - levelTails.length];
  throw new MooringInputError(
    `The changes of '${name}' are explained exactly by the other terms (for example, '${name}' is another series plus a constant): remove it or choose another deterministic case.`,
  );
}
