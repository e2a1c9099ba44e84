/**
 * The million-row part of the benchmark (MOORING_BENCH_LARGE=1 npm run bench; several minutes):
 * the built command line run as a child process on a seeded 1,000,000-row pair
 * (large-pair-csv.ts, written to test-artifacts/), with its wall time and peak resident memory
 * (read by the child at exit). Targets on a 2-core machine: order 5 s, granger 10 s, report on
 * the two series 60 s, each under 1 GB; rolling over 250-row windows must finish (no target).
 */
import { spawnSync } from 'node:child_process';
import { closeSync, existsSync, mkdirSync, openSync } from 'node:fs';
import { join } from 'node:path';
import type { Timing } from '../../addin/bench/timing';
import { writeLargePairCsv } from './large-pair-csv';

const PEAK_HOOK = 'data:text/javascript,process.on("exit",()=>process.stderr.write("\\npeak-rss-kb "+process.resourceUsage().maxRSS+"\\n"))';

export interface LargeTiming extends Timing {
  exitCode: number | null;
  peakRssMb?: number;
  targetPeakRssMb?: number;
  error?: string;
}

function runCli(cli: string, args: string[], name: string, targetMs?: number, targetMb?: number): LargeTiming {
  // The answer goes to a file, not a pipe: a million-row report's JSON passes any pipe buffer
  // spawnSync would hold (the child was killed at 256 MB before, with no exit code).
  const answer = openSync(join(process.cwd(), 'test-artifacts', 'bench-large-answer.json'), 'w');
  const start = performance.now();
  const r = spawnSync(process.execPath, ['--import', PEAK_HOOK, cli, ...args], { encoding: 'utf8', maxBuffer: 1 << 24, stdio: ['ignore', answer, 'pipe'] });
  const ms = Math.round(performance.now() - start);
  closeSync(answer);
  const peak = /peak-rss-kb (\d+)/.exec(r.stderr ?? '');
  const peakRssMb = peak ? Math.round(Number(peak[1]) / 1024) : undefined;
  const out: LargeTiming = { name, medianMs: ms, minMs: ms, runs: 1, exitCode: r.status, peakRssMb };
  if (targetMs !== undefined) out.targetMs = targetMs;
  if (targetMb !== undefined) out.targetPeakRssMb = targetMb;
  out.withinTarget = r.status === 0 && (targetMs === undefined || ms <= targetMs) && (targetMb === undefined || (peakRssMb !== undefined && peakRssMb <= targetMb));
  if (r.status !== 0) out.error = r.error ? String(r.error) : (r.stderr ?? '').trim().split('\n').slice(0, 2).join(' ');
  return out;
}

/** The million-row runs, or [] unless MOORING_BENCH_LARGE=1. */
export async function benchLargeSeries(): Promise<LargeTiming[]> {
  if (process.env.MOORING_BENCH_LARGE !== '1') return [];
  const cli = join(process.cwd(), 'dist', 'cli', 'mooring.js');
  if (!existsSync(cli)) return [{ name: 'million-row runs', medianMs: 0, minMs: 0, runs: 0, exitCode: null, error: 'dist/cli/mooring.js is missing: npm run build:cli' }];
  mkdirSync(join(process.cwd(), 'test-artifacts'), { recursive: true });
  const csv = join(process.cwd(), 'test-artifacts', 'bench-pair-1000000.csv');
  if (!existsSync(csv)) await writeLargePairCsv(csv, 1_000_000);
  return [
    runCli(cli, ['order', csv, '--series', 'Anchor', '--json'], 'order, 1,000,000 rows (command line)', 5_000, 1_024),
    runCli(cli, ['granger', csv, '--cause', 'Anchor', '--effect', 'Follower', '--json'], 'granger, 1,000,000 rows (command line)', 10_000, 1_024),
    runCli(cli, ['report', csv, '--json'], 'report on two series, 1,000,000 rows (command line)', 60_000, 1_024),
    runCli(cli, ['rolling', csv, '--y', 'Follower', '--x', 'Anchor', '--window', '250', '--json'], 'rolling, 250-row windows, 1,000,000 rows (command line; must finish)'),
  ];
}
