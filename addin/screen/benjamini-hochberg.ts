/**
 * Benjamini-Hochberg adjusted p-values (Benjamini & Hochberg 1995, the step-up procedure of
 * sec. 3). With the m p-values sorted, p_(1) <= ... <= p_(m), the adjusted value of the one
 * ranked i is
 *   q_(i) = min over j >= i of min(1, m p_(j) / j),
 * so rejecting every hypothesis with q <= alpha is the procedure that controls the false
 * discovery rate at alpha: reject H_(1..k) for the largest k with p_(k) <= k alpha / m.
 *
 * Tied p-values share one adjusted value (the q of the last of them), so the adjusted value is
 * a function of the p-value alone: the adjustment is built once from the sorted p-values and
 * then asked for any p-value of the family, in any order. That is what lets a screen of
 * millions of pairs keep two numbers per pair (the sorted p-value and its q) instead of an
 * object per pair, and lets parts screened on different machines be adjusted together.
 */
import { MooringInputError } from '../errors';

/** The adjustment of one family of p-values (see the file comment): built once, then asked. */
export class FalseDiscoveryAdjustment {
  /** The family's p-values, ascending. */
  private readonly sorted: Float64Array;
  /** q_(i) beside each sorted p-value. */
  private readonly q: Float64Array;

  /** Refuses a value outside [0, 1]. The array is sorted in place when `owned` (no copy is made). */
  constructor(pValues: ArrayLike<number>, owned = false) {
    const m = pValues.length;
    for (let i = 0; i < m; i++) {
      const p = pValues[i];
      if (typeof p !== 'number' || !(p >= 0 && p <= 1)) {
        throw new MooringInputError(`p-value ${i + 1} is ${String(p)}: every p-value must lie between 0 and 1.`);
      }
    }
    this.sorted = owned && pValues instanceof Float64Array ? pValues : Float64Array.from(pValues);
    this.sorted.sort();
    this.q = new Float64Array(m);
    let running = 1;
    for (let rank = m; rank >= 1; rank--) {
      running = Math.min(running, (m * this.sorted[rank - 1]) / rank);
      this.q[rank - 1] = running;
    }
  }

  /** Size of the family. */
  get size(): number {
    return this.sorted.length;
  }

  /** The adjusted value of a p-value of the family (the q of the last sorted value equal to it). */
  adjusted(p: number): number {
    let low = 0;
    let high = this.sorted.length;
    while (low < high) {
      const mid = (low + high) >>> 1;
      if (this.sorted[mid] <= p) low = mid + 1;
      else high = mid;
    }
    if (low === 0 || this.sorted[low - 1] !== p) throw new RangeError(`p-value ${p} is not in the family.`);
    return this.q[low - 1];
  }

  /** How many of the family have an adjusted value at or below alpha. */
  discoveries(alpha: number): number {
    let count = 0;
    while (count < this.q.length && this.q[count] <= alpha) count++;
    return count;
  }
}

/** Benjamini-Hochberg adjusted p-values, in the input's order (see the file comment); refuses a value outside [0, 1]. */
export function benjaminiHochberg(pValues: ArrayLike<number>): Float64Array {
  const adjustment = new FalseDiscoveryAdjustment(pValues);
  return Float64Array.from({ length: pValues.length }, (_, i) => adjustment.adjusted(pValues[i]));
}
