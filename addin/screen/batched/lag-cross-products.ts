/**
 * The series-level cross products of the batched screen (pair-lag-moments.ts): for changes
 * d_i, d_j and lags k = 0..P over the rows t = a..b,
 *   ij[k] = sum_t d_i[t] d_j[t - k],   ji[k] = sum_t d_j[t] d_i[t - k].
 * Both directions of a pair come from one pass per four lags. The inner loop is register
 * blocked: the four lagged values of each series slide along in locals, so each row costs four
 * loads for eight multiply-adds (a loop that reloads every lagged value needs ten). Every sum
 * still runs over t in order.
 */

/** Fills ij[0..P] and ji[0..P] (see the file comment); needs a >= P so every lagged row exists. */
export function crossLagProducts(di: Float64Array, dj: Float64Array, a: number, b: number, P: number, ij: Float64Array, ji: Float64Array): void {
  let k = 0;
  for (; k + 3 <= P; k += 4) {
    let p0 = 0, p1 = 0, p2 = 0, p3 = 0, q0 = 0, q1 = 0, q2 = 0, q3 = 0;
    let w1 = dj[a - k - 1], w2 = dj[a - k - 2], w3 = dj[a - k - 3];
    let v1 = di[a - k - 1], v2 = di[a - k - 2], v3 = di[a - k - 3];
    for (let t = a; t <= b; t++) {
      const x = di[t];
      const y = dj[t];
      const w0 = dj[t - k];
      const v0 = di[t - k];
      p0 += x * w0;
      p1 += x * w1;
      p2 += x * w2;
      p3 += x * w3;
      q0 += y * v0;
      q1 += y * v1;
      q2 += y * v2;
      q3 += y * v3;
      w3 = w2;
      w2 = w1;
      w1 = w0;
      v3 = v2;
      v2 = v1;
      v1 = v0;
    }
    ij[k] = p0;
    ij[k + 1] = p1;
    ij[k + 2] = p2;
    ij[k + 3] = p3;
    ji[k] = q0;
    ji[k + 1] = q1;
    ji[k + 2] = q2;
    ji[k + 3] = q3;
  }
  for (; k <= P; k++) {
    let p = 0;
    let q = 0;
    for (let t = a; t <= b; t++) {
      p += di[t] * dj[t - k];
      q += dj[t] * di[t - k];
    }
    ij[k] = p;
    ji[k] = q;
  }
}

/**
 * The levels against lagged changes, L[k] = sum_{t=a}^{b} c[t] d[t - k] for k = 0..P, from
 * L[0] (one pass) and the change products D[k] = sum_t e[t] d[t - k] of the series whose
 * centred level is c (e its changes, c[t + 1] = c[t] + e[t]): shifting the rows by one gives
 *   L[k + 1] = L[k] + D[k] + c[a] d[a - 1 - k] - c[b + 1] d[b - k],
 * so the levels cost one product per pair instead of P + 1.
 */
export function levelLagProducts(c: Float64Array, d: Float64Array, changeProducts: Float64Array, a: number, b: number, P: number, out: Float64Array): void {
  let s = 0;
  for (let t = a; t <= b; t++) s += c[t] * d[t];
  out[0] = s;
  shiftLevelProducts(c, d, changeProducts, a, b, P, out);
}

/** levelLagProducts with out[0] already in place (formed by another kernel). */
export function shiftLevelProducts(c: Float64Array, d: Float64Array, changeProducts: Float64Array, a: number, b: number, P: number, out: Float64Array): void {
  const first = c[a];
  const after = c[b + 1];
  for (let k = 0; k < P; k++) out[k + 1] = out[k] + changeProducts[k] + first * d[a - 1 - k] - after * d[b - k];
}
