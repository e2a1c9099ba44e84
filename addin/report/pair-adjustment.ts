/**
 * How the gap between a pair closes and where it stands now:
 *
 * - the error-correction model (errorCorrectionModel): each series' speed of adjustment
 *   toward the relation, lags by AIC (the model offers no other rule);
 * - the spread s = y - intercept - beta x on the least-squares line (spread/pair-spread.ts:
 *   the Engle-Granger residual, the series the test found stationary), its AR(1) half-life,
 *   which is THE half-life every surface shows, and its z-score over the whole sample and
 *   over a trailing window. The model's combined half-life keeps its own name (ecmHalfLife).
 */
import { errorCorrectionModel, type AdjustmentEquation } from '../cointegration/error-correction';
import { formatCoefficient, formatPeriods, formatShareClosed } from '../cointegration/wording';
import { pText } from '../causality/causality-wording';
import type { Deterministic } from '../result';
import { HALF_LIFE_DEFINITION, type PairSpread } from '../spread/pair-spread';
import { halfLifeIntervalJson } from '../spread/half-life-interval';
import { rollingZScore, zScore } from '../spread/z-score';
import type { AdjustmentReport, AdjustmentSide, SpreadReport } from './pair-types';
import { finiteOrNull } from './test-summary';

function side(eq: AdjustmentEquation, alpha: number): AdjustmentSide {
  return { series: eq.series, speed: eq.alpha, standardError: eq.standardError, pValue: eq.pValue, corrects: eq.gapSpeed < 0 && eq.pValue < alpha };
}

/** Who moves to close the gap, in one clause. */
function correctorsText(y: AdjustmentSide, x: AdjustmentSide): string {
  const detail = (s: AdjustmentSide): string => `speed ${formatCoefficient(s.speed)}, ${pText(s.pValue)}`;
  if (y.corrects && x.corrects) return `both ${y.series} (${detail(y)}) and ${x.series} (${detail(x)}) move to close it`;
  if (y.corrects) return `${y.series} moves to close it (${detail(y)}); ${x.series} does not (${pText(x.pValue)})`;
  if (x.corrects) return `${x.series} moves to close it (${detail(x)}); ${y.series} does not (${pText(y.pValue)})`;
  return `neither series moves significantly to close it (${pText(y.pValue)} for ${y.series}, ${pText(x.pValue)} for ${x.series})`;
}

/** The error-correction model and the spread's AR(1), with the half-life sentence. */
export function adjustmentSection(
  y: Float64Array,
  x: Float64Array,
  spread: PairSpread,
  names: { y: string; x: string },
  options: { alpha: number; deterministic: Deterministic; period: string },
): AdjustmentReport {
  const ecm = errorCorrectionModel(y, x, { deterministic: options.deterministic, lags: 'aic', period: options.period }, names);
  const ar1 = spread.halfLife;
  const dependent = side(ecm.y, options.alpha);
  const regressor = side(ecm.x, options.alpha);
  const closes = ar1.halfLife === null
    ? `The spread does not close its gap: ${ar1.note}`
    : `The spread closes half its gap in about ${formatPeriods(ar1.halfLife, options.period)}, ${ar1.interval.text} (about ${formatShareClosed(ar1.lambda)} of the gap each ${options.period})`;
  return {
    ecm: {
      lags: ecm.lags,
      observations: ecm.nobs,
      dependent,
      regressor,
      combinedSpeed: ecm.combinedSpeed,
      ecmHalfLife: ecm.ecmHalfLife,
      ecmHalfLifeNote: ecm.ecmHalfLifeNote ?? null,
    },
    spreadAr1: { phi: ar1.phi, speed: ar1.lambda, halfLife: ar1.halfLife, halfLifeNote: ar1.note ?? null, definition: HALF_LIFE_DEFINITION,
      halfLifeInterval: halfLifeIntervalJson(ar1.interval) },
    verdict: `${closes}; ${correctorsText(dependent, regressor)}.`,
  };
}

/** The spread on the least-squares line: values, z-scores, and where it stands on the last row. */
export function spreadSection(
  spread: PairSpread,
  names: { y: string; x: string },
  context: { rowLabels: readonly string[]; dates: readonly string[] | null; rollingWindow: number; period: string; logged: boolean },
): SpreadReport {
  const { values, line } = spread;
  const z = zScore(values);
  const window = Math.min(context.rollingWindow, values.length);
  const rolling = rollingZScore(values, window);
  const last = values.length - 1;
  const latestZ = z.values[last];
  const latestRollingZ = finiteOrNull(rolling[last]);
  const where = (v: number): string => `${formatCoefficient(Math.abs(v))} standard deviation${Math.abs(v) === 1 ? '' : 's'} ${v >= 0 ? 'above' : 'below'}`;
  const date = context.dates?.[last] || null;
  const ln = (name: string): string => (context.logged ? `ln ${name}` : name);
  const minus = (v: number): string => `${v < 0 ? '+' : '-'} ${formatCoefficient(Math.abs(v))}`;
  const rollingText = latestRollingZ === null ? '' : `; against the last ${window} ${context.period}s it is ${where(latestRollingZ)} their mean`;
  return {
      definition: `${ln(names.y)} ${minus(line.intercept)} ${minus(line.beta)} x ${ln(names.x)}, on the least-squares line with a constant, the Engle-Granger line (not the dynamic-OLS estimate of the relation)`,
      line: { beta: line.beta, intercept: line.intercept, method: 'least-squares' },
      mean: z.mean,
      standardDeviation: z.standardDeviation,
      bandUpper: z.mean + 2 * z.standardDeviation,
      bandLower: z.mean - 2 * z.standardDeviation,
      latest: values[last],
      latestRow: context.rowLabels[last],
      latestDate: date,
      latestZ,
      latestRollingZ,
      rollingWindow: window,
      values: Array.from(values),
      rollingZ: rolling.map((v) => finiteOrNull(v)),
      verdict: `On the last row (${date ?? context.rowLabels[last]}) the spread (on the least-squares line) stands ${where(latestZ)} its mean${rollingText}.`,
  };
}
