/**
 * The demo scenario after its last row: the days that follow 2024-12-27, drawn by the same
 * laws (truth.ts) from where each hidden state of the demo ends, so rows appended in the
 * preview continue the story instead of being numbers made up by hand.
 *
 * The continuation has its own seeded stream (the demo's seed plus CONTINUATION_STREAM), so
 * the committed demo file stays exactly as it is. Draws go day by day in a fixed order
 * (leader, follower, loose pair's trend, its spread, freight, premium), so the first k rows
 * after the demo are the same whether 12 or 120 are asked for.
 */
import { SeededRandom } from '../random';
import { businessDays } from './business-days';
import { DEMO_TRUTH, demoPaths, followerStep, roundTo, seriesTruth, type DemoData } from './scenario';
import { FREIGHT_DRIFT, FREIGHT_SIGMA, GASOIL_DRIFT, GASOIL_SIGMA, HEAVY_FUEL_SHARE, HEAVY_TREND_DRIFT, HEAVY_TREND_SIGMA, phiFromHalfLife } from './truth';

/** Added to the demo's seed to seed the continuation's own stream. */
export const CONTINUATION_STREAM = 1_000_003;

/**
 * Rows `from` to `from + count - 1` after the demo's last row (0 is the first weekday after
 * it), as a table of the demo's shape: the same header, the dates, and each price column.
 */
export function demoRowsAfter(from: number, count: number, seed: number = DEMO_TRUTH.seed): DemoData {
  if (!Number.isInteger(from) || from < 0 || !Number.isInteger(count) || count < 0) {
    throw new RangeError(`demoRowsAfter needs whole numbers from >= 0 and count >= 0 (got ${from}, ${count})`);
  }
  const paths = demoPaths(seed);
  const n = DEMO_TRUTH.rows;
  const last = (a: Float64Array, back = 0) => a[a.length - 1 - back];
  const rng = new SeededRandom(seed + CONTINUATION_STREAM);

  const bunker = DEMO_TRUTH.cointegratedPairs[1];
  const k = HEAVY_FUEL_SHARE / bunker.beta;
  const bunkerInnovation = bunker.spreadSd * Math.sqrt(1 - bunker.phi ** 2);
  const premiumLaw = seriesTruth('TankPremium').meanReversion;
  if (!premiumLaw) throw new Error('DEMO_TRUTH gives TankPremium no mean-reversion law');
  const premiumPhi = phiFromHalfLife(premiumLaw.halfLifeDays);
  const premiumInnovation = premiumLaw.logSd * Math.sqrt(1 - premiumPhi ** 2);

  // Where the demo ends.
  let xBefore = last(paths.gasoilWithPresample, 1);
  let x = last(paths.gasoilWithPresample);
  let y = last(paths.logs.DockDiesel);
  let w = last(paths.heavyTrend);
  let z = last(paths.bunkerSpread);
  let freight = last(paths.logs.BargeFreight);
  let premium = last(paths.premiumDeviation);

  const columns: Record<string, number[]> = Object.fromEntries(DEMO_TRUTH.series.map((s) => [s.name, [] as number[]]));
  const keep = (name: string, logPrice: number) => columns[name].push(roundTo(Math.exp(logPrice), seriesTruth(name).decimals));
  for (let t = 0; t < from + count; t++) {
    const xNow = x + GASOIL_DRIFT + GASOIL_SIGMA * rng.normal();
    y = followerStep(y, xBefore, x, xNow, rng.normal());
    xBefore = x;
    x = xNow;
    w = w + HEAVY_TREND_DRIFT + HEAVY_TREND_SIGMA * rng.normal();
    z = bunker.phi * z + bunkerInnovation * rng.normal();
    freight = freight + FREIGHT_DRIFT + FREIGHT_SIGMA * rng.normal();
    premium = premiumPhi * premium + premiumInnovation * rng.normal();
    if (t < from) continue;
    keep('GateGasoil', x);
    keep('DockDiesel', y);
    keep('HeavyFuel', w - k * z);
    keep('BunkerBlend', bunker.intercept + bunker.beta * w + (1 - bunker.beta * k) * z);
    keep('BargeFreight', freight);
    keep('TankPremium', premiumLaw.logMean + premium);
  }
  return {
    header: ['Date', ...DEMO_TRUTH.series.map((s) => s.name)],
    dates: businessDays(DEMO_TRUTH.startDate, n + from + count).slice(n + from),
    columns,
  };
}

/** The same rows as table rows: the date text first, then the prices in the header's order. */
export function demoRowsAfterAsGrid(from: number, count: number, seed: number = DEMO_TRUTH.seed): (string | number)[][] {
  const d = demoRowsAfter(from, count, seed);
  return d.dates.map((date, i) => [date, ...DEMO_TRUTH.series.map((s) => d.columns[s.name][i])]);
}
