/**
 * The screen on several threads in Node (node:worker_threads): threads - 1 workers plus the
 * main thread take chunks of each batch of pairs from one shared queue (chunk-queue.ts) and
 * write into one shared batch buffer; the main thread hands each finished batch on, in the
 * order of the pairs, and opens the next. Memory is one batch of records whatever the number
 * of pairs; what is kept of them is the caller's choice (screen-tally.ts keeps a p-value per
 * pair and the best pairs asked for; a part file keeps them all on disk). The records are the
 * same to the last bit on any number of threads: each pair's numbers depend only on its series
 * and the settings.
 *
 * Each series' order of integration is decided once, on the main thread, before any pair
 * (series-orders.ts); the workers receive the orders with the series and skip the pairs the
 * screen sets aside, exactly as one thread does. The series travel in shared memory.
 *
 * The call is synchronous: the main thread works through chunks itself and then waits on the
 * queue's finished count (Atomics.wait), so the command line keeps its synchronous commands.
 * If a worker cannot start, the main thread simply takes its chunks; a chunk a worker still
 * holds when the main thread is done is run again by the main thread after a short wait (see
 * below), and any chunk is after `patienceMs` without progress.
 *
 * The workers stay in a pool between screens (pooledWorkers): the orders of integration
 * (withSeriesOrdersInThreads) and the pairs run on the same warm workers.
 *
 * Worker is imported from 'worker_threads', not 'node:worker_threads': webpack 5.112 mangles
 * the worker chunk's constructor call for the prefixed name.
 */
import { availableParallelism } from 'node:os';
import { MessageChannel, Worker, receiveMessageOnPort, type MessagePort } from 'worker_threads';
import { batchRecords, drainBatch, finishedChunks, batchChunks, screenJob, startBatch, stopJob, threadScratch, waitForChunks, BATCH_BYTES, type ScreenJob } from './chunk-queue';
import { drainOrders, finishOrders, ordersFinished, ordersJob, ordersOf, waitForOrders, type OrdersJob } from './orders-queue';
import { RECORD_SIZE } from './pair-record';
import { PairWorkspace } from './pair-relation';
import { screenChunkInto } from './screen-chunk';
import { finishScreen, type ScreenResult } from './screen-pairs';
import { resolveScreenOptions, type ScreenOptions, type ScreenSettings } from './screen-options';
import { screenUniverse, unorderedPairCount, type NamedSeries, type ScreenUniverse } from './screen-universe';
import { withSeriesOrders } from './series-orders';
import { MooringInputError } from '../errors';
import { ORDER_WORK_PER_THREAD, threadsWorth, WORK_PER_THREAD } from './thread-work';

export { ORDER_WORK_PER_THREAD, WORK_PER_THREAD } from './thread-work';

/** How to spread the work. */
export interface ThreadOptions {
  /** Threads in all, the main one included (default: the machine's available parallelism, at most 16). */
  threads?: number;
  /** The built worker script (default: the bundle's screen-worker chunk beside this code). */
  workerFile?: string | URL;
  /** How long a taken chunk may stay unfinished before the main thread runs it itself (default 60 s). */
  patienceMs?: number;
  /** Whether the main thread takes chunks too while the workers run (default true; false leaves them all to the workers). */
  mainThreadJoins?: boolean;
  /** Work, in pairs times rows, that earns each thread beyond the first (default WORK_PER_THREAD). */
  workPerThread?: number;
  /** Most unordered pairs in one batch (default: 16 MB of records, about 80,000 pairs). */
  batchPairs?: number;
}

/** What the threads did. */
export interface ThreadReport {
  threads: number;
  workersStarted: number;
  /** Chunks the main thread ran, those it ran again included. */
  chunksOnMainThread: number;
  /** Chunks the main thread ran again because a worker still held them. */
  chunksRetaken: number;
  chunks: number;
  /** Batches the pairs went through. */
  batches: number;
  /** Why fewer threads helped than were asked for, if so. */
  note?: string;
}

/** Collects the error messages waiting on the workers' ports; true when there was one. */
function readErrors(ports: readonly MessagePort[], errors: string[]): boolean {
  let found = false;
  for (const port of ports) {
    for (let m = receiveMessageOnPort(port); m !== undefined; m = receiveMessageOnPort(port)) {
      const message = m.message as { error?: string };
      if (message.error) {
        errors.push(message.error);
        found = true;
      }
    }
  }
  return found;
}

/** The universe with its numbers in shared memory, so the workers read the one copy. */
function sharedUniverse(universe: ScreenUniverse): ScreenUniverse {
  const share = <T extends Float64Array | Uint8Array>(a: T, make: (b: SharedArrayBuffer) => T): T => {
    const copy = make(new SharedArrayBuffer(a.byteLength));
    copy.set(a);
    return copy;
  };
  return {
    ...universe,
    data: share(universe.data, (b) => new Float64Array(b)),
    complete: share(universe.complete, (b) => new Uint8Array(b)),
    means: share(universe.means, (b) => new Float64Array(b)),
    centredSquares: share(universe.centredSquares, (b) => new Float64Array(b)),
    scales: share(universe.scales, (b) => new Float64Array(b)),
  };
}

/**
 * Worker threads kept from screen to screen (one pool per worker file): a process pays for
 * starting a worker and warming its compiler once, and the orders and the pairs of one screen
 * run on the same workers. The workers are unref'd, so they never keep a process alive; one that
 * fails or exits leaves the pool.
 */
const pools = new Map<string, Worker[]>();

function pooledWorkers(count: number, workerFile: string | URL | undefined, errors: string[]): Worker[] {
  const key = workerFile === undefined ? '' : String(workerFile);
  const pool = pools.get(key) ?? [];
  pools.set(key, pool);
  const drop = (worker: Worker) => {
    const at = pool.indexOf(worker);
    if (at >= 0) pool.splice(at, 1);
  };
  while (pool.length < count) {
    try {
      const worker = workerFile === undefined
        ? new Worker(/* webpackChunkName: "screen-worker" */ new URL('./screen-worker.ts', import.meta.url))
        : new Worker(workerFile);
      worker.on('error', () => drop(worker)); // a worker that fails leaves its work to the others
      worker.on('exit', () => drop(worker));
      worker.unref();
      pool.push(worker);
    } catch (e) {
      errors.push(e instanceof Error ? e.message : String(e));
      break;
    }
  }
  return pool.slice(0, count);
}

/**
 * Starts the pool's workers for a screen about to run (the command line calls it before it reads
 * the file), so that starting them (some 100 ms each: a thread, a JavaScript engine, the worker's
 * code) overlaps the reading instead of delaying the first orders of integration. A count that is
 * not a whole number from 1 to 64 starts nothing: the screen itself refuses it.
 */
export function startScreenThreads(threading: ThreadOptions = {}): number {
  const requested = threading.threads ?? Math.min(availableParallelism(), 16);
  if (!Number.isInteger(requested) || requested < 2 || requested > 64) return 0;
  return pooledWorkers(requested - 1, threading.workerFile, []).length;
}

/** Hands a job to pooled workers, each with a port of its own for errors; returns the main thread's ends. */
function postJob(workers: readonly Worker[], kind: 'orders' | 'pairs', job: ScreenJob | OrdersJob): MessagePort[] {
  return workers.map((worker) => {
    const { port1, port2 } = new MessageChannel();
    worker.postMessage({ kind, job, port: port2 }, [port2]);
    return port1;
  });
}

/**
 * withSeriesOrders on several threads (orders-queue.ts): the same orders, decided by the pooled
 * workers and the main thread together. The pair screen then finds the workers started and warm.
 */
export function withSeriesOrdersInThreads(universe: ScreenUniverse, settings: ScreenSettings, threading: ThreadOptions = {}): ScreenUniverse {
  const N = universe.names.length;
  const requested = threadsFor(1, universe.rows, threading).requested;
  const threads = threadsWorth(N, universe.rows, requested, ORDER_WORK_PER_THREAD);
  if (threads === 1) return withSeriesOrders(universe, settings);
  const job = ordersJob(sharedUniverse(universe), settings);
  const errors: string[] = [];
  const ports = postJob(pooledWorkers(threads - 1, threading.workerFile, errors), 'orders', job);
  const patience = threading.patienceMs ?? 60_000;
  try {
    drainOrders(job);
    let done = ordersFinished(job);
    let since = performance.now();
    while (done < N) {
      waitForOrders(job, done, 50);
      const failed = readErrors(ports, errors);
      const now = ordersFinished(job);
      if (now !== done) {
        done = now;
        since = performance.now();
      } else if (failed || performance.now() - since > patience) {
        finishOrders(job); // a series a worker took but never finished is decided here
        break;
      }
    }
  } finally {
    readErrors(ports, errors);
    for (const port of ports) port.close();
  }
  return { ...universe, orders: ordersOf(job) };
}

/** Threads worth starting for `pairs` pairs of `rows` rows (see WORK_PER_THREAD), or a refusal of a bad count. */
export function threadsFor(pairs: number, rows: number, threading: ThreadOptions): { threads: number; requested: number } {
  const requested = threading.threads ?? Math.min(availableParallelism(), 16);
  if (!Number.isInteger(requested) || requested < 1 || requested > 64) {
    throw new MooringInputError(`The number of threads must be a whole number from 1 to 64; got ${String(requested)}.`);
  }
  return { requested, threads: threadsWorth(pairs, rows, requested, threading.workPerThread ?? WORK_PER_THREAD) };
}

/**
 * Runs unordered pairs [first, end) of the universe (which carries its orders) in batches on
 * several threads, and hands each batch's records to `onBatch` in order: onBatch(firstPair,
 * records), 2 directed records per pair. The records view is reused for the next batch: copy
 * what must be kept.
 */
export function screenRecordsInThreads(
  universe: ScreenUniverse, settings: ScreenSettings, first: number, end: number, threading: ThreadOptions,
  onBatch: (first: number, records: Float64Array) => void,
): ThreadReport {
  const { threads, requested } = threadsFor(end - first, universe.rows, threading);
  const batchPairs = threading.batchPairs ?? Math.floor(BATCH_BYTES / (2 * RECORD_SIZE * 8));
  const batches = Math.ceil((end - first) / batchPairs);
  const batchEnd = (b: number) => Math.min(end, first + (b + 1) * batchPairs);
  if (threads === 1) {
    const workspace = new PairWorkspace(universe.rows);
    const out = new Float64Array(2 * Math.min(batchPairs, end - first) * RECORD_SIZE);
    for (let b = 0; b < batches; b++) {
      const from = first + b * batchPairs;
      const to = batchEnd(b);
      screenChunkInto(universe, settings, from, to, out, 0, workspace);
      onBatch(from, out.subarray(0, 2 * (to - from) * RECORD_SIZE));
    }
    const report: ThreadReport = { threads, workersStarted: 0, chunksOnMainThread: batches, chunksRetaken: 0, chunks: batches, batches };
    if (threads < requested) report.note = `${requested} threads were asked for; ${end - first} pairs of ${universe.rows} rows keep ${threads} busy.`;
    return report;
  }
  const job = screenJob(sharedUniverse(universe), settings, threads, Math.min(batchPairs, end - first));
  const errors: string[] = [];
  const workers = pooledWorkers(threads - 1, threading.workerFile, errors);
  const ports = postJob(workers, 'pairs', job);
  const joins = threading.mainThreadJoins !== false || workers.length === 0;
  const patience = threading.patienceMs ?? 60_000;
  const scratch = threadScratch(job);
  let chunksOnMainThread = 0;
  let chunksRetaken = 0;
  let chunks = 0;
  try {
    for (let b = 0; b < batches; b++) {
      const from = first + b * batchPairs;
      const batch = startBatch(job, from, batchEnd(b));
      const count = batchChunks(job);
      chunks += count;
      let straggler = patience;
      if (joins) {
        const started = performance.now();
        const ran = drainBatch(job, batch, scratch);
        chunksOnMainThread += ran;
        // A worker's first chunks run before its compiler has warmed up, so the last chunk it holds
        // can take far longer than on the warm main thread. Rather than wait for it, the main thread
        // runs such a chunk again once twice its own time per chunk has passed without progress
        // (the numbers are the same, whichever thread writes them).
        if (ran > 0) straggler = Math.min(patience, Math.max(2, (2 * (performance.now() - started)) / ran));
      }
      let done = finishedChunks(job);
      let since = performance.now();
      while (done < count) {
        waitForChunks(job, done, Math.min(50, straggler));
        const failed = readErrors(ports, errors);
        const now = finishedChunks(job);
        if (now !== done && !failed) {
          done = now;
          since = performance.now();
        } else if (failed || performance.now() - since > straggler) {
          if (!failed && straggler === patience) errors.push(`a worker thread left a chunk unfinished for ${patience} ms`);
          const again = drainBatch(job, batch, scratch, true);
          chunksOnMainThread += again;
          chunksRetaken += again;
          done = finishedChunks(job);
          since = performance.now();
        }
      }
      onBatch(from, batchRecords(job));
    }
  } finally {
    stopJob(job);
    readErrors(ports, errors);
    for (const port of ports) port.close();
  }
  const report: ThreadReport = { threads, workersStarted: workers.length, chunksOnMainThread, chunksRetaken, chunks, batches };
  if (threads < requested) report.note = `${requested} threads were asked for; ${end - first} pairs of ${universe.rows} rows keep ${threads} busy.`;
  if (errors.length > 0) report.note = `Some work moved to the main thread: ${errors.join('; ')}.`;
  else if (workers.length > 0 && chunksOnMainThread - chunksRetaken === chunks) report.note = 'The main thread had run every chunk before the worker threads were ready.';
  return report;
}

/**
 * Screens every pair of the series on several threads, every pair kept (the matrices and the
 * full ranking); the result equals screenPairs'. For a universe too large to keep every pair,
 * run screenRecordsInThreads into a ScreenTally.
 */
export function screenPairsInThreads(series: readonly NamedSeries[], options: ScreenOptions = {}, threading: ThreadOptions = {}): { result: ScreenResult; report: ThreadReport } {
  const settings = resolveScreenOptions(options);
  const plain = screenUniverse(series);
  threadsFor(unorderedPairCount(plain.names.length), plain.rows, threading);
  const universe = withSeriesOrdersInThreads(plain, settings, threading);
  const total = unorderedPairCount(universe.names.length);
  const records = new Float64Array(2 * total * RECORD_SIZE);
  const report = screenRecordsInThreads(universe, settings, 0, total, threading, (from, batch) => records.set(batch, 2 * from * RECORD_SIZE));
  return { result: finishScreen(universe, settings, records), report };
}
