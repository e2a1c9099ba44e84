/**
 * The cointegrating regression of Gregory & Hansen (1996, eqs. 2-4) with one shift that
 * starts at observation s (0-based), phi_t = 1 for t >= s, else 0:
 *   level (model C):         y_t = m1 + m2 phi_t + a' x_t + e_t
 *   level-trend (model C/T): y_t = m1 + m2 phi_t + b t + a' x_t + e_t
 *   regime (model C/S):      y_t = m1 + m2 phi_t + a1' x_t + a2' x_t phi_t + e_t
 * The residual e is the equilibrium error whose unit root the test examines.
 *
 * y and the xs enter less their means: the shift lies in the span of the constant (and of
 * the constant and phi for the slope shifts), so the residual is the same, and prices far
 * from zero keep their digits. The coefficients are mapped back to the data's own units.
 */
import type { GregoryHansenModel } from '../tables/gregory-hansen-table';

/** Columns for regressors already centred: [xs..., constant, (trend), phi, (x_j phi ...)]. */
export function gregoryHansenColumns(xsCentred: readonly Float64Array[], model: GregoryHansenModel, s: number): Float64Array[] {
  const T = xsCentred[0].length;
  const constant = new Float64Array(T).fill(1);
  const phi = new Float64Array(T);
  for (let t = s; t < T; t++) phi[t] = 1;
  const columns = [...xsCentred, constant];
  if (model === 'level-trend') {
    const trend = new Float64Array(T);
    for (let t = 0; t < T; t++) trend[t] = t + 1;
    columns.push(trend);
  }
  columns.push(phi);
  if (model === 'regime') {
    for (const x of xsCentred) {
      const shifted = new Float64Array(T);
      for (let t = s; t < T; t++) shifted[t] = x[t];
      columns.push(shifted);
    }
  }
  return columns;
}

/** Column names matching gregoryHansenColumns, for messages. */
export function gregoryHansenColumnNames(xNames: readonly string[], model: GregoryHansenModel): string[] {
  return [
    ...xNames,
    'constant',
    ...(model === 'level-trend' ? ['trend'] : []),
    'shift dummy',
    ...(model === 'regime' ? xNames.map((n) => `${n} after the shift`) : []),
  ];
}

/** The relation before and after the shift, in the data's units. */
export interface ShiftedRelation {
  interceptBefore: number;
  interceptAfter: number;
  /** Coefficient on the trend t = 1..T ('level-trend' only), else null. */
  trend: number | null;
  slopesBefore: number[];
  slopesAfter: number[];
}

/**
 * Reads the relation off the coefficients of the centred fit: with y~ = y - mean(y) and
 * x~ = x - mean(x), m1 = m1~ + mean(y) - a1' mean(x) and m2 = m2~ - a2' mean(x).
 */
export function shiftedRelation(coefficients: ArrayLike<number>, model: GregoryHansenModel, yMean: number, xMeans: readonly number[]): ShiftedRelation {
  const m = xMeans.length;
  const slopesBefore = Array.from({ length: m }, (_, j) => coefficients[j]);
  let at = m;
  const constant = coefficients[at++];
  const trend = model === 'level-trend' ? coefficients[at++] : null;
  const shift = coefficients[at++];
  const slopeShifts = model === 'regime' ? Array.from({ length: m }, (_, j) => coefficients[at + j]) : new Array<number>(m).fill(0);
  let before = constant + yMean;
  let moved = shift;
  for (let j = 0; j < m; j++) {
    before -= slopesBefore[j] * xMeans[j];
    moved -= slopeShifts[j] * xMeans[j];
  }
  return {
    interceptBefore: before,
    interceptAfter: before + moved,
    trend,
    slopesBefore,
    slopesAfter: slopesBefore.map((b, j) => b + slopeShifts[j]),
  };
}
