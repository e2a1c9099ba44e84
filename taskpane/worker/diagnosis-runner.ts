/**
 * Runs a diagnosis for the pane and lets the user cancel it. The worker runner sends the
 * work to a Web Worker (a fresh one after a cancel, since cancelling terminates it); the
 * inline runner is the fallback for a page without workers, running on the pane's thread
 * after the pane has painted its progress bar. Either also answers, on demand, how one pair's
 * relation held through time (stability-job.ts); that work gets a worker of its own, so
 * cancelling it never stops a diagnosis.
 */
import { isMooringInputError } from '../../addin/errors';
import type { DiagnosticOptions } from '../../addin/report/check-input';
import { diagnose } from '../../addin/report/pairwise-diagnostic';
import type { DiagnosticInput } from '../../addin/report/prepare-input';
import type { DiagnosticReport } from '../../addin/report/report-types';
import type { RunRequest, StabilityRequest, WorkerReply } from './messages';
import { pairStability, type PairStability, type StabilityPair } from './stability-job';

/** How a run ended. */
export type RunOutcome =
  | { kind: 'done'; report: DiagnosticReport }
  | { kind: 'failed'; message: string; inputError: boolean }
  | { kind: 'cancelled' };

/** The size of a started job, for the progress line. */
export interface RunSize {
  series: number;
  pairs: number;
  rows: number;
}

/** A run in progress. */
export interface RunHandle {
  outcome: Promise<RunOutcome>;
  cancel(): void;
}

/** How a stability request ended. */
export type StabilityOutcome =
  | { kind: 'done'; stability: PairStability }
  | { kind: 'failed'; message: string; inputError: boolean }
  | { kind: 'cancelled' };

/** A stability request in progress. */
export interface StabilityHandle {
  outcome: Promise<StabilityOutcome>;
  cancel(): void;
}

/** Something that runs diagnoses. */
export interface DiagnosisRunner {
  /** Whether the work leaves the pane's thread. */
  readonly offThread: boolean;
  run(input: DiagnosticInput, options: DiagnosticOptions, onStart?: (size: RunSize) => void): RunHandle;
  /** How one pair's relation held through time, on the rows `input` and `options` give the diagnosis. */
  stability(input: DiagnosticInput, options: DiagnosticOptions, pair: StabilityPair): StabilityHandle;
}

/** Runs each diagnosis in a Web Worker made by `makeWorker`. */
export function workerRunner(makeWorker: () => Worker): DiagnosisRunner {
  let worker: Worker | null = null;
  let nextId = 1;
  return {
    offThread: true,
    run(input, options, onStart) {
      const id = nextId++;
      const current = worker ?? (worker = makeWorker());
      let settle: (o: RunOutcome) => void = () => undefined;
      const outcome = new Promise<RunOutcome>((resolve) => {
        settle = resolve;
      });
      const stop = (o: RunOutcome): void => {
        current.removeEventListener('message', onMessage);
        current.removeEventListener('error', onError);
        settle(o);
      };
      const onMessage = (event: MessageEvent<WorkerReply>): void => {
        const reply = event.data;
        if (!reply || reply.id !== id) return;
        if (reply.type === 'started') onStart?.({ series: reply.series, pairs: reply.pairs, rows: reply.rows });
        else if (reply.type === 'done') stop({ kind: 'done', report: reply.report });
        else if (reply.type === 'failed') stop({ kind: 'failed', message: reply.message, inputError: reply.inputError });
      };
      const onError = (event: ErrorEvent): void => {
        event.preventDefault();
        worker = null;
        current.terminate();
        stop({ kind: 'failed', message: `The diagnosis stopped with an internal error: ${event.message || 'unknown'}.`, inputError: false });
      };
      current.addEventListener('message', onMessage);
      current.addEventListener('error', onError);
      const request: RunRequest = { type: 'run', id, input, options };
      current.postMessage(request);
      return {
        outcome,
        cancel() {
          if (worker === current) worker = null;
          current.terminate();
          stop({ kind: 'cancelled' });
        },
      };
    },
    stability(input, options, pair) {
      const own = makeWorker();
      let settle: (o: StabilityOutcome) => void = () => undefined;
      const outcome = new Promise<StabilityOutcome>((resolve) => {
        settle = resolve;
      });
      const stop = (o: StabilityOutcome): void => {
        own.terminate();
        settle(o);
      };
      own.addEventListener('message', (event: MessageEvent<WorkerReply>) => {
        const reply = event.data;
        if (reply?.type === 'stability-done') stop({ kind: 'done', stability: reply.stability });
        else if (reply?.type === 'failed') stop({ kind: 'failed', message: reply.message, inputError: reply.inputError });
      });
      own.addEventListener('error', (event: ErrorEvent) => {
        event.preventDefault();
        stop({ kind: 'failed', message: `The check through time stopped with an internal error: ${event.message || 'unknown'}.`, inputError: false });
      });
      const request: StabilityRequest = { type: 'stability', id: nextId++, input, options, pair };
      own.postMessage(request);
      return { outcome, cancel: () => stop({ kind: 'cancelled' }) };
    },
  };
}

/**
 * Runs `work` on the pane's thread after one turn (so the progress bar paints), settling with
 * its answer, its failure, or a cancel; cancel only works before the work starts.
 */
function inlineJob<T extends { kind: string }>(work: () => T): { outcome: Promise<T | { kind: 'cancelled' } | { kind: 'failed'; message: string; inputError: boolean }>; cancel(): void } {
  type Outcome = T | { kind: 'cancelled' } | { kind: 'failed'; message: string; inputError: boolean };
  let cancelled = false;
  let settle: (o: Outcome) => void = () => undefined;
  const outcome = new Promise<Outcome>((resolve) => {
    settle = resolve;
  });
  setTimeout(() => {
    if (cancelled) return;
    try {
      settle(work());
    } catch (e) {
      settle({ kind: 'failed', message: e instanceof Error ? e.message : String(e), inputError: isMooringInputError(e) });
    }
  }, 30);
  return {
    outcome,
    cancel() {
      cancelled = true;
      settle({ kind: 'cancelled' });
    },
  };
}

/** Runs each diagnosis on the pane's thread, after one turn so the progress bar paints; cancel only works before it starts. */
export function inlineRunner(): DiagnosisRunner {
  return {
    offThread: false,
    run(input, options, onStart) {
      const job = inlineJob(() => {
        const series = input.series.length;
        onStart?.({ series, pairs: (series * (series - 1)) / 2, rows: input.series[0]?.values.length ?? 0 });
        return { kind: 'done' as const, report: diagnose(input, options) };
      });
      return { outcome: job.outcome as Promise<RunOutcome>, cancel: job.cancel };
    },
    stability(input, options, pair) {
      const job = inlineJob(() => ({ kind: 'done' as const, stability: pairStability(input, options, pair) }));
      return { outcome: job.outcome as Promise<StabilityOutcome>, cancel: job.cancel };
    },
  };
}
