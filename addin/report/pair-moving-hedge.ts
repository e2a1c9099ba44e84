/**
 * The report's section on the hedge ratio through time: the Kalman filter's moving ratio of the
 * pair's dependent on its regressor (addin/kalman/moving-hedge.ts), with Q and R by maximum
 * likelihood, cut to what the report's surfaces show (the paths, the latest ratio, the fixed
 * line for comparison and the words). The intercept's paths stay with the kalman command.
 */
import { movingHedge } from '../kalman/moving-hedge';
import type { MovingHedgeReport } from './pair-types';

export function movingHedgeSection(y: ArrayLike<number>, x: ArrayLike<number>, names: { y: string; x: string }): MovingHedgeReport {
  const r = movingHedge(y, x, names);
  return {
    dependent: names.y,
    regressor: names.x,
    stateVar: r.stateVar,
    obsVar: r.obsVar,
    logLikelihood: r.logLikelihood,
    diffuseRows: r.diffuseRows,
    beta: r.beta,
    betaStd: r.betaStd,
    betaSmoothed: r.betaSmoothed,
    betaSmoothedLow: r.betaSmoothedLow,
    betaSmoothedHigh: r.betaSmoothedHigh,
    spreadStandardised: r.spreadStandardised,
    latest: r.latest,
    fixedBeta: r.fixedBeta,
    shareOutsideBand: r.shareOutsideBand,
    driftText: r.driftText,
    assumptions: r.assumptions,
    driftMeaning: r.driftMeaning,
    warnings: r.warnings,
  };
}
