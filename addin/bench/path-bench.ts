/**
 * Benchmarks of the relation through time and where it heads: the moving hedge ratio (Kalman
 * filter and smoother with Q and R by maximum likelihood) on 2,500 rows, target 20 ms; the
 * forecast of a 3-series error-correction model (1,000 rows, K = 2, rank 1, 20 steps), target 5 ms.
 */
import { vecmForecast } from '../forecast/vecm-forecast';
import { movingHedge } from '../kalman/moving-hedge';
import { autoregressive1, randomWalk, SeededRandom } from '../random';
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

/** 1,000 seeded rows of three series: two random walks and a third tied to them. */
export function forecastBenchBlock(): Float64Array[] {
  const rng = new SeededRandom(1408);
  const a = randomWalk(rng, 1000, { start: 100, drift: 0.02 });
  const b = randomWalk(rng, 1000, { start: 50 });
  const noise = autoregressive1(rng, 1000, 0.7);
  const c = a.map((v, t) => 2 + 0.6 * v + 0.8 * b[t] + noise[t]);
  return [a, b, c];
}

export function benchForecast(): Timing[] {
  const block = forecastBenchBlock();
  return [
    timeIt("VECM forecast, 3 series x 1,000 rows, K = 2, rank 1, 'constant', 20 steps", () => vecmForecast(block, ['a', 'b', 'c'], { case: 'constant', lags: 2, rank: 1, horizon: 20 }), { runs: 31, warmup: 5, targetMs: 5 }),
  ];
}
