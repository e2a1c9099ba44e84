/**
 * Deciding the series' orders of integration (series-orders.ts) on several threads: each
 * thread, the main one included, takes the next series by an atomic counter and writes its
 * order into shared memory. The orders are the same on any number of threads: each depends
 * only on its own series. A series whose order could not be decided is written as undecided;
 * the main thread asks the routine again for the reason in words (a refusal comes early and
 * costs little), so only numbers cross between threads.
 *
 * Plain JavaScript (SharedArrayBuffer and Atomics), as chunk-queue.ts.
 */
import type { ScreenSettings } from './screen-options';
import type { ScreenUniverse } from './screen-universe';
import { seriesOrder, type SeriesOrder } from './series-orders';
import { orderText } from '../report/series-section';

/** The shared state of one orders job. */
export interface OrdersJob {
  universe: ScreenUniverse;
  settings: ScreenSettings;
  /** Int32: [next series to take, series finished]. */
  control: SharedArrayBuffer;
  /** Int32, two per series: order (-1 undecided, -2 not yet decided) and agreement (1, 0, or -1 for none). */
  codes: SharedArrayBuffer;
}

/** Code of a series no thread has decided yet. */
const PENDING = -2;
const NEXT = 0;
const FINISHED = 1;

/** A job for the universe's series (its numbers already in shared memory). */
export function ordersJob(universe: ScreenUniverse, settings: ScreenSettings): OrdersJob {
  const codes = new SharedArrayBuffer(8 * universe.names.length);
  new Int32Array(codes).fill(PENDING);
  return { universe, settings, control: new SharedArrayBuffer(8), codes };
}

/** Decides, on this thread, every series still pending (one a failed or stalled worker took). */
export function finishOrders(job: OrdersJob): void {
  const codes = new Int32Array(job.codes);
  for (let j = 0; j < job.universe.names.length; j++) {
    if (Atomics.load(codes, 2 * j) === PENDING) writeOrder(codes, j, seriesOrder(job.universe, job.settings, j));
  }
}

function writeOrder(codes: Int32Array, j: number, found: SeriesOrder): void {
  Atomics.store(codes, 2 * j + 1, found.agree === null ? -1 : found.agree ? 1 : 0);
  Atomics.store(codes, 2 * j, found.order ?? -1);
}

/** Takes and decides series until none is left; returns how many this thread decided. */
export function drainOrders(job: OrdersJob): number {
  const control = new Int32Array(job.control);
  const codes = new Int32Array(job.codes);
  const N = job.universe.names.length;
  let ran = 0;
  for (let j = Atomics.add(control, NEXT, 1); j < N; j = Atomics.add(control, NEXT, 1)) {
    writeOrder(codes, j, seriesOrder(job.universe, job.settings, j));
    Atomics.add(control, FINISHED, 1);
    Atomics.notify(control, FINISHED);
    ran++;
  }
  return ran;
}

/** Series decided so far. */
export function ordersFinished(job: OrdersJob): number {
  return Atomics.load(new Int32Array(job.control), FINISHED);
}

/** Waits up to `ms` for the finished count to move from `seen`. */
export function waitForOrders(job: OrdersJob, seen: number, ms: number): void {
  Atomics.wait(new Int32Array(job.control), FINISHED, seen, ms);
}

/** The orders once every series is decided; the reasons for undecided ones asked again on this thread. */
export function ordersOf(job: OrdersJob): SeriesOrder[] {
  const codes = new Int32Array(job.codes);
  return job.universe.names.map((name, j) => {
    const order = codes[2 * j];
    if (order < 0) return seriesOrder(job.universe, job.settings, j);
    return { name, order, orderText: orderText(order), agree: codes[2 * j + 1] === 1, note: null };
  });
}
