/**
 * Shared bookkeeping for screening on several threads at once, one batch of unordered pairs at
 * a time. A batch is cut into chunks; each thread, the main one included, takes the next
 * waiting chunk by an atomic compare-and-swap, runs the pure chunk function into a buffer of
 * its own, and copies the records into the batch's slice of one shared buffer, so a fast
 * thread simply takes more chunks. The main thread hands the finished batch on (to the tally,
 * to a file) and starts the next in the same buffer: memory is one batch, whatever the number
 * of pairs. Where a chunk runs cannot change its numbers: each pair's records depend only on
 * its two series and the settings.
 *
 * Each chunk's state carries the batch's number (state = 4 x batch + code), so a thread still
 * busy with a chunk of an earlier batch, or with a chunk another thread has since run again,
 * finds the state changed and drops its copy instead of writing over newer records.
 *
 * Plain JavaScript (SharedArrayBuffer and Atomics): no Node or browser import, so a Web
 * Worker can use it as the Node worker threads do.
 */
import { RECORD_SIZE } from './pair-record';
import { PairWorkspace } from './pair-relation';
import { screenChunkInto } from './screen-chunk';
import type { ScreenSettings } from './screen-options';
import type { ScreenUniverse } from './screen-universe';

/** Chunk state code: no thread has taken it. */
export const CHUNK_WAITING = 0;
/** Chunk state code: a thread is running it. */
export const CHUNK_TAKEN = 1;
/** Chunk state code: a thread is copying its records into the shared buffer. */
export const CHUNK_WRITING = 2;
/** Chunk state code: its records are in the shared buffer. */
export const CHUNK_DONE = 3;

/** control[BATCH]: the number of the batch under way (0 before the first, -1 to stop). */
const BATCH = 0;
/** control[FINISHED]: chunks of the batch finished. */
const FINISHED = 1;
/** control[CHUNK_STATES_AT + c]: state of chunk c. */
export const CHUNK_STATES_AT = 2;
const STATES = CHUNK_STATES_AT;

/** Most bytes of records in one batch (16 MB: about 80,000 unordered pairs). */
export const BATCH_BYTES = 16 * 2 ** 20;

/** Everything a thread needs, as structured-clonable data (the buffers are shared, not copied). */
export interface ScreenJob {
  universe: ScreenUniverse;
  settings: ScreenSettings;
  /** Chunks a full batch is cut into. */
  chunksPerBatch: number;
  /** Most unordered pairs in one batch. */
  batchPairs: number;
  /** Records of the batch under way: 2 x batchPairs x RECORD_SIZE float64 values. */
  results: SharedArrayBuffer;
  /** Int32: the batch number, the finished count, one state per chunk. */
  control: SharedArrayBuffer;
  /** Float64: [first, end) of the batch under way, in unordered pairs. */
  range: SharedArrayBuffer;
}

/** A job for `threads` threads: about `perThread` chunks each per batch (smaller chunks balance better), batches of at most `batchPairs` pairs. */
export function screenJob(universe: ScreenUniverse, settings: ScreenSettings, threads: number, batchPairs = Math.floor(BATCH_BYTES / (2 * RECORD_SIZE * 8)), perThread = 8): ScreenJob {
  const chunksPerBatch = Math.max(1, threads * perThread);
  return {
    universe,
    settings,
    chunksPerBatch,
    batchPairs: Math.max(1, batchPairs),
    results: new SharedArrayBuffer(2 * Math.max(1, batchPairs) * RECORD_SIZE * 8),
    control: new SharedArrayBuffer((STATES + chunksPerBatch) * 4),
    range: new SharedArrayBuffer(2 * 8),
  };
}

/** The chunks of the batch [first, end): as many as the job's count, or one per pair when fewer. */
function chunkOf(first: number, end: number, chunks: number, c: number): [number, number] {
  const length = end - first;
  return [first + Math.floor((c * length) / chunks), first + Math.floor(((c + 1) * length) / chunks)];
}

function chunkCount(job: ScreenJob, first: number, end: number): number {
  return Math.max(1, Math.min(job.chunksPerBatch, end - first));
}

/** Main thread: opens the batch [first, end) (at most batchPairs pairs) to every thread; returns its number. */
export function startBatch(job: ScreenJob, first: number, end: number): number {
  if (end - first > job.batchPairs || end < first) throw new RangeError(`A batch of ${end - first} pairs exceeds the job's ${job.batchPairs}.`);
  const control = new Int32Array(job.control);
  const batch = Math.max(0, Atomics.load(control, BATCH)) + 1;
  const range = new Float64Array(job.range);
  range[0] = first;
  range[1] = end;
  for (let c = 0; c < job.chunksPerBatch; c++) Atomics.store(control, STATES + c, 4 * batch + CHUNK_WAITING);
  Atomics.store(control, FINISHED, 0);
  Atomics.store(control, BATCH, batch);
  Atomics.notify(control, BATCH);
  return batch;
}

/** Main thread: tells the workers to end once they are done. */
export function stopJob(job: ScreenJob): void {
  const control = new Int32Array(job.control);
  Atomics.store(control, BATCH, -1);
  Atomics.notify(control, BATCH);
}

/** Chunks the batch under way is cut into. */
export function batchChunks(job: ScreenJob): number {
  const range = new Float64Array(job.range);
  return chunkCount(job, range[0], range[1]);
}

/** Chunks of the batch under way finished so far. */
export function finishedChunks(job: ScreenJob): number {
  return Atomics.load(new Int32Array(job.control), FINISHED);
}

/** The records of the batch under way, once every chunk is finished: a view of the shared buffer. */
export function batchRecords(job: ScreenJob): Float64Array {
  const range = new Float64Array(job.range);
  return new Float64Array(job.results, 0, 2 * (range[1] - range[0]) * RECORD_SIZE);
}

/** A thread's reusable buffers. */
export interface ThreadScratch {
  workspace: PairWorkspace;
  records: Float64Array;
}

/** Buffers for one thread of the job. */
export function threadScratch(job: ScreenJob): ThreadScratch {
  return { workspace: new PairWorkspace(job.universe.rows), records: new Float64Array(0) };
}

/**
 * Takes and runs waiting chunks of batch `batch` until none is left; returns how many this
 * thread wrote. With `retake`, chunks another thread took but has not finished are run too;
 * whichever thread finishes a chunk first writes it, and the other drops its copy.
 */
export function drainBatch(job: ScreenJob, batch: number, scratch: ThreadScratch, retake = false): number {
  const control = new Int32Array(job.control);
  const range = new Float64Array(job.range);
  const [first, end] = [range[0], range[1]];
  const count = chunkCount(job, first, end);
  const out = new Float64Array(job.results);
  const waiting = 4 * batch + CHUNK_WAITING;
  const taken = 4 * batch + CHUNK_TAKEN;
  let ran = 0;
  for (let c = 0; c < count; c++) {
    const took = Atomics.compareExchange(control, STATES + c, waiting, taken) === waiting;
    if (!took && !(retake && Atomics.load(control, STATES + c) === taken)) continue;
    if (Atomics.load(control, BATCH) !== batch) return ran;
    const [from, to] = chunkOf(first, end, count, c);
    const size = 2 * (to - from) * RECORD_SIZE;
    if (scratch.records.length < size) scratch.records = new Float64Array(size);
    screenChunkInto(job.universe, job.settings, from, to, scratch.records, 0, scratch.workspace);
    if (Atomics.compareExchange(control, STATES + c, taken, 4 * batch + CHUNK_WRITING) !== taken) continue;
    out.set(scratch.records.subarray(0, size), 2 * (from - first) * RECORD_SIZE);
    Atomics.store(control, STATES + c, 4 * batch + CHUNK_DONE);
    Atomics.add(control, FINISHED, 1);
    Atomics.notify(control, FINISHED);
    ran++;
  }
  return ran;
}

/** Main thread: waits up to `ms` for the finished count to move from `seen`. */
export function waitForChunks(job: ScreenJob, seen: number, ms: number): void {
  Atomics.wait(new Int32Array(job.control), FINISHED, seen, ms);
}

/** A worker thread's life: each batch as it opens, until the main thread says stop. */
export function workBatches(job: ScreenJob): void {
  const control = new Int32Array(job.control);
  const scratch = threadScratch(job);
  let seen = 0;
  for (;;) {
    Atomics.wait(control, BATCH, seen);
    const batch = Atomics.load(control, BATCH);
    if (batch < 0) return;
    if (batch === seen) continue;
    seen = batch;
    drainBatch(job, batch, scratch);
  }
}
