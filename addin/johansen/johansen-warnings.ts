/**
 * The cautions the Johansen rank test attaches to its result: deterministic terms that do
 * not fit the data's drift, short samples, eigenvalues at or near 1, and the provenance of
 * the restricted cases' p-values (Mooring's simulation, with its measured agreement with the
 * published table where both exist).
 */
import { studentTwoSidedP } from '../distributions';
import { toUnitScale } from '../linalg/power-of-two-scale';
import { leastSquares } from '../regression/least-squares';
import simulated from '../tables/johansen-simulated.json';
import type { JohansenCase } from './deterministic-case';

/** Level of the simple drift check. */
const DRIFT_LEVEL = 0.05;

/**
 * Whether each series drifts: a two-sided t-test of the mean of its changes x_t - x_{t-1}
 * (t = mean / (sd / sqrt(N)), N changes, Student's t with N - 1 df) at 5%. A simple check:
 * it ignores autocorrelation in the changes, which is enough for a warning.
 */
export function driftingSeries(block: readonly ArrayLike<number>[]): boolean[] {
  return block.map((given) => {
    // The t-ratio is free of units; the squares are not (they vanish for prices of 1e-300).
    const x = toUnitScale(given).values;
    const N = x.length - 1;
    let mean = 0;
    for (let t = 1; t <= N; t++) mean += x[t] - x[t - 1];
    mean /= N;
    let ss = 0;
    for (let t = 1; t <= N; t++) ss += (x[t] - x[t - 1] - mean) ** 2;
    const sd = Math.sqrt(ss / (N - 1));
    if (!(sd > 0)) return mean !== 0;
    return studentTwoSidedP(mean / (sd / Math.sqrt(N)), N - 1) < DRIFT_LEVEL;
  });
}

/** Joins names as "A", "A and B", "A, B and C". */
export function listNames(names: readonly string[]): string {
  if (names.length <= 1) return names.join('');
  return `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]}`;
}

/**
 * Whether each series' changes trend (quadratic trends in the levels): the t-test of the
 * slope b in the least-squares fit x_t - x_{t-1} = a + b t + e at 5% (Student's t, N - 2 df).
 * Simple, like the drift check.
 */
export function trendingChanges(block: readonly ArrayLike<number>[]): boolean[] {
  return block.map((x) => {
    const N = x.length - 1;
    const change = new Float64Array(N);
    const ones = new Float64Array(N).fill(1);
    const time = new Float64Array(N);
    for (let t = 0; t < N; t++) {
      change[t] = x[t + 1] - x[t];
      time[t] = t + 1;
    }
    const fit = leastSquares(change, [ones, time]);
    const tSlope = fit.tValues[1];
    if (!Number.isFinite(tSlope)) return fit.coefficients[1] !== 0;
    return studentTwoSidedP(tSlope, N - 2) < DRIFT_LEVEL;
  });
}

/**
 * Warnings when the case's assumption about drift does not match the data. The 'constant'
 * case's critical values assume the data drift (a linear trend in the levels; Johansen
 * 1995, ch. 6 and 11, chapters from memory), so driftless data over-reject there; likewise
 * the 'trend' case's values assume trending changes (quadratic trends in the levels).
 * 'none' and 'restricted-constant' assume no drift at all. The seeded Monte Carlo checks
 * in tests/johansen measure the over-rejection.
 */
export function driftWarnings(caseName: JohansenCase, block: readonly ArrayLike<number>[], names: readonly string[]): string[] {
  const drifts = driftingSeries(block);
  const drifting = names.filter((_, i) => drifts[i]);
  if (caseName === 'constant' && drifting.length === 0) {
    return [
      "None of the series drifts (the mean change is insignificant at 5% for every series, by a simple t-test). The 'constant' case's critical values assume drifting data; on driftless data this case rejects too often and can report relations that are not there. Consider the 'restricted-constant' case.",
    ];
  }
  if (caseName === 'trend' && !trendingChanges(block).some((b) => b)) {
    return [
      "None of the series' changes trend (the slope of the changes on time is insignificant at 5% for every series, by a simple t-test). The 'trend' case's critical values assume quadratic trends in the levels; on merely drifting data this case rejects too often and can report relations that are not there. Consider the 'restricted-trend' case.",
    ];
  }
  if ((caseName === 'none' || caseName === 'restricted-constant') && drifting.length > 0) {
    const verb = drifting.length === 1 ? 'drifts' : 'drift';
    return [
      `${listNames(drifting)} ${verb} (mean change significant at 5%, by a simple t-test), but the '${caseName}' case assumes no drift in the data. Consider the 'constant' case (or 'restricted-trend' if the relations themselves trend).`,
    ];
  }
  return [];
}

/**
 * Warnings for short samples: under 50 observations, or fewer than 10 observations per
 * coefficient of each equation (mK lagged changes, the levels block, the unrestricted
 * deterministic terms). The tables are asymptotic, and the trace test then rejects too
 * often (Reinsel & Ahn 1992; Cheung & Lai 1993).
 */
export function sampleWarnings(nobs: number, coefficientsPerEquation: number, corrected: boolean): string[] {
  const out: string[] = [];
  const hint = corrected ? '' : ' The small-sample correction (Reinsel & Ahn 1992) makes the statistics more conservative.';
  if (nobs < 50) {
    out.push(`Only ${nobs} observations: the critical values are asymptotic and the test tends to find too many relations in short samples.${hint}`);
  } else if (nobs < 10 * coefficientsPerEquation) {
    out.push(`${nobs} observations for ${coefficientsPerEquation} coefficients per equation (fewer than 10 per coefficient): the asymptotic critical values may be unreliable; consider fewer lags or series.${hint}`);
  }
  return out;
}

/** Largest eigenvalue before a warning: squared canonical correlations this high are rare in prices. */
const NEAR_ONE = 0.95;

/** A warning when the largest eigenvalue is at or near 1 (near-exact combinations, or too many lags). */
export function eigenvalueWarnings(eigenvalues: readonly number[]): string[] {
  const top = eigenvalues[0];
  if (!(top > NEAR_ONE)) return [];
  return [
    `The largest eigenvalue is ${top.toFixed(4)}, close to 1: the statistics are then very large and fragile. This usually means one series is nearly a copy or an exact mix of the others, or the lags are too many for the rows.`,
  ];
}

/**
 * Largest relative gap, in percent, between Mooring's simulated 90/95/99% points and the
 * published MacKinnon, Haug & Michelis (1999) values, over the cases both cover (none,
 * constant, trend; trace and maximum eigenvalue; n - r = 1..12). Measured, not assumed:
 * tests/tables/johansen-agreement.test.ts fails if any gap reaches it.
 */
export const SIMULATED_AGREEMENT_PERCENT = 1.1;

/** Smallest and largest replications per row of the simulated table, from its provenance. */
function replicationRange(): { fewest: number; most: number } {
  const counts = Object.values(simulated.provenance.replications).map((c) => c * simulated.provenance.replicationScale);
  return { fewest: Math.min(...counts), most: Math.max(...counts) };
}

/** "800,000": a whole count with thousands separators, the same on every machine. */
function countText(n: number): string {
  return String(n).replace(/\B(?=(\d{3})+(?!\d))/g, ',');
}

/**
 * The note on where the restricted cases' critical values and p-values come from: Mooring's
 * seeded simulation of the limiting distributions (addin/tables/johansen-simulated.json),
 * and how far that simulation agrees with the published values in the cases they cover.
 */
export function simulatedTableWarning(caseName: JohansenCase): string[] {
  if (caseName !== 'restricted-constant' && caseName !== 'restricted-trend') return [];
  const { fewest, most } = replicationRange();
  return [
    `Critical values and p-values for the '${caseName}' case come from Mooring's own simulation of the limiting distribution ` +
      `(${countText(fewest)} to ${countText(most)} seeded replications per row, ${countText(simulated.provenance.steps)} steps extrapolated to the limit; seeds and method are recorded with the table). ` +
      `The published MacKinnon, Haug & Michelis (1999) tables do not cover this case; in the three cases they do cover, the same simulation matches their 10%, 5% and 1% points to within ${SIMULATED_AGREEMENT_PERCENT}%.`,
  ];
}
