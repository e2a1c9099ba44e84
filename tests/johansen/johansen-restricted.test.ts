import { describe, expect, it } from 'vitest';
import { johansenTest, type JohansenCase } from '../../addin/johansen/johansen';
import { SeededRandom, autoregressive1, randomWalk } from '../../addin/random';

/**
 * The restricted cases have no published table or reference fixture, so they are checked
 * by properties that follow from where each deterministic term sits (Johansen 1995,
 * ch. 5.7), and by recovering a known rank and relation from seeded systems.
 */

/** Three series over T = 300 rows (seed 5101): one tie among three walks. */
function threeSeries(seed: number): Float64Array[] {
  const rng = new SeededRandom(seed);
  const a = randomWalk(rng, 300, { start: 50 });
  const b = randomWalk(rng, 300, { start: 20 });
  const noise = autoregressive1(rng, 300, 0.5);
  return [a.map((v, t) => 4 + 0.8 * v - 0.4 * b[t] + noise[t]), a, b];
}

function shifted(block: Float64Array[], shift: (series: number, row: number) => number): Float64Array[] {
  return block.map((x, s) => x.map((v, t) => v + shift(s, t)));
}

function statistics(block: Float64Array[], caseName: JohansenCase): number[] {
  const r = johansenTest(block, { case: caseName, lags: 2 });
  return [...r.trace.map((t) => t.statistic), ...r.maxEigen.map((t) => t.statistic)];
}

function expectSameStatistics(a: number[], b: number[]): void {
  a.forEach((v, i) => expect(Math.abs(v - b[i]) / Math.max(Math.abs(b[i]), 1)).toBeLessThan(1e-8));
}

describe('Johansen restricted cases: invariance to the deterministic terms they absorb', () => {
  const block = threeSeries(5101);
  const levelShift = (s: number) => [100, -35, 7.5][s];
  const lineShift = (s: number, t: number) => [100, -35, 7.5][s] + [0.3, -0.1, 0.05][s] * t;

  it("'restricted-constant' statistics are unchanged when each series gets its own constant added", () => {
    expectSameStatistics(statistics(shifted(block, levelShift), 'restricted-constant'), statistics(block, 'restricted-constant'));
  });

  it("'none' statistics do change under the same shift (so the check above can fail)", () => {
    const before = statistics(block, 'none');
    const after = statistics(shifted(block, levelShift), 'none');
    expect(Math.abs(after[0] - before[0])).toBeGreaterThan(0.01 * before[0]);
  });

  it("'restricted-constant' beta is unchanged by the shift and its constant moves by -beta'c", () => {
    const before = johansenTest(block, { case: 'restricted-constant', lags: 2 });
    const after = johansenTest(shifted(block, levelShift), { case: 'restricted-constant', lags: 2 });
    for (let j = 0; j < 3; j++) {
      let moved = 0;
      for (let i = 0; i < 3; i++) {
        expect(after.beta[i][j]).toBeCloseTo(before.beta[i][j], 6);
        moved += before.beta[i][j] * levelShift(i);
      }
      const expected = (before.deterministicInRelation as number[])[j] - moved;
      expect(Math.abs((after.deterministicInRelation as number[])[j] - expected)).toBeLessThan(1e-6 * Math.max(1, Math.abs(expected)));
    }
  });

  it("'restricted-trend' statistics are unchanged when each series gets its own straight line (a + b t) added", () => {
    expectSameStatistics(statistics(shifted(block, lineShift), 'restricted-trend'), statistics(block, 'restricted-trend'));
  });

  it("'constant' and 'trend' are invariant to the terms they leave unrestricted (constants; lines)", () => {
    expectSameStatistics(statistics(shifted(block, levelShift), 'constant'), statistics(block, 'constant'));
    expectSameStatistics(statistics(shifted(block, lineShift), 'trend'), statistics(block, 'trend'));
  });

  it("'restricted-constant' is not invariant to added lines (a trend is outside its span)", () => {
    const before = statistics(block, 'restricted-constant');
    const after = statistics(shifted(block, lineShift), 'restricted-constant');
    expect(Math.abs(after[0] - before[0])).toBeGreaterThan(0.01 * before[0]);
  });
});

describe('Johansen restricted cases: rank and relation recovered from seeded systems (T = 400, K = 1)', () => {
  it("'restricted-constant' finds the one relation y1 = 5 + 0.8 y2 - 0.4 y3 among driftless walks (seed 5201)", () => {
    const rng = new SeededRandom(5201);
    const y2 = randomWalk(rng, 400, { start: 30 });
    const y3 = randomWalk(rng, 400, { start: 10 });
    const u = autoregressive1(rng, 400, 0.5);
    const y1 = y2.map((v, t) => 5 + 0.8 * v - 0.4 * y3[t] + u[t]);
    const r = johansenTest([y1, y2, y3], { case: 'restricted-constant', lags: 1 }, ['Y1', 'Y2', 'Y3']);
    expect(r.rank.trace).toBe(1);
    expect(r.rank.maxEigen).toBe(1);
    expect(r.beta[1][0]).toBeCloseTo(-0.8, 1);
    expect(r.beta[2][0]).toBeCloseTo(0.4, 1);
    expect(Math.abs((r.deterministicInRelation as number[])[0] - -5)).toBeLessThan(1);
    expect(r.verdict).toContain('Y1, Y2 and Y3 share 1 long-run relation');
    expect(r.warnings.some((w) => w.includes("Mooring's own simulation"))).toBe(true);
  });

  it("'restricted-trend' finds the one relation y1 = 2 + 0.8 y2 - 0.4 y3 + 0.05 t among drifting walks (seed 5202)", () => {
    const rng = new SeededRandom(5202);
    const y2 = randomWalk(rng, 400, { start: 30, drift: 0.2 });
    const y3 = randomWalk(rng, 400, { start: 10, drift: -0.1 });
    const u = autoregressive1(rng, 400, 0.5);
    // the design's trend counts 1, 2, ... from the level x_{t-1} at data row K = 1, so data row t carries trend t
    const y1 = y2.map((v, t) => 2 + 0.8 * v - 0.4 * y3[t] + 0.05 * t + u[t]);
    const r = johansenTest([y1, y2, y3], { case: 'restricted-trend', lags: 1 });
    expect(r.rank.trace).toBe(1);
    expect(r.beta[1][0]).toBeCloseTo(-0.8, 1);
    expect(r.beta[2][0]).toBeCloseTo(0.4, 1);
    expect(Math.abs((r.deterministicInRelation as number[])[0] - -0.05)).toBeLessThan(0.01);
  });

  it("'restricted-trend' finds no relation among three independent drifting walks (seed 5203)", () => {
    const rng = new SeededRandom(5203);
    const block = [0.2, -0.1, 0.05].map((drift) => randomWalk(rng, 400, { drift }));
    const r = johansenTest(block, { case: 'restricted-trend', lags: 1 });
    expect(r.rank.trace).toBe(0);
    expect(r.verdict).toContain('share no long-run relation');
  });
});
