/**
 * The sentences under a rolling or expanding analysis: how many windows pass at 5%, where
 * the latest window stands, how far the hedge ratio moved, and why the share of passing
 * windows is a description rather than a test (overlapping windows share most of their rows,
 * so their p-values are far from independent).
 */
import { formatCoefficient, formatPValue } from '../cointegration/wording';
import { groupedNumber } from '../screen/chance-sentence';
import type { RollingRelation } from './rolling-relation';

/** Level the summary reads the p-values at. */
const SUMMARY_LEVEL = 0.05;

/** The summary sentences of a finished analysis; windows counted in `period`s (one row each: "row", "day", "week", ...). */
export function rollingSummary(r: RollingRelation, names: { y: string; x: string }, flatWindows: number, period = 'row'): string[] {
  const rows = (n: number) => `${groupedNumber(n)} ${period}${n === 1 ? '' : 's'}`;
  const kind = r.expanding ? 'expanding windows' : `rolling windows of ${rows(r.window)}`;
  const total = r.endRow.length;
  const tested = r.pValue.filter((p): p is number => p !== null);
  const passing = tested.filter((p) => p <= SUMMARY_LEVEL).length;
  const out = [
    `In ${groupedNumber(passing)} of ${groupedNumber(tested.length)} ${kind} (${Math.round((100 * passing) / Math.max(tested.length, 1))}%), ` +
      `the Engle-Granger p-value of ${names.y} on ${names.x} is at or below 5%.`,
  ];
  const lastP = r.pValue[total - 1];
  const lastBeta = r.beta[total - 1];
  if (lastP !== null && lastBeta !== null) {
    out.push(`In the latest window (${rows(r.nobs[total - 1])}) it is ${formatPValue(lastP)}, with a hedge ratio of ${formatCoefficient(lastBeta)}.`);
  }
  const range = betaRange(r.beta);
  if (range.count > 1) {
    out.push(`The hedge ratio ranged from ${formatCoefficient(range.lowest)} to ${formatCoefficient(range.highest)} across the windows.`);
  }
  if (flatWindows > 0) out.push(`In ${groupedNumber(flatWindows)} window${flatWindows === 1 ? '' : 's'} ${names.x} or ${names.y} does not move, so there is no hedge ratio there.`);
  if (total > 1) {
    out.push('Neighbouring windows share most of their rows, so their p-values are not independent tests: the share that pass describes the history, it does not test it.');
  }
  return out;
}

/**
 * Lowest and highest hedge ratio over the windows, by a loop: a million windows are a million
 * arguments to Math.min(...betas), which overflows the call stack.
 */
function betaRange(betas: readonly (number | null)[]): { count: number; lowest: number; highest: number } {
  let count = 0;
  let lowest = Infinity;
  let highest = -Infinity;
  for (const b of betas) {
    if (b === null) continue;
    count++;
    if (b < lowest) lowest = b;
    if (b > highest) highest = b;
  }
  return { count, lowest, highest };
}
