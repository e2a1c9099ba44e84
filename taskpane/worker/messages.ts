/**
 * The messages between the pane and the diagnosis worker. Plain data only, so they pass
 * through structured cloning unchanged (the report is JSON-serialisable by design).
 */
import type { DiagnosticOptions } from '../../addin/report/check-input';
import type { DiagnosticInput } from '../../addin/report/prepare-input';
import type { DiagnosticReport } from '../../addin/report/report-types';
import type { PairStability, StabilityPair } from './stability-job';

/** Pane to worker: run the diagnosis. */
export interface RunRequest {
  type: 'run';
  id: number;
  input: DiagnosticInput;
  options: DiagnosticOptions;
}

/** Pane to worker: how one pair's relation held through time, on the run's rows. */
export interface StabilityRequest {
  type: 'stability';
  id: number;
  input: DiagnosticInput;
  options: DiagnosticOptions;
  pair: StabilityPair;
}

/** Worker to pane: the work has started (with its size), finished, or was refused. */
export type WorkerReply =
  | { type: 'started'; id: number; series: number; pairs: number; rows: number }
  | { type: 'done'; id: number; report: DiagnosticReport }
  | { type: 'stability-done'; id: number; stability: PairStability }
  | { type: 'failed'; id: number; message: string; inputError: boolean };
