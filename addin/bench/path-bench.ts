/**
 * Benchmarks of the relation through time and where it heads: the moving hedge ratio (Kalman
 * filter and smoother with Q and R by maximum likelihood) on 2,500 rows, target 20 ms.
 */
import { movingHedge } from '../kalman/moving-hedge';
import { randomWalk, SeededRandom } from '../random';
import { timeIt, type Timing } from './timing';

/** 2,500 seeded rows: x a random walk, y on a line whose slope drifts slowly, with noise. */
export function kalmanBenchPair(): { y: Float64Array; x: Float64Array } {
  const rng = new SeededRandom(1407);
  const n = 2500;
  const x = randomWalk(rng, n, { start: 100 });
  const y = new Float64Array(n);
  let slope = 1.2;
  for (let t = 0; t < n; t++) {
    slope += 0.002 * rng.normal();
    y[t] = 5 + slope * x[t] + rng.normal();
  }
  return { y, x };
}

export function benchKalman(): Timing[] {
  const { y, x } = kalmanBenchPair();
  return [
    timeIt('moving hedge ratio: Kalman filter and smoother, Q and R by maximum likelihood, 2,500 rows', () => movingHedge(y, x, { y: 'y', x: 'x' }), { runs: 15, warmup: 3, targetMs: 20 }),
  ];
}
