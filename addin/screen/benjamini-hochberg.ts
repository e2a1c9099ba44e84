/**
 * Benjamini-Hochberg adjusted p-values (Benjamini & Hochberg 1995, the step-up procedure of
 * sec. 3). With the m p-values sorted, p_(1) <= ... <= p_(m), the adjusted value of the one
 * ranked i is
 *   q_(i) = min over j >= i of min(1, m p_(j) / j),
 * so rejecting every hypothesis with q <= alpha is the procedure that controls the false
 * discovery rate at alpha: reject H_(1..k) for the largest k with p_(k) <= k alpha / m.
 * Ties share one adjusted value; the result is in the input's order.
 */
import { MooringInputError } from '../errors';

/** Benjamini-Hochberg adjusted p-values, in the input's order (see the file comment); refuses a value outside [0, 1]. */
export function benjaminiHochberg(pValues: ArrayLike<number>): Float64Array {
  const m = pValues.length;
  for (let i = 0; i < m; i++) {
    const p = pValues[i];
    if (typeof p !== 'number' || !(p >= 0 && p <= 1)) {
      throw new MooringInputError(`p-value ${i + 1} is ${String(p)}: every p-value must lie between 0 and 1.`);
    }
  }
  const order = Array.from({ length: m }, (_, i) => i).sort((a, b) => pValues[a] - pValues[b] || a - b);
  const adjusted = new Float64Array(m);
  let running = 1;
  for (let rank = m; rank >= 1; rank--) {
    const index = order[rank - 1];
    running = Math.min(running, (m * pValues[index]) / rank);
    adjusted[index] = running;
  }
  return adjusted;
}
