/**
 * MOOR.SCREEN in a real browser, through the built functions bundle (dist/functions.html, the
 * page that loads the custom functions without the pane), with Web Workers and without: the
 * page's CustomFunctions.associate is replaced by one that keeps each function, and the test
 * calls SCREEN as Excel would, on 46 seeded series of 2,000 rows (1,035 pairs x 2,000 rows,
 * enough work for two threads). With workers, the answer is a Promise and the page started two
 * workers (counted by a Worker subclass); with Worker removed from the page, the answer comes at
 * once from the page's own thread. The two must give the same cells, and the grid of p-values
 * must agree with screenCell in Node to 1e-9: the evidence is agreement between the paths and
 * surfaces on our own seeded data. No network: the page's
 * request for Office.js is refused.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { screenCell } from '../../functions/analyses/screen-cells';
import { generatedUniverse } from '../screen/generated-universe';
import { launchBrowser } from './browser';
import { findBrowser } from './find-browser';
// @ts-expect-error The preview server is plain JavaScript (node taskpane/preview/serve.mjs).
import { startPreviewServer } from '../../taskpane/preview/serve.mjs';

type Cells = (number | string)[][];
interface PageAnswer {
  cells: Cells;
  wasPromise: boolean;
  workersStarted: number;
  cores: number;
}

let server: { url: string; close(): Promise<void> };
let browser: Browser;

const { series } = generatedUniverse(43, { clusters: 4, perCluster: 3, walks: 34, T: 2000 });
const block: (number | string)[][] = [series.map((s) => s.name), ...Array.from({ length: 2000 }, (_, t) => series.map((s) => s.values[t]))];

beforeAll(async () => {
  server = (await startPreviewServer({ port: 0 })) as typeof server;
  browser = await launchBrowser(await findBrowser());
}, 120_000);

afterAll(async () => {
  await browser?.close();
  await server?.close();
});

/** SCREEN called in a fresh functions page, with the page's Worker kept or removed. */
async function screenInPage(withWorkers: boolean, show: string): Promise<PageAnswer> {
  const page = await browser.newPage();
  const errors: string[] = [];
  page.on('pageerror', (e) => errors.push(e.message));
  await page.route((url) => !url.href.startsWith(server.url), (route) => route.abort());
  await page.addInitScript((keep: boolean) => {
    const w = window as unknown as Record<string, unknown>;
    const kept: Record<string, unknown> = {};
    w.__functions = kept;
    w.__workersStarted = 0;
    w.CustomFunctions = { associate: (id: string, f: unknown) => (kept[id] = f) };
    if (!keep) {
      delete w.Worker;
      w.Worker = undefined;
    } else {
      const Original = window.Worker;
      w.Worker = class extends Original {
        constructor(url: string | URL, options?: WorkerOptions) {
          super(url, options);
          (w.__workersStarted as number)++;
        }
      };
    }
  }, withWorkers);
  await page.goto(new URL('functions.html', server.url).href);
  await page.waitForFunction(() => typeof (window as unknown as { __functions: Record<string, unknown> }).__functions.SCREEN === 'function');
  const answer = await page.evaluate(async ([cells, view]) => {
    const w = window as unknown as { __functions: Record<string, (...a: unknown[]) => unknown>; __workersStarted: number };
    const out = w.__functions.SCREEN(cells, 0.05, view);
    const wasPromise = out instanceof Promise;
    return { cells: (await out) as (number | string)[][], wasPromise, workersStarted: w.__workersStarted, cores: navigator.hardwareConcurrency };
  }, [block, show] as const);
  await page.close();
  expect(errors).toEqual([]);
  return answer;
}

describe('MOOR.SCREEN on Web Workers in the browser answers the cells of one thread', () => {
  it('with workers (a Promise, two workers started) and without (cells at once): the same cells; the p-values near Node\'s', async () => {
    for (const show of ['list', 'matrix']) {
      const onWorkers = await screenInPage(true, show);
      expect(onWorkers.cores).toBeGreaterThanOrEqual(2); // the machine must have two cores for the worker path to be chosen
      expect(onWorkers.wasPromise).toBe(true);
      expect(onWorkers.workersStarted).toBe(2);
      const inline = await screenInPage(false, show);
      expect(inline.wasPromise).toBe(false);
      expect(inline.workersStarted).toBe(0);
      expect(onWorkers.cells).toEqual(inline.cells);
      if (show === 'matrix') {
        // The browser's engine and Node's round a few last bits differently (so a tie at p = 0 may
        // rank in another order in the list): the grid of p-values agrees to 1e-9.
        const node = screenCell(block, 0.05, show);
        expect(inline.cells.length).toBe(node.length);
        inline.cells.forEach((row, r) => row.forEach((v, c) => {
          const w = node[r][c];
          if (typeof v === 'number' && typeof w === 'number') expect(Math.abs(v - w)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(w)));
          else expect(v).toEqual(w);
        }));
      }
    }
  }, 300_000);
});
