/**
 * MOOR.SCREEN's Web Worker: answers the screen's requests (addin/screen/screen-messages.ts) with
 * the same engine code one thread runs. Started by screen-worker-pool.ts.
 */
import { answerScreenMessage, screenWorkerState, type ScreenRequest } from '../../addin/screen/screen-messages';

// Listen only when loaded as a worker (tests may import this module in Node).
if (typeof WorkerGlobalScope !== 'undefined' && globalThis instanceof WorkerGlobalScope) {
  const scope = globalThis as unknown as DedicatedWorkerGlobalScope;
  const state = screenWorkerState();
  scope.onmessage = (event: MessageEvent<ScreenRequest>) => {
    const answer = answerScreenMessage(state, event.data);
    if (answer) scope.postMessage(answer.reply, answer.transfer);
  };
}
