/**
 * Deterministic regressors: nothing, a constant, or a constant and a linear trend
 * t = 1..n over the regression's own sample (the reference library's convention, so
 * coefficients on the trend compare exactly).
 */
import type { Deterministic } from '../result';

/** How many deterministic columns each choice adds. */
export function deterministicCount(d: Deterministic): number {
  return d === 'none' ? 0 : d === 'const' ? 1 : 2;
}

/** The deterministic columns for a sample of n rows: [] / [1] / [1, t]. */
export function deterministicColumns(d: Deterministic, n: number): Float64Array[] {
  if (d === 'none') return [];
  const ones = new Float64Array(n).fill(1);
  if (d === 'const') return [ones];
  const trend = new Float64Array(n);
  for (let i = 0; i < n; i++) trend[i] = i + 1;
  return [ones, trend];
}

/** Names of the deterministic columns, for messages. */
export function deterministicNames(d: Deterministic): string[] {
  return d === 'none' ? [] : d === 'const' ? ['constant'] : ['constant', 'trend'];
}
