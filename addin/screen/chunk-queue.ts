/**
 * Shared bookkeeping for screening on several threads at once: the chunks of unordered pairs
 * and an array of their states in shared memory (0 waiting, 1 taken, 2 done). Each thread,
 * the main one included, takes the next waiting chunk by an atomic compare-and-swap, runs the
 * pure chunk function into its own slice of the shared result buffer, and marks it done, so a
 * fast thread simply takes more chunks. Where a chunk runs cannot change its numbers: each
 * pair's records depend only on its two series and the settings.
 *
 * Plain JavaScript (SharedArrayBuffer and Atomics): no Node or browser import, so a Web
 * Worker can use it as the Node worker threads do.
 */
import { RECORD_SIZE } from './pair-record';
import { PairWorkspace } from './pair-relation';
import { chunkRanges, screenChunkInto } from './screen-chunk';
import type { ScreenSettings } from './screen-options';
import { unorderedPairCount, type ScreenUniverse } from './screen-universe';

/** Chunk state: no thread has taken it. */
export const CHUNK_WAITING = 0;
/** Chunk state: a thread is running it. */
export const CHUNK_TAKEN = 1;
/** Chunk state: its records are written. */
export const CHUNK_DONE = 2;

/** Everything a thread needs, as structured-clonable data. */
export interface ScreenJob {
  universe: ScreenUniverse;
  settings: ScreenSettings;
  /** [first, end) of each chunk, in unordered pairs. */
  chunks: [number, number][];
  /** Records of every directed pair: 2 x pairs x RECORD_SIZE float64 values. */
  results: SharedArrayBuffer;
  /** One Int32 state per chunk, then a count of finished chunks. */
  states: SharedArrayBuffer;
}

/** A job for the universe with about `perThread` chunks for each of `threads` threads (smaller chunks balance better). */
export function screenJob(universe: ScreenUniverse, settings: ScreenSettings, threads: number, perThread = 8): ScreenJob {
  const total = unorderedPairCount(universe.names.length);
  const chunks = chunkRanges(total, Math.max(1, threads * perThread));
  return {
    universe,
    settings,
    chunks,
    results: new SharedArrayBuffer(2 * total * RECORD_SIZE * Float64Array.BYTES_PER_ELEMENT),
    states: new SharedArrayBuffer((chunks.length + 1) * Int32Array.BYTES_PER_ELEMENT),
  };
}

/**
 * Takes and runs waiting chunks until none is left; returns how many this thread ran. With
 * `retake`, chunks another thread took but never finished are run too (they are rewritten
 * with the same numbers if that thread finishes after all).
 */
export function drainChunks(job: ScreenJob, retake = false): number {
  const states = new Int32Array(job.states);
  const out = new Float64Array(job.results);
  const count = job.chunks.length;
  const workspace = new PairWorkspace(job.universe.rows);
  let ran = 0;
  for (let c = 0; c < count; c++) {
    const took = Atomics.compareExchange(states, c, CHUNK_WAITING, CHUNK_TAKEN) === CHUNK_WAITING;
    if (!took && !(retake && Atomics.load(states, c) === CHUNK_TAKEN)) continue;
    const [first, end] = job.chunks[c];
    screenChunkInto(job.universe, job.settings, first, end, out, 2 * first, workspace);
    if (Atomics.exchange(states, c, CHUNK_DONE) !== CHUNK_DONE) {
      Atomics.add(states, count, 1);
      Atomics.notify(states, count);
    }
    ran++;
  }
  return ran;
}

/** Chunks finished so far. */
export function finishedChunks(job: ScreenJob): number {
  return Atomics.load(new Int32Array(job.states), job.chunks.length);
}
