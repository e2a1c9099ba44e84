/**
 * Entry of a Node worker thread of the screen (pooled by parallel-node.ts): it waits for jobs.
 * An 'orders' job decides series' orders of integration until none is left (orders-queue.ts); a
 * 'pairs' job takes chunks of each batch the main thread opens until it says stop
 * (chunk-queue.ts). Errors go back on the port that came with the job; the main thread does any
 * work a failed worker left unfinished.
 */
import { isMainThread, parentPort, type MessagePort } from 'node:worker_threads';
import { workBatches, type ScreenJob } from './chunk-queue';
import { drainOrders, type OrdersJob } from './orders-queue';

type Message = { kind: 'orders'; job: OrdersJob; port: MessagePort } | { kind: 'pairs'; job: ScreenJob; port: MessagePort };

if (!isMainThread && parentPort) {
  parentPort.on('message', (message: Message) => {
    try {
      if (message.kind === 'orders') drainOrders(message.job);
      else workBatches(message.job);
    } catch (e) {
      message.port.postMessage({ error: e instanceof Error ? e.message : String(e) });
    } finally {
      message.port.close();
    }
  });
}
