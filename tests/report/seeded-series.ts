/**
 * Seeded series for the diagnostic's tests, each built from N(0, 1) shocks of SeededRandom
 * with a structure stated beside it. These are the tests' own inputs (not the demo's).
 */
import { SeededRandom } from '../../addin/random';

/** A random walk: start plus the running sum of sigma-sized shocks. */
export function walk(rng: SeededRandom, n: number, sigma = 0.01, start = 0): Float64Array {
  const out = new Float64Array(n);
  let level = start;
  for (let t = 0; t < n; t++) {
    level += sigma * rng.normal();
    out[t] = level;
  }
  return out;
}

/** An AR(1) around mean, started at the mean: x_t = mean + phi (x_{t-1} - mean) + sigma e_t. */
export function ar1(rng: SeededRandom, n: number, phi: number, sigma: number, mean = 0): Float64Array {
  const out = new Float64Array(n);
  let dev = 0;
  for (let t = 0; t < n; t++) {
    dev = phi * dev + sigma * rng.normal();
    out[t] = mean + dev;
  }
  return out;
}

/** A leader and a follower tied by y = intercept + beta x + z, z an exact AR(1) with coefficient phi. */
export interface LeaderFollower {
  leader: Float64Array;
  follower: Float64Array;
  intercept: number;
  beta: number;
  phi: number;
}

/**
 * The leader x is a random walk that never looks at the follower. The follower takes beta times
 * the leader's change of the day, gamma times its change of the day before, and closes 1 - phi of
 * the gap each day:  dy_t = beta dx_t + gamma dx_{t-1} + (phi - 1) z_{t-1} + s e_t, with
 * z = y - intercept - beta x, so z_t = phi z_{t-1} + gamma dx_{t-1} + s e_t: stationary, and the
 * leader's past predicts the follower's change (the leader leads).
 */
export function leaderFollower(seed: number, n: number, options: { intercept?: number; beta?: number; phi?: number; gamma?: number } = {}): LeaderFollower {
  const rng = new SeededRandom(seed);
  const intercept = options.intercept ?? 0.2;
  const beta = options.beta ?? 0.8;
  const phi = options.phi ?? 0.9;
  const gamma = options.gamma ?? 0.5;
  const x = walk(rng, n + 1, 0.012, 1);
  const y = new Float64Array(n);
  y[0] = intercept + beta * x[1];
  for (let t = 1; t < n; t++) {
    const zPrev = y[t - 1] - intercept - beta * x[t];
    const dxNow = x[t + 1] - x[t];
    const dxPrev = x[t] - x[t - 1];
    y[t] = y[t - 1] + beta * dxNow + gamma * dxPrev + (phi - 1) * zPrev + 0.004 * rng.normal();
  }
  return { leader: x.slice(1), follower: y, intercept, beta, phi };
}
