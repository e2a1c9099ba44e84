/** Small helpers the reference tests share for comparing our numbers with a fixture's. */
import type { TestResult } from '../../addin/result';

/** |a - b| / |b| (b = 0 guarded), the relative difference used by the "1e-8 relative" checks. */
export function relative(a: number, b: number): number {
  return Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);
}

/** The numeric detail `key` of a result; throws when it is missing or not a number. */
export function detail(r: TestResult, key: string): number {
  const d = r.details.find((x) => x.key === key);
  if (!d || typeof d.value !== 'number') throw new Error(`detail ${key} missing`);
  return d.value;
}
