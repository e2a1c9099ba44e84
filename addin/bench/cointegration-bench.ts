/**
 * Benchmarks of the residual-based cointegration engine on a seeded 2,500-row pair
 * (y = 5 + 1.2 x + AR(1) spread with phi = 0.9): Engle-Granger with the AIC lag search to the
 * default maximum (target 1 ms, median of many runs after a warm-up), and beside it, for
 * comparison, Engle-Granger with a fixed lag, Phillips-Ouliaris, the four hedge ratios and
 * the error-correction model with its AIC lag search.
 */
import { engleGranger } from '../cointegration/engle-granger';
import { errorCorrectionModel } from '../cointegration/error-correction';
import { hedgeRatios } from '../cointegration/hedge-ratio';
import { phillipsOuliaris } from '../cointegration/phillips-ouliaris';
import { SeededRandom, autoregressive1, randomWalk } from '../random';
import { timeIt, type Timing } from './timing';

export function benchPair(): { y: Float64Array; x: Float64Array } {
  const rng = new SeededRandom(2500);
  const x = randomWalk(rng, 2500, { start: 80 });
  const spread = autoregressive1(rng, 2500, 0.9);
  return { y: x.map((v, t) => 5 + 1.2 * v + spread[t]), x };
}

/** Timings (median ms, also as `ms`) on the 2,500-row pair. */
export function benchEngleGranger(): (Timing & { ms: number })[] {
  const { y, x } = benchPair();
  const runs = [
    timeIt('Engle-Granger, AIC search to the default maximum lag (27), 2,500 rows', () => engleGranger(y, [x]), { runs: 201, warmup: 50, targetMs: 1 }),
    timeIt('Engle-Granger, fixed 2 lags, 2,500 rows', () => engleGranger(y, [x], { lags: 2 }), { runs: 201, warmup: 50 }),
    timeIt('Phillips-Ouliaris, automatic bandwidth, 2,500 rows', () => phillipsOuliaris(y, [x]), { runs: 201, warmup: 50 }),
    timeIt('Hedge ratios (OLS both ways, TLS, dynamic OLS with AIC leads/lags), 2,500 rows', () => hedgeRatios(y, x), { runs: 51, warmup: 10 }),
    timeIt('Error-correction model, AIC lag search, 2,500 rows', () => errorCorrectionModel(y, x), { runs: 51, warmup: 10 }),
  ];
  return runs.map((t) => ({ ...t, ms: t.medianMs }));
}
