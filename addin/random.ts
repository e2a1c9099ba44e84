/**
 * A small seeded random-number generator for simulations, Monte Carlo checks and the
 * demo data. Same seed, same numbers, on every platform.
 *
 * Uniforms come from xoshiro128** (Blackman & Vigna 2018), seeded through splitmix32;
 * normals from the Marsaglia polar method (Marsaglia & Bray 1964).
 */
export class SeededRandom {
  private s0: number;
  private s1: number;
  private s2: number;
  private s3: number;
  private spareNormal: number | null = null;

  constructor(seed: number) {
    let state = seed >>> 0;
    const next = (): number => {
      // splitmix32: spreads one 32-bit seed over the four words of state
      state = (state + 0x9e3779b9) >>> 0;
      let z = state;
      z = Math.imul(z ^ (z >>> 16), 0x85ebca6b) >>> 0;
      z = Math.imul(z ^ (z >>> 13), 0xc2b2ae35) >>> 0;
      return (z ^ (z >>> 16)) >>> 0;
    };
    this.s0 = next();
    this.s1 = next();
    this.s2 = next();
    this.s3 = next();
  }

  /** A 32-bit unsigned integer (xoshiro128**). */
  nextUint32(): number {
    const result = Math.imul(rotl(Math.imul(this.s1, 5) >>> 0, 7), 9) >>> 0;
    const t = (this.s1 << 9) >>> 0;
    this.s2 = (this.s2 ^ this.s0) >>> 0;
    this.s3 = (this.s3 ^ this.s1) >>> 0;
    this.s1 = (this.s1 ^ this.s2) >>> 0;
    this.s0 = (this.s0 ^ this.s3) >>> 0;
    this.s2 = (this.s2 ^ t) >>> 0;
    this.s3 = rotl(this.s3, 11);
    return result;
  }

  /** A uniform number in (0, 1), never exactly 0 or 1 (53 random bits). */
  uniform(): number {
    const hi = this.nextUint32() >>> 5; // 27 bits
    const lo = this.nextUint32() >>> 6; // 26 bits
    return (hi * 67108864 + lo + 0.5) / 9007199254740992;
  }

  /** A standard normal draw (Marsaglia polar method). */
  normal(): number {
    if (this.spareNormal !== null) {
      const v = this.spareNormal;
      this.spareNormal = null;
      return v;
    }
    let u: number;
    let v: number;
    let s: number;
    do {
      u = 2 * this.uniform() - 1;
      v = 2 * this.uniform() - 1;
      s = u * u + v * v;
    } while (s >= 1 || s === 0);
    const f = Math.sqrt((-2 * Math.log(s)) / s);
    this.spareNormal = v * f;
    return u * f;
  }

  /** n standard normal draws. */
  normals(n: number): Float64Array {
    const out = new Float64Array(n);
    for (let i = 0; i < n; i++) out[i] = this.normal();
    return out;
  }
}

function rotl(x: number, k: number): number {
  return ((x << k) | (x >>> (32 - k))) >>> 0;
}

/** A random walk of length n starting at start: x_t = x_{t-1} + drift + sigma * e_t. */
export function randomWalk(rng: SeededRandom, n: number, options: { start?: number; drift?: number; sigma?: number } = {}): Float64Array {
  const { start = 0, drift = 0, sigma = 1 } = options;
  const out = new Float64Array(n);
  let level = start;
  for (let t = 0; t < n; t++) {
    level += drift + sigma * rng.normal();
    out[t] = level;
  }
  return out;
}

/** A stationary AR(1) path of length n: x_t = phi x_{t-1} + sigma e_t, started from its stationary law. */
export function autoregressive1(rng: SeededRandom, n: number, phi: number, sigma = 1): Float64Array {
  const out = new Float64Array(n);
  let level = Math.abs(phi) < 1 ? (sigma / Math.sqrt(1 - phi * phi)) * rng.normal() : 0;
  for (let t = 0; t < n; t++) {
    level = phi * level + sigma * rng.normal();
    out[t] = level;
  }
  return out;
}
