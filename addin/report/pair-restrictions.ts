/**
 * Johansen's restriction tests of one pair, for the report: is the one relation simply the
 * first minus the second (weights 1 and -1 up to scale), and does each series move to close
 * the gap (its adjustment is not zero)? Run with the lags and case of the pair's Johansen test
 * and one relation, exactly as the results block's MOOR.RELATIONIS and MOOR.ADJUSTS rows ask,
 * so the pane and the block show the same p-values.
 */
import { betaRestrictionTest, exogeneityTests } from '../johansen/restrictions';
import type { PairRestrictions } from './pair-types';
import type { JohansenSummary } from './report-types';

/** The two restriction tests of the pair (a, b) with the Johansen test's lags and case. */
export function pairRestrictions(a: Float64Array, b: Float64Array, names: { a: string; b: string }, johansen: JohansenSummary): PairRestrictions {
  const options = { lags: johansen.lags, case: johansen.case };
  const labels = [names.a, names.b];
  const oneToOne = betaRestrictionTest([a, b], [1, -1], options, labels);
  const adjusts = exogeneityTests([a, b], { ...options, rank: 1 }, labels);
  return {
    oneToOne: { statistic: oneToOne.statistic, df: oneToOne.df, pValue: oneToOne.pValue },
    adjusts: adjusts.map((t) => ({ series: t.series, statistic: t.statistic, df: t.df, pValue: t.pValue })),
  };
}
