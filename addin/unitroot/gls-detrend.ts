/**
 * GLS detrending (Elliott, Rothenberg & Stock 1996, sec. 3): the deterministic terms are
 * estimated on quasi-differences rather than on the levels, which keeps the local-to-unity
 * alternative's power that ordinary demeaning gives away.
 *
 * With a = 1 + c/T, the quasi-differenced data are y^a_1 = y_1 and y^a_t = y_t - a y_{t-1}
 * (t = 2..T), the same for each deterministic column z_t (1, or 1 and t); delta is the least
 * squares fit of y^a on z^a, and the detrended series is y~_t = y_t - z_t' delta.
 * c = -7 with a constant, -13.5 with a constant and trend (ERS 1996, p. 825: the values where
 * the point-optimal test's power envelope is 50%).
 *
 * The series is first brought to a size near one by a power of two (exact for ordinary prices),
 * so every statistic computed from y~ is the same for prices of 1e300 or 1e-300.
 */
import { MooringInputError } from '../errors';
import { toUnitScale } from '../linalg/power-of-two-scale';
import { leastSquares } from '../regression/least-squares';

/** The deterministic terms GLS detrending can remove. */
export type GlsDeterministic = 'const' | 'trend';

export const GLS_DETERMINISTIC_WORDS: readonly GlsDeterministic[] = ['const', 'trend'];

/** The non-centrality c of ERS (1996): -7 with a constant, -13.5 with a trend. */
export const GLS_CBAR: Record<GlsDeterministic, number> = { const: -7, trend: -13.5 };

export interface GlsDetrended {
  /** y~: the series less its GLS-estimated deterministic part, in the unit scale. */
  values: Float64Array;
  cbar: number;
  /** 1 + c/T. */
  a: number;
}

/** Refuses deterministic words GLS detrending does not take. */
export function checkGlsDeterministic(d: unknown): GlsDeterministic {
  if (d !== 'const' && d !== 'trend') {
    throw new MooringInputError(`Unknown deterministic terms '${String(d)}' for GLS detrending: use const or trend (GLS detrending always removes at least a constant).`);
  }
  return d;
}

/** The GLS-detrended series (ERS 1996), computed on the series brought to unit scale. */
export function glsDetrend(series: ArrayLike<number>, deterministic: GlsDeterministic, cbar = GLS_CBAR[deterministic]): GlsDetrended {
  const T = series.length;
  const minimum = deterministic === 'const' ? 4 : 6;
  if (T < minimum) throw new MooringInputError(`${T} observations are too few for GLS detrending: it needs at least ${minimum}.`);
  const y = toUnitScale(series).values;
  const a = 1 + cbar / T;
  const ya = new Float64Array(T);
  const ones = new Float64Array(T);
  ya[0] = y[0];
  ones[0] = 1;
  for (let t = 1; t < T; t++) {
    ya[t] = y[t] - a * y[t - 1];
    ones[t] = 1 - a;
  }
  const columns = [ones];
  if (deterministic === 'trend') {
    // z_t = t for t = 1..T, so z^a_1 = 1 and z^a_t = t - a (t - 1).
    const trend = new Float64Array(T);
    trend[0] = 1;
    for (let t = 1; t < T; t++) trend[t] = t + 1 - a * t;
    columns.push(trend);
  }
  const delta = leastSquares(ya, columns, { names: deterministic === 'const' ? ['constant'] : ['constant', 'trend'], withoutCovariance: true }).coefficients;
  const values = new Float64Array(T);
  for (let t = 0; t < T; t++) values[t] = y[t] - delta[0] - (deterministic === 'trend' ? delta[1] * (t + 1) : 0);
  return { values, cbar, a };
}
