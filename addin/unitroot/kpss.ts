/**
 * KPSS stationarity test (Kwiatkowski, Phillips, Schmidt & Shin 1992).
 * Null: the series is stationary around a constant (or a linear trend). Residuals e from the
 * mean (or from a constant and trend t = 1..n); S_t their partial sums;
 *   eta = sum S_t^2 / (n^2 lambda^2), lambda^2 the Bartlett long-run variance of e.
 * Large values reject. p-value: linear interpolation in the KPSS (1992) Table 1 upper-tail
 * points (10, 5, 2.5, 1%), held at the ends and marked as a bound (pValueBound, "below 0.01" or
 * "above 0.10"), never clipped silently.
 */
import { MooringInputError } from '../errors';
import { pValueBoundNote, pValueBoundText } from '../p-value-bound';
import type { TestResult } from '../result';
import { powerOfTwoScale, scaled } from '../linalg/power-of-two-scale';
import { leastSquares } from '../regression/least-squares';
import { bartlettByWindows, bartlettLongRunVariance, neweyWestBandwidth, overflowError } from '../regression/long-run-variance';
import { kpssCriticalValues, kpssPValue } from '../tables/kpss-table';
import { stationarityHypotheses } from './hypotheses';

export interface KpssOptions {
  deterministic?: 'const' | 'trend';
  bandwidth?: number | 'auto';
}

/** Residuals of a series from its mean or from a fitted constant and linear trend. */
export function detrendedResiduals(series: ArrayLike<number>, deterministic: 'const' | 'trend'): Float64Array {
  const n = series.length;
  if (deterministic === 'const') {
    let m = 0;
    for (let i = 0; i < n; i++) m += series[i];
    m /= n;
    const out = new Float64Array(n);
    for (let i = 0; i < n; i++) out[i] = series[i] - m;
    return out;
  }
  const ones = new Float64Array(n).fill(1);
  const trend = new Float64Array(n);
  for (let i = 0; i < n; i++) trend[i] = i + 1;
  return leastSquares(series, [ones, trend], { names: ['constant', 'trend'], withoutCovariance: true }).residuals;
}

/**
 * Room for n residuals, reused from call to call: a new Float64Array of 10,000 doubles costs
 * about 0.2 ms on Node 20 (its memory is set up outside the heap), twice the rest of the test.
 * The residuals never leave kpssTest, and a call runs to its end before the next begins.
 */
let residualStore = new Float64Array(0);
function residualRoom(n: number): Float64Array {
  if (residualStore.length < n) residualStore = new Float64Array(Math.max(n, 2 * residualStore.length));
  return residualStore.subarray(0, n);
}

/**
 * series * factor minus its mean, in one array: the same doubles as scaling a copy and then
 * subtracting the mean (detrendedResiduals), without the intermediate copy.
 */
function scaledDeviationsFromMean(series: ArrayLike<number>, factor: number): Float64Array {
  const n = series.length;
  let m = 0;
  for (let i = 0; i < n; i++) m += series[i] * factor;
  m /= n;
  const out = residualRoom(n);
  for (let i = 0; i < n; i++) out[i] = series[i] * factor - m;
  return out;
}

/**
 * The Bartlett long-run variance of the residuals (Newey & West 1987) from the squares of the
 * sums of every window of L + 1 rows (bartlettByWindows), O(n) whatever the bandwidth, where the
 * lag-by-lag sum costs O(n L): at n = 10,000 the automatic bandwidth of a random walk is near 60,
 * and the lag products were nearly all of the test's time. The two routes are the same sum
 * regrouped (tests/unitroot/kpss-window-route.test.ts: equal to 1e-12); a sum of squares cannot cancel, so the window route is at
 * least as exact. A bandwidth that is not a whole number in 0..n-1 goes to
 * bartlettLongRunVariance, which refuses it with its own message.
 */
function kpssLongRunVariance(e: Float64Array, bandwidth: number): number {
  const n = e.length;
  if (!Number.isInteger(bandwidth) || bandwidth < 0 || bandwidth >= n) return bartlettLongRunVariance(e, bandwidth);
  const lrv = bartlettByWindows(e, bandwidth) / n;
  if (!Number.isFinite(lrv)) throw overflowError();
  return lrv;
}

export function kpssTest(series: ArrayLike<number>, options: KpssOptions = {}, name = 'the series'): TestResult {
  const deterministic = options.deterministic ?? 'const';
  if (deterministic !== 'const' && deterministic !== 'trend') {
    throw new MooringInputError(`Unknown deterministic terms '${String(deterministic)}' for KPSS: use const or trend.`);
  }
  const n = series.length;
  if (n < 3) throw new MooringInputError(`${n} observations are too few for the KPSS test.`);
  // The statistic is free of units; the sums below are not (they overflow for prices of 1e300
  // and vanish for 1e-300), so they run on the series brought to a size near one.
  const factor = powerOfTwoScale(series);
  const e = deterministic === 'const' ? scaledDeviationsFromMean(series, factor) : detrendedResiduals(scaled(series, factor), deterministic);
  const requested = options.bandwidth ?? 'auto';
  if (requested !== 'auto' && typeof requested !== 'number') {
    throw new MooringInputError(`Unknown bandwidth '${String(requested)}': use a whole number or auto.`);
  }
  const bandwidth = requested === 'auto' ? neweyWestBandwidth(e) : requested;
  const lrv = kpssLongRunVariance(e, bandwidth);
  let partial = 0;
  let sumSquares = 0;
  for (let t = 0; t < n; t++) {
    partial += e[t];
    sumSquares += partial * partial;
  }
  const statistic = sumSquares / (n * n) / lrv;
  const table = kpssPValue(statistic, deterministic);
  const warnings: string[] = [];
  const pValueBound = table.beyondTable;
  const pValueNote = pValueBound === null ? undefined : pValueBoundNote(table.pValue, pValueBound);
  if (pValueBound !== null) {
    warnings.push(`The statistic lies outside the published table (it spans p-values 0.01 to 0.10), so the p-value is only known to be ${pValueBoundText(table.pValue, pValueBound)}.`);
  }
  const { nullHypothesis, alternative } = stationarityHypotheses(name, deterministic);
  return {
    test: 'KPSS',
    title: `Stationarity test (KPSS) on ${name}`,
    statisticName: 'eta',
    statistic,
    pValue: table.pValue,
    pValueNote,
    pValueBound,
    critical: { ...kpssCriticalValues(deterministic) },
    rejectTail: 'upper',
    lags: null,
    bandwidth,
    nobs: n,
    deterministic,
    nullHypothesis,
    alternative,
    warnings,
    details: [
      { key: 'bandwidthRule', label: 'Bandwidth rule', value: requested === 'auto' ? 'Newey-West (1994) automatic' : 'fixed' },
      { key: 'longRunVariance', label: 'Long-run variance of the residuals', value: lrv / factor / factor },
    ],
  };
}
