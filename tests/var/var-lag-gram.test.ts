import { describe, expect, it } from 'vitest';
import { MooringInputError } from '../../addin/errors';
import { SeededRandom, randomWalk } from '../../addin/random';
import { chooseVarLags, defaultVarMaxLags } from '../../addin/var/choose-var-lags';
import { nestedVarResiduals } from '../../addin/var/nested-var-residuals';
import { varDesign } from '../../addin/var/var-design';
import { varLagCrossProductsByQr } from '../../addin/var/var-lag-cross-products-qr';
import { varLagGram } from '../../addin/var/var-lag-gram';

/**
 * The fast route of the VAR lag search (shifted cross products, one Cholesky) against the
 * direct products of the design and against the Householder QR route it replaces. Seeded data;
 * tolerances: the Gram matrix to 1e-11 of its scale; the criteria to 1e-9 relative, measured
 * against max(|value|, 1) because AIC, BIC and HQ are logarithms that can pass through zero
 * (where a relative difference means nothing); ln|Sigma| to 1e-10 absolute.
 */

/** |a - b| / max(|b|, 1): relative for values of size 1 or more, absolute below. */
function relative(a: number, b: number): number {
  return Math.abs(a - b) / Math.max(Math.abs(b), 1);
}

function noise(rng: SeededRandom, n: number): Float64Array {
  const out = new Float64Array(n);
  for (let i = 0; i < n; i++) out[i] = rng.normal();
  return out;
}

/** Mean-free, unit root-mean-square copy of a series (the conditioning the Gram path applies). */
function conditioned(x: Float64Array): { values: Float64Array; scale: number } {
  const mean = x.reduce((s, v) => s + v, 0) / x.length;
  const centred = x.map((v) => v - mean);
  const scale = Math.sqrt(centred.reduce((s, v) => s + v * v, 0) / x.length);
  return { values: centred.map((v) => v / scale), scale };
}

function dot(a: ArrayLike<number>, b: ArrayLike<number>): number {
  let s = 0;
  for (let i = 0; i < a.length; i++) s += a[i] * b[i];
  return s;
}

/** Seeded systems of the kinds the search meets: noise, random walks (prices), a cointegrated set. */
function systems(): { name: string; block: Float64Array[] }[] {
  const rng = new SeededRandom(2024);
  const walk = randomWalk(rng, 2_500, { start: 100 });
  const common = randomWalk(rng, 300);
  return [
    { name: 'white noise, 2 series, 120 rows', block: [noise(rng, 120), noise(rng, 120)] },
    { name: 'white noise, 3 series, 400 rows', block: [noise(rng, 400), noise(rng, 400), noise(rng, 400)] },
    { name: 'random walks, 2 series, 2,500 rows', block: [walk, randomWalk(rng, 2_500, { start: 50 })] },
    { name: 'a random walk and its noisy follower, 2,500 rows', block: [walk, walk.map((v, i) => (i === 0 ? v : 0.5 * walk[i - 1] + 0.5 * v) + rng.normal())] },
    { name: 'random walks, 4 series, 300 rows', block: [randomWalk(rng, 300), randomWalk(rng, 300), randomWalk(rng, 300), randomWalk(rng, 300)] },
    { name: 'cointegrated triple, 300 rows', block: [common, common.map((v) => 2 * v + rng.normal()), common.map((v) => -v + 3 + rng.normal())] },
  ];
}

describe('VAR lag Gram matrix', () => {
  it('equals the direct cross products of the conditioned design [1, lags 1..M] and responses, to 1e-11 of n', () => {
    const rng = new SeededRandom(7);
    const block = [randomWalk(rng, 200, { start: 40 }), noise(rng, 200).map((v) => 5 + 3 * v)];
    const M = 6;
    const gram = varLagGram(block, M);
    const cond = block.map(conditioned);
    const design = varDesign(cond.map((c) => c.values), M, 'const', M, ['a', 'b']);
    const k = design.columns.length;
    expect(gram.k).toBe(k);
    expect(gram.n).toBe(200 - M);
    const tol = 1e-11 * gram.n;
    for (let i = 0; i < k; i++) {
      for (let j = 0; j < k; j++) expect(Math.abs(gram.xtx[i * k + j] - dot(design.columns[i], design.columns[j]))).toBeLessThan(tol);
      design.responses.forEach((y, a) => expect(Math.abs(gram.xty[i * 2 + a] - dot(design.columns[i], y))).toBeLessThan(tol));
    }
    design.responses.forEach((ya, a) =>
      design.responses.forEach((yb, b) => expect(Math.abs(gram.yty[a * 2 + b] - dot(ya, yb))).toBeLessThan(tol)),
    );
    expect(gram.logScale).toBeCloseTo(2 * Math.log(cond[0].scale) + 2 * Math.log(cond[1].scale), 12);
  });

  it('its nested Cholesky gives the QR residual cross products once the scales are undone, to 1e-9 relative', () => {
    const rng = new SeededRandom(8);
    const block = [randomWalk(rng, 500), randomWalk(rng, 500), noise(rng, 500)];
    const M = 9;
    const scales = block.map((x) => conditioned(x).scale);
    const fromGram = nestedVarResiduals(varLagGram(block, M), 3, M);
    expect(fromGram).not.toBeNull();
    const fromQr = varLagCrossProductsByQr(block, M, ['a', 'b', 'c']);
    fromQr.forEach((e, p) => {
      for (let a = 0; a < 3; a++) {
        for (let b = 0; b < 3; b++) {
          const undone = fromGram![p][a * 3 + b] * scales[a] * scales[b];
          expect(Math.abs(undone - e[a * 3 + b]) / Math.sqrt(e[a * 3 + a] * e[b * 3 + b])).toBeLessThan(1e-9);
        }
      }
    });
  });
});

describe('VAR lag order: the Gram path gives the QR path\'s answers', () => {
  for (const { name, block } of systems()) {
    it(`${name}: the Gram path is taken, same orders, all four criteria to 1e-9, ln|Sigma| to 1e-10`, () => {
      const M = defaultVarMaxLags(block[0].length, block.length);
      expect(nestedVarResiduals(varLagGram(block, M), block.length, M)).not.toBeNull();
      const fast = chooseVarLags(block);
      const qr = chooseVarLags(block, { method: 'qr' });
      expect(fast.maxLags).toBe(M);
      expect({ aic: fast.aic, bic: fast.bic, hq: fast.hq, fpe: fast.fpe }).toEqual({ aic: qr.aic, bic: qr.bic, hq: qr.hq, fpe: qr.fpe });
      fast.table.forEach((row, p) => {
        for (const key of ['aic', 'bic', 'hq', 'fpe'] as const) expect(relative(row[key], qr.table[p][key])).toBeLessThan(1e-9);
        expect(Math.abs(row.logDetSigma - qr.table[p].logDetSigma)).toBeLessThan(1e-10);
      });
    });
  }

  it('rescaling a series by c moves every ln|Sigma| by 2 ln c and leaves the orders alone', () => {
    const rng = new SeededRandom(31);
    const block = [randomWalk(rng, 600), randomWalk(rng, 600)];
    const base = chooseVarLags(block);
    const scaled = chooseVarLags([block[0].map((v) => 250 * v), block[1]]);
    expect({ aic: scaled.aic, bic: scaled.bic, hq: scaled.hq }).toEqual({ aic: base.aic, bic: base.bic, hq: base.hq });
    scaled.table.forEach((row, p) => expect(row.logDetSigma - base.table[p].logDetSigma).toBeCloseTo(2 * Math.log(250), 9));
  });
});

describe('VAR lag order: where the Gram path declines', () => {
  it('a straight trend with tiny noise (lags nearly collinear) goes to the QR path, with the QR answers exactly', () => {
    const rng = new SeededRandom(12);
    const block = [noise(rng, 2_500).map((v, i) => i + 0.01 * v), noise(rng, 2_500).map((v, i) => 2 * i + 0.01 * v)];
    const M = defaultVarMaxLags(2_500, 2);
    expect(nestedVarResiduals(varLagGram(block, M), 2, M)).toBeNull();
    expect(chooseVarLags(block)).toEqual(chooseVarLags(block, { method: 'qr' }));
  });

  it('a duplicated series and a constant series are refused by the QR path\'s message', () => {
    const rng = new SeededRandom(13);
    const x = randomWalk(rng, 100);
    expect(() => chooseVarLags([x, x], { names: ['A', 'B'] })).toThrow(MooringInputError);
    expect(() => chooseVarLags([x, x], { names: ['A', 'B'] })).toThrow(/cannot separate 'B lag 1'/);
    expect(() => chooseVarLags([x, new Float64Array(100).fill(3)], { names: ['A', 'B'] })).toThrow(/cannot separate 'B lag 1'/);
  });
});
