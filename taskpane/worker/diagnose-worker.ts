/**
 * The diagnosis worker: runs the engine's diagnose() off the pane's thread, so long work
 * (many series, long histories) never freezes the pane. It says when it starts (with the
 * size of the job), then sends the report or the engine's refusal; asked about one pair's
 * stability through time, it sends that (stability-job.ts). Cancelling is done by the pane
 * terminating the worker.
 */
import { isMooringInputError } from '../../addin/errors';
import { diagnose } from '../../addin/report/pairwise-diagnostic';
import type { RunRequest, StabilityRequest, WorkerReply } from './messages';
import { pairStability } from './stability-job';

/** The work of one request, posting its replies through `post` (exported for tests). */
export function handleRunRequest(request: RunRequest, post: (reply: WorkerReply) => void): void {
  const series = request.input.series.length;
  const rows = request.input.series[0]?.values.length ?? 0;
  post({ type: 'started', id: request.id, series, pairs: (series * (series - 1)) / 2, rows });
  try {
    post({ type: 'done', id: request.id, report: diagnose(request.input, request.options) });
  } catch (e) {
    post({ type: 'failed', id: request.id, message: e instanceof Error ? e.message : String(e), inputError: isMooringInputError(e) });
  }
}

/** The work of a stability request (exported for tests). */
export function handleStabilityRequest(request: StabilityRequest, post: (reply: WorkerReply) => void): void {
  try {
    post({ type: 'stability-done', id: request.id, stability: pairStability(request.input, request.options, request.pair) });
  } catch (e) {
    post({ type: 'failed', id: request.id, message: e instanceof Error ? e.message : String(e), inputError: isMooringInputError(e) });
  }
}

// Listen only when loaded as a worker (tests import this module in Node).
if (typeof WorkerGlobalScope !== 'undefined' && globalThis instanceof WorkerGlobalScope) {
  const scope = globalThis as unknown as DedicatedWorkerGlobalScope;
  scope.onmessage = (event: MessageEvent<RunRequest | StabilityRequest>) => {
    if (event.data?.type === 'run') handleRunRequest(event.data, (reply) => scope.postMessage(reply));
    if (event.data?.type === 'stability') handleStabilityRequest(event.data, (reply) => scope.postMessage(reply));
  };
}
