/**
 * Numbers inside the engine's plain-words verdicts. Renderers format the result fields
 * themselves; these are only for the sentences the engine writes.
 */
import { pValueBoundText, type PValueBound } from '../p-value-bound';

/** Four significant digits, trailing zeros dropped: 1.023, 0.0612, 13.51. */
export function formatCoefficient(v: number): string {
  if (!Number.isFinite(v)) return v > 0 ? 'infinity' : v < 0 ? 'minus infinity' : 'not a number';
  return String(Number(v.toPrecision(4)));
}

/**
 * A p-value for a sentence: "p = 0.031", "p < 0.001", or "no p-value" when none exists; a
 * bounded one (a table's end) as "p < 0.01" or "p > 0.10".
 */
export function formatPValue(p: number | null, bound?: PValueBound): string {
  const bounded = pValueBoundText(p, bound);
  if (bounded !== null) return `p ${bounded}`;
  if (p === null) return 'no p-value';
  if (p < 0.001) return 'p < 0.001';
  return `p = ${Number(p.toPrecision(2))}`;
}

/** A significance level as a percentage: 0.05 -> "5%". */
export function levelText(alpha: number): string {
  return `${Math.round(alpha * 1000) / 10}%`;
}

/** "a and b", "a, b and c". */
export function listText(items: readonly string[]): string {
  return items.length <= 1 ? (items[0] ?? '') : `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}

/** A number of periods for a sentence: one decimal below 10, whole above ("6.8 days", "11 days"). */
export function formatPeriods(v: number, period: string): string {
  const shown = v < 10 ? Math.round(v * 10) / 10 : Math.round(v);
  return `${shown} ${period}${shown === 1 ? '' : 's'}`;
}

/** A speed of adjustment as the share of a gap closed each period: -0.062 -> "6.2%". */
export function formatShareClosed(speed: number): string {
  return `${Number((-speed * 100).toPrecision(2))}%`;
}
