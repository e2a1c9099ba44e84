/**
 * A p-value read off a table is a bound, not a value, when the statistic lies beyond the
 * table's ends: the table holds it at its end probability (KPSS at 0.01 or 0.10, the Johansen
 * simulation at 0.001 or 0.999) and all that is known is that the truth lies further out.
 * The engine marks such a p-value with `pValueBound` on the TestResult; every surface then
 * prints it through formatBoundedPValue, so "< 0.01" reads the same on the terminal, in the
 * HTML report, in the pane and in a cell's table, and never passes for an exact 0.0100.
 */

/**
 * Which side of the reported p-value the truth lies on: 'below' (the true p-value is smaller,
 * the statistic is beyond the table's most extreme point), 'above' (it is larger, the statistic
 * falls short of the table's first point), or null when the p-value is read inside the table.
 */
export type PValueBound = 'below' | 'above' | null;

/** The bound as the table gives it, with at least two decimals: 0.01, 0.10, 0.001, 0.999. */
function boundNumber(p: number): string {
  const shortest = String(Number(p.toPrecision(6)));
  const decimals = shortest.includes('.') ? shortest.split('.')[1].length : 0;
  return p.toFixed(Math.max(2, decimals));
}

/** "< 0.01" or "> 0.10" for a bounded p-value; null when the p-value is exact or missing. */
export function pValueBoundText(p: number | null | undefined, bound: PValueBound | undefined): string | null {
  if (!bound || p === null || p === undefined || !Number.isFinite(p)) return null;
  return `${bound === 'below' ? '<' : '>'} ${boundNumber(p)}`;
}

/**
 * The one formatting of a p-value with its bound, shared by every renderer: a bounded p-value
 * as "< 0.01" / "> 0.10" / "< 0.001", an exact one by the surface's own digits (`exact`).
 */
export function formatBoundedPValue<P extends number | null | undefined>(
  p: P,
  bound: PValueBound | undefined,
  exact: (p: P) => string,
): string {
  return pValueBoundText(p, bound) ?? exact(p);
}

/**
 * The bound in words, for JSON's pValueNote and the notes beside a table:
 * "below 0.01: the statistic lies beyond the table's last column".
 */
export function pValueBoundNote(p: number, bound: 'below' | 'above'): string {
  return `${bound} ${boundNumber(p)}: ${pValueBoundReason(bound)}`;
}

/** Why a p-value is only a bound, for a note beside "< 0.01": where the statistic fell. */
export function pValueBoundReason(bound: 'below' | 'above'): string {
  return bound === 'below' ? "the statistic lies beyond the table's last column" : "the statistic lies before the table's first column";
}
