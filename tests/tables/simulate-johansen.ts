/**
 * Generator of addin/tables/johansen-simulated.json: quantiles of the asymptotic null
 * distributions of the Johansen trace and maximum-eigenvalue statistics for n - r = 1..12
 * and all five deterministic cases, by a seeded simulation of the limiting Brownian
 * functional (addin/johansen/simulate-distribution.ts; Johansen 1995, ch. 11 and 15).
 *
 * Run (one process, low priority; about 15-20 minutes on one core):
 *   npx rolldown tests/tables/simulate-johansen.ts --platform node --format esm \
 *     --file test-artifacts/simulate-johansen.mjs && nice -n 10 node test-artifacts/simulate-johansen.mjs
 * Options: --scale <x> multiplies every replication count (for a quick trial run);
 *          --out <path> writes elsewhere than the committed table;
 *          --rows 1,2,3 regenerates only those n - r and keeps the others from the existing
 *          file. Each n - r has its own seeds, so the result is the same as a full run; the
 *          kept rows are checked against the current settings and the runs are listed.
 *          (The committed table: a full run, then rows 1-6 again with more replications.)
 *
 * Design, and why:
 * - Each (n - r) is simulated in BATCHES independent batches with their own seeds, so the
 *   Monte Carlo error of each tabulated quantile can be measured by batch replication;
 *   the table's quantiles come from all batches pooled.
 * - The random-walk approximation of W with T steps biases the draws by O(1/T) (about
 *   -1% in the trace at n - r = 12 with T = 1000). Every path is also evaluated at T/2
 *   steps (increments merged in pairs) and the quantiles are extrapolated in T
 *   (Richardson) on the log scale: log q = log q_T + r(p), r(p) = log q_T - log q_{T/2}.
 *   The log scale keeps the extrapolated quantiles positive near zero and is the same as
 *   2 q_T - q_{T/2} to first order in 1/T.
 * - r(p) is a smooth, slowly varying function of p, but its raw estimate is noisy in the
 *   far tails (few draws there), enough to make neighbouring extrapolated quantiles cross.
 *   So r is fitted as a quadratic in the normal score z = Φ^{-1}(p) by weighted least
 *   squares over the grid, weights the inverse binomial variances of log q_T(p), and the
 *   fitted r is applied. Each row records the raw and the applied correction at 90/95/99%.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { Matrix, solve } from 'ml-matrix';
import { normalQuantile } from '../../addin/distributions';
import { simulateJohansenDistributions, type JohansenDraws } from '../../addin/johansen/simulate-distribution';
import { JOHANSEN_CASES, MAX_COMMON_TRENDS, type JohansenCase, type JohansenStatisticKind } from '../../addin/johansen/deterministic-case';

const STEPS = 1000;
const BATCHES = 20;
const BASE_SEED = 19_950_000;
/** Seed of batch b (0..19) for n - r = m: distinct for every (m, b), so any batch can be re-run alone. */
const batchSeed = (m: number, b: number) => BASE_SEED + 100 * m + b;

/** Replications per n - r: more where the distribution is relatively wide (small n - r). */
function replicationsFor(m: number): number {
  // sized from a first run so that the 99% point's Monte Carlo error is about 0.35% or less
  const counts = [800_000, 300_000, 200_000, 120_000, 120_000, 100_000];
  return m <= counts.length ? counts[m - 1] : 50_000;
}
const batchSize = (m: number, scale: number) => Math.max(50, Math.round((replicationsFor(m) * scale) / BATCHES));

/** Probability grid (lower-tail probabilities), dense in the upper tail where p-values are read. */
const PROBABILITIES = [
  0.001, 0.005, 0.01, 0.025, 0.05, 0.1, 0.15, 0.2, 0.25, 0.3, 0.35, 0.4, 0.45, 0.5, 0.55, 0.6, 0.65, 0.7, 0.75, 0.8, 0.85,
  0.875, 0.9, 0.91, 0.92, 0.93, 0.94, 0.95, 0.96, 0.97, 0.975, 0.98, 0.985, 0.99, 0.995, 0.9975, 0.999,
];
const LEVELS: Record<string, number> = { '10%': 0.9, '5%': 0.95, '1%': 0.99 };
const KINDS: JohansenStatisticKind[] = ['trace', 'maxEigen'];

/** Sample quantile of sorted draws: linear interpolation between order statistics at (N - 1)p. */
function sampleQuantile(sorted: Float64Array, p: number): number {
  const h = (sorted.length - 1) * p;
  const lo = Math.floor(h);
  const hi = Math.min(lo + 1, sorted.length - 1);
  return sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
}

/**
 * Standard error of a sample quantile by the order-statistic (binomial) method: the number
 * of draws below q_p is Binomial(N, p), so q_p moves by about the spacing of order
 * statistics sqrt(N p (1 - p)) ranks either side; SE = half that spread.
 */
function binomialQuantileError(sorted: Float64Array, p: number): number {
  const n = sorted.length;
  const d = Math.sqrt(n * p * (1 - p));
  const lo = Math.min(n - 2, Math.max(0, Math.round(n * p - d) - 1));
  const hi = Math.min(n - 1, Math.max(lo + 1, Math.round(n * p + d) - 1));
  return (sorted[hi] - sorted[lo]) / 2;
}

/**
 * Quantiles on the grid extrapolated to T = ∞ from the T-step and T/2-step draws of the
 * same paths: q = q_T exp(r̂(p)), r̂ the weighted quadratic fit in Φ^{-1}(p) of the raw
 * log ratios log q_T - log q_{T/2} (see the header). Also returns the raw ratios.
 */
function extrapolatedQuantiles(fine: Float64Array, half: Float64Array): { quantiles: number[]; rawLogRatio: number[] } {
  const qT = PROBABILITIES.map((p) => sampleQuantile(fine, p));
  const raw = PROBABILITIES.map((p, i) => Math.log(qT[i]) - Math.log(sampleQuantile(half, p)));
  const design = new Matrix(PROBABILITIES.map((p) => [1, normalQuantile(p), normalQuantile(p) ** 2]));
  const weights = PROBABILITIES.map((p, i) => (qT[i] / binomialQuantileError(fine, p)) ** 2);
  const weighted = design.clone();
  for (let i = 0; i < weights.length; i++) for (let j = 0; j < 3; j++) weighted.set(i, j, design.get(i, j) * weights[i]);
  const coefficients = solve(weighted.transpose().mmul(design), weighted.transpose().mmul(Matrix.columnVector(raw)));
  const fitted = design.mmul(coefficients).getColumn(0);
  return { quantiles: qT.map((q, i) => q * Math.exp(fitted[i])), rawLogRatio: raw };
}

function concatSorted(parts: Float64Array[]): Float64Array {
  const all = new Float64Array(parts.reduce((s, a) => s + a.length, 0));
  let at = 0;
  for (const a of parts) {
    all.set(a, at);
    at += a.length;
  }
  return all.sort();
}

/** Rounds to significant digits (not decimals: the lower quantiles for n - r = 1 are of order 1e-6). */
const round = (x: number, digits: number) => Number(x.toPrecision(digits));
const mean = (xs: number[]) => xs.reduce((s, v) => s + v, 0) / xs.length;
const sd = (xs: number[]) => Math.sqrt(xs.reduce((s, v) => s + (v - mean(xs)) ** 2, 0) / (xs.length - 1));

interface Row {
  nMinusR: number;
  replications: number;
  quantiles: number[];
  monteCarloStandardError: Record<string, number>;
  binomialStandardErrorAtT: Record<string, number>;
  discretisationCorrection: Record<string, number>;
  rawRichardsonCorrection: Record<string, number>;
}

function tabulate(m: number, scale: number): Record<JohansenCase, Record<JohansenStatisticKind, Row>> {
  const perBatch = batchSize(m, scale);
  const fine: Record<string, Float64Array[]> = {};
  const half: Record<string, Float64Array[]> = {};
  for (let b = 0; b < BATCHES; b++) {
    const sim = simulateJohansenDistributions({ nMinusR: m, steps: STEPS, replications: perBatch, seed: batchSeed(m, b), alsoHalfSteps: true });
    for (const c of JOHANSEN_CASES) {
      for (const k of KINDS) {
        (fine[`${c}/${k}`] ??= []).push((sim.draws[c] as JohansenDraws)[k]);
        (half[`${c}/${k}`] ??= []).push((sim.halfStepDraws![c] as JohansenDraws)[k]);
      }
    }
  }
  const out = {} as Record<JohansenCase, Record<JohansenStatisticKind, Row>>;
  for (const c of JOHANSEN_CASES) {
    out[c] = {} as Record<JohansenStatisticKind, Row>;
    for (const k of KINDS) {
      const f = concatSorted(fine[`${c}/${k}`]);
      const h = concatSorted(half[`${c}/${k}`]);
      const { quantiles, rawLogRatio } = extrapolatedQuantiles(f, h);
      for (let i = 1; i < quantiles.length; i++) {
        if (!(quantiles[i] > quantiles[i - 1])) {
          // reported, not hidden: the p-value interpolation needs strictly increasing quantiles and its tests check them
          process.stderr.write(`WARNING quantiles not increasing: ${c} ${k} n - r = ${m} at p = ${PROBABILITIES[i]}\n`);
        }
      }
      const batchQuantiles = fine[`${c}/${k}`].map((fb, b) => extrapolatedQuantiles(fb, half[`${c}/${k}`][b]).quantiles);
      const mc: Record<string, number> = {};
      const binom: Record<string, number> = {};
      const applied: Record<string, number> = {};
      const rawCorrection: Record<string, number> = {};
      for (const [label, p] of Object.entries(LEVELS)) {
        const i = PROBABILITIES.indexOf(p);
        mc[label] = round(sd(batchQuantiles.map((q) => q[i])) / Math.sqrt(BATCHES), 3);
        binom[label] = round(binomialQuantileError(f, p), 3);
        const qT = sampleQuantile(f, p);
        applied[label] = round(quantiles[i] - qT, 3);
        rawCorrection[label] = round(qT * Math.exp(rawLogRatio[i]) - qT, 3);
      }
      out[c][k] = {
        nMinusR: m,
        replications: f.length,
        quantiles: quantiles.map((q) => round(q, 7)),
        monteCarloStandardError: mc,
        binomialStandardErrorAtT: binom,
        discretisationCorrection: applied,
        rawRichardsonCorrection: rawCorrection,
      };
    }
  }
  return out;
}

interface Run {
  date: string;
  rows: number[];
  seconds: number;
}

/** The existing table, for a partial run: refused unless it was made with the current settings. */
function previousTable(path: string, scale: number, rowsToRun: number[]): { cases: Record<JohansenCase, Record<JohansenStatisticKind, Row[]>>; provenance: { runs: Run[] } } {
  const old = JSON.parse(readFileSync(path, 'utf8'));
  const same =
    old.provenance.steps === STEPS &&
    old.provenance.batches === BATCHES &&
    old.provenance.replicationScale === scale &&
    JSON.stringify(old.probabilities) === JSON.stringify(PROBABILITIES) &&
    String(old.provenance.seed).includes(`SeededRandom(${BASE_SEED} + 100 m + b)`);
  if (!same) throw new Error(`${path} was made with other settings; run all rows`);
  for (const m of Array.from({ length: MAX_COMMON_TRENDS }, (_, i) => i + 1).filter((k) => !rowsToRun.includes(k))) {
    const n = old.cases.none.trace[m - 1].replications;
    if (n !== batchSize(m, scale) * BATCHES) throw new Error(`${path} row n - r = ${m} has ${n} replications, the settings now give ${batchSize(m, scale) * BATCHES}; regenerate it`);
  }
  // a table from before run lists were kept: one full run, its total time recorded as runTimeSeconds
  const runs: Run[] = old.provenance.runs ?? [{ date: old.provenance.date, rows: Array.from({ length: MAX_COMMON_TRENDS }, (_, i) => i + 1), seconds: old.provenance.runTimeSeconds }];
  return { cases: old.cases, provenance: { runs } };
}

function main(): void {
  const argv = process.argv.slice(2);
  const opt = (name: string) => {
    const i = argv.indexOf(name);
    return i >= 0 ? argv[i + 1] : undefined;
  };
  const scale = Number(opt('--scale') ?? '1');
  const outPath = opt('--out') ?? 'addin/tables/johansen-simulated.json';
  const allRows = Array.from({ length: MAX_COMMON_TRENDS }, (_, i) => i + 1);
  const rowsToRun = opt('--rows') ? opt('--rows')!.split(',').map(Number) : allRows;
  const previous = rowsToRun.length < MAX_COMMON_TRENDS ? previousTable(outPath, scale, rowsToRun) : undefined;
  const started = Date.now();
  const byCase: Record<JohansenCase, Record<JohansenStatisticKind, Row[]>> = {} as never;
  for (const c of JOHANSEN_CASES) byCase[c] = { trace: [], maxEigen: [] };
  for (const m of allRows) {
    if (!rowsToRun.includes(m)) {
      for (const c of JOHANSEN_CASES) for (const k of KINDS) byCase[c][k].push(previous!.cases[c][k][m - 1]);
      continue;
    }
    const t0 = Date.now();
    const t = tabulate(m, scale);
    for (const c of JOHANSEN_CASES) for (const k of KINDS) byCase[c][k].push(t[c][k]);
    process.stderr.write(`n - r = ${m}: ${((Date.now() - t0) / 1000).toFixed(1)} s; trace 95% none ${t.none.trace.quantiles[PROBABILITIES.indexOf(0.95)]}\n`);
  }
  const seconds = Math.round((Date.now() - started) / 1000);
  const date = new Date().toISOString().slice(0, 10);
  const runs = [...(previous?.provenance.runs ?? []), { date, rows: rowsToRun, seconds }];
  const table = {
    title: 'Johansen trace and maximum-eigenvalue statistics: simulated quantiles of the asymptotic null distributions, five deterministic cases, n - r = 1..12',
    source:
      "Mooring's own simulation of the limiting Brownian functionals of Johansen, S. (1995), Likelihood-Based Inference in Cointegrated Vector Autoregressive Models, Oxford University Press, ch. 11 and 15. The restricted-constant and restricted-trend cases rest on this simulation alone: the published tables Mooring carries (addin/tables/johansen-critical.json, MacKinnon, Haug & Michelis 1999) cover only the cases none, constant and trend, and are used to check this table there.",
    provenance: {
      method:
        'Q = (∫dW F\')\'(∫FF\' du)^{-1}(∫F dW\'), trace = tr Q, maxEigen = largest eigenvalue of Q, W an (n - r)-dimensional standard Brownian motion approximated by the scaled cumulative sum of T iid N(0, I) steps; F per case as documented in addin/johansen/simulate-distribution.ts (Itô left-point sums for the stochastic terms, midpoint rule for the deterministic ones, correction for unrestricted terms on the moment matrices).',
      steps: STEPS,
      discretisationCorrection: `Each path is evaluated at T = ${STEPS} and at T/2 = ${STEPS / 2} steps (increments merged in pairs); each tabulated quantile is the Richardson extrapolation q_T exp(r(p)), r(p) = log q_T - log q_{T/2}, which removes the O(1/T) random-walk bias; r(p) is smoothed by a weighted least-squares quadratic in the normal score of p (weights: inverse binomial variances of log q_T) because its raw estimate is noisy in the far tails. Each row gives, at 90/95/99%, discretisationCorrection = tabulated minus T-step quantile, and rawRichardsonCorrection = the same with the unsmoothed r.`,
      replications: Object.fromEntries(Array.from({ length: MAX_COMMON_TRENDS }, (_, i) => [String(i + 1), byCase.none.trace[i].replications])),
      replicationScale: scale,
      batches: BATCHES,
      seed: `batch b = 0..${BATCHES - 1} of n - r = m uses SeededRandom(${BASE_SEED} + 100 m + b) from addin/random.ts; all five cases share each batch's paths`,
      quantileEstimator: 'Sample quantile with linear interpolation between order statistics at (N - 1)p, from all batches pooled, at T and at T/2, then extrapolated.',
      monteCarloStandardError: `monteCarloStandardError: standard deviation of the ${BATCHES} batch estimates of the extrapolated quantile (each batch extrapolated and smoothed on its own) divided by sqrt(${BATCHES}) (batch replication). binomialStandardErrorAtT: order-statistic (binomial) standard error of the pooled T-step quantile, for comparison.`,
      generator: 'tests/tables/simulate-johansen.ts',
      command:
        'npx rolldown tests/tables/simulate-johansen.ts --platform node --format esm --file test-artifacts/simulate-johansen.mjs && nice -n 10 node test-artifacts/simulate-johansen.mjs',
      date,
      runs,
      runNote: 'runs: wall-clock seconds of each generator run and the rows it produced (a later run replaces the rows it lists), on a 2-core machine shared with other work (one process at nice 10), so the times overstate the CPU needed.',
      node: process.version,
    },
    layout:
      "cases[case][kind] is a list of 12 rows, row k for nMinusR = k. case is one of 'none', 'restricted-constant', 'constant', 'restricted-trend', 'trend' (Johansen's cases 1..5); kind is 'trace' or 'maxEigen'. quantiles[i] is the quantile at lower-tail probability probabilities[i]; the critical value for a test at level a is the quantile at 1 - a; reject when the statistic exceeds it. Standard errors and corrections are keyed by test level: '10%', '5%', '1%' (the 90%, 95%, 99% quantiles).",
    probabilities: PROBABILITIES,
    cases: byCase,
  };
  // one line per numeric array keeps the file readable and small
  const text = JSON.stringify(table, null, 1)
    .replace(/\[\s*(-?[\d.e+-]+(?:,\s*-?[\d.e+-]+)*)\s*\]/g, (_, body: string) => `[${body.split(/,\s*/).join(', ')}]`)
    .replace(/\{\s*((?:"[^"]+": -?[\d.e+-]+,?\s*)+)\}/g, (_, body: string) => `{ ${body.trim().split(/,\s*/).join(', ')} }`);
  writeFileSync(outPath, text + '\n');
  process.stderr.write(`wrote ${outPath} in ${seconds} s\n`);
}

main();
