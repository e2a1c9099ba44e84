/**
 * The standing cautions of the diagnostic, in every rendering (terminal, JSON, HTML): a
 * test is evidence, not advice; long-run relations break; screening many pairs turns up
 * false discoveries (with this report's own count); the user's risk policy and licensed
 * advice come first.
 */
import { levelText } from '../cointegration/wording';

/** Expected number of pairs passing by chance alone when none is related: pairs x alpha. */
export function expectedFalseDiscoveries(pairs: number, alpha: number): number {
  return pairs * alpha;
}

/** How many tests the report ran, and how many would pass by chance alone if nothing were related. */
export interface ScreeningCount {
  pairs: number;
  leadLagDirections: number;
  alpha: number;
  /** pairs x alpha. */
  expectedPassingPairs: number;
  /** directions x alpha. */
  expectedPassingDirections: number;
  /** The screening caution in words (also among the cautions). */
  text: string;
}

/** The screening count of a report with this many pairs at this level. */
export function screeningCount(pairs: number, alpha: number): ScreeningCount {
  return {
    pairs,
    leadLagDirections: 2 * pairs,
    alpha,
    expectedPassingPairs: expectedFalseDiscoveries(pairs, alpha),
    expectedPassingDirections: expectedFalseDiscoveries(2 * pairs, alpha),
    text: reportCautions(pairs, alpha)[2],
  };
}

/** The cautions for a report that tested this many pairs (each with two lead-lag directions) at this level. */
export function reportCautions(pairs: number, alpha: number): string[] {
  const shown = (x: number): string => String(Number(x.toPrecision(2)));
  const screening = pairs > 1
    ? `This report tested ${pairs} pairs and ${2 * pairs} lead-lag directions. At the ${levelText(alpha)} level about ${shown(expectedFalseDiscoveries(pairs, alpha))} pairs ` +
      `and ${shown(expectedFalseDiscoveries(2 * pairs, alpha))} directions would pass by chance alone even if nothing were related: ` +
      'screening many pairs and keeping the ones that pass yields false discoveries.'
    : 'Screening many series or pairs and keeping the ones that pass yields false discoveries: some pass by chance alone.';
  return [
    'A test result is statistical evidence about past prices, not advice to trade.',
    'Long-run relations between prices break: a relation that held for years can end without warning, so re-test on new data before relying on it.',
    screening,
    'Your own risk policy and licensed financial advice come first.',
  ];
}
