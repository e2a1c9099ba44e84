/**
 * Size of the Gregory-Hansen test at the quoted 5% points when the ADF lag is chosen by AIC
 * once (on the residual without the shift, the default) or afresh at each candidate date:
 * y and x independent Gaussian random walks, models C and C/T, T = 150 and 400. The figures
 * behind the default lag timing (addin/breaks/gregory-hansen-search.ts) and known issue 9 in
 * addin/tables/README.md.
 *
 * Run (one process, low priority; several minutes on one core):
 *   npx rolldown tests/breaks/simulate-gregory-hansen-size.ts --platform node --format esm \
 *     --file test-artifacts/simulate-gregory-hansen-size.mjs && nice -n 10 node test-artifacts/simulate-gregory-hansen-size.mjs
 * Options: --reps <n> (default 1000). Seed 9000 + T for each (T, timing, model) run.
 */
import { gregoryHansenTest } from '../../addin/breaks/gregory-hansen';
import { SeededRandom, randomWalk } from '../../addin/random';

const at = process.argv.indexOf('--reps');
const reps = at > 0 ? Number(process.argv[at + 1]) : 1000;
for (const T of [150, 400]) {
  for (const lagTiming of ['once', 'each-date'] as const) {
    for (const model of ['level', 'level-trend'] as const) {
      const rng = new SeededRandom(9000 + T);
      let rejected = 0;
      for (let r = 0; r < reps; r++) {
        const y = randomWalk(rng, T);
        const x = randomWalk(rng, T);
        const res = gregoryHansenTest(y, [x], { model, lagTiming });
        if (res.statistic < res.critical['5%']) rejected++;
      }
      process.stdout.write(`T ${T}, lags by AIC ${lagTiming}, ${model}: rejects at 5% in ${((100 * rejected) / reps).toFixed(1)}% of ${reps}\n`);
    }
  }
}
