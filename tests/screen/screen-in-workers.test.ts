/**
 * The screen as messages to workers that share no memory with the page (MOOR.SCREEN's Web
 * Workers). Each worker here is the real worker code (answerScreenMessage) behind a port that
 * copies every message with structuredClone, as a browser does between a page and a worker (the
 * records' buffers transferred), and answers on a later turn, in an order the test shuffles. The
 * evidence is agreement with the one-thread screen on the same seeded series: every field of the
 * result equal, whatever the number of workers and the order the answers come back in. A real
 * Web Worker in a browser is checked in tests/e2e/screen-workers.e2e.test.ts.
 */
import { describe, expect, it } from 'vitest';
import { SeededRandom, autoregressive1 } from '../../addin/random';
import { screenUniverseInWorkers, type ScreenPort } from '../../addin/screen/screen-in-workers';
import { answerScreenMessage, screenWorkerState, type ScreenReply, type ScreenRequest } from '../../addin/screen/screen-messages';
import { resolveScreenOptions } from '../../addin/screen/screen-options';
import { screenPairs } from '../../addin/screen/screen-pairs';
import { screenUniverse } from '../../addin/screen/screen-universe';
import { threadsWorth, WORK_PER_THREAD } from '../../addin/screen/thread-work';
import { screenCell, screenCellOrLater, type ScreenWorkerSource } from '../../functions/analyses/screen-cells';
import { generatedUniverse } from './generated-universe';

/** What a test port does with a request: answer it, lose it, or stop as a crashed worker does. */
type Behaviour = (request: ScreenRequest) => 'answer' | 'lose' | 'stop';

/**
 * A worker in this process: its own state, every message cloned, the answers in the order the
 * requests came (as a worker's messages are) each `delay(k)` ms after the one before.
 */
function clonedPort(delay: (k: number) => number, behave: Behaviour = () => 'answer'): ScreenPort & { requests: number } {
  const state = screenWorkerState();
  let onReply: (reply: ScreenReply) => void = () => undefined;
  let onFailure: (message: string) => void = () => undefined;
  let queue = Promise.resolve();
  const port = {
    requests: 0,
    send(request: ScreenRequest, transfer: ArrayBuffer[]) {
      const copy = structuredClone(request, { transfer });
      const wait = delay(port.requests++);
      queue = queue.then(() => new Promise<void>((done) => setTimeout(() => {
        const action = behave(copy);
        if (action === 'stop') onFailure('stopped by the test');
        if (action === 'answer') {
          const answer = answerScreenMessage(state, copy);
          if (answer) onReply(structuredClone(answer.reply, { transfer: answer.transfer }));
        }
        done();
      }, wait)));
    },
    listen(reply: (r: ScreenReply) => void, failure: (m: string) => void) {
      onReply = reply;
      onFailure = failure;
    },
  };
  return port;
}

const { series } = generatedUniverse(47, { clusters: 3, perCluster: 3, walks: 9, T: 300 }); // 18 series, 153 pairs
const settled = [...series, { name: 'settles', values: autoregressive1(new SeededRandom(42), 300, 0.5, 1).map((v) => 20 + v) }];

describe('the screen on message-passing workers equals the screen on one thread', () => {
  it('on 1, 2 and 3 workers answering in a shuffled order (seeded delays): every field equal', async () => {
    const single = screenPairs(settled, { johansen: true });
    const settings = resolveScreenOptions({ johansen: true });
    const rng = new SeededRandom(5);
    for (const count of [1, 2, 3]) {
      const ports = Array.from({ length: count }, () => clonedPort(() => Math.floor(3 * rng.uniform())));
      const result = await screenUniverseInWorkers(screenUniverse(settled), settings, ports);
      expect(result).toEqual(single);
      expect(result.setAside.filter((p) => p.y === 'settles' || p.x === 'settles')).toHaveLength(2 * series.length); // set aside on the workers too
      for (const port of ports) expect(port.requests).toBeGreaterThan(2); // every worker took a share
    }
  });

  it('rejects when a worker stops or answers that it failed, so the caller can run the screen itself', async () => {
    const settings = resolveScreenOptions({});
    const stops = [clonedPort(() => 0), clonedPort(() => 0, (r) => (r.kind === 'pairs' ? 'stop' : 'answer'))];
    await expect(screenUniverseInWorkers(screenUniverse(series), settings, stops)).rejects.toThrow(/a worker stopped/);
    // A worker that never received the series answers 'failed' (its first message lost).
    const forgetful = clonedPort(() => 0, (r) => (r.kind === 'universe' ? 'lose' : 'answer'));
    await expect(screenUniverseInWorkers(screenUniverse(series), settings, [forgetful])).rejects.toThrow(/could not finish its share: no series were sent/);
  });
});

describe('MOOR.SCREEN chooses workers by the work (thread-work.ts) and answers the same cells', () => {
  // 46 series x 2,000 rows: 1,035 pairs x 2,000 rows = 2,070,000, past WORK_PER_THREAD: 2 workers.
  const { series: wide } = generatedUniverse(43, { clusters: 4, perCluster: 3, walks: 34, T: 2000 });
  const cells = [wide.map((s) => s.name), ...Array.from({ length: 2000 }, (_, t) => wide.map((s) => s.values[t]))];
  const source = (cores: number, failing = false) => {
    const made = { started: 0, closed: 0 };
    const workers: ScreenWorkerSource = {
      cores: () => cores,
      start(count) {
        made.started = count;
        return Array.from({ length: count }, (_, k) => clonedPort(() => 0, failing && k === 1 ? (r) => (r.kind === 'orders' ? 'stop' : 'answer') : undefined));
      },
      close: () => void made.closed++,
    };
    return { workers, made };
  };

  it('on 4 cores starts the 2 workers the work earns, and gives the cells screenCell gives (list and matrix)', async () => {
    expect(threadsWorth(1035, 2000, 4)).toBe(2);
    expect(1035 * 2000).toBeGreaterThan(WORK_PER_THREAD);
    for (const show of ['list', 'matrix']) {
      const { workers, made } = source(4);
      const later = screenCellOrLater(cells, 0.05, show, undefined, workers);
      expect(later).toBeInstanceOf(Promise);
      expect(await later).toEqual(screenCell(cells, 0.05, show));
      expect(made.started).toBe(2);
    }
  });

  it('when a worker fails, ends the workers and answers the same cells from this thread', async () => {
    const { workers, made } = source(2, true);
    expect(await screenCellOrLater(cells, 0.05, 'list', undefined, workers)).toEqual(screenCell(cells, 0.05, 'list'));
    expect(made.closed).toBe(1);
  });

  it('answers at once, on this thread, for work below WORK_PER_THREAD, on one core, or where the runtime has no workers', () => {
    const small = cells.slice(0, 301).map((row) => row.slice(0, 18)); // 153 pairs x 300 rows
    for (const [block, cores] of [[small, 8], [cells, 1]] as const) {
      const { workers, made } = source(cores);
      expect(screenCellOrLater(block, 0.05, 'list', undefined, workers)).toEqual(screenCell(block, 0.05, 'list'));
      expect(made.started).toBe(0);
    }
    expect(screenCellOrLater(small, 0.05, 'list', undefined, null)).toEqual(screenCell(small, 0.05, 'list'));
  });

  it('refuses bad input at once, naming the cell, before any worker starts', () => {
    const { workers, made } = source(4);
    const broken = cells.map((row, r) => (r === 38 ? row.map((v, j) => (j === 0 ? 'n/a' : v)) : row));
    expect(() => screenCellOrLater(broken, 0.05, 'list', undefined, workers)).toThrow("series 1 row 39 of its range is text 'n/a'");
    expect(made.started).toBe(0);
  });
});
