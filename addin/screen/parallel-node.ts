/**
 * The screen on several threads in Node (node:worker_threads): threads - 1 workers plus the
 * main thread take chunks of pairs from one shared queue (chunk-queue.ts) and write into one
 * shared result buffer; the answer is then finished exactly as on one thread, so it is the
 * same to the last bit (each pair's numbers depend only on its series and the settings).
 *
 * Each series' order of integration is decided once, on the main thread, before any pair
 * (series-orders.ts); the workers receive the orders with the series and skip the pairs the
 * screen sets aside, exactly as one thread does.
 *
 * The call is synchronous: the main thread works through chunks itself and then waits on the
 * queue's finished count (Atomics.wait), so the command line keeps its synchronous commands.
 * If a worker cannot start, the main thread simply takes its chunks; a chunk a worker still
 * holds when the main thread is done is run again by the main thread after a short wait (see
 * below), and any chunk is after `patienceMs` without progress.
 *
 * Worker is imported from 'worker_threads', not 'node:worker_threads': webpack 5.112 mangles
 * the worker chunk's constructor call for the prefixed name.
 */
import { availableParallelism } from 'node:os';
import { MessageChannel, Worker, receiveMessageOnPort, type MessagePort } from 'worker_threads';
import { drainChunks, finishedChunks, screenJob } from './chunk-queue';
import { finishScreen, type ScreenResult } from './screen-pairs';
import { resolveScreenOptions, type ScreenOptions } from './screen-options';
import { screenUniverse, unorderedPairCount, type NamedSeries } from './screen-universe';
import { withSeriesOrders } from './series-orders';
import { MooringInputError } from '../errors';

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
  /** Why fewer threads helped than were asked for, if so. */
  note?: string;
}

/**
 * Pairs times rows that earn each thread beyond the first: 2,000,000, about 800 pairs of
 * 2,500 rows or a tenth of a second of one thread's work, well above what starting a worker
 * and warming its compiler cost. Below it the main thread finishes sooner alone.
 */
export const WORK_PER_THREAD = 2_000_000;

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

/** Screens every pair of the series on several threads; the result equals screenPairs' (see the file comment). */
export function screenPairsInThreads(series: readonly NamedSeries[], options: ScreenOptions = {}, threading: ThreadOptions = {}): { result: ScreenResult; report: ThreadReport } {
  const settings = resolveScreenOptions(options);
  const universe = withSeriesOrders(screenUniverse(series), settings);
  const requested = threading.threads ?? Math.min(availableParallelism(), 16);
  if (!Number.isInteger(requested) || requested < 1 || requested > 64) {
    throw new MooringInputError(`The number of threads must be a whole number from 1 to 64; got ${String(requested)}.`);
  }
  const total = unorderedPairCount(universe.names.length);
  const work = total * universe.rows;
  const perThread = threading.workPerThread ?? WORK_PER_THREAD;
  const threads = Math.max(1, Math.min(requested, total, Math.floor(work / Math.max(perThread, 1)) + 1));
  const job = screenJob(universe, settings, threads);
  const errors: string[] = [];
  const workers: Worker[] = [];
  const ports: MessagePort[] = [];
  for (let w = 0; w < threads - 1; w++) {
    try {
      const { port1, port2 } = new MessageChannel();
      const worker = threading.workerFile === undefined
        ? new Worker(/* webpackChunkName: "screen-worker" */ new URL('./screen-worker.ts', import.meta.url), { workerData: { job, port: port2 }, transferList: [port2] })
        : new Worker(threading.workerFile, { workerData: { job, port: port2 }, transferList: [port2] });
      worker.on('error', () => undefined); // a worker that fails to start leaves its chunks to the others
      worker.unref();
      workers.push(worker);
      ports.push(port1);
    } catch (e) {
      errors.push(e instanceof Error ? e.message : String(e));
    }
  }
  const joins = threading.mainThreadJoins !== false || workers.length === 0;
  const patience = threading.patienceMs ?? 60_000;
  let chunksOnMainThread = 0;
  let chunksRetaken = 0;
  let straggler = patience;
  if (joins) {
    const started = performance.now();
    chunksOnMainThread = drainChunks(job);
    // A worker's first chunks run before its compiler has warmed up, so the last chunk it holds
    // can take far longer than on the warm main thread. Rather than wait for it, the main thread
    // runs such a chunk again once twice its own time per chunk has passed without progress
    // (the numbers are the same, whichever thread writes them).
    if (chunksOnMainThread > 0) straggler = Math.min(patience, Math.max(2, (2 * (performance.now() - started)) / chunksOnMainThread));
  }
  const states = new Int32Array(job.states);
  const count = job.chunks.length;
  let done = finishedChunks(job);
  let since = performance.now();
  while (done < count) {
    Atomics.wait(states, count, done, Math.min(50, straggler));
    const failed = readErrors(ports, errors);
    const now = finishedChunks(job);
    if (now !== done && !failed) {
      done = now;
      since = performance.now();
    } else if (failed || performance.now() - since > straggler) {
      if (!failed && straggler === patience) errors.push(`a worker thread left a chunk unfinished for ${patience} ms`);
      const again = drainChunks(job, true);
      chunksOnMainThread += again;
      chunksRetaken += again;
      done = finishedChunks(job);
      since = performance.now();
    }
  }
  readErrors(ports, errors);
  for (const port of ports) port.close();
  for (const worker of workers) void worker.terminate();
  const result = finishScreen(universe, settings, new Float64Array(job.results));
  const report: ThreadReport = { threads, workersStarted: workers.length, chunksOnMainThread, chunksRetaken, chunks: count };
  if (threads < requested) report.note = `${requested} threads were asked for; ${total} pairs of ${universe.rows} rows keep ${threads} busy.`;
  if (errors.length > 0) report.note = `Some work moved to the main thread: ${errors.join('; ')}.`;
  else if (workers.length > 0 && chunksOnMainThread - chunksRetaken === count) report.note = 'The main thread had run every chunk before the worker threads were ready.';
  return { result, report };
}
