/**
 * The checks every table lookup makes (addin/tables/table-case.ts) answer in words a user can act
 * on: a statistic that is not a number names what would work instead of printing "NaN", and a
 * count that is not a whole number says what it must be and what was given.
 */
import { describe, expect, it } from 'vitest';
import { MooringInputError } from '../../addin/errors';
import { requireCount, requireNotNaN, tableCaseOf } from '../../addin/tables/table-case';

function messageOf(task: () => void): string {
  try {
    task();
  } catch (e) {
    expect(e).toBeInstanceOf(MooringInputError);
    return (e as Error).message;
  }
  throw new Error('expected a refusal');
}

describe('table-case messages', () => {
  it('a statistic that is not a number: no "NaN", and what would work', () => {
    const m = messageOf(() => requireNotNaN(Number.NaN, 'tau statistic'));
    expect(m).toMatch(/^The tau statistic could not be computed from these data, so no p-value can be read from the table\. What would work: /);
    expect(m).toMatch(/series that move/);
    expect(m).toMatch(/rescale larger ones/);
    expect(m).toMatch(/at least 20/);
    expect(m).not.toMatch(/NaN/);
    expect(() => requireNotNaN(-Infinity, 'tau statistic')).not.toThrow();
  });

  it('a count that is not a whole number of at least 1 says what it must be and what was given', () => {
    expect(messageOf(() => requireCount(Number.NaN, 'number of variables N'))).toBe('The number of variables N must be a whole number of at least 1, such as 1 or 2; got no number.');
    expect(messageOf(() => requireCount(1.5, 'number of variables N'))).toMatch(/got 1\.5\.$/);
    expect(() => requireCount(2, 'number of variables N')).not.toThrow();
  });

  it('unknown deterministic terms name the three that work', () => {
    expect(messageOf(() => tableCaseOf('quadratic' as never))).toBe("Unknown deterministic terms 'quadratic': use 'none', 'const' or 'trend'.");
  });
});
