/**
 * The pair screen at universe sizes where memory, not speed, used to decide (measured here,
 * never in a test): the built command line (dist/cli/mooring.js) run as a child process on
 * seeded CSVs, its peak resident memory (all threads) read by the child itself at exit and its
 * wall time measured here.
 *
 * - 1,000 series x 500 rows (999,000 directed pairs), `screen --top 5`: target 600 MB.
 * - 2,000 series x 300 rows (3,998,000 directed pairs), `screen --top 5`: target 1,500 MB.
 * - 2,000 series x 300 rows, `screen --format csv` to a file: every pair streamed, same target.
 * - The same 2,000 series in 4 parts run one after the other, then `mooring merge`: the
 *   largest part's and the merge's peak.
 *
 * These take minutes on a 2-core machine: MOORING_BENCH_SKIP_SCALE=1 leaves them out (the
 * entry then says so). The universes are benchUniverse's (screen-bench.ts).
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { benchUniverse } from './screen-bench';
import type { Timing } from './timing';

/** A scale run's figures. */
export interface ScaleTiming extends Timing {
  peakRssMb?: number;
  targetPeakRssMb?: number;
  exitCode?: number | null;
  outputMb?: number;
  skipped?: string;
}

/** Reports the child's peak resident set at exit, on stderr, on a line of its own. */
const PEAK_HOOK = 'data:text/javascript,process.on("exit",()=>process.stderr.write("\\npeak-rss-kb "+process.resourceUsage().maxRSS+"\\n"))';

function writeUniverseCsv(path: string, n: number, T: number, seed: number): void {
  const series = benchUniverse(n, T, Math.floor(n / 30), seed);
  const lines = [['Date', ...series.map((s) => s.name)].join(',')];
  for (let t = 0; t < T; t++) {
    const day = new Date(Date.UTC(2020, 0, 1 + t)).toISOString().slice(0, 10);
    lines.push([day, ...series.map((s) => s.values[t].toFixed(4))].join(','));
  }
  writeFileSync(path, `${lines.join('\n')}\n`);
}

function runCli(cli: string, args: string[], name: string, targetMb: number): ScaleTiming {
  const start = performance.now();
  const r = spawnSync(process.execPath, ['--import', PEAK_HOOK, cli, ...args], {
    encoding: 'utf8', maxBuffer: 1 << 26, stdio: ['ignore', 'pipe', 'pipe'],
  });
  const ms = Math.round(performance.now() - start);
  const peak = /peak-rss-kb (\d+)/.exec(r.stderr ?? '');
  const peakRssMb = peak ? Math.round(Number(peak[1]) / 1024) : undefined;
  return {
    name, medianMs: ms, minMs: ms, runs: 1, exitCode: r.status, peakRssMb, targetPeakRssMb: targetMb,
    withinTarget: r.status === 0 && peakRssMb !== undefined && peakRssMb <= targetMb,
    ...(r.status !== 0 ? { skipped: (r.stderr ?? '').trim().split('\n').slice(0, 2).join(' ') } : {}),
  };
}

/** The scale runs (see the file comment). */
export function benchScreenScale(): ScaleTiming[] {
  if (process.env.MOORING_BENCH_SKIP_SCALE === '1') {
    return [{ name: 'Pair screen at 1,000 and 2,000 series (skipped: MOORING_BENCH_SKIP_SCALE=1)', medianMs: 0, minMs: 0, runs: 0, skipped: 'MOORING_BENCH_SKIP_SCALE=1' }];
  }
  const cli = join(process.cwd(), 'dist', 'cli', 'mooring.js');
  if (!existsSync(cli)) return [{ name: 'Pair screen at scale (skipped)', medianMs: 0, minMs: 0, runs: 0, skipped: 'dist/cli/mooring.js is not built (npm run build:cli)' }];
  const dir = mkdtempSync(join(tmpdir(), 'mooring-scale-bench-'));
  try {
    const out: ScaleTiming[] = [];
    const thousand = join(dir, 'u1000x500.csv');
    writeUniverseCsv(thousand, 1000, 500, 1000);
    out.push(runCli(cli, ['screen', thousand, '--top', '5'], 'screen --top 5, 1,000 series x 500 rows (999,000 directed pairs), every core', 600));
    const twoThousand = join(dir, 'u2000x300.csv');
    writeUniverseCsv(twoThousand, 2000, 300, 2000);
    out.push(runCli(cli, ['screen', twoThousand, '--top', '5'], 'screen --top 5, 2,000 series x 300 rows (3,998,000 directed pairs), every core', 1500));
    const csv = join(dir, 'every-pair.csv');
    const streamStart = performance.now();
    const streamed = spawnSync('sh', ['-c', `"${process.execPath}" --import '${PEAK_HOOK}' "${cli}" screen "${twoThousand}" --format csv > "${csv}"`], { encoding: 'utf8', maxBuffer: 1 << 26 });
    const streamMs = Math.round(performance.now() - streamStart);
    const peak = /peak-rss-kb (\d+)/.exec(streamed.stderr ?? '');
    out.push({
      name: 'screen --format csv > file, 2,000 series x 300 rows: every directed pair streamed', medianMs: streamMs, minMs: streamMs, runs: 1, exitCode: streamed.status,
      peakRssMb: peak ? Math.round(Number(peak[1]) / 1024) : undefined, targetPeakRssMb: 1500,
      outputMb: existsSync(csv) ? Math.round(statSync(csv).size / 2 ** 20) : undefined,
      withinTarget: streamed.status === 0 && peak !== null && Number(peak[1]) / 1024 <= 1500,
    });
    rmSync(csv, { force: true });
    const parts = [1, 2, 3, 4].map((k) => runCli(cli, ['screen', twoThousand, '--part', `${k}/4`, '--out', join(dir, `part-${k}.bin`)], `screen --part ${k}/4, 2,000 series x 300 rows`, 1500));
    const slowest = parts.reduce((a, b) => (a.medianMs >= b.medianMs ? a : b));
    const biggest = parts.reduce((top, p) => Math.max(top, p.peakRssMb ?? 0), 0);
    out.push({ ...slowest, name: 'screen --part k/4 (the slowest of 4 parts, run one after another; peak of the largest)', peakRssMb: biggest, withinTarget: parts.every((p) => p.withinTarget) });
    out.push(runCli(cli, ['merge', ...[1, 2, 3, 4].map((k) => join(dir, `part-${k}.bin`)), '--top', '5'], 'merge of the 4 parts, --top 5', 1500));
    return out;
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
