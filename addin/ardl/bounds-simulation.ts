/**
 * Draws of the bounds F and t statistics under the null of no level relation, for a given
 * number of regression rows n and regressors k, with the regressors either all I(0) (white
 * noise: the lower bound) or all I(1) (random walks: the upper bound), as Pesaran, Shin &
 * Smith (2001, section 6) simulate them:
 *
 *   y_t = y_{t-1} + e_t,  x_t = x_{t-1} + u_t (I(1)) or x_t = u_t (I(0)),  e, u iid N(0, 1)
 *   Δy_t on [free terms, restricted term, x_{t-1}, y_{t-1}],  t = 1..n
 *
 * F: the test that the levels (and the restricted term) are zero, divided by their number;
 * t: the ratio of the coefficient on y_{t-1} to its standard error.
 * All five cases are computed from the same paths (one set of cross products of
 * [1, t, x_{t-1}, y_{t-1}], from which each case takes its columns).
 *
 * Speed: one Cholesky of each case's cross products per draw (columns ordered so that
 * y_{t-1} is last and the free terms first): the restricted and unrestricted sums of
 * squares, the last coefficient and its standard error all come from L^{-1} X'Δy and the last
 * diagonal of L. This builds a table only; reported statistics use Householder QR.
 */
import { SeededRandom } from '../random';
import { BOUNDS_CASE_TERMS, BOUNDS_CASES, type BoundsCase } from './bounds-case';

/** F and t draws of one case. */
export interface BoundsDraws {
  f: Float64Array;
  t: Float64Array;
}

/** Column indexes into [1, t, x_1..x_k, y] for a case, in the order free, restricted, x, y. */
function caseColumns(boundsCase: BoundsCase, k: number): { columns: number[]; free: number; tested: number } {
  const terms = BOUNDS_CASE_TERMS[boundsCase];
  const index = (term: 'constant' | 'trend') => (term === 'constant' ? 0 : 1);
  const columns = [...terms.unrestricted.map(index), ...(terms.restricted ? [index(terms.restricted)] : [])];
  for (let j = 0; j < k; j++) columns.push(2 + j);
  columns.push(2 + k);
  return { columns, free: terms.unrestricted.length, tested: columns.length - terms.unrestricted.length };
}

/** Simulates `replications` draws of F and t for n rows and k regressors, for all five cases. */
export function simulateBoundsDraws(n: number, k: number, integrated: boolean, replications: number, seed: number): Record<BoundsCase, BoundsDraws> {
  const rng = new SeededRandom(seed);
  const full = k + 3;
  const xtx = new Float64Array(full * full);
  const xty = new Float64Array(full);
  const row = new Float64Array(full);
  const layouts = BOUNDS_CASES.map((c) => caseColumns(c, k));
  const out = Object.fromEntries(BOUNDS_CASES.map((c) => [c, { f: new Float64Array(replications), t: new Float64Array(replications) }])) as Record<BoundsCase, BoundsDraws>;
  const chol = new Float64Array(full * full);
  const z = new Float64Array(full);
  const xLevel = new Float64Array(k);
  for (let rep = 0; rep < replications; rep++) {
    let y = 0;
    for (let j = 0; j < k; j++) xLevel[j] = integrated ? 0 : rng.normal();
    xtx.fill(0);
    xty.fill(0);
    let yty = 0;
    row[0] = 1;
    for (let i = 0; i < n; i++) {
      row[1] = i + 1;
      for (let j = 0; j < k; j++) row[2 + j] = xLevel[j];
      row[2 + k] = y;
      const e = rng.normal();
      yty += e * e;
      for (let a = 0; a < full; a++) {
        const xa = row[a];
        xty[a] += xa * e;
        for (let b = 0; b <= a; b++) xtx[a * full + b] += xa * row[b];
      }
      y += e;
      for (let j = 0; j < k; j++) xLevel[j] = integrated ? xLevel[j] + rng.normal() : rng.normal();
    }
    BOUNDS_CASES.forEach((boundsCase, c) => {
      const { columns, free, tested } = layouts[c];
      const p = columns.length;
      for (let a = 0; a < p; a++) {
        const ia = columns[a];
        for (let b = 0; b <= a; b++) {
          const ib = columns[b];
          let s = ia >= ib ? xtx[ia * full + ib] : xtx[ib * full + ia];
          for (let m = 0; m < b; m++) s -= chol[a * full + m] * chol[b * full + m];
          chol[a * full + b] = a === b ? Math.sqrt(s) : s / chol[b * full + b];
        }
        let s = xty[ia];
        for (let m = 0; m < a; m++) s -= chol[a * full + m] * z[m];
        z[a] = s / chol[a * full + a];
      }
      let explainedFree = 0;
      for (let a = 0; a < free; a++) explainedFree += z[a] * z[a];
      let explained = explainedFree;
      for (let a = free; a < p; a++) explained += z[a] * z[a];
      const ssrU = yty - explained;
      const s2 = ssrU / (n - p);
      out[boundsCase].f[rep] = (explained - explainedFree) / tested / s2;
      // last coefficient = z_p / L_pp and its variance s2 / L_pp^2, so t = z_p / sqrt(s2)
      out[boundsCase].t[rep] = z[p - 1] / Math.sqrt(s2);
    });
  }
  return out;
}
