/**
 * Units do not change an answer: every statistic Mooring reports is the same whether prices are
 * quoted in dollars, cents or units of 1e300. Sums of squares are not: at 1e300 they overflow,
 * at 1e-300 they underflow to zero, and a regression then finds a column "constant". So the
 * engine brings each series to a size near one before it forms sums, and converts back the
 * few answers that carry units (coefficients, intercepts, residuals, variances).
 *
 * The factor is a power of two, 2^-e with 2^e <= max |v| < 2^(e+1): multiplying by it changes
 * only the exponent of each double, never its digits, so (away from overflow and underflow) a
 * computation on scaled values rounds exactly as on the originals, and the answers for prices
 * of ordinary size are the same to the last bit as without scaling.
 */

/** Exponents beyond which 2^e is not a normal double. */
const LOWEST_EXPONENT = -1022;
const HIGHEST_EXPONENT = 1023;

/** 2^e for a whole e within the normal range, exactly. */
export function powerOfTwo(e: number): number {
  const clamped = Math.max(LOWEST_EXPONENT, Math.min(HIGHEST_EXPONENT, e));
  // Math.pow(2, e) is exact for whole e in range; two steps keep 2^1023 and 2^-1022 finite.
  const half = Math.trunc(clamped / 2);
  return Math.pow(2, half) * Math.pow(2, clamped - half);
}

/**
 * The power of two that brings the largest |value| of the series into [1, 2): 2^-e with
 * e = floor(log2 max |v|). 1 for series that are all zero or hold no finite value.
 */
export function powerOfTwoScale(...series: ArrayLike<number>[]): number {
  let largest = 0;
  for (const s of series) {
    for (let i = 0; i < s.length; i++) {
      const a = Math.abs(s[i]);
      if (a > largest && a !== Number.POSITIVE_INFINITY) largest = a;
    }
  }
  if (!(largest > 0)) return 1;
  let e = Math.floor(Math.log2(largest));
  // log2 can round across a power of two; settle e so that 2^e <= largest < 2^(e+1).
  if (powerOfTwo(e) > largest) e--;
  else if (powerOfTwo(e + 1) <= largest) e++;
  // Keep the factor itself a finite double (subnormal prices reach here only partly scaled).
  return powerOfTwo(Math.max(-HIGHEST_EXPONENT, Math.min(-LOWEST_EXPONENT, -e)));
}

/** A copy of the series times the factor (exact for a power of two). */
export function scaled(series: ArrayLike<number>, factor: number): Float64Array {
  const out = new Float64Array(series.length);
  for (let i = 0; i < series.length; i++) out[i] = series[i] * factor;
  return out;
}

/** The series brought to a largest |value| in [1, 2), and the factor used. */
export function toUnitScale(series: ArrayLike<number>): { values: Float64Array; factor: number } {
  const factor = powerOfTwoScale(series);
  return { values: scaled(series, factor), factor };
}
