import { describe, expect, it } from 'vitest';
import { SeededRandom, autoregressive1, randomWalk } from '../../addin/random';
import { chooseVarLags } from '../../addin/var/choose-var-lags';
import { nestedVarResiduals } from '../../addin/var/nested-var-residuals';
import { varChangeGram } from '../../addin/var/var-change-gram';
import { varLagCrossProductsByQr } from '../../addin/var/var-lag-cross-products-qr';
import { varLagGram } from '../../addin/var/var-lag-gram';

/**
 * The VAR lag search in the changes form ([1, y_{t-1}, Δy_{t-1..t-M+1}] explaining Δy_t, the
 * same residuals as the levels form; Hamilton 1994, sec. 17.7) against the direct products of
 * that design and against the Householder QR of the levels design. Seeded data. Tolerances:
 * the Gram matrix to 1e-11 of n; E'E to 1e-9 of sqrt(E'E_aa E'E_bb); ln|Sigma| to 1e-10.
 */

function dot(a: ArrayLike<number>, b: ArrayLike<number>): number {
  let s = 0;
  for (let i = 0; i < a.length; i++) s += a[i] * b[i];
  return s;
}

/** The conditioning of var-change-gram.ts done the plain way: levels mean-free at unit RMS, changes mean-free. */
function conditioned(x: Float64Array): { level: Float64Array; change: Float64Array; scale: number } {
  const mean = x.reduce((s, v) => s + v, 0) / x.length;
  const centred = x.map((v) => v - mean);
  const scale = Math.sqrt(centred.reduce((s, v) => s + v * v, 0) / x.length);
  const level = centred.map((v) => v / scale);
  const change = new Float64Array(x.length);
  for (let t = 1; t < x.length; t++) change[t] = level[t] - level[t - 1];
  const m = change.reduce((s, v) => s + v, 0) / (x.length - 1);
  for (let t = 1; t < x.length; t++) change[t] -= m;
  return { level, change, scale };
}

describe('VAR lag search, changes form', () => {
  it('its cross products equal the direct products of [1, y_{t-1}, Δy lags 1..M-1] with Δy_t, to 1e-11 of n', () => {
    const rng = new SeededRandom(71);
    const block = [randomWalk(rng, 300, { start: 40 }), rng.normals(300).map((v) => 5 + 3 * v)];
    const M = 5;
    const T = 300;
    const g = varChangeGram(block, M);
    const c = block.map(conditioned);
    const rows = (f: (t: number) => number): Float64Array => Float64Array.from({ length: T - M }, (_, r) => f(r + M));
    const columns: Float64Array[] = [rows(() => 1)];
    for (let a = 0; a < 2; a++) columns.push(rows((t) => c[a].level[t - 1]));
    for (let lag = 1; lag < M; lag++) for (let a = 0; a < 2; a++) columns.push(rows((t) => c[a].change[t - lag]));
    const responses = [0, 1].map((a) => rows((t) => c[a].change[t]));
    expect(g.k).toBe(columns.length);
    const tol = 1e-11 * g.n;
    for (let i = 0; i < g.k; i++) {
      for (let j = 0; j < g.k; j++) expect(Math.abs(g.xtx[i * g.k + j] - dot(columns[i], columns[j]))).toBeLessThan(tol);
      responses.forEach((y, a) => expect(Math.abs(g.xty[i * 2 + a] - dot(columns[i], y))).toBeLessThan(tol));
    }
    responses.forEach((ya, a) => responses.forEach((yb, b) => expect(Math.abs(g.yty[a * 2 + b] - dot(ya, yb))).toBeLessThan(tol)));
  });

  it.each([
    ['two random walks, 3,000 rows', 3_000, 2, 18],
    ['three random walks, 1,000 rows', 1_000, 3, 10],
    ['a walk and its follower, 20,000 rows', 20_000, 2, 25],
  ])('%s: every order\'s E\'E equals the QR path\'s, to 1e-9', (_name, T, K, M) => {
    const rng = new SeededRandom(T + K);
    const walk = randomWalk(rng, T, { start: 100 });
    const block = [walk, ...Array.from({ length: K - 1 }, (_, i) => (i === 0 && K === 2 ? walk.map((v, t) => (t === 0 ? v : 0.5 * walk[t - 1] + 0.5 * v) + rng.normal()) : randomWalk(rng, T, { start: 50 })))];
    const g = varChangeGram(block, M);
    const fromGram = nestedVarResiduals(g, K, M);
    expect(fromGram).not.toBeNull();
    fromGram![0] = g.orderZero;
    const scales = block.map((x) => conditioned(x).scale);
    const fromQr = varLagCrossProductsByQr(block, M, block.map((_, a) => `s${a}`));
    fromQr.forEach((e, p) => {
      for (let a = 0; a < K; a++) {
        for (let b = 0; b < K; b++) {
          const undone = fromGram![p][a * K + b] * scales[a] * scales[b];
          expect(Math.abs(undone - e[a * K + b]) / Math.sqrt(e[a * K + a] * e[b * K + b])).toBeLessThan(1e-9);
        }
      }
    });
  });

  it('on 50,000 rows of a tied pair of prices the levels form declines and the changes form gives the QR orders and ln|Sigma| to 1e-10', () => {
    const rng = new SeededRandom(5);
    const walk = randomWalk(rng, 50_000, { start: 5_000, sigma: 0.5 });
    const gap = autoregressive1(rng, 50_000, 0.97, 0.4);
    const block = [walk, walk.map((v, t) => 0.8 * v + 20 + gap[t])];
    const fast = chooseVarLags(block);
    expect(nestedVarResiduals(varLagGram(block, fast.maxLags), 2, fast.maxLags)).toBeNull();
    const qr = chooseVarLags(block, { method: 'qr' });
    expect({ aic: fast.aic, bic: fast.bic, hq: fast.hq, fpe: fast.fpe }).toEqual({ aic: qr.aic, bic: qr.bic, hq: qr.hq, fpe: qr.fpe });
    fast.table.forEach((row, p) => expect(Math.abs(row.logDetSigma - qr.table[p].logDetSigma)).toBeLessThan(1e-10));
  });

  it('a smooth curve with tiny noise (change lags nearly collinear) is declined, so the search takes another path', () => {
    const rng = new SeededRandom(6);
    const block = [Float64Array.from({ length: 2_000 }, (_, t) => Math.sin(t / 80) + 1e-9 * rng.normal()), Float64Array.from({ length: 2_000 }, (_, t) => Math.cos(t / 60) + 1e-9 * rng.normal())];
    expect(nestedVarResiduals(varChangeGram(block, 12), 2, 12)).toBeNull();
    expect(chooseVarLags(block, { maxLags: 12 })).toEqual(chooseVarLags(block, { method: 'qr', maxLags: 12 }));
  });
});
