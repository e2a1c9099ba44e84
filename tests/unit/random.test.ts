import { describe, expect, it } from 'vitest';
import { SeededRandom } from '../../addin/random';

describe('seeded random numbers', () => {
  it('the same seed gives the same stream, a different seed a different one', () => {
    const a = new SeededRandom(42).normals(5);
    const b = new SeededRandom(42).normals(5);
    const c = new SeededRandom(43).normals(5);
    expect(Array.from(a)).toEqual(Array.from(b));
    expect(Array.from(a)).not.toEqual(Array.from(c));
  });
  it('normal draws have mean 0 and variance 1 within sampling error (seed 7, 200,000 draws)', () => {
    const x = new SeededRandom(7).normals(200_000);
    let m = 0;
    for (const v of x) m += v;
    m /= x.length;
    let s2 = 0;
    for (const v of x) s2 += (v - m) ** 2;
    s2 /= x.length - 1;
    // standard errors: 1/sqrt(n) = 0.0022 for the mean, sqrt(2/n) = 0.0032 for the variance; 4 SE bounds
    expect(Math.abs(m)).toBeLessThan(0.009);
    expect(Math.abs(s2 - 1)).toBeLessThan(0.013);
  });
  it('uniforms lie strictly inside (0, 1) with mean 1/2', () => {
    const rng = new SeededRandom(1);
    let sum = 0;
    for (let i = 0; i < 100_000; i++) {
      const u = rng.uniform();
      expect(u > 0 && u < 1).toBe(true);
      sum += u;
    }
    expect(Math.abs(sum / 100_000 - 0.5)).toBeLessThan(0.004);
  });
});
