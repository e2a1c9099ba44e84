/**
 * The one error type of the engine. Every refusal of bad input is a MooringInputError
 * whose message a spreadsheet user can act on: what is wrong, where, and what would work.
 * Each surface maps it once: a cell error with this message, exit code 2 on the command
 * line, a banner in the pane.
 */
export class MooringInputError extends Error {
  /** Where the problem is, in the caller's terms (e.g. "row 37", "series 'Crude'"), if known. */
  readonly where?: string;

  constructor(message: string, where?: string) {
    super(message);
    this.name = 'MooringInputError';
    this.where = where;
  }
}

export function isMooringInputError(e: unknown): e is MooringInputError {
  return e instanceof MooringInputError;
}

/** Throws a MooringInputError unless the condition holds. */
export function require(condition: boolean, message: string, where?: string): asserts condition {
  if (!condition) throw new MooringInputError(message, where);
}
