import { describe, expect, it } from 'vitest';
import { CHUNK_STATES_AT, CHUNK_TAKEN, batchChunks, batchRecords, drainBatch, finishedChunks, screenJob, startBatch, threadScratch } from '../../addin/screen/chunk-queue';
import { RECORD_SIZE } from '../../addin/screen/pair-record';
import { chunkRanges, screenChunk } from '../../addin/screen/screen-chunk';
import { finishScreen, screenPairs } from '../../addin/screen/screen-pairs';
import { resolveScreenOptions } from '../../addin/screen/screen-options';
import { screenUniverse, unorderedPairAt, unorderedPairCount } from '../../addin/screen/screen-universe';
import { withSeriesOrders } from '../../addin/screen/series-orders';
import { SeededRandom, autoregressive1 } from '../../addin/random';
import { generatedUniverse } from './generated-universe';

/**
 * The chunk function is what every thread runs, so splitting the pairs differently must give
 * the same bits. Checked here in one thread; the worker pool itself is checked against the
 * built bundle in screen-threads.test.ts.
 */
// An AR(1) series (coefficient 0.5, unit shocks, seed 31) joins the generated ones, so some pairs are set aside.
const { series: generated } = generatedUniverse(31, { clusters: 2, perCluster: 3, walks: 4, T: 250 });
const series = [...generated, { name: 'settles', values: autoregressive1(new SeededRandom(31), 250, 0.5, 1).map((v) => 50 + v) }];
const settings = resolveScreenOptions({ johansen: true });
const universe = withSeriesOrders(screenUniverse(series), settings);
const total = unorderedPairCount(series.length);
const whole = screenChunk(universe, settings, 0, total);

describe('the pure chunk function', () => {
  it('numbers the unordered pairs (0,1), (0,2), ..., (1,2), ... for any N', () => {
    for (const N of [2, 3, 7, 10]) {
      const expected: [number, number][] = [];
      for (let i = 0; i < N; i++) for (let j = i + 1; j < N; j++) expected.push([i, j]);
      expect(expected.map((_, k) => unorderedPairAt(k, N))).toEqual(expected);
    }
  });

  it.each([1, 2, 3, 7, 45])('gives bit-identical records when the %i-way split is run chunk by chunk', (pieces) => {
    const parts = chunkRanges(total, pieces).map(([first, end]) => screenChunk(universe, settings, first, end));
    const joined = new Float64Array(whole.length);
    let at = 0;
    for (const part of parts) {
      joined.set(part, at);
      at += part.length;
    }
    expect(at).toBe(whole.length);
    expect(Buffer.from(joined.buffer).equals(Buffer.from(whole.buffer))).toBe(true);
  });

  it('runs a chunk the same whether it comes first or last (no state carried between pairs)', () => {
    const lastFirst = screenChunk(universe, settings, total - 5, total);
    expect(Array.from(lastFirst)).toEqual(Array.from(whole.subarray(2 * (total - 5) * RECORD_SIZE)));
  });

  it('splits the pairs into contiguous ranges that cover them once', () => {
    const ranges = chunkRanges(100, 7);
    expect(ranges[0][0]).toBe(0);
    expect(ranges[ranges.length - 1][1]).toBe(100);
    ranges.slice(1).forEach(([first], k) => expect(first).toBe(ranges[k][1]));
    expect(chunkRanges(3, 10)).toHaveLength(3);
  });

  it('refuses a range outside the pairs', () => {
    expect(() => screenChunk(universe, settings, 0, total + 1)).toThrow(RangeError);
  });
});

describe('the shared chunk queue, drained on this thread', () => {
  it('the universe carries one order per series, and the settling series is set aside', () => {
    expect(universe.orders?.map((o) => o.order)).toEqual([...generated.map(() => 1), 0]);
  });

  it('one batch drained on this thread fills the shared buffer with the same records as one chunk, and its result equals screenPairs', () => {
    const job = screenJob(universe, settings, 3, total);
    const batch = startBatch(job, 0, total);
    expect(drainBatch(job, batch, threadScratch(job))).toBe(batchChunks(job));
    expect(finishedChunks(job)).toBe(batchChunks(job));
    expect(Array.from(batchRecords(job))).toEqual(Array.from(whole));
    const result = finishScreen(universe, settings, Float64Array.from(batchRecords(job)));
    expect(result).toEqual(screenPairs(series, { johansen: true }));
    expect(result.setAside).toHaveLength(2 * generated.length);
  });

  it('batches of 7 pairs through one reused buffer give the same records in order', () => {
    const job = screenJob(universe, settings, 2, 7);
    const scratch = threadScratch(job);
    const joined: number[] = [];
    for (let from = 0; from < total; from += 7) {
      const batch = startBatch(job, from, Math.min(total, from + 7));
      drainBatch(job, batch, scratch);
      joined.push(...batchRecords(job));
    }
    expect(joined).toEqual(Array.from(whole));
  });

  it('finishing needs the orders the records were made with', () => {
    expect(() => finishScreen(screenUniverse(series), settings, whole)).toThrow(/carries no orders/);
  });

  it('a second drain finds nothing left; a retake reruns taken-but-unfinished chunks with the same numbers; a late thread of an old batch writes nothing', () => {
    const job = screenJob(universe, settings, 2, total);
    const scratch = threadScratch(job);
    const batch = startBatch(job, 0, total);
    drainBatch(job, batch, scratch);
    expect(drainBatch(job, batch, scratch)).toBe(0);
    // As if a thread had taken chunk 0 and died before finishing it: taken, not counted, records lost.
    const control = new Int32Array(job.control);
    Atomics.store(control, CHUNK_STATES_AT, 4 * batch + CHUNK_TAKEN);
    Atomics.sub(control, 1, 1);
    const size = 2 * total * RECORD_SIZE;
    new Float64Array(job.results).fill(0, 0, 2 * RECORD_SIZE);
    expect(drainBatch(job, batch, scratch)).toBe(0);
    expect(drainBatch(job, batch, scratch, true)).toBe(1);
    expect(Array.from(batchRecords(job))).toEqual(Array.from(whole));
    expect(finishedChunks(job)).toBe(batchChunks(job));
    // The next batch opens in the same buffer: a thread still holding batch 1 finds every state changed.
    const next = startBatch(job, 0, total);
    new Float64Array(job.results).fill(0, 0, size);
    expect(drainBatch(job, batch, scratch, true)).toBe(0);
    expect(new Float64Array(job.results).every((v) => v === 0)).toBe(true);
    expect(drainBatch(job, next, scratch)).toBe(batchChunks(job));
    expect(Array.from(batchRecords(job))).toEqual(Array.from(whole));
  });
});
