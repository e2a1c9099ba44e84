/// <reference types="custom-functions-runtime" />
/**
 * The one adapter that turns a refusal into the error a cell shows.
 *
 * Platform facts, from Microsoft's documentation:
 * - "CustomFunctions.Error class" and "Handle and return errors from your custom function":
 *   a function reports an error by throwing `new CustomFunctions.Error(code, message)`.
 * - "CustomFunctions.ErrorCode enum": a custom message is shown only with invalidValue
 *   (#VALUE!) and notAvailable (#N/A); the other codes drop it. So Mooring uses only these two:
 *   #VALUE! when the input is wrong, #N/A when the input is fine but no number exists (a p-value
 *   with no published table, a spread that does not revert).
 * - "Custom Functions requirement sets": the Error class arrived with CustomFunctionsRuntime 1.2.
 *
 * Where the runtime is absent (Node tests, the benchmark, a plain browser page) the same call
 * builds a CellError carrying the code and message, so the layer behaves identically there.
 */

/** The two error kinds that carry a message. */
export type CellErrorKind = 'invalidValue' | 'notAvailable';

/** What the cell shows for each kind. */
export const CELL_ERROR_TEXT: Readonly<Record<CellErrorKind, '#VALUE!' | '#N/A'>> = {
  invalidValue: '#VALUE!',
  notAvailable: '#N/A',
};

/** Stands in for CustomFunctions.Error where the custom-functions runtime is not loaded. */
export class CellError extends Error {
  /** The error value the cell would show. */
  readonly code: '#VALUE!' | '#N/A';

  constructor(kind: CellErrorKind, message: string) {
    super(message);
    this.name = 'CellError';
    this.code = CELL_ERROR_TEXT[kind];
  }
}

/** The runtime's error class and codes, when the runtime is loaded. */
interface Runtime {
  Error: new (code: CustomFunctions.ErrorCode, message?: string) => CustomFunctions.Error;
  ErrorCode: typeof CustomFunctions.ErrorCode;
}

function loadedRuntime(): Runtime | null {
  const runtime = (globalThis as { CustomFunctions?: Partial<Runtime> }).CustomFunctions;
  if (!runtime || typeof runtime.Error !== 'function' || !runtime.ErrorCode) return null;
  return runtime as Runtime;
}

/** The error to throw from a custom function: the runtime's where it is loaded, a CellError elsewhere. */
export function cellError(kind: CellErrorKind, message: string): CustomFunctions.Error | CellError {
  const runtime = loadedRuntime();
  if (runtime) return new runtime.Error(runtime.ErrorCode[kind], message);
  return new CellError(kind, message);
}

/** True for an error already shaped for a cell (ours or the runtime's), which passes through unchanged. */
export function isCellError(e: unknown): boolean {
  if (e instanceof CellError) return true;
  const runtime = loadedRuntime();
  return runtime !== null && e instanceof runtime.Error;
}
