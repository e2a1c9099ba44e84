/**
 * The cointegration evidence of one pair: Engle-Granger in both normalisations, the
 * Phillips-Ouliaris Z-t of the relation the report settles on, and the Johansen rank of the
 * pair. The report's decision rests on Engle-Granger (the residual the spread is built from):
 * cointegrated when both series are I(1) and at least one direction rejects "no
 * cointegration"; the evidence is "both-directions" or "one-direction" accordingly. The
 * other two tests corroborate, and a disagreement becomes a warning (pair-warnings.ts).
 */
import type { EngleGrangerResult } from '../cointegration/engle-granger';
import { engleGrangerBothWays } from '../cointegration/engle-granger-both-ways';
import { phillipsOuliaris } from '../cointegration/phillips-ouliaris';
import type { Deterministic } from '../result';
import type { BoundsSummary, CointegrationEvidence, EngleGrangerSummary, PairCointegration, PairRestrictions } from './pair-types';
import { summariseTest, type TestSummary } from './test-summary';
import type { JohansenSummary } from './report-types';

/** Engle-Granger in one direction, summarised with its step-1 line. */
function engleGrangerSummary(result: EngleGrangerResult, dependent: string, regressor: string, alpha: number): EngleGrangerSummary {
  return { ...summariseTest(result.test, alpha), dependent, regressor, beta: result.beta[0], intercept: result.intercept };
}

/** Both Engle-Granger directions, and the evidence they give together. */
export function engleGrangerPair(
  a: Float64Array,
  b: Float64Array,
  names: { a: string; b: string },
  options: { alpha: number; deterministic: Deterministic; lagRule: 'aic' | 'bic' },
): { aOnB: EngleGrangerSummary; bOnA: EngleGrangerSummary; agree: boolean; evidence: CointegrationEvidence } {
  const both = engleGrangerBothWays(a, b, { alpha: options.alpha, deterministic: options.deterministic, lags: options.lagRule }, names);
  const aOnB = engleGrangerSummary(both.aOnB, names.a, names.b, options.alpha);
  const bOnA = engleGrangerSummary(both.bOnA, names.b, names.a, options.alpha);
  const count = [aOnB.rejects, bOnA.rejects].filter((r) => r === true).length;
  const evidence: CointegrationEvidence = count === 2 ? 'both-directions' : count === 1 ? 'one-direction' : 'none';
  return { aOnB, bOnA, agree: both.agree, evidence };
}

/** Phillips-Ouliaris Z-t of y on x. */
export function phillipsOuliarisSummary(
  y: Float64Array,
  x: Float64Array,
  names: { y: string; x: string },
  options: { alpha: number; deterministic: Deterministic },
): TestSummary {
  const result = phillipsOuliaris(y, [x], { deterministic: options.deterministic }, { y: names.y, xs: [names.x] });
  return summariseTest(result.test, options.alpha);
}

/** The p-value that speaks for the evidence: the larger of the rejecting directions' p-values (the cautious one). */
export function headlinePValue(cointegration: Pick<PairCointegration, 'engleGranger'>): number | null {
  const { aOnB, bOnA } = cointegration.engleGranger;
  const rejecting = [aOnB, bOnA].filter((t) => t.rejects === true);
  const pool = rejecting.length > 0 ? rejecting : [aOnB, bOnA];
  const ps = pool.map((t) => t.pValue).filter((p): p is number => p !== null);
  return ps.length === 0 ? null : Math.max(...ps);
}

/** The pair's cointegration part, with the decision and its verdict. */
export function pairCointegration(
  parts: {
    engleGranger: ReturnType<typeof engleGrangerPair>;
    phillipsOuliaris: TestSummary | null;
    johansen: JohansenSummary | null;
    bothIntegrated: boolean;
    bounds?: BoundsSummary | null;
    restrictions?: PairRestrictions | null;
  },
  verdict: string,
): PairCointegration {
  const { aOnB, bOnA, agree, evidence } = parts.engleGranger;
  return {
    bothIntegrated: parts.bothIntegrated,
    engleGranger: { aOnB, bOnA, agree },
    phillipsOuliaris: parts.phillipsOuliaris,
    johansen: parts.johansen,
    evidence,
    cointegrated: parts.bothIntegrated && evidence !== 'none',
    verdict,
    ...(parts.bounds ? { bounds: parts.bounds } : {}),
    ...(parts.restrictions ? { restrictions: parts.restrictions } : {}),
  };
}
