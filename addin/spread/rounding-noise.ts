/**
 * A spread that is rounding noise. When y is (almost) an exact line in x, such as a copied
 * column or one computed from another, the spread y - intercept - beta x keeps only the last
 * digits of the prices. Its half-life, its z-scores and a standard error of the slope then
 * describe the rounding of doubles, not the pair (two identical series gave a half-life of
 * 1.82 periods and a z-score of -4.65 from a spread of about 1e-14).
 *
 * The rule is the Engle-Granger one (cointegrating-regression.ts): the line's R^2, here
 * 1 - (sum of squared deviations of the spread) / (the same of y), at or above
 * EXACT_FIT_R_SQUARED = 1 - 100 sqrt(machine epsilon). For the least-squares line this is its
 * R^2; for any other line (given, or another estimator) it asks the same of that line's spread.
 * Every surface asks this one check: the formulas answer #N/A with the sentence, the command
 * line refuses with it, the dynamic-OLS standard error is left out with it.
 */
import { EXACT_FIT_R_SQUARED } from '../cointegration/cointegrating-regression';
import { MooringInputError } from '../errors';
import { powerOfTwoScale } from '../linalg/power-of-two-scale';

/** Why a spread carries no information, with the R^2 of its line. */
export interface RoundingNoise {
  rSquared: number;
  /** The sentence every surface shows. */
  message: string;
}

/** Sum of squared deviations from the mean of v times f (f a power of two, so nothing overflows). */
function centredSquares(v: ArrayLike<number>, f: number): number {
  let mean = 0;
  for (let i = 0; i < v.length; i++) mean += v[i] * f;
  mean /= v.length;
  let ss = 0;
  for (let i = 0; i < v.length; i++) ss += (v[i] * f - mean) ** 2;
  return ss;
}

/**
 * The R^2 of the line that left `spread` from `y` and the sentence to show, when the spread is
 * rounding noise (see the file comment); null when the spread is a real series (or y does not move).
 */
export function roundingNoiseOf(y: ArrayLike<number>, spread: ArrayLike<number>, names: { y: string; xs: readonly string[] }): RoundingNoise | null {
  const f = powerOfTwoScale(y);
  const total = centredSquares(y, f);
  if (!(total > 0)) return null;
  const rSquared = 1 - centredSquares(spread, f) / total;
  if (!(rSquared >= EXACT_FIT_R_SQUARED)) return null;
  return {
    rSquared,
    message:
      `${names.y} is an exact combination of ${names.xs.join(', ')} (R² = ${rSquared.toFixed(7)}), so the spread is rounding noise: ` +
      'check that one column is not a copy or a formula of another.',
  };
}

/** Refuses a spread of rounding noise with the one sentence (MooringInputError). */
export function refuseRoundingNoise(y: ArrayLike<number>, spread: ArrayLike<number>, names: { y: string; xs: readonly string[] }): void {
  const noise = roundingNoiseOf(y, spread, names);
  if (noise) throw new MooringInputError(noise.message);
}
