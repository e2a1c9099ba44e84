/**
 * Generator of addin/tables/ardl-bounds-simulated.json: quantiles of the bounds F and t
 * statistics (Pesaran, Shin & Smith 2001) under the null, for each case 1..5, k = 1..6
 * regressors, regressors all I(0) (lower bound) or all I(1) (upper bound), and a grid of
 * regression sizes n, by Mooring's own seeded simulation (addin/ardl/bounds-simulation.ts).
 * The largest n stands in for the asymptotic distribution in the p-values; the table's
 * agreement with the paper's printed asymptotic bounds is checked in
 * tests/ardl/bounds-tables.test.ts.
 *
 * Run (one process, low priority):
 *   npx rolldown tests/tables/simulate-ardl-bounds.ts --platform node --format esm \
 *     --file test-artifacts/simulate-ardl-bounds.mjs && nice -n 10 node test-artifacts/simulate-ardl-bounds.mjs
 * Options: --scale <x> multiplies the replication count (for a quick trial run);
 *          --out <path> writes elsewhere than the committed table.
 */
import { writeFileSync } from 'node:fs';
import { BOUNDS_CASES } from '../../addin/ardl/bounds-case';
import { simulateBoundsDraws } from '../../addin/ardl/bounds-simulation';
import { BOUNDS_PROBABILITIES, BOUNDS_SIZES, BOUNDS_MAX_SIMULATED_K } from '../../addin/ardl/bounds-table-layout';

const BASE_SEED = 20_010_000;
const REPLICATIONS = 40_000;
/** Seed of one cell: distinct for every (k, n, bound), so any cell can be re-run alone; the five cases share the cell's paths. */
const cellSeed = (k: number, sizeIndex: number, integrated: boolean) => BASE_SEED + 100 * k + 2 * sizeIndex + (integrated ? 1 : 0);

/** Sample quantile with linear interpolation between order statistics (type 7). */
function quantiles(draws: Float64Array, probabilities: readonly number[]): number[] {
  const sorted = Float64Array.from(draws).sort();
  return probabilities.map((p) => {
    const h = (sorted.length - 1) * p;
    const lo = Math.floor(h);
    const hi = Math.min(lo + 1, sorted.length - 1);
    return Number((sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo])).toFixed(4));
  });
}

const args = process.argv.slice(2);
const option = (name: string) => {
  const i = args.indexOf(`--${name}`);
  return i >= 0 ? args[i + 1] : undefined;
};
const scale = Number(option('scale') ?? 1);
const out = option('out') ?? 'addin/tables/ardl-bounds-simulated.json';
const replications = Math.round(REPLICATIONS * scale);

type Cell = { F: { i0: number[]; i1: number[] }; t: { i0: number[]; i1: number[] } | null };
const cases: Record<string, Record<string, Record<string, Cell>>> = Object.fromEntries(BOUNDS_CASES.map((c) => [c, {}]));
for (let k = 1; k <= BOUNDS_MAX_SIMULATED_K; k++) {
  for (const c of BOUNDS_CASES) cases[c][k] = {};
  BOUNDS_SIZES.forEach((n, s) => {
    const lower = simulateBoundsDraws(n, k, false, replications, cellSeed(k, s, false));
    const upper = simulateBoundsDraws(n, k, true, replications, cellSeed(k, s, true));
    for (const boundsCase of BOUNDS_CASES) {
      const tabulatesT = boundsCase === 1 || boundsCase === 3 || boundsCase === 5;
      cases[boundsCase][k][n] = {
        F: { i0: quantiles(lower[boundsCase].f, BOUNDS_PROBABILITIES), i1: quantiles(upper[boundsCase].f, BOUNDS_PROBABILITIES) },
        t: tabulatesT ? { i0: quantiles(lower[boundsCase].t, BOUNDS_PROBABILITIES), i1: quantiles(upper[boundsCase].t, BOUNDS_PROBABILITIES) } : null,
      };
    }
  });
  process.stderr.write(`k ${k} done\n`);
}

const table = {
  title: 'Bounds test (Pesaran, Shin & Smith 2001): simulated null distributions of F and t by sample size',
  source: "Mooring's own seeded simulation; regenerate with tests/tables/simulate-ardl-bounds.ts",
  provenance: {
    method:
      'y a Gaussian random walk; k regressors all white noise (I(0), lower bound) or all random walks (I(1), upper bound), independent of y; ' +
      'Δy_t regressed on the case\'s free terms, its restricted term, x_{t-1} and y_{t-1} over n rows (t = 1..n); F = the Wald test of the levels and the restricted term over their number; ' +
      't = the t-ratio of y_{t-1} (cases 1, 3 and 5 only, as in the paper). Short-run terms are left out: they do not change the limiting distributions and little change the finite-sample ones (a documented simplification, as in Narayan 2005).',
    replications,
    seed: `cell (k, size index s, bound b = 0 for I(0), 1 for I(1)) uses SeededRandom(${BASE_SEED} + 100 k + 2 s + b) from addin/random.ts; the five cases are computed from the same paths`,
    quantileEstimator: 'sample quantile with linear interpolation between order statistics',
  },
  layout: 'cases[case][k][n] = { F: { i0, i1 }, t: { i0, i1 } | null }, each a list of quantiles at probabilities',
  probabilities: BOUNDS_PROBABILITIES,
  sizes: BOUNDS_SIZES,
  cases,
};
writeFileSync(out, JSON.stringify(table) + '\n');
process.stderr.write(`wrote ${out}\n`);
