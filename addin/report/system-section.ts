/**
 * The system as a whole, for more than two series: the Johansen rank of all of them, with
 * the case and lags chosen as for a pair (johansen-choice.ts). A stationary series in the
 * block is a "relation" of its own (it is a combination that stays anchored), so the verdict
 * names such series rather than let them pass for ties between prices.
 */
import { isMooringInputError } from '../errors';
import type { JohansenCase } from '../johansen/johansen';
import { listNames } from '../johansen/johansen-warnings';
import { johansenSection } from './johansen-choice';
import type { SystemReport } from './report-types';
import { orderText } from './series-section';

/** The Johansen rank of the whole block, or why it is missing. */
export function systemSection(
  block: readonly Float64Array[],
  names: readonly string[],
  orders: Record<string, number>,
  options: { alpha: number; lagRule: 'aic' | 'bic'; johansenCase: JohansenCase | 'auto' },
): SystemReport {
  try {
    const johansen = johansenSection(block, names, options);
    const notI1 = names.filter((n) => orders[n] !== 1);
    const note = notI1.length === 0
      ? ''
      : ` ${listNames(notI1.map((n) => `${n} (${orderText(orders[n])})`))} ${notI1.length === 1 ? 'is' : 'are'} not I(1): a stationary series counts as a relation of its own, so the rank includes ${notI1.length === 1 ? 'it' : 'them'}.`;
    return { johansen, unavailable: null, verdict: `${johansen.verdict}${note}` };
  } catch (e) {
    if (!isMooringInputError(e)) throw e;
    return { johansen: null, unavailable: e.message, verdict: `No test of the system as a whole: ${e.message}` };
  }
}
