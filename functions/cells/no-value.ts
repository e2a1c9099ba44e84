/**
 * A finding without a number: the input was fine, but the answer is not a number the cell can
 * hold (no published p-value for that many series, a spread that does not revert, a statistic
 * of minus infinity for an exact fit). It reaches the cell as #N/A with the reason, never as a
 * made-up number or NaN.
 */
export class NoValue extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'NoValue';
  }
}
