/**
 * What a reader should weigh before relying on a pair's verdicts, each warning one or two
 * plain sentences: inputs that are not I(1), tests that disagree (the two Engle-Granger
 * directions, Engle-Granger against Phillips-Ouliaris and against Johansen), a spread close
 * to a unit root, and signs that the relation moved (the halves of the sample).
 *
 * "Close to a unit root" follows common practice: an AR(1) coefficient of the spread above
 * 0.98, or a half-life longer than a third of the sample, leaves too few closings of the gap
 * in the data to trust the estimate.
 */
import { formatCoefficient, formatPeriods, formatPValue } from '../cointegration/wording';
import type { PairReport, PairWarning, PairWarningKind } from './pair-types';
import { orderText } from './series-section';

/** AR(1) coefficient of the spread above which it is called close to a unit root. */
export const NEAR_UNIT_ROOT_PHI = 0.98;

/** Share of the sample a half-life may reach before it is called too long to trust. */
export const LONGEST_HALF_LIFE_SHARE = 1 / 3;

/** The warnings of one pair. */
export function pairWarnings(
  pair: Omit<PairReport, 'warnings' | 'verdicts'>,
  context: { orders: Record<string, number>; observations: number; period: string },
): PairWarning[] {
  const out: PairWarning[] = [];
  const add = (kind: PairWarningKind, text: string): void => {
    out.push({ kind, text });
  };
  const c = pair.cointegration;
  const { aOnB, bOnA } = c.engleGranger;
  if (!c.bothIntegrated) {
    const odd = [pair.a, pair.b].filter((n) => context.orders[n] !== 1).map((n) => `${n} is ${orderText(context.orders[n])}`);
    add('inputs-not-integrated', `Cointegration tests assume both series are I(1), but ${odd.join(' and ')}; their results for this pair do not show a long-run relation between two wandering prices.`);
    // The tests below disagree as a matter of course on such a pair; their warnings would only be noise.
    for (const u of pair.unavailable) add('part-unavailable', `No ${u.part}: ${u.reason}`);
    return out;
  }
  if (!c.engleGranger.agree) {
    const [yes, no] = aOnB.rejects === true ? [aOnB, bOnA] : [bOnA, aOnB];
    add(
      'directions-disagree',
      `The two Engle-Granger directions disagree: ${yes.dependent} on ${yes.regressor} rejects "no relation" (${formatPValue(yes.pValue)}), ` +
        `${no.dependent} on ${no.regressor} does not (${formatPValue(no.pValue)}). Treat the evidence as borderline.`,
    );
  }
  const egFinds = c.evidence !== 'none';
  const po = c.phillipsOuliaris;
  if (po && po.rejects !== null && po.rejects !== egFinds) {
    add(
      'residual-tests-disagree',
      `Phillips-Ouliaris (${formatPValue(po.pValue)}) ${po.rejects ? 'finds' : 'does not find'} a long-run relation where Engle-Granger ${egFinds ? 'does' : 'does not'}: the residual-based tests disagree.`,
    );
  }
  const j = c.johansen;
  if (j) {
    const rank = j.rank.trace;
    if (rank === 2) {
      add('johansen-disagrees', 'Johansen\'s trace test rejects every rank below 2, which says both series are stationary on their own rather than tied by a relation.');
    } else if ((rank === 1) !== egFinds) {
      add(
        'johansen-disagrees',
        `Johansen's trace test (${j.case} case) finds ${rank === 1 ? 'one long-run relation' : 'no long-run relation'} where Engle-Granger finds ${egFinds ? 'one' : 'none'}: the tests disagree, so the evidence is not clear-cut.`,
      );
    }
  }
  const ar1 = pair.adjustment?.spreadAr1;
  if (ar1 && egFinds) {
    const longest = context.observations * LONGEST_HALF_LIFE_SHARE;
    if (ar1.phi > NEAR_UNIT_ROOT_PHI || (ar1.halfLife !== null && ar1.halfLife > longest)) {
      const life = ar1.halfLife === null ? 'no half-life' : `a half-life of ${formatPeriods(ar1.halfLife, context.period)}`;
      add(
        'near-unit-root',
        `The spread is close to a unit root (AR(1) coefficient ${formatCoefficient(ar1.phi)}, ${life}; ` +
          `common practice is wary above ${NEAR_UNIT_ROOT_PHI} or beyond a third of the sample, ${formatPeriods(longest, context.period)}): it may not close within the data.`,
      );
    }
  }
  const halves = pair.relation?.halves;
  if (halves && !halves.stable && egFinds) {
    add(
      'relation-moved',
      `The hedge ratio moved between the halves of the sample: ${formatCoefficient(halves.first.beta)} (${halves.first.from} to ${halves.first.to}) against ` +
        `${formatCoefficient(halves.second.beta)} (${halves.second.from} to ${halves.second.to}), ${formatCoefficient(halves.differenceInStandardErrors)} standard errors apart. The relation may be unstable.`,
    );
  }
  for (const u of pair.unavailable) add('part-unavailable', `No ${u.part}: ${u.reason}`);
  return out;
}
