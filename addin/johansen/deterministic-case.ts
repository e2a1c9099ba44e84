/**
 * The five deterministic specifications of the Johansen rank test, in Mooring's words,
 * following the numbering of Johansen (1995), ch. 5.7 and 6:
 *
 * | Mooring name          | Johansen's model | deterministic terms                                   |
 * |-----------------------|------------------|-------------------------------------------------------|
 * | 'none'                | H2(r), case 1    | none                                                  |
 * | 'restricted-constant' | H1*(r), case 2   | constant inside the cointegrating relations only      |
 * | 'constant'            | H1(r), case 3    | unrestricted constant (linear trends in the data)     |
 * | 'restricted-trend'    | H*(r), case 4    | unrestricted constant, trend inside the relations     |
 * | 'trend'               | H(r), case 5     | unrestricted constant and trend (quadratic trends)    |
 *
 * Reference: Johansen, S. (1995). Likelihood-Based Inference in Cointegrated Vector
 * Autoregressive Models. Oxford University Press.
 */
import { MooringInputError } from '../errors';

/** One of the five deterministic specifications (see the table above). */
export type JohansenCase = 'none' | 'restricted-constant' | 'constant' | 'restricted-trend' | 'trend';

/** All five cases, in Johansen's order 1..5. */
export const JOHANSEN_CASES: readonly JohansenCase[] = ['none', 'restricted-constant', 'constant', 'restricted-trend', 'trend'];

/** The two rank statistics: trace = -T sum log(1 - lambda_i), maxEigen = -T log(1 - lambda_max). */
export type JohansenStatisticKind = 'trace' | 'maxEigen';

/** Largest n - r (number of common stochastic trends) that Mooring's tables cover. */
export const MAX_COMMON_TRENDS = 12;

/** Plain words for each case, for messages and labels. */
export const JOHANSEN_CASE_LABEL: Record<JohansenCase, string> = {
  none: 'no constant, no trend',
  'restricted-constant': 'constant inside the cointegrating relations',
  constant: 'unrestricted constant (linear trends in the data)',
  'restricted-trend': 'linear trend inside the cointegrating relations',
  trend: 'unrestricted linear trend (quadratic trends in the data)',
};

/** Throws a MooringInputError unless caseName is one of the five cases. */
export function requireJohansenCase(caseName: unknown): asserts caseName is JohansenCase {
  if (typeof caseName !== 'string' || !(JOHANSEN_CASES as readonly string[]).includes(caseName)) {
    throw new MooringInputError(
      `Unknown deterministic case '${String(caseName)}' for the Johansen test: use one of ${JOHANSEN_CASES.map((c) => `'${c}'`).join(', ')}.`,
    );
  }
}

/** Throws a MooringInputError unless kind is 'trace' or 'maxEigen'. */
export function requireStatisticKind(kind: unknown): asserts kind is JohansenStatisticKind {
  if (kind !== 'trace' && kind !== 'maxEigen') {
    throw new MooringInputError(`Unknown Johansen statistic '${String(kind)}': use 'trace' or 'maxEigen'.`);
  }
}

/** Throws a MooringInputError unless nMinusR is a whole number from 1 to MAX_COMMON_TRENDS. */
export function requireCommonTrends(nMinusR: unknown): asserts nMinusR is number {
  if (typeof nMinusR !== 'number' || !Number.isInteger(nMinusR) || nMinusR < 1 || nMinusR > MAX_COMMON_TRENDS) {
    throw new MooringInputError(
      `n - r (variables minus cointegrating rank) must be a whole number from 1 to ${MAX_COMMON_TRENDS}; got ${String(nMinusR)}.`,
    );
  }
}
