/**
 * The concentrated moments from cross products and one Cholesky factorisation (the route
 * johansenTest takes) against the Householder QR route they replaced (momentsByQr, kept as the
 * fallback and as the reference here), on seeded systems: independent walks, walks near 100
 * that move by cents ("tight"), cointegrated systems, and the benchmark's block, in all five
 * deterministic cases with K = 0, 1, 2, 4 lagged changes.
 *
 * Measures and tolerances:
 * - S00, S01, S11: |difference| / sqrt(S_ii S_jj) below 1e-12 (each entry against the two
 *   columns' own residual sums of squares, the scale the rounding of either route has); 5e-12 on
 *   the tight walks, where the gap is the QR route's own error (below).
 * - eigenvalues: |difference| below 5e-12 times the largest eigenvalue on independent walks and
 *   the benchmark's block, 2e-11 on the cointegrated and tight systems. Both routes feed the same symmetric eigenproblem, which amplifies a difference in S
 *   by the conditioning of S11 and S00; there the QR route's own answer moves too: measured with
 *   mpmath at 50 digits on the tight walks (6 series, 60 rows, K = 4, 'restricted-trend'), the
 *   Cholesky route's S11 is 1.2e-15 from the exact value and the QR route's 1.3e-12 (its
 *   Householder steps carry the prices' uncentred size), and at 40 digits on a cointegrated
 *   system (3 series, 2,500 rows, K = 1, 'none') the largest eigenvalue from QR is 4.4e-11 from
 *   the exact value and from the cross products 1.2e-11. The tolerances are our own choice.
 * - trace and maximum-eigenvalue statistics: relative, with a floor of 1 in the denominator
 *   (as in johansen-reference.test.ts), the same bounds as the eigenvalues.
 * Near-collinear designs must not take the Cholesky route: they get the QR route's answer
 * exactly, or its refusal word for word.
 */
import { describe, expect, it } from 'vitest';
import type { Matrix } from 'ml-matrix';
import { benchBlock } from '../../addin/bench/johansen-bench';
import { MooringInputError } from '../../addin/errors';
import { momentsByCholesky, momentsByQr } from '../../addin/johansen/concentrated-moments';
import type { JohansenCase } from '../../addin/johansen/deterministic-case';
import { johansenTest } from '../../addin/johansen/johansen';
import { johansenDesign, type JohansenDesign } from '../../addin/johansen/johansen-design';
import { reducedRankRegression, reducedRankRegressionByQr } from '../../addin/johansen/reduced-rank-regression';
import { powerOfTwoScale, scaled } from '../../addin/linalg/power-of-two-scale';
import { SeededRandom, autoregressive1, randomWalk } from '../../addin/random';

const CASES: JohansenCase[] = ['none', 'restricted-constant', 'constant', 'restricted-trend', 'trend'];

type Kind = 'walks' | 'tight' | 'cointegrated';

function system(seed: number, m: number, T: number, kind: Kind): Float64Array[] {
  const rng = new SeededRandom(seed);
  const walks = Array.from({ length: m }, () => randomWalk(rng, T, { start: 100, drift: 0.02 }));
  if (kind === 'walks') return walks;
  if (kind === 'tight') return walks.map((w) => w.map((v) => 100 + 0.01 * v));
  const out = walks.slice(0, Math.ceil(m / 2));
  while (out.length < m) {
    const noise = autoregressive1(rng, T, 0.5);
    const a = out[out.length - 1];
    out.push(a.map((v, t) => 0.8 * v + 3 + noise[t]));
  }
  return out;
}

/** The design as johansenTest builds it (each series brought near one by a power of two). */
function designOf(raw: Float64Array[], K: number, c: JohansenCase): JohansenDesign {
  const block = raw.map((s) => scaled(s, powerOfTwoScale(s)));
  return johansenDesign(block, K, c, raw.map((_, i) => `s${i}`));
}

function normalisedGap(a: Matrix, b: Matrix, rowScale: number[], columnScale: number[]): number {
  let worst = 0;
  for (let i = 0; i < a.rows; i++) {
    for (let j = 0; j < a.columns; j++) worst = Math.max(worst, Math.abs(a.get(i, j) - b.get(i, j)) / Math.sqrt(rowScale[i] * columnScale[j]));
  }
  return worst;
}

function diagonal(s: Matrix): number[] {
  return Array.from({ length: s.rows }, (_, i) => s.get(i, i));
}

/** Largest gap of the eigenvalues (against the largest) and of the statistics (floor 1) between two fits. */
function resultGap(d: JohansenDesign): { eigen: number; statistic: number } {
  const fast = reducedRankRegression(d);
  const reference = reducedRankRegressionByQr(d);
  const m = d.changes.length;
  const n = d.nobs;
  let eigen = 0;
  let statistic = 0;
  for (let r = 0; r < m; r++) {
    eigen = Math.max(eigen, Math.abs(fast.eigenvalues[r] - reference.eigenvalues[r]) / reference.eigenvalues[0]);
    const maxFast = -n * Math.log1p(-fast.eigenvalues[r]);
    const maxReference = -n * Math.log1p(-reference.eigenvalues[r]);
    statistic = Math.max(statistic, Math.abs(maxFast - maxReference) / Math.max(1, Math.abs(maxReference)));
    let traceFast = 0;
    let traceReference = 0;
    for (let j = r; j < m; j++) {
      traceFast -= n * Math.log1p(-fast.eigenvalues[j]);
      traceReference -= n * Math.log1p(-reference.eigenvalues[j]);
    }
    statistic = Math.max(statistic, Math.abs(traceFast - traceReference) / Math.max(1, Math.abs(traceReference)));
  }
  return { eigen, statistic };
}

describe('Johansen moments: cross products with one Cholesky against Householder QR', () => {
  const grid: { kind: Kind; m: number; T: number; K: number; c: JohansenCase }[] = [];
  for (const kind of ['walks', 'tight', 'cointegrated'] as const) {
    for (const m of [2, 3, 6]) {
      for (const T of [60, 500, 2500]) {
        for (const K of [0, 1, 2, 4]) for (const c of CASES) grid.push({ kind, m, T, K, c });
      }
    }
  }
  const usable = grid.filter(({ m, T, K, c }) => {
    const d = designOf(system(1, m, T, 'walks'), K, c);
    return d.nobs - d.shortRun.length >= d.levels.length + m + 1;
  });

  it(`takes the Cholesky route on most of the ${usable.length} seeded designs (so the comparisons below compare something)`, () => {
    const taken = usable.filter(({ kind, m, T, K, c }) => momentsByCholesky(designOf(system(1000 + m * 7 + T + K, m, T, kind), K, c)) !== null);
    expect(taken.length).toBeGreaterThan(usable.length / 2);
  });

  it.each(usable.map((g) => [`${g.kind}, ${g.m} series x ${g.T}, K = ${g.K}, ${g.c}`, g] as const))('%s: S00, S01, S11 to 1e-12, eigenvalues and statistics within bounds', (_, { kind, m, T, K, c }) => {
    const d = designOf(system(1000 + m * 7 + T + K, m, T, kind), K, c);
    const fast = momentsByCholesky(d);
    if (fast === null) {
      // The fallback: the answer is the QR route's, to the last bit.
      expect(reducedRankRegression(d)).toEqual(reducedRankRegressionByQr(d));
      return;
    }
    const reference = momentsByQr(d);
    const d0 = diagonal(reference.s00);
    const d1 = diagonal(reference.s11);
    const momentBound = kind === 'tight' ? 5e-12 : 1e-12;
    expect(normalisedGap(fast.s00, reference.s00, d0, d0)).toBeLessThan(momentBound);
    expect(normalisedGap(fast.s01, reference.s01, d0, d1)).toBeLessThan(momentBound);
    expect(normalisedGap(fast.s11, reference.s11, d1, d1)).toBeLessThan(momentBound);
    const bound = kind === 'walks' ? 5e-12 : 2e-11;
    const gap = resultGap(d);
    expect(gap.eigen).toBeLessThan(bound);
    expect(gap.statistic).toBeLessThan(bound);
  });

  it.each(CASES)("the benchmark's block (6 x 2,500, K = 2), %s: the Cholesky route where the levels allow it, eigenvalues and statistics to 5e-12", (c) => {
    const d = designOf(benchBlock(), 2, c);
    // Without a constant to centre on, six prices near 100 are nearly collinear through their
    // common level, and the QR route answers.
    if (c === 'none' || c === 'restricted-constant') expect(momentsByCholesky(d)).toBeNull();
    else expect(momentsByCholesky(d)).not.toBeNull();
    const gap = resultGap(d);
    expect(gap.eigen).toBeLessThan(5e-12);
    expect(gap.statistic).toBeLessThan(5e-12);
  });
});

describe('near-collinear systems keep the QR route: its answer exactly, or its refusal', () => {
  const rng = new SeededRandom(1616);
  const a = randomWalk(rng, 400, { start: 100 });
  const b = randomWalk(rng, 400, { start: 60 });
  const noise = rng.normals(400);

  /** A fit, or the refusal's words. */
  function outcome(run: () => unknown): unknown {
    try {
      return run();
    } catch (e) {
      expect(e).toBeInstanceOf(MooringInputError);
      return (e as Error).message;
    }
  }

  it.each([1e-2, 1e-4, 1e-7])('a third series 0.6 a + 0.4 b + %s noise: no Cholesky answer; the QR answer to the last bit, or its refusal', (size) => {
    const tied = a.map((v, t) => 0.6 * v + 0.4 * b[t] + size * noise[t]);
    for (const c of CASES) {
      const d = designOf([a, b, tied], 2, c);
      expect(momentsByCholesky(d)).toBeNull();
      expect(outcome(() => reducedRankRegression(d))).toEqual(outcome(() => reducedRankRegressionByQr(d)));
    }
  });

  function refusalOf(run: () => unknown): string {
    try {
      run();
    } catch (e) {
      expect(e).toBeInstanceOf(MooringInputError);
      return (e as Error).message;
    }
    throw new Error('expected a refusal');
  }

  it.each([
    ['an exact combination of two others', () => [a, b, a.map((v, t) => v + 2 * b[t])], 'constant', 1],
    ['a duplicated series with no lags and no constant', () => [a, b, Float64Array.from(b)], 'none', 0],
    ['another series plus a constant', () => [a, a.map((v) => v + 3)], 'none', 0],
    ['another series plus a constant, constant case', () => [a, b, a.map((v) => v + 3)], 'constant', 2],
    ['a series on a straight line plus another', () => [a, a.map((v, t) => v + 0.5 * t)], 'restricted-trend', 1],
  ] as const)('%s: the same refusal as the QR route, word for word', (_, make, c, K) => {
    const raw = make() as Float64Array[];
    const d = designOf(raw, K, c as JohansenCase);
    const expected = refusalOf(() => reducedRankRegressionByQr(d));
    expect(refusalOf(() => reducedRankRegression(d))).toBe(expected);
    expect(refusalOf(() => johansenTest(raw, { case: c as JohansenCase, lags: K }, raw.map((_, i) => `s${i}`)))).toBe(expected);
  });
});
