/**
 * The concentrated product moments of Johansen's reduced-rank regression (Johansen 1995,
 * ch. 6): S_ij = R_i' R_j / n, with R0 and R1 the residuals of the changes and of the levels
 * block on the short-run block. Two routes give them:
 *
 * - by cross products (this file's momentsByCholesky): the cross products of all the columns
 *   [short-run, levels, changes] in one pass, then one Cholesky factorisation of that matrix.
 *   After the short-run columns are eliminated, the trailing block is the Schur complement
 *   G_BC,BC - G_BC,A G_AA^{-1} G_A,BC, which is exactly R'R of the residuals; continuing the
 *   same factorisation through the levels and changes is the check that none of them is a
 *   combination of the others once the short-run block is out (no second factorisation).
 *   When the short-run block holds the unrestricted constant, every column is centred first:
 *   the cross products of centred columns are the Schur complement after the constant, formed
 *   without the cancellation of sum(x y) - n mean(x) mean(y) that prices far from zero cause.
 * - by Householder QR (momentsByQr, the reference and the fallback): one QR of the short-run
 *   block, Q'y for each other column, and dot products of the tails; then a second QR of the
 *   tails to check separability.
 *
 * Cross products square the conditioning that QR meets, so the Cholesky route answers only where
 * every pivot keeps a good share of its column (PIVOT_SHARE_LIMIT, RESIDUAL_SHARE_LIMIT); else
 * it returns null and the caller takes the QR route, which also gives the refusals.
 */
import { Matrix } from 'ml-matrix';
import { MooringInputError } from '../errors';
import { HouseholderQr } from '../linalg/householder-qr';
import type { JohansenDesign } from './johansen-design';

/** S00 (changes), S01 (changes x levels) and S11 (levels), each divided by n. */
export interface ConcentratedMoments {
  s00: Matrix;
  s01: Matrix;
  s11: Matrix;
}

/**
 * Smallest share of a column's sum of squares (after the columns before it are taken out) that a
 * Cholesky pivot may keep. Below it the columns are nearly collinear: the eigenproblem then
 * magnifies any rounding in S by about the inverse share, and the QR route answers (or refuses)
 * instead, as before. Our choice, from seeded systems (tests/johansen/concentrated-moments.test.ts).
 */
export const PIVOT_SHARE_LIMIT = 1e-3;

/**
 * Smallest share of a level's or change's sum of squares that may survive the short-run block:
 * below it the Schur complement subtracts nearly equal numbers (a strongly trending level in
 * the 'trend' case). Our choice, as above.
 */
export const RESIDUAL_SHARE_LIMIT = 1e-2;

/**
 * S00, S01, S11 from the cross products and one Cholesky factorisation; null when a pivot is
 * too small a share of its column for the answer to match the QR route (then use momentsByQr).
 */
export function momentsByCholesky(design: JohansenDesign): ConcentratedMoments | null {
  const { nobs: n, changes, levels, shortRun, unrestrictedCount } = design;
  // The unrestricted constant, when there is one, is the first unrestricted term (johansen-design.ts).
  const constantAt = unrestrictedCount > 0 ? shortRun.length - unrestrictedCount : -1;
  const partialled = constantAt < 0 ? shortRun : shortRun.filter((_, j) => j !== constantAt);
  const a = partialled.length;
  const p = levels.length;
  const m = changes.length;
  const columns = [...partialled, ...levels, ...changes];
  const q = columns.length;
  const centred = constantAt >= 0;

  // The columns side by side in one array (centred when the constant is partialled out).
  const data = new Float64Array(q * n);
  for (let j = 0; j < q; j++) {
    const x = columns[j];
    let mean = 0;
    if (centred) {
      for (let t = 0; t < n; t++) mean += x[t];
      mean /= n;
    }
    const base = j * n;
    for (let t = 0; t < n; t++) data[base + t] = x[t] - mean;
  }
  const g = crossProducts(data, q, n);

  // Right-looking Cholesky in place (lower triangle, row-major q x q). Pivot shares: a
  // short-run column against its own sum of squares; a level or change against its residual
  // sum of squares after the short-run block (the trailing block when j reaches a), which in
  // turn must keep a share of the column's own sum of squares.
  const own = new Float64Array(q);
  for (let j = 0; j < q; j++) own[j] = g[j * q + j];
  const concentrated = new Float64Array(q * q);
  for (let j = 0; j < q; j++) {
    if (j === a) {
      concentrated.set(g);
      for (let i = a; i < q; i++) if (!(concentrated[i * q + i] > RESIDUAL_SHARE_LIMIT * own[i])) return null;
    }
    const reference = j < a ? own[j] : concentrated[j * q + j];
    const d = g[j * q + j];
    if (!(d > PIVOT_SHARE_LIMIT * reference)) return null;
    const r = Math.sqrt(d);
    g[j * q + j] = r;
    for (let i = j + 1; i < q; i++) g[i * q + j] /= r;
    for (let i = j + 1; i < q; i++) {
      const lij = g[i * q + j];
      if (lij === 0) continue;
      for (let l = j + 1; l <= i; l++) g[i * q + l] -= lij * g[l * q + j];
    }
  }

  const s11 = new Matrix(p, p);
  const s01 = new Matrix(m, p);
  const s00 = new Matrix(m, m);
  const at = (i: number, j: number) => (i >= j ? concentrated[i * q + j] : concentrated[j * q + i]) / n;
  for (let i = 0; i < p; i++) for (let j = 0; j < p; j++) s11.set(i, j, at(a + i, a + j));
  for (let i = 0; i < m; i++) for (let j = 0; j < p; j++) s01.set(i, j, at(a + p + i, a + j));
  for (let i = 0; i < m; i++) for (let j = 0; j < m; j++) s00.set(i, j, at(a + p + i, a + p + j));
  return { s00, s01, s11 };
}

/**
 * The lower triangle (row-major q x q) of X'X for the q columns of length n laid side by side
 * in data. Four columns share each pass over a fifth, in four running sums, so each row of the
 * fifth is read once per four products and four chains of additions run side by side.
 */
function crossProducts(data: Float64Array, q: number, n: number): Float64Array {
  const g = new Float64Array(q * q);
  for (let i = 0; i < q; i++) {
    const xi = i * n;
    let j = 0;
    for (; j + 3 <= i; j += 4) {
      const y0 = j * n;
      const y1 = y0 + n;
      const y2 = y1 + n;
      const y3 = y2 + n;
      let s0 = 0;
      let s1 = 0;
      let s2 = 0;
      let s3 = 0;
      for (let t = 0; t < n; t++) {
        const x = data[xi + t];
        s0 += x * data[y0 + t];
        s1 += x * data[y1 + t];
        s2 += x * data[y2 + t];
        s3 += x * data[y3 + t];
      }
      g[i * q + j] = s0;
      g[i * q + j + 1] = s1;
      g[i * q + j + 2] = s2;
      g[i * q + j + 3] = s3;
    }
    for (; j <= i; j++) {
      const y = j * n;
      let s = 0;
      for (let t = 0; t < n; t++) s += data[xi + t] * data[y + t];
      g[i * q + j] = s;
    }
  }
  return g;
}

/**
 * S00, S01, S11 from one Householder QR of the short-run block: Q'y for each level and change,
 * whose tails (the entries past the short-run columns) are the residuals in an orthonormal
 * basis, so S_ij are dot products of tails. Refuses a design where a column is an exact
 * combination of others (naming it), with a second QR of the tails for the levels and changes.
 */
export function momentsByQr(design: JohansenDesign): ConcentratedMoments {
  const { nobs: n, changes, levels, shortRun } = design;
  const k = shortRun.length;
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
  return { s00, s01, s11 };
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
