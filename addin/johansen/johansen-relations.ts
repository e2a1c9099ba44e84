/**
 * The long-run relations (beta) and their loadings (alpha) from the eigenvectors of the
 * reduced-rank regression, in the form people read: each relation scaled so the first
 * series has weight 1.
 *
 * Scaling: the eigenvectors v come with v' S11 v = 1. Relation j is w = v / v_1, and its
 * loadings are alpha_j = S01 w (w' S11 w)^{-1} (Johansen 1995, ch. 6, from memory; one column at a
 * time; the columns are S11-orthogonal, so this equals the joint estimate for any rank).
 * The product alpha_j w' does not depend on the scaling.
 *
 * Units: the fit may run on series i times a power of two f_i (johansen.ts). A relation w' on
 * the scaled series, sum w'_i f_i y_i + d', is f_p times sum (w'_i f_i / f_p) y_i + d' / f_p
 * with p the pivot, so the weights are w'_i f_i / f_p, the deterministic coefficient d' / f_p,
 * and the loadings alpha'_ij f_p / f_i.
 */
import type { ReducedRankFit } from './reduced-rank-regression';

/** Relative size below which the first series' weight is treated as zero. */
const NO_WEIGHT = 1e-10;

/** The relations, their loadings and deterministic coefficients, as matrices with one column per relation. */
export interface NormalisedRelations {
  /** beta[i][j]: weight of series i in relation j. */
  beta: number[][];
  /** alpha[i][j]: loading of series i's equation on relation j. */
  alpha: number[][];
  /** The constant or trend coefficient of each relation (restricted cases), else empty. */
  deterministic: number[];
  warnings: string[];
}

/**
 * The first m relations of the fit (the ones belonging to the m eigenvalues reported),
 * scaled so the first series has weight 1; where it has no weight, scaled by the largest
 * weight instead (with a warning).
 */
export function normalisedRelations(fit: ReducedRankFit, m: number, names: readonly string[], scales?: readonly number[]): NormalisedRelations {
  const f = (i: number) => scales?.[i] ?? 1;
  const p = fit.vectors.length;
  const beta: number[][] = Array.from({ length: m }, () => new Array<number>(m).fill(0));
  const alpha: number[][] = Array.from({ length: m }, () => new Array<number>(m).fill(0));
  const deterministic: number[] = [];
  const warnings: string[] = [];
  for (let j = 0; j < m; j++) {
    const v = fit.vectors[j];
    let largest = 0;
    for (let i = 1; i < m; i++) if (Math.abs(v[i]) > Math.abs(v[largest])) largest = i;
    let pivot = 0;
    if (Math.abs(v[0]) <= NO_WEIGHT * Math.abs(v[largest])) {
      pivot = largest;
      warnings.push(`Relation ${j + 1} gives '${names[0]}' no weight, so it is scaled to weight 1 on '${names[pivot]}' instead.`);
    }
    const w = v.map((x) => x / v[pivot]);
    let quadratic = 0;
    for (let a = 0; a < p; a++) {
      for (let b = 0; b < p; b++) quadratic += w[a] * fit.s11.get(a, b) * w[b];
    }
    for (let i = 0; i < m; i++) {
      beta[i][j] = (w[i] * f(i)) / f(pivot);
      let s = 0;
      for (let b = 0; b < p; b++) s += fit.s01.get(i, b) * w[b];
      alpha[i][j] = ((s / quadratic) * f(pivot)) / f(i);
    }
    if (p > m) deterministic.push(w[m] / f(pivot));
  }
  return { beta, alpha, deterministic, warnings };
}
