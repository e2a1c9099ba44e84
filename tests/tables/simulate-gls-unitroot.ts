/**
 * Generator of addin/tables/gls-unitroot-simulated.json: the null distributions of the DF-GLS
 * t-ratio (Elliott, Rothenberg & Stock 1996) and of the Ng & Perron (2001) statistics MZa, MZt,
 * MSB and MPT, with a constant and with a constant and trend, as response surfaces in the
 * sample size.
 *
 * Run (one process, low priority; about 7 minutes on one core):
 *   npm run tables:gls
 * Options: --scale <x> multiplies the replication count (for a quick trial run);
 *          --out <path> writes elsewhere than the committed table.
 *
 * Design, and why:
 * - Each draw is a Gaussian random walk of T observations (iid N(0, 1) steps). GLS detrending
 *   removes any starting level (and, with the trend, any drift) exactly, so the random walk
 *   stands for every unit-root process with iid errors.
 * - The statistics are computed by the engine's own functions (glsDetrend, adfRegression with
 *   no lagged changes, mStatistics), so the table describes exactly the numbers the tests report.
 * - For each T in SAMPLE_SIZES the empirical quantiles at PROBABILITIES are taken; for each
 *   probability q(T) = b0 + b1 / T + b2 / T^2 is fitted by least squares over the sizes
 *   (the form of MacKinnon's response surfaces). b0 is the asymptotic quantile.
 * - Every (T) has its own seed, SEED_BASE + T, and the draws of one T serve both deterministic
 *   cases and all five statistics.
 * - The lagged changes a test adds move the small-sample distribution a little (Cheung & Lai
 *   1995); the table is for no lagged changes, as ERS's Table 1 is.
 */
import { writeFileSync } from 'node:fs';
import { Matrix, solve } from 'ml-matrix';
import { SeededRandom } from '../../addin/random';
import { adfRegression } from '../../addin/unitroot/adf-regression';
import { GLS_CBAR, glsDetrend, type GlsDeterministic } from '../../addin/unitroot/gls-detrend';
import { mStatistics } from '../../addin/unitroot/m-statistics';

const SAMPLE_SIZES = [25, 35, 50, 75, 100, 150, 200, 300, 500, 1000];
const REPLICATIONS = 50_000;
const SEED_BASE = 1_996_000;
const PROBABILITIES = [
  0.001, 0.0025, 0.005, 0.01, 0.025, 0.05, 0.075, 0.1, 0.125, 0.15, 0.2, 0.25, 0.3, 0.35, 0.4, 0.45, 0.5,
  0.55, 0.6, 0.65, 0.7, 0.75, 0.8, 0.85, 0.9, 0.95, 0.975, 0.99, 0.995, 0.999,
];
const STATISTICS = ['tau', 'MZa', 'MZt', 'MSB', 'MPT'] as const;
const CASES: GlsDeterministic[] = ['const', 'trend'];

function argument(name: string): string | undefined {
  const i = process.argv.indexOf(`--${name}`);
  return i >= 0 ? process.argv[i + 1] : undefined;
}

function quantile(sorted: Float64Array, p: number): number {
  // the definition used for every quantile here: linear between order statistics at (n - 1) p
  const h = (sorted.length - 1) * p;
  const lo = Math.floor(h);
  const hi = Math.min(lo + 1, sorted.length - 1);
  return sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
}

function fitSurface(sizes: number[], values: number[]): { coefficients: number[]; largestResidual: number } {
  const X = new Matrix(sizes.map((T) => [1, 1 / T, 1 / (T * T)]));
  const y = Matrix.columnVector(values);
  const b = solve(X.transpose().mmul(X), X.transpose().mmul(y)).to1DArray();
  let largest = 0;
  sizes.forEach((T, i) => {
    largest = Math.max(largest, Math.abs(b[0] + b[1] / T + b[2] / (T * T) - values[i]));
  });
  return { coefficients: b, largestResidual: largest };
}

function main(): void {
  const scale = Number(argument('scale') ?? '1');
  const out = argument('out') ?? 'addin/tables/gls-unitroot-simulated.json';
  const reps = Math.max(1000, Math.round(REPLICATIONS * scale));
  // quantiles[case][statistic][sizeIndex][probabilityIndex]
  const quantiles: Record<string, Record<string, number[][]>> = {};
  for (const c of CASES) quantiles[c] = Object.fromEntries(STATISTICS.map((s) => [s, [] as number[][]]));
  const started = Date.now();
  for (const T of SAMPLE_SIZES) {
    const rng = new SeededRandom(SEED_BASE + T);
    const draws: Record<string, Record<string, Float64Array>> = {};
    for (const c of CASES) draws[c] = Object.fromEntries(STATISTICS.map((s) => [s, new Float64Array(reps)]));
    const walk = new Float64Array(T);
    for (let r = 0; r < reps; r++) {
      let level = 0;
      for (let t = 0; t < T; t++) {
        level += rng.normal();
        walk[t] = level;
      }
      for (const c of CASES) {
        const detrended = glsDetrend(walk, c);
        const regression = adfRegression(detrended.values, 0, 'none');
        const m = mStatistics(detrended.values, regression, c, GLS_CBAR[c]);
        const d = draws[c];
        d.tau[r] = regression.tau;
        d.MZa[r] = m.MZa;
        d.MZt[r] = m.MZt;
        d.MSB[r] = m.MSB;
        d.MPT[r] = m.MPT;
      }
    }
    for (const c of CASES) {
      for (const s of STATISTICS) {
        const sorted = draws[c][s].sort();
        quantiles[c][s].push(PROBABILITIES.map((p) => quantile(sorted, p)));
      }
    }
    process.stderr.write(`T = ${T}: ${((Date.now() - started) / 1000).toFixed(0)} s\n`);
  }
  const surfaces: Record<string, Record<string, number[][]>> = {};
  let largestResidual = 0;
  for (const c of CASES) {
    surfaces[c] = {};
    for (const s of STATISTICS) {
      surfaces[c][s] = PROBABILITIES.map((_, j) => {
        const fit = fitSurface(SAMPLE_SIZES, quantiles[c][s].map((row) => row[j]));
        largestResidual = Math.max(largestResidual, fit.largestResidual / Math.max(1, Math.abs(fit.coefficients[0])));
        return fit.coefficients.map((v) => Number(v.toPrecision(7)));
      });
    }
  }
  const table = {
    title: 'DF-GLS t-ratio and Ng-Perron MZa, MZt, MSB, MPT: simulated null quantiles as response surfaces in the sample size',
    source:
      "Mooring's own simulation of the statistics of Elliott, G., Rothenberg, T. J. & Stock, J. H. (1996), 'Efficient tests for an autoregressive unit root', Econometrica 64(4), 813-836, and Ng, S. & Perron, P. (2001), 'Lag length selection and the construction of unit root tests with good size and power', Econometrica 69(6), 1519-1554, under the null of a unit root with iid Gaussian errors.",
    provenance: {
      generator: 'tests/tables/simulate-gls-unitroot.ts (npm run tables:gls)',
      method:
        'Random walks of T observations with iid N(0, 1) steps; GLS detrending with c = -7 (constant) or -13.5 (constant and trend), first observation kept; the regression of the change on the lagged detrended level with no lagged changes and no deterministic terms; tau its OLS t-ratio (s^2 = SSR / (n - 1)); the M statistics with s2_AR = SSR / n. Quantiles are linear between order statistics at (R - 1) p.',
      surface: 'For each probability p: q_p(T) = b0 + b1 / T + b2 / T^2, least squares over the sample sizes; b0 is the asymptotic quantile. Stored as [b0, b1, b2] to 7 significant digits.',
      sampleSizes: SAMPLE_SIZES,
      replicationsPerSize: reps,
      seeds: `SeededRandom(${SEED_BASE} + T) for each sample size T; one set of draws serves both cases and all statistics`,
      largestRelativeFitResidual: Number(largestResidual.toPrecision(3)),
      lagsNote: 'No lagged changes: a test with k lagged changes reads the same table (Cheung & Lai 1995 show the critical values move a little with k in small samples).',
    },
    probabilities: PROBABILITIES,
    surfaces,
  };
  writeFileSync(out, `${JSON.stringify(table, null, 1)}\n`);
  process.stderr.write(`wrote ${out} (${reps} replications per size, ${((Date.now() - started) / 1000).toFixed(0)} s)\n`);
}

main();
