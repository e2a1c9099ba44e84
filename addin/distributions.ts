/**
 * The probability distributions Mooring uses, all from jstat (one import point,
 * so the CommonJS/ESM interop of that package is handled once).
 */
import jStatModule from 'jstat';

const jStat = jStatModule.jStat ?? jStatModule;

/** Standard normal distribution function Phi(x). */
export function normalCdf(x: number): number {
  return jStat.normal.cdf(x, 0, 1);
}

/** Standard normal quantile: the x with Phi(x) = p. */
export function normalQuantile(p: number): number {
  return jStat.normal.inv(p, 0, 1);
}

/** Upper-tail probability of Student's t with df degrees of freedom, two-sided. */
export function studentTwoSidedP(t: number, df: number): number {
  return 2 * (1 - jStat.studentt.cdf(Math.abs(t), df));
}

/**
 * Upper-tail probability P(F > f) of the F distribution with (df1, df2) degrees of freedom,
 * read directly as the regularized incomplete beta I_x(df2/2, df1/2) at x = df2/(df2 + df1 f)
 * (Abramowitz & Stegun 26.6.2 with the beta symmetry I_x(a, b) = 1 - I_{1-x}(b, a)) rather than
 * as 1 - cdf: for a small p-value 1 - cdf cancels away its digits (a p of 1e-11 came out 5e-6
 * off in relative terms, and one of 3e-20 as exactly 0), while the direct tail keeps them. jstat's
 * continued fraction stops once a step changes it by less than 3e-7, so p-values agree with
 * an exact computation to about 1e-7 relative, not to the last digit.
 */
export function fUpperP(f: number, df1: number, df2: number): number {
  if (f <= 0) return 1;
  return jStat.ibeta(df2 / (df2 + df1 * f), df2 / 2, df1 / 2);
}

/** Upper-tail probability P(X > x) of the chi-square distribution with df degrees of freedom. */
export function chiSquareUpperP(x: number, df: number): number {
  if (x <= 0) return 1;
  return 1 - jStat.chisquare.cdf(x, df);
}

/** Upper-tail critical values of F(df1, df2) at the 10%, 5% and 1% levels. */
export function fCriticalValues(df1: number, df2: number): { '10%': number; '5%': number; '1%': number } {
  return {
    '10%': jStat.centralF.inv(0.9, df1, df2),
    '5%': jStat.centralF.inv(0.95, df1, df2),
    '1%': jStat.centralF.inv(0.99, df1, df2),
  };
}

/** Upper-tail critical values of chi-square(df) at the 10%, 5% and 1% levels. */
export function chiSquareCriticalValues(df: number): { '10%': number; '5%': number; '1%': number } {
  return {
    '10%': jStat.chisquare.inv(0.9, df),
    '5%': jStat.chisquare.inv(0.95, df),
    '1%': jStat.chisquare.inv(0.99, df),
  };
}
