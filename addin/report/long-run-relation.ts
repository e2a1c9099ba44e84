/**
 * The long-run relation of a pair, dependent = intercept + beta regressor: the static OLS
 * line (the Engle-Granger step 1, which the spread is built from) and dynamic OLS with its
 * HAC standard error (the one with valid inference for wandering prices), plus a stability
 * check: dynamic OLS on each half of the sample. Common practice reads a difference of more
 * than two standard errors of the difference, sqrt(se1^2 + se2^2), as a sign that the
 * relation moved between the halves.
 *
 * Every dynamic-OLS standard error here is the engine's one estimator (dynamic-ols.ts: the
 * long-run variance with Andrews' AR(1) plug-in bandwidth, which allows for a persistent
 * spread), the same the hedge command shows. Each line's slope is also given as units to hold
 * at the latest prices (hedge-units.ts): in logs the slope is an elasticity.
 */
import { dynamicOls, dynamicOlsStandardErrorText } from '../cointegration/dynamic-ols';
import { olsHedgeRatio } from '../cointegration/hedge-ratio';
import { hedgeUnits } from '../cointegration/hedge-units';
import { formatCoefficient } from '../cointegration/wording';
import type { LongRunRelation } from './pair-types';

/** Fewest observations in each half before the halves are compared. */
export const HALF_MIN_OBSERVATIONS = 40;

/** Standard errors of the difference beyond which the halves disagree. */
export const HALVES_LIMIT = 2;

/** "ln DockDiesel = 0.4123 + 1.148 ln GateGasoil" (ln only when the values are logs). */
export function relationText(dependent: string, regressor: string, line: { beta: number; intercept: number }, logged: boolean): string {
  const name = (s: string): string => (logged ? `ln ${s}` : s);
  const sign = line.beta < 0 ? '-' : '+';
  return `${name(dependent)} = ${formatCoefficient(line.intercept)} ${sign} ${formatCoefficient(Math.abs(line.beta))} ${name(regressor)}`;
}

/** The relation of y on x with its stability check; row labels name the halves. */
export function longRunRelation(
  y: Float64Array,
  x: Float64Array,
  names: { y: string; x: string },
  context: { logged: boolean; rowLabels: readonly string[]; normalisationReason: string },
): LongRunRelation {
  const ols = olsHedgeRatio(y, x);
  const dols = dynamicOls(y, x);
  const n = y.length;
  const half = Math.floor(n / 2);
  let halves: LongRunRelation['halves'] = null;
  let halvesNote: string | null = null;
  if (half < HALF_MIN_OBSERVATIONS) {
    halvesNote = `Each half would hold fewer than ${HALF_MIN_OBSERVATIONS} observations, too few to compare the hedge ratio between them.`;
  } else {
    const first = dynamicOls(y.subarray(0, half), x.subarray(0, half));
    const second = dynamicOls(y.subarray(half), x.subarray(half));
    const spread = Math.sqrt(first.standardError ** 2 + second.standardError ** 2);
    const differenceInStandardErrors = Math.abs(first.beta - second.beta) / spread;
    halves = {
      first: { beta: first.beta, standardError: first.standardError, from: context.rowLabels[0], to: context.rowLabels[half - 1] },
      second: { beta: second.beta, standardError: second.standardError, from: context.rowLabels[half], to: context.rowLabels[n - 1] },
      differenceInStandardErrors,
      stable: differenceInStandardErrors <= HALVES_LIMIT,
    };
  }
  const dynamicLine = { beta: dols.beta, intercept: dols.intercept };
  const olsUnits = hedgeUnits(ols.beta, y, x, context.logged, names);
  const dynamicUnits = hedgeUnits(dols.beta, y, x, context.logged, names);
  return {
    dependent: names.y,
    regressor: names.x,
    normalisationReason: context.normalisationReason,
    slopeMeaning: dynamicUnits.slopeMeaning,
    latestPrices: { y: dynamicUnits.latestPriceY, x: dynamicUnits.latestPriceX },
    hedgeText: dynamicUnits.text,
    ols: { beta: ols.beta, intercept: ols.intercept, hedgeUnits: olsUnits.hedgeUnits },
    dynamicOls: {
      ...dynamicLine,
      hedgeUnits: dynamicUnits.hedgeUnits,
      standardError: dols.standardError,
      standardErrorMethod: dynamicOlsStandardErrorText(dols),
      leadsLags: dols.leadsLags,
      bandwidth: dols.bandwidth,
      observations: dols.nobs,
    },
    text: relationText(names.y, names.x, dynamicLine, context.logged),
    halves,
    halvesNote,
  };
}
