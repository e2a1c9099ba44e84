/**
 * The spread of a pair and its half-life, with one definition for every surface (the spread
 * and ecm commands, the report, the pane):
 *
 * - the spread is s_t = y_t - a - b x_t on the least-squares line of y on x with a constant
 *   (the Engle-Granger step-1 line, whose residual the test found stationary). Dynamic OLS
 *   stays the estimate of the relation with sound standard errors; the spread is not built
 *   on it, because its residual is not the series the cointegration test checked;
 * - THE half-life is ln 2 / -ln(1 + lambda), lambda from the AR(1) regression with a constant
 *   Δs_t = c + lambda s_{t-1} + e_t of that spread (half-life.ts).
 *
 * The error-correction model implies other half-lives (its combined speed, each equation's
 * own); they carry their own names (error-correction.ts) so that no surface calls two
 * different numbers "the half-life".
 */
import { olsHedgeRatio } from '../cointegration/hedge-ratio';
import { halfLife, type SpreadHalfLife } from './half-life';
import { refuseRoundingNoise } from './rounding-noise';
import { spreadSeries } from './spread-series';

/** Which line the spread is built on, in words, for every surface that shows the spread. */
export const SPREAD_LINE_TEXT = 'the least-squares line of y on x with a constant (the Engle-Granger line)';

/** How the half-life is found, in words, beside every half-life a surface shows. */
export const HALF_LIFE_DEFINITION =
  'ln 2 / -ln(1 + lambda), lambda from the AR(1) regression with a constant of the spread on the least-squares line';

/** The least-squares spread of y on x and its half-life. */
export interface PairSpread {
  /** The least-squares line y = intercept + beta x the spread is built on. */
  line: { beta: number; intercept: number };
  /** s_t = y_t - intercept - beta x_t. */
  values: Float64Array;
  /** The AR(1) half-life of the spread: THE half-life of the pair. */
  halfLife: SpreadHalfLife;
}

/** The spread on the least-squares line of y on x (with a constant), and its AR(1) half-life. */
export function pairSpread(y: ArrayLike<number>, x: ArrayLike<number>, names: { y: string; x: string }, period = 'period'): PairSpread {
  const ols = olsHedgeRatio(y, x);
  const line = { beta: ols.beta, intercept: ols.intercept };
  const values = spreadSeries(y, x, line.beta, line.intercept, names);
  // A copied column leaves a spread of rounding noise, whose half-life would describe rounding.
  refuseRoundingNoise(y, values, { y: names.y, xs: [names.x] });
  return { line, values, halfLife: halfLife(values, period) };
}
