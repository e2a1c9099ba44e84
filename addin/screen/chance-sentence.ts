/**
 * The sentence every screen carries: how many pairs would pass at the chosen level by chance
 * alone, beside how many pass before and after the false-discovery-rate adjustment. Under
 * the null of no relation a p-value is uniform, so of m tests at level alpha about m alpha
 * pass even when nothing is related (the expected count of false rejections).
 */
import { levelText } from '../cointegration/wording';

/** The counts the sentence reports. */
export interface ChanceCounts {
  /** Directed pairs tested: the multiple-testing family. */
  tested: number;
  alpha: number;
  /** Pairs whose own p-value is at or below alpha. */
  rawPasses: number;
  /** Pairs whose Benjamini-Hochberg adjusted p-value is at or below alpha. */
  discoveries: number;
}

/** A whole number with thousands separators: 2450 -> "2,450". */
export function groupedNumber(n: number): string {
  return String(Math.round(n)).replace(/\B(?=(\d{3})+(?!\d))/g, ',');
}

/** Pairs expected to pass by chance alone: tested x alpha, rounded. */
export function expectedByChance(tested: number, alpha: number): number {
  return Math.round(tested * alpha);
}

/**
 * "Of 2,450 directed pairs tested at 5%, 140 pass on their own p-value, but about 123 would
 * pass by chance alone even if no pair were related; 9 pass after false-discovery-rate
 * adjustment (Benjamini-Hochberg over all 2,450 directed pairs)."
 */
export function chanceSentence(c: ChanceCounts): string {
  const level = levelText(c.alpha);
  const pairs = (n: number) => `${groupedNumber(n)} directed pair${n === 1 ? '' : 's'}`;
  if (c.tested === 0) return `No pair could be tested at ${level}, so no pair passes, by chance or otherwise.`;
  const chance = expectedByChance(c.tested, c.alpha);
  return (
    `Of ${pairs(c.tested)} tested at ${level}, ${groupedNumber(c.rawPasses)} pass${c.rawPasses === 1 ? 'es' : ''} on ${c.rawPasses === 1 ? 'its' : 'their'} own p-value, ` +
    `but about ${groupedNumber(chance)} would pass by chance alone even if no pair were related; ` +
    `${groupedNumber(c.discoveries)} pass${c.discoveries === 1 ? 'es' : ''} after false-discovery-rate adjustment (Benjamini-Hochberg over all ${pairs(c.tested)}).`
  );
}
