/**
 * The runner the pane uses: the Web Worker where the page has workers (every current
 * browser and Excel's web views), the inline runner otherwise.
 */
import { inlineRunner, workerRunner, type DiagnosisRunner } from './diagnosis-runner';
import { startDiagnosisWorker } from './start-worker';

/** The worker runner when workers exist, else the inline fallback. */
export function chooseRunner(): DiagnosisRunner {
  return typeof Worker === 'function' ? workerRunner(startDiagnosisWorker) : inlineRunner();
}
