/**
 * The long-run variance's autocovariance sums, eight lags per sweep, against the plain
 * definition one lag at a time (c_i = sum_{t=i..n-1} u_t u_{t-i}, Newey & West 1987): the
 * same terms added in the same order, so the same doubles, for every length and lag count
 * (the head of each sweep and the leftover lags past a multiple of eight included).
 */
import { describe, expect, it } from 'vitest';
import { SeededRandom, randomWalk } from '../../addin/random';
import { autocovarianceSums, bartlettLongRunVariance, neweyWestBandwidth } from '../../addin/regression/long-run-variance';

function oneLagAtATime(u: ArrayLike<number>, maxLag: number): Float64Array {
  const c = new Float64Array(maxLag + 1);
  for (let i = 0; i <= maxLag; i++) {
    let s = 0;
    for (let t = i; t < u.length; t++) s += u[t] * u[t - i];
    c[i] = s;
  }
  return c;
}

describe('autocovariance sums, several lags per sweep', () => {
  const rng = new SeededRandom(4242);
  it.each([
    [2, 1],
    [9, 8],
    [17, 16],
    [40, 7],
    [40, 8],
    [40, 23],
    [40, 39],
    [1000, 0],
    [1000, 64],
    [1000, 71],
  ])('n = %i, lags 0..%i: every sum equals the one-lag-at-a-time sum exactly', (n, maxLag) => {
    const u = rng.normals(n);
    expect(Array.from(autocovarianceSums(u, maxLag))).toEqual(Array.from(oneLagAtATime(u, maxLag)));
  });

  it('the Bartlett long-run variance is the plain weighted sum of those autocovariances', () => {
    const walk = randomWalk(new SeededRandom(9), 3000);
    const L = 37;
    const c = oneLagAtATime(walk, L);
    let s = c[0];
    for (let i = 1; i <= L; i++) s += 2 * (1 - i / (L + 1)) * c[i];
    expect(bartlettLongRunVariance(walk, L)).toBe(s / walk.length);
  });

  it('the automatic bandwidth follows the Newey-West (1994) rule on the same sums', () => {
    const u = new SeededRandom(10).normals(5000).map((v, i, a) => v + (i > 0 ? 0.6 * a[i - 1] : 0));
    const n = u.length;
    const nc = Math.floor(n ** (2 / 9));
    const c = oneLagAtATime(u, nc);
    let s0 = c[0] / n;
    let s1 = 0;
    for (let j = 1; j <= nc; j++) {
      s0 += (2 * c[j]) / n;
      s1 += (j * 2 * c[j]) / n;
    }
    const expected = Math.min(Math.floor(1.1447 * ((s1 / s0) ** 2) ** (1 / 3) * n ** (1 / 3)), n - 1);
    expect(neweyWestBandwidth(u)).toBe(expected);
  });
});
