/**
 * Plain words for the break tests: numbers inside sentences, the shift each model allows,
 * and the verdicts a trader reads first.
 */
import { pValueBoundText } from '../p-value-bound';
import type { BreakLocation } from './break-location';

/** Four significant digits, trailing zeros dropped: -5.386, 0.0063. */
export function formatNumber(v: number): string {
  if (!Number.isFinite(v)) return v > 0 ? 'infinity' : 'minus infinity';
  return String(Number(v.toPrecision(4)));
}

/** "p = 0.031", "p < 0.001", or "p < 0.00001" / "p > 0.999" when the table's end was reached. */
export function formatBreakPValue(p: number | null, beyond: 'below' | 'above' | null): string {
  if (p === null) return 'no p-value';
  const bound = pValueBoundText(p, beyond);
  if (bound !== null) return `p ${bound}`;
  if (p < 0.001) return 'p < 0.001';
  return `p = ${Number(p.toPrecision(2))}`;
}

/** "around 2023-04-12" or "around row 340". */
export function aroundText(location: BreakLocation): string {
  return `around ${location.label}`;
}

/** The standing caution of every break result: a relation that broke once can break again. */
export const BREAKS_AGAIN_CAUTION =
  'Relations and regimes break: one that shifted once can shift again, and a test on past prices says nothing about the next shift. Re-test as new prices arrive.';

/** The sentence with its first letter in capitals ("the series ..." -> "The series ..."). */
export function capitalise(sentence: string): string {
  return sentence.charAt(0).toUpperCase() + sentence.slice(1);
}
