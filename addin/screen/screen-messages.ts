/**
 * The screen's work as messages, for workers that share no memory with the page that starts
 * them (Web Workers in a page that is not cross-origin isolated have no SharedArrayBuffer, and
 * a page may not block on Atomics.wait): the page sends each worker the packed series once,
 * then asks for ranges of series' orders and of pairs; each answer is a copy of plain data
 * (the records as a Float64Array whose buffer is transferred, not copied). The numbers are the
 * ones one thread computes: each comes from the same pure functions (seriesOrder,
 * screenChunkInto) on the same series and settings, and with the inner-product kernel the page
 * itself would use: a page whose content security policy refuses WebAssembly sums with the
 * JavaScript loops, which round a few last bits differently from the SIMD kernel a worker could
 * compile, so the page tells its workers which to use.
 *
 * No browser or Node import: the worker entry only wires answerScreenMessage to its port.
 */
import type { LagKernel } from './batched/pair-lag-moments';
import { PairWorkspace } from './pair-relation';
import { RECORD_SIZE } from './pair-record';
import { screenChunkInto } from './screen-chunk';
import type { ScreenSettings } from './screen-options';
import type { ScreenUniverse } from './screen-universe';
import { seriesOrder, type SeriesOrder } from './series-orders';

/** What the page asks of a worker. `job` tells one screen's messages from an earlier one's. */
export type ScreenRequest =
  | { kind: 'universe'; job: number; universe: ScreenUniverse; settings: ScreenSettings; kernel: LagKernel }
  | { kind: 'orders'; job: number; first: number; end: number }
  | { kind: 'known-orders'; job: number; orders: SeriesOrder[] }
  | { kind: 'pairs'; job: number; first: number; end: number };

/** What a worker answers: the orders of series [first, end), the records of pairs [first, end), or why it could not. */
export type ScreenReply =
  | { kind: 'orders'; job: number; first: number; orders: SeriesOrder[] }
  | { kind: 'pairs'; job: number; first: number; records: Float64Array }
  | { kind: 'failed'; job: number; message: string };

/** What a worker keeps between messages: the screen under way and its buffers. */
export interface ScreenWorkerState {
  job: number;
  universe: ScreenUniverse | null;
  settings: ScreenSettings | null;
  workspace: PairWorkspace | null;
  /** Rows and inner-product kernel the workspace was made for. */
  workspaceRows: number;
  workspaceKernel: LagKernel | null;
}

/** A worker's state before any screen. */
export function screenWorkerState(): ScreenWorkerState {
  return { job: -1, universe: null, settings: null, workspace: null, workspaceRows: -1, workspaceKernel: null };
}

/** Answers one request (null for those that only set the state), with the buffers to transfer. */
export function answerScreenMessage(state: ScreenWorkerState, request: ScreenRequest): { reply: ScreenReply; transfer: ArrayBuffer[] } | null {
  try {
    if (request.kind === 'universe') {
      state.job = request.job;
      state.universe = request.universe;
      state.settings = request.settings;
      if (state.workspace === null || state.workspaceRows !== request.universe.rows || state.workspaceKernel !== request.kernel) {
        state.workspace = new PairWorkspace(request.universe.rows, { kernel: request.kernel });
        state.workspaceRows = request.universe.rows;
        state.workspaceKernel = request.kernel;
      }
      return null;
    }
    const { universe, settings, workspace } = state;
    if (state.job !== request.job || !universe || !settings || !workspace) throw new Error(`no series were sent for screen ${request.job}`);
    if (request.kind === 'known-orders') {
      state.universe = { ...universe, orders: request.orders };
      return null;
    }
    if (request.kind === 'orders') {
      const orders: SeriesOrder[] = [];
      for (let j = request.first; j < request.end; j++) orders.push(seriesOrder(universe, settings, j));
      return { reply: { kind: 'orders', job: request.job, first: request.first, orders }, transfer: [] };
    }
    const records = new Float64Array(2 * (request.end - request.first) * RECORD_SIZE);
    screenChunkInto(universe, settings, request.first, request.end, records, 0, workspace);
    return { reply: { kind: 'pairs', job: request.job, first: request.first, records }, transfer: [records.buffer] };
  } catch (e) {
    return { reply: { kind: 'failed', job: request.job, message: e instanceof Error ? e.message : String(e) }, transfer: [] };
  }
}
