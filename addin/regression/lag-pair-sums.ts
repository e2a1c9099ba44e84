/**
 * The lag sums the Dickey-Fuller gram (lagged-difference-gram.ts) and the VAR's changes form
 * (var/var-change-gram.ts) both need: for j = 0..lags-1,
 *   out[at + j] = sum_t u[t] c[t - j]   and   (returned)[j] = sum_t w[t + wShift] c[t - j],
 * over t = from..to. Each sum is taken in row order as a sum of its own, so the doubles are those
 * of one pass per sum; four lags share one pass over the rows.
 */
export function lagPairSums(
  u: Float64Array, w: Float64Array, wShift: number, c: Float64Array,
  from: number, to: number, lags: number, out: Float64Array, at: number,
): Float64Array {
  const second = new Float64Array(lags);
  let j = 0;
  for (; j + 3 < lags; j += 4) {
    let d0 = 0;
    let d1 = 0;
    let d2 = 0;
    let d3 = 0;
    let l0 = 0;
    let l1 = 0;
    let l2 = 0;
    let l3 = 0;
    for (let t = from; t <= to; t++) {
      const x = u[t];
      const v = w[t + wShift];
      const i = t - j;
      const c0 = c[i];
      const c1 = c[i - 1];
      const c2 = c[i - 2];
      const c3 = c[i - 3];
      d0 += x * c0;
      d1 += x * c1;
      d2 += x * c2;
      d3 += x * c3;
      l0 += v * c0;
      l1 += v * c1;
      l2 += v * c2;
      l3 += v * c3;
    }
    out[at + j] = d0;
    out[at + j + 1] = d1;
    out[at + j + 2] = d2;
    out[at + j + 3] = d3;
    second[j] = l0;
    second[j + 1] = l1;
    second[j + 2] = l2;
    second[j + 3] = l3;
  }
  for (; j < lags; j++) {
    let s = 0;
    let l = 0;
    for (let t = from; t <= to; t++) {
      s += u[t] * c[t - j];
      l += w[t + wShift] * c[t - j];
    }
    out[at + j] = s;
    second[j] = l;
  }
  return second;
}
