/**
 * Entry of a Node worker thread of the screen (started by parallel-node.ts): takes chunks of
 * each batch the main thread opens until it says stop, then ends. Errors go back on the port
 * it was given; the main thread runs any chunk a failed worker left unfinished.
 */
import { isMainThread, workerData, type MessagePort } from 'node:worker_threads';
import { workBatches, type ScreenJob } from './chunk-queue';

if (!isMainThread) {
  const { job, port } = workerData as { job: ScreenJob; port: MessagePort };
  try {
    workBatches(job);
  } catch (e) {
    port.postMessage({ error: e instanceof Error ? e.message : String(e) });
  } finally {
    port.close();
  }
}
