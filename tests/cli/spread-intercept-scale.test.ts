/**
 * `spread --beta B --intercept C` with an intercept far beyond the scale of the prices (issue 13's
 * hostile-input pass: --intercept 1e308 answered "cannot separate 'constant'"): refused before any
 * statistic, naming --intercept, the value and what would work. The prices are the demo data
 * (Mooring's own seeded generator). The boundary is the double's precision: about 16 significant
 * digits (IEEE 754), of which the spread's movement must keep 6.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { MOORING_COMMANDS } from '../../addin/cli/commands';
import { expectOneLineRefusal, runWith } from './cli-harness';

const demo = readFileSync(new URL('../../addin/demo/data/quennel-delta.csv', import.meta.url), 'utf8');
const spread = (...options: string[]) => runWith(MOORING_COMMANDS, ['spread', 'p.csv', '--y', 'GateGasoil', '--x', 'DockDiesel', '--beta', '2', ...options], { 'p.csv': demo });

describe('spread --intercept far beyond the scale of the spread', () => {
  it.each(['1e308', '-1e300', '1e12'])('--intercept %s is refused with the option, the value and an intercept that would work', (value) => {
    const message = expectOneLineRefusal(spread('--intercept', value));
    expect(message).toContain(`--intercept ${value} is far larger than the spread it shifts`);
    expect(message).toMatch(/GateGasoil - 2\.0000 DockDiesel moves between -?[\d.]+ and -?[\d.]+/);
    expect(message).toMatch(/such as its mean -?[\d.]+, or leave --intercept out \(0\)\.$/);
    expect(message).not.toMatch(/cannot separate/);
  });

  it('an intercept beyond the largest double is refused as such', () => {
    expect(expectOneLineRefusal(spread('--intercept', '1e309'))).toMatch(/--intercept 1e309 is beyond the largest number a double holds/);
  });

  it('an intercept on the scale of the spread, or large but keeping the movement, is used', () => {
    for (const value of ['-2.36', '1e6']) {
      const out = runWith(MOORING_COMMANDS, ['spread', 'p.csv', '--y', 'GateGasoil', '--x', 'DockDiesel', '--beta', '2', '--intercept', value, '--json'], { 'p.csv': demo });
      expect(out.stderr).toBe('');
      expect(JSON.parse(out.stdout).intercept).toBe(Number(value));
    }
  });
});
