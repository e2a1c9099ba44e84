import { describe, expect, it } from 'vitest';
import { SeededRandom } from '../../addin/random';
import type { RollingRelation } from '../../addin/stability/rolling-relation';
import { rollingSummary } from '../../addin/stability/rolling-summary';

/**
 * A million windows (what `rolling --window 250` makes of a million rows) used to overflow the
 * call stack in the summary (Math.min(...betas) passes every window as an argument). The
 * windows here are built directly, so the test needs no million-row fit; the hedge ratios are
 * seeded draws with the extremes planted at known windows.
 */
function manyWindows(count: number, seed: number): RollingRelation {
  const rng = new SeededRandom(seed);
  const beta: (number | null)[] = Array.from({ length: count }, () => 1 + 0.1 * rng.normal());
  const pValue: (number | null)[] = Array.from({ length: count }, () => rng.uniform());
  beta[Math.floor(count * 0.12)] = -7.25;
  beta[Math.floor(count * 0.87)] = 9.5;
  beta[5] = null;
  pValue[5] = null;
  const rows = Array.from({ length: count }, (_, k) => k);
  return {
    expanding: false, window: 250, step: 1,
    startRow: rows, endRow: rows.map((k) => k + 249), nobs: rows.map(() => 250),
    beta, intercept: beta.map(() => 0), rSquared: beta.map(() => 0.5), halfLife: beta.map(() => 10),
    statistic: beta.map(() => -3), pValue, lags: beta.map(() => 1), summary: [],
  };
}

describe('the rolling summary at a million windows', () => {
  it('names the lowest and highest hedge ratio without overflowing the call stack', () => {
    const r = manyWindows(1_000_000, 17);
    const lines = rollingSummary(r, { y: 'Y', x: 'X' }, 1);
    const range = lines.find((l) => l.startsWith('The hedge ratio ranged'));
    expect(range).toBeDefined();
    expect(range).toMatch(/from -7\.25\d* to 9\.5\d* across the windows/);
    expect(lines[0]).toMatch(/of 999,999 rolling windows of 250 rows/);
  });

  it('with every hedge ratio missing but one, gives no range', () => {
    const r = manyWindows(200_000, 3);
    r.beta = r.beta.map(() => null);
    r.beta[7] = 1.5;
    expect(rollingSummary(r, { y: 'Y', x: 'X' }, 0).filter((l) => l.includes('ranged'))).toEqual([]);
  });
});
