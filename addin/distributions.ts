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

/** Upper-tail probability P(F > f) of the F distribution with (df1, df2) degrees of freedom. */
export function fUpperP(f: number, df1: number, df2: number): number {
  if (f <= 0) return 1;
  return 1 - jStat.centralF.cdf(f, df1, df2);
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
