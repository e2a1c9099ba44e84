/**
 * The Web Workers MOOR.SCREEN runs on, where the custom-functions runtime has them (the shared
 * runtime is a browser page; the JavaScript-only runtime has no Worker). Started on the first
 * screen that earns them and kept for the next, so recalculating a sheet starts no worker twice;
 * a pool whose worker failed is closed and the next screen starts afresh.
 *
 * The worker is its own entry of the add-in build (dist/screen-cells-worker.js, webpack.config.js),
 * served from the add-in's origin beside the page, as its content security policy requires. Its
 * address is worked out only when a worker starts, so functions.js itself loads anywhere, even
 * where there is no page address (tests/build/dist.test.ts).
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
    pool.push(new Worker(new URL('screen-cells-worker.js', self.location.href), { name: 'mooring-screen' }));
  }
  return pool.slice(0, count).map(portOf);
}

/** Ends every pooled worker (after a failure, so the next screen starts fresh ones). */
export function closeScreenWorkers(): void {
  for (const worker of pool) worker.terminate();
  pool = [];
}
