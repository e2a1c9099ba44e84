/**
 * A pair's verdicts in plain words at the report's level, in reading order: whether the two
 * share a long-run relation, what it is, how fast the spread closes, where it stands now, and
 * which series leads. The numbers sit next to the words ("Engle-Granger p = 0.001").
 */
import { formatCoefficient, formatPValue } from '../cointegration/wording';
import type { BoundsSummary, PairCointegration, PairReport } from './pair-types';
import { headlinePValue } from './pair-cointegration';
import { orderText } from './series-section';

/** The cointegration sentence, dependent series first. */
export function cointegrationVerdict(
  c: Pick<PairCointegration, 'engleGranger' | 'evidence' | 'bothIntegrated'>,
  first: string,
  second: string,
  orders: Record<string, number>,
  bounds: BoundsSummary | null = null,
): string {
  if (!c.bothIntegrated) {
    const odd = [first, second].filter((n) => orders[n] !== 1).map((n) => `${n} is ${orderText(orders[n])}`);
    if (bounds) {
      return `${first} and ${second}: the residual tests and Johansen assume two wandering prices, but ${odd.join(' and ')}; the bounds test, which allows a mix, answers instead. ${bounds.verdict}`;
    }
    return `${first} and ${second}: cointegration tests assume I(1) inputs, but ${odd.join(' and ')}, so this pair shows no long-run relation between two wandering prices.`;
  }
  const { aOnB, bOnA } = c.engleGranger;
  if (c.evidence === 'both-directions') {
    return `${first} and ${second} share a long-run relation (Engle-Granger ${formatPValue(headlinePValue(c))}, both directions agree).`;
  }
  if (c.evidence === 'one-direction') {
    const [yes, no] = aOnB.rejects === true ? [aOnB, bOnA] : [bOnA, aOnB];
    return (
      `${first} and ${second} may share a long-run relation, but the evidence is borderline: Engle-Granger finds it with ${yes.dependent} on ${yes.regressor} ` +
      `(${formatPValue(yes.pValue)}) and not the other way round (${formatPValue(no.pValue)}).`
    );
  }
  return `No evidence that ${first} and ${second} share a long-run relation (Engle-Granger ${formatPValue(aOnB.pValue)} and ${formatPValue(bOnA.pValue)} for the two directions).`;
}

/** All verdicts of a pair. */
export function pairVerdicts(pair: Omit<PairReport, 'verdicts' | 'warnings'>): string[] {
  const out = [pair.cointegration.verdict];
  if (pair.cointegration.cointegrated) {
    const r = pair.relation;
    if (r) {
      out.push(`Long-run relation: ${r.text} (dynamic OLS; the slope's standard error is ${formatCoefficient(r.dynamicOls.standardError)}, from the long-run variance); ${r.hedgeText}.`);
    }
    if (pair.adjustment) out.push(pair.adjustment.verdict);
    if (pair.spread) out.push(pair.spread.verdict);
  }
  if (pair.leadLag) out.push(pair.leadLag.verdict);
  return out;
}
