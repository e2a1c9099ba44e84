/**
 * The first step of every residual-based cointegration analysis (Engle & Granger 1987):
 * the static least-squares regression of y on the xs and the chosen deterministic terms,
 *   y_t = b_1 x1_t + ... + b_m xm_t [+ c] [+ d t] + u_t,  t = 1..T,
 * with the columns in that order (the reference library's order, so coefficients compare
 * exactly). Its residual u is the estimated equilibrium error that Engle-Granger,
 * Phillips-Ouliaris and the error-correction model all work on.
 */
import { MooringInputError } from '../errors';
import { DETERMINISTIC_WORDS, type Deterministic } from '../result';
import { deterministicColumns, deterministicNames } from '../regression/deterministic-terms';
import { type LeastSquaresFit, leastSquares } from '../regression/least-squares';
import { formatCoefficient, listText } from './wording';

/** R^2 at or above which y counts as an exact combination of the xs: 1 - 100 sqrt(machine epsilon), the reference library's rule. */
export const EXACT_FIT_R_SQUARED = 1 - 100 * Math.sqrt(Number.EPSILON);

/** Names for messages and labels: the dependent series and each regressor. */
export interface SeriesNames {
  y: string;
  xs: string[];
}

export interface CointegratingRegression {
  fit: LeastSquaresFit;
  /** Coefficients on the xs, in order. */
  beta: number[];
  intercept: number | null;
  trendCoefficient: number | null;
  residuals: Float64Array;
  rSquared: number;
  /** True when y is (almost) an exact combination of the xs (R^2 >= EXACT_FIT_R_SQUARED): the residual is rounding noise. */
  exactFit: boolean;
  /** Observations T. */
  nobs: number;
  /** N: y plus the xs. */
  nVariables: number;
  deterministic: Deterministic;
  names: SeriesNames;
}

/** Default names "y", "x1", "x2", ... filled in where the caller gave none. */
export function resolveNames(count: number, names?: Partial<SeriesNames>): SeriesNames {
  const xs = Array.from({ length: count }, (_, i) => names?.xs?.[i] ?? (count === 1 ? 'x' : `x${i + 1}`));
  return { y: names?.y ?? 'y', xs };
}

/** Refuses an unknown deterministic word with the list of known ones. */
export function requireDeterministic(d: unknown): asserts d is Deterministic {
  if (!DETERMINISTIC_WORDS.includes(d as Deterministic)) {
    throw new MooringInputError(`Unknown deterministic terms '${String(d)}': use one of ${DETERMINISTIC_WORDS.join(', ')}.`);
  }
}

/** Refuses series of different lengths or holding a value that is not a finite number, naming the series and row. */
export function requireAlignedSeries(series: readonly ArrayLike<number>[], names: readonly string[]): number {
  const T = series[0].length;
  series.forEach((s, j) => {
    if (s.length !== T) {
      throw new MooringInputError(
        `'${names[j]}' has ${s.length} values but '${names[0]}' has ${T}: the series must cover the same rows (align them first).`,
        `series '${names[j]}'`,
      );
    }
    for (let i = 0; i < T; i++) {
      if (!Number.isFinite(s[i])) {
        throw new MooringInputError(
          `'${names[j]}' has no number at position ${i + 1} (${String(s[i])}): fill or drop the gap before testing.`,
          `series '${names[j]}', position ${i + 1}`,
        );
      }
    }
  });
  return T;
}

/** Fits the cointegrating regression of y on the xs with the given deterministic terms. */
export function cointegratingRegression(
  y: ArrayLike<number>,
  xs: readonly ArrayLike<number>[],
  deterministic: Deterministic,
  names?: Partial<SeriesNames>,
): CointegratingRegression {
  requireDeterministic(deterministic);
  if (!Array.isArray(xs) || xs.length === 0) {
    throw new MooringInputError('A cointegrating regression needs at least one regressor series beside the dependent one.');
  }
  const resolved = resolveNames(xs.length, names);
  const T = requireAlignedSeries([y, ...xs], [resolved.y, ...resolved.xs]);
  const columns = [...xs, ...deterministicColumns(deterministic, T)];
  const fit = leastSquares(y, columns, { names: [...resolved.xs, ...deterministicNames(deterministic)] });
  const m = xs.length;
  const c = fit.coefficients;
  return {
    fit,
    beta: Array.from(c.subarray(0, m)),
    intercept: deterministic === 'none' ? null : c[m],
    trendCoefficient: deterministic === 'trend' ? c[m + 1] : null,
    residuals: fit.residuals,
    rSquared: fit.rSquared,
    exactFit: fit.rSquared >= EXACT_FIT_R_SQUARED,
    nobs: T,
    nVariables: m + 1,
    deterministic,
    names: resolved,
  };
}

/** The relation in words, e.g. "Crude - 1.02 Brent - 3.1" (what the residual measures). */
export function relationText(step1: CointegratingRegression): string {
  const term = (b: number, name: string): string => `${b < 0 ? '+' : '-'} ${formatCoefficient(Math.abs(b))} ${name}`;
  const parts = [step1.names.y, ...step1.beta.map((b, i) => term(b, step1.names.xs[i]))];
  if (step1.intercept !== null) parts.push(`${step1.intercept < 0 ? '+' : '-'} ${formatCoefficient(Math.abs(step1.intercept))}`);
  if (step1.trendCoefficient !== null) parts.push(term(step1.trendCoefficient, 't'));
  return parts.join(' ');
}

/** The null and alternative of a residual-based cointegration test, in words. */
export function cointegrationHypotheses(step1: CointegratingRegression): { nullHypothesis: string; alternative: string } {
  const list = listText([step1.names.y, ...step1.names.xs]);
  return {
    nullHypothesis: `${list} are not cointegrated: the residual of ${step1.names.y} on ${step1.names.xs.join(', ')} has a unit root`,
    alternative: `${list} are cointegrated: ${relationText(step1)} is stationary`,
  };
}
