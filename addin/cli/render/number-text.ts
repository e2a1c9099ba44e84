/**
 * Numbers for the diagnostic's renderings where four decimals read better than the exponent
 * form: a speed of 0.0004 or a spread mean that is zero up to rounding (-4e-16) shows as
 * 0.0004 and 0.0000, and a count of periods with one decimal (11.9 days).
 */

/** Four decimals; large magnitudes in exponent form; a negative zero after rounding shows without its sign. */
export function fixed4(x: number | null | undefined): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return 'not available';
  if (Math.abs(x) >= 1e6) return x.toExponential(3);
  const s = x.toFixed(4);
  return /^-0\.0+$/.test(s) ? s.slice(1) : s;
}

/** One decimal: half-lives, standard errors apart. */
export function fixed1(x: number): string {
  const s = x.toFixed(1);
  return s === '-0.0' ? '0.0' : s;
}
