/**
 * The Web Workers MOOR.SCREEN runs on, where the custom-functions runtime has them (the shared
 * runtime is a browser page; the JavaScript-only runtime has no Worker). Started on the first
 * screen that earns them and kept for the next, so recalculating a sheet starts no worker twice;
 * a pool whose worker failed is closed and the next screen starts afresh.
 *
 * The `new Worker(new URL(...), import.meta.url)` form lets the bundler emit the worker as its
 * own file (screen-cells-worker.js), served from the add-in's origin as its content security
 * policy requires.
 */
import type { ScreenPort } from '../../addin/screen/screen-in-workers';
import type { ScreenReply } from '../../addin/screen/screen-messages';

let pool: Worker[] = [];

/** Cores the page may use (navigator.hardwareConcurrency, at most 16), 1 where unknown. */
export function availableCores(): number {
  const cores = typeof navigator === 'object' ? navigator.hardwareConcurrency : undefined;
  return typeof cores === 'number' && cores >= 1 ? Math.min(Math.floor(cores), 16) : 1;
}

/** True where the runtime can start Web Workers. */
export function workersAvailable(): boolean {
  return typeof Worker === 'function';
}

/** A worker as the screen uses it. */
function portOf(worker: Worker): ScreenPort {
  return {
    send: (request, transfer) => worker.postMessage(request, transfer),
    listen(onReply, onFailure) {
      worker.onmessage = (event: MessageEvent<ScreenReply>) => onReply(event.data);
      worker.onerror = (event: ErrorEvent) => {
        event.preventDefault();
        onFailure(event.message || 'its script could not be loaded');
      };
      worker.onmessageerror = () => onFailure('a message could not be read');
    },
  };
}

/** `count` pooled workers, started as needed; throws when one cannot be started. */
export function screenWorkers(count: number): ScreenPort[] {
  while (pool.length < count) {
    pool.push(new Worker(new URL(/* webpackChunkName: "screen-cells-worker" */ './screen-cells-worker.ts', import.meta.url), { name: 'mooring-screen' }));
  }
  return pool.slice(0, count).map(portOf);
}

/** Ends every pooled worker (after a failure, so the next screen starts fresh ones). */
export function closeScreenWorkers(): void {
  for (const worker of pool) worker.terminate();
  pool = [];
}
