/**
 * The screen on workers that share no memory with the page (screen-messages.ts): MOOR.SCREEN's
 * Web Workers. The page packs and checks the series (so a refusal names the cell as on one
 * thread), sends them to every worker once, then hands out ranges of series for their orders of
 * integration and, once every order is known, ranges of pairs, the next range to whichever
 * worker answers first, so a fast worker simply takes more. The records come back in any order
 * and are laid in their place; the ranking and the false-discovery adjustment run on the page
 * over all of them (finishScreen). The result equals screenPairs': each number depends only on
 * its series and the settings, never on the worker or the range.
 *
 * The page itself computes nothing while the workers run: it is the spreadsheet's own thread.
 * No browser import: a worker is reached through ScreenPort, which the caller builds.
 */
import { wasmLagArena } from './batched/wasm-lag-kernel';
import { RECORD_SIZE } from './pair-record';
import type { ScreenReply, ScreenRequest } from './screen-messages';
import { finishScreen, type ScreenResult } from './screen-pairs';
import type { ScreenSettings } from './screen-options';
import { unorderedPairCount, type ScreenUniverse } from './screen-universe';
import type { SeriesOrder } from './series-orders';

/** One worker as the screen uses it. */
export interface ScreenPort {
  /** Posts a request, moving the listed buffers rather than copying them. */
  send(request: ScreenRequest, transfer: ArrayBuffer[]): void;
  /** What to do with each reply, and when the worker itself fails (its script did not load, it crashed); replaces any earlier listener. */
  listen(onReply: (reply: ScreenReply) => void, onFailure: (message: string) => void): void;
}

/** Ranges handed out per worker in each round: enough for a fast worker to take more, few enough that messages cost little. */
const RANGES_PER_WORKER = 8;
/** Most pairs in one range (their records are under 1 MB). */
const MOST_PAIRS_PER_RANGE = 4096;

let lastJob = 0;

/** [first, end) ranges cutting `total` items into pieces of about `size`. */
function ranges(total: number, size: number): [number, number][] {
  const out: [number, number][] = [];
  for (let first = 0; first < total; first += size) out.push([first, Math.min(total, first + size)]);
  return out;
}

/** Sends each request to the next idle worker until all are answered; `take` receives each answer. */
function round(ports: readonly ScreenPort[], job: number, requests: readonly ScreenRequest[], take: (reply: ScreenReply) => void): Promise<void> {
  return new Promise((resolve, reject) => {
    let next = 0;
    let answered = 0;
    let over = false;
    const fail = (message: string) => {
      if (over) return;
      over = true;
      reject(new Error(message));
    };
    const give = (port: ScreenPort) => {
      if (next < requests.length) port.send(requests[next++], []);
    };
    if (requests.length === 0) {
      resolve();
      return;
    }
    for (const port of ports) {
      port.listen((reply) => {
        if (over || reply.job !== job) return;
        if (reply.kind === 'failed') {
          fail(`a worker could not finish its share: ${reply.message}`);
          return;
        }
        take(reply);
        answered++;
        if (answered === requests.length) {
          over = true;
          resolve();
        } else {
          give(port);
        }
      }, (message) => fail(`a worker stopped: ${message}`));
      give(port);
    }
  });
}

/**
 * Screens the packed universe (screenUniverse, without orders) on the workers; resolves with
 * what screenPairs answers for the same series and settings, or rejects when a worker fails
 * (the caller may then run the screen on its own thread).
 */
export async function screenUniverseInWorkers(universe: ScreenUniverse, settings: ScreenSettings, ports: readonly ScreenPort[]): Promise<ScreenResult> {
  if (ports.length === 0) throw new RangeError('A screen on workers needs at least one worker.');
  const job = ++lastJob;
  const N = universe.names.length;
  const { names, rows, data, complete, means, centredSquares, scales } = universe;
  const plain: ScreenUniverse = { names, rows, data, complete, means, centredSquares, scales };
  // The workers sum as this thread would (screen-messages.ts): SIMD only where it compiles here.
  const kernel = wasmLagArena(2, 1) ? 'wasm' : 'js';
  for (const port of ports) port.send({ kind: 'universe', job, universe: plain, settings, kernel }, []);

  const orders = new Array<SeriesOrder>(N);
  const seriesPerRange = Math.max(1, Math.ceil(N / (ports.length * RANGES_PER_WORKER)));
  await round(ports, job, ranges(N, seriesPerRange).map(([first, end]) => ({ kind: 'orders', job, first, end })), (reply) => {
    if (reply.kind === 'orders') reply.orders.forEach((o, k) => (orders[reply.first + k] = o));
  });
  for (const port of ports) port.send({ kind: 'known-orders', job, orders }, []);

  const total = unorderedPairCount(N);
  const records = new Float64Array(2 * total * RECORD_SIZE);
  const pairsPerRange = Math.max(1, Math.min(MOST_PAIRS_PER_RANGE, Math.ceil(total / (ports.length * RANGES_PER_WORKER))));
  await round(ports, job, ranges(total, pairsPerRange).map(([first, end]) => ({ kind: 'pairs', job, first, end })), (reply) => {
    if (reply.kind === 'pairs') records.set(reply.records, 2 * reply.first * RECORD_SIZE);
  });
  return finishScreen({ ...universe, orders }, settings, records);
}
