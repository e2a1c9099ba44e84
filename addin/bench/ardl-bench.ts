/**
 * Benchmark of the ARDL bounds test (Pesaran, Shin & Smith 2001; `mooring ardl`'s engine
 * function) on the seeded 2,500-row pair of the cointegration benchmark (y = 5 + 1.2 x + an
 * AR(1) spread with phi 0.9): fixed orders ARDL(2, 2) in case 3, the call the reference
 * library's UECM bounds test makes, and the default AIC search over orders 1 to 4. Target 5 ms
 * each (issue 15: each new test on 2,500 rows within the order of the existing ones).
 */
import { ardlBoundsTest } from '../ardl/bounds-test';
import { benchPair } from './cointegration-bench';
import { timeIt, type Timing } from './timing';

/** Timings (median ms, also as `ms`) of the bounds test on the 2,500-row pair. */
export function benchArdl(): (Timing & { ms: number })[] {
  const { y, x } = benchPair();
  const runs = [
    timeIt('ARDL bounds test, ARDL(2, 2) given, case 3, 2,500 rows', () => ardlBoundsTest(y, [x], { case: 3, lags: { fixed: 2 }, order: [{ fixed: 2 }] }), { runs: 101, warmup: 20, targetMs: 5 }),
    timeIt('ARDL bounds test, orders by AIC up to 4 (the default), case 3, 2,500 rows', () => ardlBoundsTest(y, [x]), { runs: 51, warmup: 10, targetMs: 5 }),
  ];
  return runs.map((t) => ({ ...t, ms: t.medianMs }));
}
