/**
 * How the pane shows numbers the engine computed: statistics to three decimals, p-values as
 * the engine's sentences write them, and a dash where the engine has no number. Formatting
 * only: nothing here computes a statistic.
 */
import { formatPValue } from '../../../addin/cointegration/wording';

/** A statistic or coefficient: three decimals below 1000, whole above; a dash for none. */
export function showNumber(x: number | null | undefined, decimals = 3): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return '—';
  if (Math.abs(x) >= 1000) return x.toFixed(0);
  return x.toFixed(decimals);
}

/** A p-value for a table cell: "0.0066", "< 0.0001", or a dash. */
export function showPValue(p: number | null | undefined): string {
  if (p === null || p === undefined || !Number.isFinite(p)) return '—';
  if (p < 0.0001) return '< 0.0001';
  return p < 0.01 ? p.toFixed(4) : p.toFixed(3);
}

/** A p-value inside a sentence, as the engine writes it ("p = 0.031"). */
export function sayPValue(p: number | null): string {
  return formatPValue(p);
}

/** A significance level as a percentage: 0.05 -> "5%". */
export function showLevel(alpha: number): string {
  return `${Math.round(alpha * 1000) / 10}%`;
}
