/**
 * The demo data set: six invented daily price series from the Quennel Delta, made by a
 * seeded generator whose true structure is known and exported as DEMO_TRUTH (truth.ts).
 *
 * The committed file addin/demo/data/quennel-delta.csv is demoCsv() written out. The test
 * tests/demo/demo-data.test.ts compares the two byte for byte; after a deliberate change to
 * the generator, rewrite the file with
 *
 *     MOORING_WRITE_DEMO=1 npx vitest run tests/demo
 *
 * and commit it together with the change.
 *
 * All series are built in natural logs and exponentiated, so every price stays positive and
 * every relation in DEMO_TRUTH is a relation between log prices.
 */
import { SeededRandom, autoregressive1, randomWalk } from '../random';
import { businessDays } from './business-days';
import {
  DEMO_TRUTH,
  FREIGHT_DRIFT,
  FREIGHT_SIGMA,
  GASOIL_DRIFT,
  GASOIL_SIGMA,
  HEAVY_FUEL_SHARE,
  HEAVY_TREND_DRIFT,
  HEAVY_TREND_SIGMA,
  phiFromHalfLife,
  type DemoSeriesTruth,
} from './truth';

export { DEMO_TRUTH } from './truth';

/** The demo table: column names (Date first), the dates, and each price column by name. */
export interface DemoData {
  header: string[];
  dates: string[];
  columns: Record<string, number[]>;
}

/**
 * Generates the demo table. The draws are taken in a fixed order (gasoil trend, diesel noise,
 * heavy-fuel trend, heavy-fuel spread, freight, premium); changing that order or any parameter
 * changes every later number and so the committed file.
 */
export function generateDemo(seed: number = DEMO_TRUTH.seed): DemoData {
  const n = DEMO_TRUTH.rows;
  const { logs } = demoPaths(seed);
  const columns: Record<string, number[]> = {};
  for (const s of DEMO_TRUTH.series) {
    columns[s.name] = Array.from(logs[s.name], (v) => roundTo(Math.exp(v), s.decimals));
  }
  return {
    header: ['Date', ...DEMO_TRUTH.series.map((s) => s.name)],
    dates: businessDays(DEMO_TRUTH.startDate, n),
    columns,
  };
}

/**
 * The demo's paths before rounding: each series' log prices by name, and the hidden states the
 * generator drew them from (the leader with its pre-sample day, the loose pair's common trend
 * and spread, the premium's deviation from its mean), which continuation.ts carries on from.
 */
export interface DemoPaths {
  logs: Record<string, Float64Array>;
  gasoilWithPresample: Float64Array;
  heavyTrend: Float64Array;
  bunkerSpread: Float64Array;
  premiumDeviation: Float64Array;
}

/** Draws the demo's paths (see generateDemo for the order of the draws). */
export function demoPaths(seed: number = DEMO_TRUTH.seed): DemoPaths {
  const n = DEMO_TRUTH.rows;
  const rng = new SeededRandom(seed);
  const logs: Record<string, Float64Array> = {};
  const start = (name: string): number => Math.log(seriesTruth(name).startPrice);

  // Pair 1. The leader is a plain random walk: nothing in its equation looks at the follower.
  // One pre-sample day is drawn so the follower's first equation has a lagged leader change.
  const gasoilWithPresample = randomWalk(rng, n + 1, {
    start: start('GateGasoil') - GASOIL_DRIFT,
    drift: GASOIL_DRIFT,
    sigma: GASOIL_SIGMA,
  });
  const gasoil = gasoilWithPresample.subarray(1);
  logs.GateGasoil = gasoil;
  logs.DockDiesel = followLeader(rng, gasoilWithPresample);

  // Pair 2. A common trend w and an AR(1) spread z are split so that
  // log BunkerBlend - intercept - beta * log HeavyFuel = z exactly, with HeavyFuel bearing
  // HEAVY_FUEL_SHARE of every correction and BunkerBlend the rest (both adjust, no leader).
  const bunkerPair = DEMO_TRUTH.cointegratedPairs[1];
  const trend = randomWalk(rng, n, {
    start: start('HeavyFuel') - HEAVY_TREND_DRIFT,
    drift: HEAVY_TREND_DRIFT,
    sigma: HEAVY_TREND_SIGMA,
  });
  const spread = autoregressive1(rng, n, bunkerPair.phi, bunkerPair.spreadSd * Math.sqrt(1 - bunkerPair.phi ** 2));
  const k = HEAVY_FUEL_SHARE / bunkerPair.beta;
  logs.HeavyFuel = trend.map((w, t) => w - k * spread[t]);
  logs.BunkerBlend = trend.map((w, t) => bunkerPair.intercept + bunkerPair.beta * w + (1 - bunkerPair.beta * k) * spread[t]);

  // The unrelated I(1) series and the stationary I(0) series draw only their own shocks.
  logs.BargeFreight = randomWalk(rng, n, {
    start: start('BargeFreight') - FREIGHT_DRIFT,
    drift: FREIGHT_DRIFT,
    sigma: FREIGHT_SIGMA,
  });
  const premiumLaw = seriesTruth('TankPremium').meanReversion;
  if (!premiumLaw) throw new Error('DEMO_TRUTH gives TankPremium no mean-reversion law');
  const premiumPhi = phiFromHalfLife(premiumLaw.halfLifeDays);
  const premium = autoregressive1(rng, n, premiumPhi, premiumLaw.logSd * Math.sqrt(1 - premiumPhi ** 2));
  logs.TankPremium = premium.map((z) => premiumLaw.logMean + z);
  return { logs, gasoilWithPresample, heavyTrend: trend, bunkerSpread: spread, premiumDeviation: premium };
}

/**
 * The follower of pair 1 (log DockDiesel, y) from its leader (log GateGasoil, x), by the
 * error-correction equation
 *
 *   dy_t = (beta - gamma) mu + (phi - 1) z_{t-1} + gamma dx_{t-1} + beta (dx_t - mu) + sigma_e e_t,
 *   z_t  = y_t - intercept - beta x_t,
 *
 * where mu is the leader's drift and gamma its lagged pass-through. The constant keeps the
 * spread's mean at zero. Substituting gives z_t = phi z_{t-1} + sigma_e e_t + gamma (dx_{t-1} - mu):
 * an exact AR(1) with independent innovations, so the spread's half-life is the designed one.
 * sigma_e is set so the spread's stationary standard deviation is the designed spreadSd.
 */
function followLeader(rng: SeededRandom, leaderWithPresample: Float64Array): Float64Array {
  const { intercept, beta, spreadSd } = DEMO_TRUTH.cointegratedPairs[0];
  const x = leaderWithPresample;
  const n = x.length - 1;
  const y = new Float64Array(n);
  // Row 0 starts on the equilibrium plus a spread drawn from its stationary law.
  y[0] = intercept + beta * x[1] + spreadSd * rng.normal();
  for (let t = 1; t < n; t++) y[t] = followerStep(y[t - 1], x[t - 1], x[t], x[t + 1], rng.normal());
  return y;
}

/**
 * One day of the follower's equation above: its log price from yesterday's (yPrev), the
 * leader's log prices of the day before yesterday, yesterday and today, and a standard normal
 * draw e (scaled by sigma_e here).
 */
export function followerStep(yPrev: number, xBefore: number, xPrev: number, xNow: number, e: number): number {
  const pair = DEMO_TRUTH.cointegratedPairs[0];
  const gamma = DEMO_TRUTH.leadLag.followerOnLaggedLeaderChange;
  const { intercept, beta, phi, spreadSd } = pair;
  const innovationSd = spreadSd * Math.sqrt(1 - phi * phi);
  const sigmaE = Math.sqrt(innovationSd ** 2 - (gamma * GASOIL_SIGMA) ** 2);
  const zPrev = yPrev - intercept - beta * xPrev;
  const dxNow = xNow - xPrev;
  const dxPrev = xPrev - xBefore;
  return (
    yPrev +
    (beta - gamma) * GASOIL_DRIFT +
    (phi - 1) * zPrev +
    gamma * dxPrev +
    beta * (dxNow - GASOIL_DRIFT) +
    sigmaE * e
  );
}

/** The demo table as CSV text: the header row, then one row per day, LF line endings. */
export function demoCsv(seed: number = DEMO_TRUTH.seed): string {
  const data = generateDemo(seed);
  const lines = [data.header.join(',')];
  for (let t = 0; t < data.dates.length; t++) {
    const cells = [data.dates[t]];
    for (const s of DEMO_TRUTH.series) cells.push(data.columns[s.name][t].toFixed(s.decimals));
    lines.push(cells.join(','));
  }
  return lines.join('\n') + '\n';
}

export function seriesTruth(name: string): DemoSeriesTruth {
  const s = DEMO_TRUTH.series.find((entry) => entry.name === name);
  if (!s) throw new Error(`demo series '${name}' is not in DEMO_TRUTH`);
  return s;
}

/** Rounds half away from zero at the given decimals (prices are positive). */
export function roundTo(value: number, decimals: number): number {
  const scale = 10 ** decimals;
  return Math.round(value * scale) / scale;
}
