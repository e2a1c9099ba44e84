/**
 * The reading beside each number: a formula that turns the number in the next cell into
 * words, so the words change with the number when rows are added. Every reading begins with
 * "yes", "no" or "n/a" (a missing number), which is what its fill keys on (block-style.ts);
 * the rest of the words are the block's own.
 */
import { levelText } from '../../addin/cointegration/wording';
import { VERDICT_START } from './block-style';
import { textLiteral } from './series-reference';

const { supported: YES, notSupported: NO, missing: NA } = VERDICT_START;

/** IF(ISNUMBER(cell), inner, "n/a: ..."), the guard every reading shares. */
function guarded(cell: string, inner: string, missing: string): string {
  return `=IF(ISNUMBER(${cell}),${inner},${textLiteral(`${NA}: ${missing}`)})`;
}

/** A p-value read at a level: "yes: <finding> (evidence at 5%)" below it, "no: ..." at or above. */
export function pValueReading(cell: string, alpha: number, finding: string, absent: string): string {
  const level = levelText(alpha);
  return guarded(
    cell,
    `IF(${cell}<${alpha},${textLiteral(`${YES}: ${finding} (evidence at ${level})`)},${textLiteral(`${NO}: ${absent} at ${level}`)})`,
    'no p-value (see the message on the number)',
  );
}

/** The order of integration: I(1) is what the tie tests need. */
export function orderReading(cell: string): string {
  return `=IF(${cell}=1,${textLiteral(`${YES}: wanders, and its changes settle (I(1), as the tie tests need)`)},` +
    `IF(${cell}=0,${textLiteral(`${NO}: settles around a level by itself (I(0))`)},` +
    `IF(ISNUMBER(${cell}),${textLiteral(`${NO}: wanders even in its changes (I(2))`)},${textLiteral(`${NA}: no clear order (see the message on the number)`)})))`;
}

/** The Johansen count of relations for a pair: one is a tie, two says each series settles alone. */
export function rankReading(cell: string): string {
  return guarded(
    cell,
    `IF(${cell}=1,${textLiteral(`${YES}: one long-run relation`)},IF(${cell}=0,${textLiteral(`${NO}: no long-run relation`)},` +
      `${textLiteral(`${NO}: as many relations as series, which says each settles by itself`)}))`,
    'no count (see the message on the number)',
  );
}

/** The sign of a speed of adjustment: negative moves back toward the line. */
export function speedReading(cell: string, series: string): string {
  return guarded(cell, `IF(${cell}<0,${textLiteral(`${YES}: ${series} moves back toward the line`)},${textLiteral(`${NO}: ${series} does not move back`)})`, 'no estimate');
}

/** A t-value against the two-sided critical value for the level. */
export function pullReading(cell: string, critical: number, alpha: number): string {
  const level = levelText(alpha);
  return guarded(
    cell,
    `IF(${cell}<=${-Number(critical.toFixed(3))},${textLiteral(`${YES}: the pull back is significant at ${level}`)},${textLiteral(`${NO}: no significant pull back at ${level}`)})`,
    'no estimate',
  );
}

/**
 * A half-life exists only when the spread reverts. The function answers #N/A when there is
 * none; any other error (a refused input) is not a finding about the spread, so it reads n/a.
 */
export function halfLifeReading(cell: string, period: string): string {
  return `=IF(ISNUMBER(${cell}),${textLiteral(`${YES}: half of a gap closes in about this many ${period}s`)},` +
    `IF(ISNA(${cell}),${textLiteral(`${NO}: the spread does not revert, so no half-life`)},${textLiteral(`${NA}: no half-life (see the message on the number)`)}))`;
}

/** Whether the latest z-score lies beyond the 2-standard-deviation bands. */
export function stretchReading(cell: string): string {
  return guarded(
    cell,
    `IF(ABS(${cell})>=2,${textLiteral(`${YES}: beyond 2 standard deviations from the mean`)},${textLiteral(`${NO}: within 2 standard deviations of the mean`)})`,
    'no z-score',
  );
}
