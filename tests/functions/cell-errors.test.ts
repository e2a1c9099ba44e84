/**
 * The one mapping from a refusal to a cell error. Platform fact ("CustomFunctions.ErrorCode
 * enum"): custom messages show only with #VALUE! (invalidValue) and #N/A (notAvailable), so
 * those are the only two codes Mooring produces.
 */
import { afterEach, describe, expect, it, vi } from 'vitest';
import { MooringInputError } from '../../addin/errors';
import { answer, toCellError } from '../../functions/cells/answer';
import { CellError, cellError } from '../../functions/cells/cell-error';
import { NoValue } from '../../functions/cells/no-value';
import { adf, halflife } from '../../functions/functions';
import { cellNumber } from '../../functions/render/cell-number';
import { column } from './cell-shapes';

/** A stand-in for the runtime's CustomFunctions global, shaped as its typings declare. */
class RuntimeError {
  constructor(
    public code: string,
    public message?: string,
  ) {}
}
const fakeRuntime = { Error: RuntimeError, ErrorCode: { invalidValue: '#VALUE!', notAvailable: '#N/A', invalidNumber: '#NUM!' } };

afterEach(() => {
  vi.unstubAllGlobals();
});

describe('cellError, the adapter', () => {
  it('without the runtime builds a CellError with the code the cell shows and the message', () => {
    const e = cellError('invalidValue', 'row 3 is text');
    expect(e).toBeInstanceOf(CellError);
    expect((e as CellError).code).toBe('#VALUE!');
    expect(e.message).toBe('row 3 is text');
    expect((cellError('notAvailable', 'no table') as CellError).code).toBe('#N/A');
  });

  it('with the runtime loaded builds the runtime\'s own error with the same code and message', () => {
    vi.stubGlobal('CustomFunctions', fakeRuntime);
    const e = cellError('notAvailable', 'no table') as unknown as RuntimeError;
    expect(e).toBeInstanceOf(RuntimeError);
    expect(e.code).toBe('#N/A');
    expect(e.message).toBe('no table');
  });

  it('a function called inside the runtime throws the runtime\'s error for bad input', () => {
    vi.stubGlobal('CustomFunctions', fakeRuntime);
    let thrown: unknown;
    try {
      adf(column(['a', 1, 2]));
    } catch (e) {
      thrown = e;
    }
    expect(thrown).toBeInstanceOf(RuntimeError);
    expect((thrown as RuntimeError).code).toBe('#VALUE!');
    expect((thrown as RuntimeError).message).toMatch(/row 1 of its range is text 'a'/);
  });
});

describe('answer(), the one place errors are mapped', () => {
  it('an engine refusal becomes #VALUE! with its message', () => {
    const e = toCellError(new MooringInputError('Use at most 4 lags.')) as CellError;
    expect([e.code, e.message]).toEqual(['#VALUE!', 'Use at most 4 lags.']);
  });
  it('a finding without a number becomes #N/A with its reason', () => {
    const e = toCellError(new NoValue('No half-life: the gap grows.')) as CellError;
    expect([e.code, e.message]).toEqual(['#N/A', 'No half-life: the gap grows.']);
  });
  it('a fault in Mooring says so, instead of a bare #VALUE! that looks like the user\'s mistake', () => {
    const e = toCellError(new TypeError('x is undefined')) as CellError;
    expect(e.code).toBe('#VALUE!');
    expect(e.message).toMatch(/x is undefined.*fault in Mooring, not in your data/);
  });
  it('an error already shaped for a cell passes through unchanged', () => {
    const ready = cellError('notAvailable', 'kept');
    expect(toCellError(ready)).toBe(ready);
  });
  it('returns the work\'s value when nothing is thrown', () => {
    expect(answer(() => 42)).toBe(42);
  });
  it('a NaN is never passed off as a number: it is reported as a fault', () => {
    expect(() => answer(() => cellNumber(NaN, 'The p-value'))).toThrow(/fault in Mooring/);
  });
  it('an infinite or missing number becomes #N/A with the reason', () => {
    expect(() => cellNumber(-Infinity, 'The statistic', 'exact fit')).toThrow(/minus infinity, which a cell cannot hold: exact fit/);
    expect(() => cellNumber(null, 'The p-value', 'No surface above 6 variables.')).toThrow('No surface above 6 variables.');
  });
  it('a spread that never reverts gives #N/A through the function, not a negative half-life', () => {
    const explosive = Array.from({ length: 40 }, (_, t) => (t % 2 === 0 ? 1 : -1) * 1.5 ** t);
    let thrown: unknown;
    try {
      halflife(column(explosive));
    } catch (e) {
      thrown = e;
    }
    expect((thrown as CellError).code).toBe('#N/A');
    expect((thrown as CellError).message).toMatch(/overshoots/);
  });
});
