import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { MooringInputError } from '../../addin/errors';
import { screenPairsInThreads } from '../../addin/screen/parallel-node';
import { screenPairs } from '../../addin/screen/screen-pairs';
import { SeededRandom, autoregressive1 } from '../../addin/random';
import { generatedUniverse } from './generated-universe';

/**
 * The worker-thread pool against the built bundle. A worker runs compiled JavaScript, and
 * vitest hands Node TypeScript it cannot start as a thread, so these tests point the pool at
 * the worker chunk webpack builds beside the command line (dist/cli/screen-worker.js; `npm test`
 * builds before vitest). The pure chunk function is checked for bit-identity on one thread in
 * screen-chunks.test.ts; here the same numbers must come back from real threads.
 */
const DIST_CLI = fileURLToPath(new URL('../../dist/cli/', import.meta.url));
const WORKER = join(DIST_CLI, 'screen-worker.js');
const { series } = generatedUniverse(41, { clusters: 3, perCluster: 3, walks: 9, T: 300 }); // 18 series, 153 pairs: room for 3 threads
const single = screenPairs(series, { johansen: true });

describe('screen on worker threads (built worker dist/cli/screen-worker.js)', () => {
  it('with the work left to one worker: the same result as on one thread, and the worker ran every chunk', () => {
    const { result, report } = screenPairsInThreads(series, { johansen: true }, { threads: 2, workerFile: WORKER, mainThreadJoins: false, workPerThread: 1 });
    expect(report.workersStarted).toBe(1);
    expect(report.chunksOnMainThread).toBe(0);
    expect(report.note).toBeUndefined();
    expect(result).toEqual(single);
  });

  it('with 3 threads sharing the queue, the main one included: the same result', () => {
    const { result, report } = screenPairsInThreads(series, { johansen: true }, { threads: 3, workerFile: WORKER, workPerThread: 1 });
    expect(report.threads).toBe(3);
    expect(report.workersStarted).toBe(2);
    expect(result).toEqual(single);
  });

  it('in batches of 10 pairs through one shared buffer (16 batches), the workers alone: the same result', () => {
    const { result, report } = screenPairsInThreads(series, { johansen: true }, { threads: 3, workerFile: WORKER, workPerThread: 1, batchPairs: 10, mainThreadJoins: false });
    expect(report.batches).toBe(16);
    expect(report.chunksOnMainThread).toBe(0);
    expect(result).toEqual(single);
  });

  it('when a worker cannot start, the main thread runs its chunks: still the same result, with a note', () => {
    const { result, report } = screenPairsInThreads(series, { johansen: true }, { threads: 2, workerFile: join(DIST_CLI, 'no-such-worker.js'), workPerThread: 1 });
    expect(result).toEqual(single);
    expect(report.chunksOnMainThread).toBe(report.chunks);
    expect(report.note).toBeDefined();
  });

  it('with a series that settles (an AR(1), coefficient 0.5, seed 42): its pairs are set aside on the threads as on one thread', () => {
    const settled = [...series, { name: 'settles', values: autoregressive1(new SeededRandom(42), 300, 0.5, 1).map((v) => 20 + v) }];
    const { result, report } = screenPairsInThreads(settled, {}, { threads: 3, workerFile: WORKER, workPerThread: 1 });
    expect(report.workersStarted).toBe(2);
    expect(result.setAside).toHaveLength(2 * series.length);
    expect(result).toEqual(screenPairs(settled));
  });

  it('uses no more threads than the work keeps busy (pairs x rows per thread), and says so', () => {
    const small = screenPairsInThreads(series.slice(0, 4), {}, { threads: 8, workerFile: WORKER });
    expect(small.report.threads).toBe(1);
    expect(small.report.note).toBe('8 threads were asked for; 6 pairs of 300 rows keep 1 busy.');
    expect(small.result).toEqual(screenPairs(series.slice(0, 4)));
    // 153 pairs x 300 rows = 45,900: at 20,000 per thread, 3 threads.
    expect(screenPairsInThreads(series, {}, { threads: 8, workerFile: WORKER, workPerThread: 20_000 }).report.threads).toBe(3);
  });

  it('refuses a thread count that is not a whole number from 1 to 64', () => {
    expect(() => screenPairsInThreads(series, {}, { threads: 0 })).toThrow(MooringInputError);
    expect(() => screenPairsInThreads(series, {}, { threads: 1.5 })).toThrow(/whole number from 1 to 64/);
  });
});

describe('mooring screen in the built bundle: --threads 2 answers as --threads 1', () => {
  it('prints the same JSON apart from the thread report (46 series x 2,000 rows: 1,035 pairs, enough work for 2 threads)', () => {
    const { series: wide } = generatedUniverse(43, { clusters: 4, perCluster: 3, walks: 34, T: 2000 });
    const dir = mkdtempSync(join(tmpdir(), 'mooring-screen-'));
    const file = join(dir, 'prices.csv');
    const lines = [wide.map((s) => s.name).join(',')];
    for (let t = 0; t < 2000; t++) lines.push(wide.map((s) => s.values[t].toFixed(6)).join(','));
    writeFileSync(file, `${lines.join('\n')}\n`);
    const run = (threads: number) => {
      const out = spawnSync(process.execPath, [join(DIST_CLI, 'mooring.js'), 'screen', file, '--json', '--top', '5000', '--threads', String(threads)], { encoding: 'utf8', maxBuffer: 1 << 28 });
      expect(out.status, out.stderr).toBe(0);
      return JSON.parse(out.stdout) as Record<string, unknown> & { threads: { threads: number } };
    };
    const one = run(1);
    const two = run(2);
    expect(one.threads.threads).toBe(1);
    expect(two.threads.threads).toBe(2);
    const { threads: _a, ...restOne } = one;
    const { threads: _b, ...restTwo } = two;
    expect(restTwo).toEqual(restOne);
    // Every directed pair is ranked or set aside (a walk the unit-root tests call settled takes its pairs out of the ranking).
    expect((restOne.pairs as unknown[]).length).toBe(restOne.rankedCount);
    expect((restOne.pairs as unknown[]).length + (restOne.setAsideCount as number)).toBe(46 * 45);
    expect((restOne.pairs as unknown[]).length).toBeGreaterThan(0.8 * 46 * 45);
  });
});
