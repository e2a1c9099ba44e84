/**
 * Wald statistic that a set of coefficients in one regression equation are all zero:
 * W = b' V^{-1} b, with b the estimates and V their estimated covariance block; chi-square with
 * as many degrees of freedom as coefficients under the null (Lutkepohl 2005, from memory).
 *
 * In a VAR fitted by equation-by-equation least squares the covariance of equation e's
 * coefficients is sigma_e^2 (Z'Z)^{-1} with sigma_e^2 = e_e'e_e / (n - Kp - d). That is exactly
 * the equation-e block of the reference library's (Z'Z)^{-1} (x) Sigma_u, so one equation's own
 * least-squares covariance gives the same statistic.
 */
import { Matrix, solve } from 'ml-matrix';
import { MooringInputError } from '../errors';
import type { LeastSquaresFit } from '../regression/least-squares';

/** A Wald statistic, its degrees of freedom and the coefficients it tested. */
export interface CoefficientWald {
  statistic: number;
  df: number;
  /** The restricted coefficients, in the order of the rows asked for. */
  coefficients: number[];
}

/** Wald statistic that fit's coefficients at the given column positions are jointly zero. */
export function coefficientWald(fit: LeastSquaresFit, positions: readonly number[]): CoefficientWald {
  if (positions.length === 0) throw new MooringInputError('Internal: a Wald test needs at least one coefficient.');
  if (fit.covariance.length === 0) throw new MooringInputError('Internal: the regression was fitted without its covariance.');
  const b = positions.map((r) => fit.coefficients[r]);
  const v = new Matrix(positions.map((r) => positions.map((c) => fit.covariance[r][c])));
  const x = solve(v, Matrix.columnVector(b));
  let statistic = 0;
  for (let i = 0; i < b.length; i++) statistic += b[i] * x.get(i, 0);
  if (!Number.isFinite(statistic) || statistic < 0) {
    throw new MooringInputError(
      'The coefficient covariance is singular, so the Wald statistic cannot be computed: the series may be exact copies or combinations of each other.',
    );
  }
  return { statistic, df: b.length, coefficients: b };
}
