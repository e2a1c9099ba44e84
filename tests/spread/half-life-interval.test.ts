/**
 * The half-life's 95% interval (addin/spread/half-life-interval.ts): the mapping of the speed's
 * interval through the half-life, its one-sided and unbounded cases in words, and its coverage
 * measured by seeded simulation at the advertised level.
 */
import { describe, expect, it } from 'vitest';
import { autoregressive1, randomWalk, SeededRandom } from '../../addin/random';
import { halfLife } from '../../addin/spread/half-life';
import { HALF_LIFE_LEVEL, halfLifeInterval } from '../../addin/spread/half-life-interval';
import { pairSpread } from '../../addin/spread/pair-spread';

const lifeOf = (phi: number): number => Math.log(2) / -Math.log(Math.abs(phi));

describe('half-life interval: the ends', () => {
  it('are the half-lives of the ends of the speed interval, centred on the bias-corrected AR(1) coefficient', () => {
    const T = 400;
    const phi = 0.92;
    const se = 0.02;
    const got = halfLifeInterval(phi - 1, se, T, 'day');
    const centre = phi + (1 + 3 * phi) / T; // Kendall (1954): E(phi_hat) - phi ≈ -(1 + 3 phi) / T (from memory)
    expect(got.level).toBe(0.95);
    expect(got.speedLow).toBeCloseTo(centre - 1.959963984540054 * se - 1, 12);
    expect(got.speedHigh).toBeCloseTo(centre + 1.959963984540054 * se - 1, 12);
    expect(got.low).toBeCloseTo(lifeOf(1 + got.speedLow), 12);
    expect(got.high).toBeCloseTo(lifeOf(1 + got.speedHigh), 12);
    expect(got.text).toMatch(/^likely between \d+(\.\d)? and \d+(\.\d)? days$/);
  });

  it('has no upper bound when the interval reaches no reversion, and says so in words', () => {
    const got = halfLifeInterval(-0.01, 0.01, 300, 'day');
    expect(got.high).toBeNull();
    expect(got.low).toBeGreaterThan(0);
    expect(got.text).toMatch(/at least .* no upper bound: the 95% interval of the speed reaches no reversion/);
  });

  it('has no bound at all when the whole interval lies in no reversion', () => {
    const got = halfLifeInterval(0.05, 0.005, 300, 'day');
    expect(got.low).toBeNull();
    expect(got.high).toBeNull();
    expect(got.text).toMatch(/no reversion at all/);
  });

  it('starts at 0 when the interval reaches a gap closed in one period (lambda = -1)', () => {
    const got = halfLifeInterval(-1, 0.1, 300, 'day');
    expect(got.low).toBe(0);
    expect(got.high).not.toBeNull();
  });

  it('never holds a negative, infinite or NaN bound', () => {
    for (const lambda of [-1.9, -1.2, -0.7, -0.2, -0.01, 0, 0.3]) {
      for (const se of [0.001, 0.05, 0.5]) {
        const got = halfLifeInterval(lambda, se, 200);
        for (const v of [got.low, got.high]) if (v !== null) expect(Number.isFinite(v) && v >= 0, `${lambda} ${se}`).toBe(true);
        if (got.low !== null && got.high !== null) expect(got.low).toBeLessThanOrEqual(got.high);
      }
    }
  });

  it('travels with the half-life of a spread', () => {
    const s = autoregressive1(new SeededRandom(3), 300, 0.9);
    const answer = halfLife(s, 'day');
    expect(answer.interval).toEqual(halfLifeInterval(answer.lambda, answer.standardError, 300, 'day'));
    expect(answer.interval.low as number).toBeLessThan(answer.halfLife as number);
    expect(answer.interval.high as number).toBeGreaterThan(answer.halfLife as number);
  });
});

/** Share of replications whose interval holds the true half-life. */
function coverage(replications: number, seed: number, draw: (rng: SeededRandom) => { low: number | null; high: number | null }, truth: number): number {
  const rng = new SeededRandom(seed);
  let held = 0;
  for (let r = 0; r < replications; r++) {
    const { low, high } = draw(rng);
    if (low !== null && low <= truth && (high === null || truth <= high)) held++;
  }
  return held / replications;
}

describe('half-life interval: coverage by simulation at the advertised 95%', () => {
  // Tolerance: the Monte Carlo standard error at 2,000 replications is sqrt(0.95 x 0.05 / 2000)
  // = 0.005, and the bias correction leaves an O(1/T^2) remainder; 0.025 is five standard errors.
  const REPLICATIONS = 2000;
  const TOLERANCE = 0.025;

  it('a pair: x a random walk, y = 1 + 1.5 x + u, u AR(1) with phi = 0.9 (half-life 6.58), T = 250, seed 1401', () => {
    const phi = 0.9;
    const got = coverage(REPLICATIONS, 1401, (rng) => {
      const x = randomWalk(rng, 250, { start: 50 });
      const u = autoregressive1(rng, 250, phi);
      const y = x.map((v, t) => 1 + 1.5 * v + u[t]);
      return pairSpread(y, x, { y: 'y', x: 'x' }).halfLife.interval;
    }, lifeOf(phi));
    expect(Math.abs(got - HALF_LIFE_LEVEL), `coverage ${got}`).toBeLessThan(TOLERANCE);
  });

  it('a spread given as it is: AR(1) with phi = 0.944 (half-life 12.0) around a mean of 3, T = 500, seed 1402', () => {
    const phi = 0.944;
    const got = coverage(REPLICATIONS, 1402, (rng) => {
      const s = autoregressive1(rng, 500, phi).map((v) => v + 3);
      return halfLife(s).interval;
    }, lifeOf(phi));
    expect(Math.abs(got - HALF_LIFE_LEVEL), `coverage ${got}`).toBeLessThan(TOLERANCE);
  });
});
