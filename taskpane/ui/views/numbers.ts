/**
 * How the pane shows numbers the engine computed: statistics to three decimals, p-values as
 * the engine's sentences write them, and a dash where the engine has no number. Formatting
 * only: nothing here computes a statistic.
 */
import { formatPValue } from '../../../addin/cointegration/wording';
import { formatBoundedPValue, type PValueBound } from '../../../addin/p-value-bound';

/** A statistic or coefficient: three decimals below 1000, whole above; a dash for none. */
export function showNumber(x: number | null | undefined, decimals = 3): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return '—';
  if (Math.abs(x) >= 1000) return x.toFixed(0);
  return x.toFixed(decimals);
}

/** A p-value for a table cell: "0.0066", "< 0.0001", a bound read off a table's end ("< 0.01", "> 0.10"), or a dash. */
export function showPValue(p: number | null | undefined, bound?: PValueBound): string {
  return formatBoundedPValue(p, bound, (x) => {
    if (x === null || x === undefined || !Number.isFinite(x)) return '—';
    if (x < 0.0001) return '< 0.0001';
    return x < 0.01 ? x.toFixed(4) : x.toFixed(3);
  });
}

/** A p-value inside a sentence, as the engine writes it ("p = 0.031", "p < 0.01"). */
export function sayPValue(p: number | null, bound?: PValueBound): string {
  return formatPValue(p, bound);
}

/** A significance level as a percentage: 0.05 -> "5%". */
export function showLevel(alpha: number): string {
  return `${Math.round(alpha * 1000) / 10}%`;
}
