/**
 * The sequential choice of the cointegration rank and the plain-words verdict.
 *
 * Sequential rule (Johansen 1995, ch. 12, from memory): test rank <= 0, <= 1, ... in turn and stop at
 * the first r whose null is not rejected at the chosen level; if every null is rejected the
 * rank is n (the series are then stationary themselves).
 */
import { listNames } from './johansen-warnings';

/** The first r whose p-value is at least alpha, or pValues.length when every null is rejected. */
export function sequentialRank(pValues: readonly number[], alpha: number): number {
  const r = pValues.findIndex((p) => p >= alpha);
  return r < 0 ? pValues.length : r;
}

/** "5%", "2.5%", "10%" for alpha = 0.05, 0.025, 0.1. */
export function percentLabel(alpha: number): string {
  return `${Number((alpha * 100).toPrecision(6))}%`;
}

/**
 * The verdict in plain words, e.g. "At 5%, Crude, Diesel and Freight share 1 long-run
 * relation (trace test).", with the caution that fits the outcome.
 */
export function rankVerdict(names: readonly string[], rank: { trace: number; maxEigen: number }, alpha: number): string {
  const m = names.length;
  const level = percentLabel(alpha);
  const who = listNames(names);
  const parts: string[] = [];
  if (rank.trace === 0) {
    parts.push(`At ${level}, ${who} share no long-run relation (trace test): no mix of them was found to stay anchored, so a spread built from them may wander without limit.`);
  } else if (rank.trace === m) {
    parts.push(
      `At ${level}, the trace test rejects every rank below ${m}: that says the series are themselves stationary rather than tied together by long-run relations. Check each series with a unit-root test before reading this as cointegration.`,
    );
  } else {
    const relations = rank.trace === 1 ? '1 long-run relation' : `${rank.trace} long-run relations`;
    parts.push(
      `At ${level}, ${who} share ${relations} (trace test). The relation${rank.trace === 1 ? ' is' : 's are'} estimated from this sample and can break; re-test on new data before trading on ${rank.trace === 1 ? 'it' : 'them'}.`,
    );
  }
  if (rank.maxEigen !== rank.trace) {
    parts.push(`The maximum-eigenvalue test points to ${rank.maxEigen} instead, so the evidence is not clear-cut.`);
  }
  return parts.join(' ');
}
