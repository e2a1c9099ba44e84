/**
 * The built functions bundle (dist/functions.js, built by npm test before vitest), loaded as
 * Excel loads it: with a CustomFunctions global whose associate() registers each function
 * and whose Error class carries the error code. Calls go through the registered functions,
 * so this checks the wiring Excel sees: ids, argument order, the values, and the errors.
 */
import { readFileSync } from 'node:fs';
import { runInNewContext } from 'node:vm';
import { describe, expect, it } from 'vitest';
import { fixtureSeries, loadFixture, type Fixtures } from '../reference/fixtures';
import { column } from './cell-shapes';

class RuntimeError {
  constructor(
    public code: string,
    public message?: string,
  ) {}
}

function loadBundle(): Map<string, (...args: unknown[]) => unknown> {
  const registered = new Map<string, (...args: unknown[]) => unknown>();
  const CustomFunctions = {
    associate: (id: string, fn: (...args: unknown[]) => unknown) => registered.set(id, fn),
    Error: RuntimeError,
    ErrorCode: { invalidValue: '#VALUE!', notAvailable: '#N/A' },
  };
  runInNewContext(readFileSync(new URL('../../dist/functions.js', import.meta.url), 'utf8'), { CustomFunctions, performance, console });
  return registered;
}

describe('dist/functions.js under a stand-in custom-functions runtime', () => {
  const fns = loadBundle();
  const adfCase = loadFixture<Fixtures['adf']>('adf').cases.find((c) => c.deterministic === 'const' && c.lags === 'aic' && c.maxLags === null)!;
  const coint = loadFixture<Fixtures['coint']>('coint');
  const egCase = coint.cases.find((c) => c.x.length === 1 && c.lags === 'aic' && c.deterministic === 'const')!;

  it('registers MOOR.ADF and it matches the adf.json fixture, options passed as Excel passes omitted ones (null)', () => {
    const series = column(fixtureSeries(loadFixture<Fixtures['adf']>('adf'), adfCase.series));
    const answer = fns.get('ADF')!(series, null, null, null) as number[][];
    expect(Math.abs(answer[0][0] - adfCase.pValue)).toBeLessThan(1e-6);
  });

  it('registers MOOR.ENGLEGRANGER and it matches the coint.json fixture', () => {
    const answer = fns.get('ENGLEGRANGER')!(column(fixtureSeries(coint, egCase.y)), column(fixtureSeries(coint, egCase.x[0])), null, null, null) as number[][];
    expect(Math.abs(answer[0][0] - egCase.pValue)).toBeLessThan(1e-6);
  });

  it('throws the runtime\'s own error with #VALUE! and the message for bad input', () => {
    let thrown: unknown;
    try {
      fns.get('HEDGE')!(column(['n/a', ...fixtureSeries(coint, 'pair_y').slice(1)]), column(fixtureSeries(coint, 'pair_x')), null);
    } catch (e) {
      thrown = e;
    }
    expect(thrown).toBeInstanceOf(RuntimeError);
    expect((thrown as RuntimeError).code).toBe('#VALUE!');
    expect((thrown as RuntimeError).message).toMatch(/y row 1 of its range is text 'n\/a'/);
  });

  it('throws #N/A with the reason when no number exists', () => {
    let thrown: unknown;
    try {
      fns.get('HALFLIFE')!(column(Array.from({ length: 50 }, (_, t) => 1.05 ** t)), null);
    } catch (e) {
      thrown = e;
    }
    expect((thrown as RuntimeError).code).toBe('#N/A');
    expect((thrown as RuntimeError).message).toMatch(/no mean reversion/);
  });
});
