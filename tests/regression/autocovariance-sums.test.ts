/**
 * The long-run variance's autocovariance sums, eight lags per sweep, against the plain
 * definition one lag at a time (c_i = sum_{t=i..n-1} u_t u_{t-i}, Newey & West 1987): the
 * same terms added in the same order, so the same doubles, for every length and lag count
 * (the head of each sweep and the leftover lags past a multiple of eight included).
 */
import { describe, expect, it } from 'vitest';
import { SeededRandom, randomWalk } from '../../addin/random';
import { BARTLETT_WINDOW_WORK, autocovarianceSums, bartlettByWindows, bartlettLongRunVariance, neweyWestBandwidth } from '../../addin/regression/long-run-variance';

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

describe('the Bartlett sum from window sums (long series with wide bandwidths)', () => {
  // The identity: a pair of rows i apart shares L + 1 - i of the windows of L + 1 positions, so
  // the squares of the window sums add up to (L + 1) times the Bartlett-weighted sum.
  function lagByLag(u: ArrayLike<number>, L: number): number {
    const c = autocovarianceSums(u, L);
    let s = c[0];
    for (let i = 1; i <= L; i++) s += 2 * (1 - i / (L + 1)) * c[i];
    return s;
  }
  const rng = new SeededRandom(77);
  const noise = rng.normals(20_000);
  const walk = randomWalk(new SeededRandom(78), 20_000, { start: 100 });
  const overDifferenced = noise.slice(1).map((v, i) => v - noise[i]);
  const ar = new SeededRandom(79).normals(20_000).map((v, i, a) => v + (i > 0 ? 0.9 * a[i - 1] : 0));
  const cases: [string, Float64Array][] = [
    ['noise', noise],
    ['a random walk', walk],
    ['an AR(1)', ar],
  ];
  for (const [name, u] of cases) {
    it.each([0, 1, 7, 8, 63, 500, 4_999])(`${name}, bandwidth %i: equals the lag-by-lag sum to 1e-12`, (L) => {
      const expected = lagByLag(u, L);
      expect(Math.abs(bartlettByWindows(u, L) - expected) / Math.abs(expected)).toBeLessThan(1e-12);
    });
  }
  // Over-differenced noise: the Bartlett sum is far below c0, so the lag-by-lag sum cancels (at
  // bandwidth 4,999 it is 4.6e-12 from a long-double sum, the window route 4e-15). The windows'
  // sums telescope (u_t = e_{t+1} - e_t), which gives an exact reference without cancellation.
  it.each([0, 1, 63, 500, 4_999])('over-differenced noise, bandwidth %i: equals the telescoped window sums to 1e-13', (L) => {
    const n = overDifferenced.length;
    let total = 0;
    for (let start = -L; start < n; start++) {
      const w = noise[Math.min(n - 1, start + L) + 1] - noise[Math.max(0, start)];
      total += w * w;
    }
    const exact = total / (L + 1);
    expect(Math.abs(bartlettByWindows(overDifferenced, L) - exact) / exact).toBeLessThan(1e-13);
    if (L <= 63) expect(Math.abs(lagByLag(overDifferenced, L) - exact) / exact).toBeLessThan(1e-12);
  });

  it('the long-run variance of a long series with a wide bandwidth (past BARTLETT_WINDOW_WORK) takes the window route and equals the lag-by-lag sum to 1e-12', () => {
    const u = new SeededRandom(81).normals(200_000).map((v, i, a) => v + (i > 0 ? 0.5 * a[i - 1] : 0));
    const L = 200;
    expect(u.length * (L + 1)).toBeGreaterThan(BARTLETT_WINDOW_WORK);
    const expected = lagByLag(u, L) / u.length;
    expect(Math.abs(bartlettLongRunVariance(u, L) - expected) / expected).toBeLessThan(1e-12);
  });

  it('short series, the bandwidth up to n - 1', () => {
    const u = new SeededRandom(80).normals(9);
    for (let L = 0; L <= 8; L++) expect(Math.abs(bartlettByWindows(u, L) - lagByLag(u, L)) / Math.abs(lagByLag(u, L))).toBeLessThan(1e-13);
  });
});
