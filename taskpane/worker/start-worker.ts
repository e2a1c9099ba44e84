/**
 * Starts the diagnosis worker. The `new Worker(new URL(...), import.meta.url)` form lets
 * the bundler emit the worker as its own file (diagnose-worker.js), served from the pane's
 * own origin as the content security policy requires.
 */

/** A new diagnosis worker. */
export function startDiagnosisWorker(): Worker {
  return new Worker(new URL(/* webpackChunkName: "diagnose-worker" */ './diagnose-worker.ts', import.meta.url), { name: 'mooring-diagnosis' });
}
