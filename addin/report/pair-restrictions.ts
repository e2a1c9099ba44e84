/**
 * Johansen's restriction tests of one pair, for the report: is the one relation simply the
 * first minus the second (weights 1 and -1 up to scale), and does each series move to close
 * the gap (its adjustment is not zero)? Run with the lags and case of the pair's Johansen test
 * and one relation, exactly as the results block's MOOR.RELATIONIS and MOOR.ADJUSTS rows ask,
 * so the pane and the block show the same p-values.
 */
import { betaRestrictionTest, exogeneityTests } from '../johansen/restrictions';
import { powerOfTwoScale, scaled, toUnitScale } from '../linalg/power-of-two-scale';
import type { PairRestrictions } from './pair-types';
import type { JohansenSummary } from './report-types';

/** The two restriction tests of the pair (a, b) with the Johansen test's lags and case. */
export function pairRestrictions(a: Float64Array, b: Float64Array, names: { a: string; b: string }, johansen: JohansenSummary): PairRestrictions {
  const options = { lags: johansen.lags, case: johansen.case };
  const labels = [names.a, names.b];
  // Likelihood ratios do not depend on the units of the prices, but their moment matrices can
  // overflow at extreme units: each series is brought near 1 by a power of two first. The
  // weights 1 and -1 are in the prices' own units, so both series share one factor for that test.
  const shared = powerOfTwoScale(a, b);
  const together = [scaled(a, shared), scaled(b, shared)];
  const oneToOne = betaRestrictionTest(together, [1, -1], options, labels);
  const adjusts = exogeneityTests([toUnitScale(a).values, toUnitScale(b).values], { ...options, rank: 1 }, labels);
  return {
    oneToOne: { statistic: oneToOne.statistic, df: oneToOne.df, pValue: oneToOne.pValue },
    adjusts: adjusts.map((t) => ({ series: t.series, statistic: t.statistic, df: t.df, pValue: t.pValue })),
  };
}
