// AssemblyScript (compiled to WebAssembly by scripts/build-wasm.mjs, not by tsc): the inner
// kernel of the batched screen, addin/screen/batched/lag-cross-products.ts, with 128-bit SIMD
// (two rows per instruction). Arrays are byte offsets into the module's memory, which the
// JavaScript side lays out from heapBase() and grows as needed.
//
//   ij[k] = sum_{t=a}^{b} di[t] dj[t - k],   ji[k] = sum_{t=a}^{b} dj[t] di[t - k],   k = 0..P.
//
// Each lane sums every other row in order; the two lanes are added at the end.

/** First free byte of memory (after the module's own data). */
export function heapBase(): usize {
  return __heap_base;
}

@inline function sum2(v: v128): f64 {
  return f64x2.extract_lane(v, 0) + f64x2.extract_lane(v, 1);
}

export function crossLagProducts(di: usize, dj: usize, a: i32, b: i32, P: i32, ij: usize, ji: usize): void {
  const pairsEnd = a + ((b - a + 1) & ~1); // rows a .. pairsEnd - 1 two at a time; row b alone when the count is odd
  let k = 0;
  for (; k + 3 <= P; k += 4) {
    let p0 = f64x2.splat(0), p1 = f64x2.splat(0), p2 = f64x2.splat(0), p3 = f64x2.splat(0);
    let q0 = f64x2.splat(0), q1 = f64x2.splat(0), q2 = f64x2.splat(0), q3 = f64x2.splat(0);
    for (let t = a; t < pairsEnd; t += 2) {
      const at = <usize>t << 3;
      const lag = <usize>(t - k) << 3;
      const x = v128.load(di + at);
      const y = v128.load(dj + at);
      p0 = f64x2.add(p0, f64x2.mul(x, v128.load(dj + lag)));
      p1 = f64x2.add(p1, f64x2.mul(x, v128.load(dj + lag - 8)));
      p2 = f64x2.add(p2, f64x2.mul(x, v128.load(dj + lag - 16)));
      p3 = f64x2.add(p3, f64x2.mul(x, v128.load(dj + lag - 24)));
      q0 = f64x2.add(q0, f64x2.mul(y, v128.load(di + lag)));
      q1 = f64x2.add(q1, f64x2.mul(y, v128.load(di + lag - 8)));
      q2 = f64x2.add(q2, f64x2.mul(y, v128.load(di + lag - 16)));
      q3 = f64x2.add(q3, f64x2.mul(y, v128.load(di + lag - 24)));
    }
    let s0 = sum2(p0), s1 = sum2(p1), s2 = sum2(p2), s3 = sum2(p3);
    let r0 = sum2(q0), r1 = sum2(q1), r2 = sum2(q2), r3 = sum2(q3);
    if (pairsEnd <= b) {
      const at = <usize>b << 3;
      const lag = <usize>(b - k) << 3;
      const x = load<f64>(di + at);
      const y = load<f64>(dj + at);
      s0 += x * load<f64>(dj + lag);
      s1 += x * load<f64>(dj + lag - 8);
      s2 += x * load<f64>(dj + lag - 16);
      s3 += x * load<f64>(dj + lag - 24);
      r0 += y * load<f64>(di + lag);
      r1 += y * load<f64>(di + lag - 8);
      r2 += y * load<f64>(di + lag - 16);
      r3 += y * load<f64>(di + lag - 24);
    }
    const out = <usize>k << 3;
    store<f64>(ij + out, s0);
    store<f64>(ij + out + 8, s1);
    store<f64>(ij + out + 16, s2);
    store<f64>(ij + out + 24, s3);
    store<f64>(ji + out, r0);
    store<f64>(ji + out + 8, r1);
    store<f64>(ji + out + 16, r2);
    store<f64>(ji + out + 24, r3);
  }
  for (; k <= P; k++) {
    let p = f64x2.splat(0), q = f64x2.splat(0);
    for (let t = a; t < pairsEnd; t += 2) {
      const at = <usize>t << 3;
      const lag = <usize>(t - k) << 3;
      p = f64x2.add(p, f64x2.mul(v128.load(di + at), v128.load(dj + lag)));
      q = f64x2.add(q, f64x2.mul(v128.load(dj + at), v128.load(di + lag)));
    }
    let s = sum2(p), r = sum2(q);
    if (pairsEnd <= b) {
      s += load<f64>(di + (<usize>b << 3)) * load<f64>(dj + (<usize>(b - k) << 3));
      r += load<f64>(dj + (<usize>b << 3)) * load<f64>(di + (<usize>(b - k) << 3));
    }
    store<f64>(ij + (<usize>k << 3), s);
    store<f64>(ji + (<usize>k << 3), r);
  }
}

/** sum_{t=a}^{b} c[t] d[t], two rows per instruction. */
export function dot(c: usize, d: usize, a: i32, b: i32): f64 {
  const pairsEnd = a + ((b - a + 1) & ~1);
  let s = f64x2.splat(0);
  for (let t = a; t < pairsEnd; t += 2) {
    const at = <usize>t << 3;
    s = f64x2.add(s, f64x2.mul(v128.load(c + at), v128.load(d + at)));
  }
  let total = sum2(s);
  if (pairsEnd <= b) total += load<f64>(c + (<usize>b << 3)) * load<f64>(d + (<usize>b << 3));
  return total;
}

/** sum_{t=0}^{n-1} (y[t] - beta x[t])^2, the residual's sum of squares from two centred levels, two rows per instruction. */
export function residualSquares(y: usize, x: usize, beta: f64, n: i32): f64 {
  const pairsEnd = n & ~1;
  const b = f64x2.splat(beta);
  let s = f64x2.splat(0);
  for (let t = 0; t < pairsEnd; t += 2) {
    const at = <usize>t << 3;
    const v = f64x2.sub(v128.load(y + at), f64x2.mul(b, v128.load(x + at)));
    s = f64x2.add(s, f64x2.mul(v, v));
  }
  let total = sum2(s);
  if (pairsEnd < n) {
    const at = <usize>(n - 1) << 3;
    const v = load<f64>(y + at) - beta * load<f64>(x + at);
    total += v * v;
  }
  return total;
}
