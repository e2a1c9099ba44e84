/**
 * Plausibility check of the Gregory-Hansen critical values quoted from memory
 * (addin/tables/gregory-hansen-critical.json): simulates ADF* under the null (y and m
 * regressors independent Gaussian random walks, no lags, the true order for this design)
 * with our own implementation and prints its 1, 2.5, 5 and 10% quantiles beside the table.
 * Finite T, so the simulated points differ from the asymptotic ones by sampling error
 * (about 0.03-0.05 at 2,000 replications) and a small-sample bias.
 *
 * Run (one process, low priority; a few minutes on one core):
 *   npx rolldown tests/breaks/simulate-gregory-hansen.ts --platform node --format esm \
 *     --file test-artifacts/simulate-gregory-hansen.mjs && nice -n 10 node test-artifacts/simulate-gregory-hansen.mjs
 * Options: --reps <n> (default 2000), --T <n> (default 400), --seed <n> (default 4242).
 */
import { gregoryHansenTest } from '../../addin/breaks/gregory-hansen';
import { SeededRandom, randomWalk } from '../../addin/random';
import { GREGORY_HANSEN_MODELS, gregoryHansenCritical } from '../../addin/tables/gregory-hansen-table';

function option(name: string, fallback: number): number {
  const i = process.argv.indexOf(`--${name}`);
  return i > 0 ? Number(process.argv[i + 1]) : fallback;
}

const reps = option('reps', 2000);
const T = option('T', 400);
const seed = option('seed', 4242);
const levels = [0.01, 0.025, 0.05, 0.1];
const rows: string[] = [];
for (let m = 1; m <= 4; m++) {
  for (const [k, model] of GREGORY_HANSEN_MODELS.entries()) {
    const rng = new SeededRandom(seed + 10 * m + k);
    const stats: number[] = [];
    for (let r = 0; r < reps; r++) {
      const y = randomWalk(rng, T);
      const xs = Array.from({ length: m }, () => randomWalk(rng, T));
      stats.push(gregoryHansenTest(y, xs, { model, lags: 0 }).statistic);
    }
    stats.sort((a, b) => a - b);
    const simulated = levels.map((p) => stats[Math.floor(p * reps)].toFixed(2));
    const table = gregoryHansenCritical(model, m);
    const quoted = table ? [table['1%'], table['2.5%'], table['5%'], table['10%']].map((v) => v.toFixed(2)) : [];
    rows.push(`m=${m} ${model.padEnd(11)} simulated ${simulated.join(' ')}   table ${quoted.join(' ')}`);
    process.stdout.write(`${rows[rows.length - 1]}\n`);
  }
}
process.stdout.write(`reps ${reps}, T ${T}, seed ${seed} (+ 10 m + model index), lags 0\n`);
