import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { SeededRandom, autoregressive1 } from '../../addin/random';
import { withSeriesOrdersInThreads, screenPairsInThreads } from '../../addin/screen/parallel-node';
import { screenPairs } from '../../addin/screen/screen-pairs';
import { resolveScreenOptions } from '../../addin/screen/screen-options';
import { screenUniverse } from '../../addin/screen/screen-universe';
import { withSeriesOrders } from '../../addin/screen/series-orders';
import { generatedUniverse } from './generated-universe';

/**
 * The orders of integration decided on pooled worker threads (orders-queue.ts) against one
 * thread, with the built worker (dist/cli/screen-worker.js, as screen-threads.test.ts explains).
 * 50 series of 2,000 rows are 100,000 series-rows, enough for a second thread; among them a
 * series that settles (an AR(1) with coefficient 0.5, seed 48) and one that never moves, whose
 * reason in words the main thread supplies.
 */
const WORKER = join(fileURLToPath(new URL('../../dist/cli/', import.meta.url)), 'screen-worker.js');
const { series } = generatedUniverse(47, { clusters: 8, perCluster: 3, walks: 24, T: 2000 });
const settles = { name: 'settles', values: autoregressive1(new SeededRandom(48), 2000, 0.5, 1).map((v) => 50 + v) };
const flat = { name: 'flat', values: new Float64Array(2000).fill(7) };
const all = [...series, settles, flat];

describe('orders of integration on worker threads', () => {
  it('are the orders one thread decides, series by series, reasons included', () => {
    const settings = resolveScreenOptions({});
    const one = withSeriesOrders(screenUniverse(all), settings).orders!;
    const two = withSeriesOrdersInThreads(screenUniverse(all), settings, { threads: 2, workerFile: WORKER }).orders!;
    expect(two).toEqual(one);
    expect(one.find((o) => o.name === 'flat')!.note).toMatch(/does not move/);
    expect(one.find((o) => o.name === 'settles')!.order).toBe(0);
  });

  it('and a whole screen on the pooled workers, run twice, equals the one-thread screen both times', () => {
    const few = all.slice(0, 12).concat([settles, flat]).map((s) => ({ name: s.name, values: s.values.subarray(0, 600) }));
    const single = screenPairs(few);
    for (let run = 0; run < 2; run++) {
      const { result, report } = screenPairsInThreads(few, {}, { threads: 2, workerFile: WORKER, workPerThread: 1 });
      expect(report.workersStarted).toBe(1);
      expect(result).toEqual(single);
    }
  });
});
