/**
 * A seeded pair of long price series written as a CSV, for the million-row part of the
 * benchmark (MOORING_BENCH_LARGE=1) and for profiling the command line on it. Invented data,
 * from our own generator: a random walk with drift and a second price tied to it by a fixed
 * ratio plus a persistent AR(1) gap. No date column (a million daily dates would run past
 * the calendar years the date reader accepts); rows are in time order.
 *
 *   node test-artifacts/large-pair-csv.mjs [rows] [file]   (after rolldown, see run-large-bench.ts)
 */
import { createWriteStream } from 'node:fs';
import { SeededRandom, autoregressive1, randomWalk } from '../../addin/random';

/** Writes `rows` rows of two columns, Anchor and Follower, to `file`; resolves when flushed. */
export function writeLargePairCsv(file: string, rows: number, seed = 1_000_003): Promise<void> {
  const rng = new SeededRandom(seed);
  const anchor = randomWalk(rng, rows, { start: 5000, drift: 0.001, sigma: 0.5 });
  const gap = autoregressive1(rng, rows, 0.97, 0.4);
  const out = createWriteStream(file);
  return new Promise((resolve, reject) => {
    out.on('error', reject);
    out.on('finish', () => resolve());
    let chunk = 'Anchor,Follower\n';
    for (let t = 0; t < rows; t++) {
      chunk += `${anchor[t].toFixed(4)},${(0.8 * anchor[t] + 20 + gap[t]).toFixed(4)}\n`;
      if (chunk.length > 1 << 16) {
        out.write(chunk);
        chunk = '';
      }
    }
    out.end(chunk);
  });
}

const invokedDirectly = typeof process !== 'undefined' && process.argv[1]?.endsWith('large-pair-csv.mjs');
if (invokedDirectly) {
  const rows = Number(process.argv[2] ?? 1_000_000);
  const file = process.argv[3] ?? 'test-artifacts/large-pair.csv';
  void writeLargePairCsv(file, rows).then(() => process.stdout.write(`${file}: ${rows} rows\n`));
}
