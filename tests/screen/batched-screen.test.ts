import { describe, expect, it } from 'vitest';
import { SeededRandom, autoregressive1, randomWalk } from '../../addin/random';
import { CANCELLATION_LIMIT, type LagKernel } from '../../addin/screen/batched/pair-lag-moments';
import { LAG_PRODUCTS_WASM } from '../../addin/screen/batched/lag-products-wasm';
import { SLOT, wasmLagArena } from '../../addin/screen/batched/wasm-lag-kernel';
import { crossLagProducts, levelLagProducts } from '../../addin/screen/batched/lag-cross-products';
import { FIELD, PAIR_STATUS, RECORD_SIZE } from '../../addin/screen/pair-record';
import { PairWorkspace } from '../../addin/screen/pair-relation';
import { screenChunkInto } from '../../addin/screen/screen-chunk';
import { resolveScreenOptions, type ScreenOptions } from '../../addin/screen/screen-options';
import { screenUniverse, unorderedPairCount, type NamedSeries } from '../../addin/screen/screen-universe';
import { generatedUniverse } from './generated-universe';

/**
 * The batched residual ADF (series-level lag products combined per pair) against the per-pair
 * path it replaces, which stays the reference: on every directed pair the status, the lag count,
 * the hedge ratio, intercept, R^2 and row counts are the same to the last bit, tau and the p-value
 * agree within 1e-10 (the agreement asked of the fast path), and the spread's half-life, speed and
 * z-score (from the combined sums as well) within 1e-9 relative, the screen's tolerance against
 * the single-pair functions. The universes carry no orders, so every pair is tested.
 */
function records(series: readonly NamedSeries[], options: ScreenOptions, products: 'batched' | 'per-pair', kernel: LagKernel = 'wasm') {
  const settings = resolveScreenOptions(options);
  const universe = screenUniverse(series);
  const pairs = unorderedPairCount(universe.names.length);
  const out = new Float64Array(2 * pairs * RECORD_SIZE);
  const workspace = new PairWorkspace(universe.rows, { products, kernel });
  screenChunkInto(universe, settings, 0, pairs, out, 0, workspace);
  return { out, directed: 2 * pairs, fallbacks: workspace.moments?.fallbacks ?? 0, kernel: workspace.moments?.kernelInUse };
}

/** Compares the two paths; returns the largest tau difference and the number of tested directed pairs. */
function compare(series: readonly NamedSeries[], options: ScreenOptions = {}, kernel: LagKernel = 'wasm') {
  const fast = records(series, options, 'batched', kernel);
  expect(fast.kernel).toBe(kernel); // Node runs WebAssembly SIMD, so the default kernel is the SIMD one
  const reference = records(series, options, 'per-pair');
  let worst = 0;
  let tested = 0;
  for (let d = 0; d < fast.directed; d++) {
    const at = d * RECORD_SIZE;
    for (let f = 0; f < RECORD_SIZE; f++) {
      if (f === FIELD.tau || f === FIELD.pValue) continue;
      const [a, b] = [fast.out[at + f], reference.out[at + f]];
      if (Object.is(a, b) || (Number.isNaN(a) && Number.isNaN(b))) continue;
      // The spread's sums come from the combination too: half-life, speed and z-score agree to 1e-9 relative.
      const close = (f === FIELD.halfLife || f === FIELD.speed || f === FIELD.zscore) && Math.abs(a - b) <= 1e-9 * Math.abs(b);
      if (!close) expect.fail(`directed pair ${d}, field ${f}: ${a} against ${b}`);
    }
    if (reference.out[at + FIELD.status] !== PAIR_STATUS.tested) continue;
    tested++;
    const gap = Math.abs(fast.out[at + FIELD.tau] - reference.out[at + FIELD.tau]);
    if (!(gap < 1e-10)) expect.fail(`directed pair ${d}: tau ${fast.out[at + FIELD.tau]} against ${reference.out[at + FIELD.tau]}`);
    expect(Math.abs(fast.out[at + FIELD.pValue] - reference.out[at + FIELD.pValue])).toBeLessThan(1e-10);
    worst = Math.max(worst, gap);
  }
  return { worst, tested, fallbacks: fast.fallbacks };
}

/** x a random walk; y_m = a + b x + e_m with e_m an AR(1) of size noise_m, so R^2 runs up to 1 - 1e-12 or so. */
function collinearUniverse(seed: number, T: number, noises: readonly number[]): NamedSeries[] {
  const rng = new SeededRandom(seed);
  const x = randomWalk(rng, T, { start: 50 });
  const out: NamedSeries[] = [{ name: 'x', values: x }];
  noises.forEach((noise, m) => {
    const e = autoregressive1(rng, T, 0.5, noise);
    const b = 0.5 + rng.uniform();
    out.push({ name: `y${m}`, values: x.map((v, t) => 3 + b * v + e[t]) });
  });
  return out;
}

describe('batched lag products', () => {
  it('the register-blocked products and the shifted level products equal plain sums (1e-12 relative)', () => {
    const rng = new SeededRandom(5);
    const T = 300;
    const di = rng.normals(T);
    const dj = rng.normals(T);
    const level = randomWalk(rng, T + 1, { start: 0 }); // its changes are e below
    const e = new Float64Array(T);
    for (let t = 0; t < T; t++) e[t] = level[t + 1] - level[t];
    for (const P of [0, 1, 3, 4, 7, 13]) {
      const [a, b] = [P, T - 2];
      const ij = new Float64Array(P + 1);
      const ji = new Float64Array(P + 1);
      crossLagProducts(di, dj, a, b, P, ij, ji);
      const eDj = new Float64Array(P + 1);
      crossLagProducts(e, dj, a, b, P, eDj, new Float64Array(P + 1));
      const levels = new Float64Array(P + 1);
      levelLagProducts(level, dj, eDj, a, b, P, levels);
      for (let k = 0; k <= P; k++) {
        let [p, q, l, scale] = [0, 0, 0, 0];
        for (let t = a; t <= b; t++) {
          p += di[t] * dj[t - k];
          q += dj[t] * di[t - k];
          l += level[t] * dj[t - k];
          scale += Math.abs(level[t] * dj[t - k]);
        }
        expect(Math.abs(ij[k] - p)).toBeLessThan(1e-12 * T);
        expect(Math.abs(ji[k] - q)).toBeLessThan(1e-12 * T);
        expect(Math.abs(levels[k] - l)).toBeLessThan(1e-12 * scale);
      }
    }
  });
});

describe('the SIMD kernel (WebAssembly)', () => {
  it('gives the products of the JavaScript loops (1e-12 relative) for odd and even row counts and every lag count', () => {
    const rng = new SeededRandom(6);
    for (const rows of [40, 41, 301]) {
      for (const P of [0, 1, 2, 3, 4, 5, 9, 13]) {
        const arena = wasmLagArena(rows, P);
        expect(arena).not.toBeNull();
        const di = arena!.slots[SLOT.changesI];
        const dj = arena!.slots[SLOT.changesJ];
        di.set(rng.normals(rows));
        dj.set(rng.normals(rows));
        const [a, b] = [P, rows - 2];
        arena!.crossLagProducts(SLOT.changesI, SLOT.changesJ, a, b, P);
        const ij = new Float64Array(P + 1);
        const ji = new Float64Array(P + 1);
        crossLagProducts(di, dj, a, b, P, ij, ji);
        for (let k = 0; k <= P; k++) {
          expect(Math.abs(arena!.ij[k] - ij[k])).toBeLessThan(1e-12 * rows);
          expect(Math.abs(arena!.ji[k] - ji[k])).toBeLessThan(1e-12 * rows);
        }
        let dot = 0;
        for (let t = a; t <= b; t++) dot += di[t] * dj[t];
        expect(Math.abs(arena!.dot(SLOT.changesI, SLOT.changesJ, a, b) - dot)).toBeLessThan(1e-12 * rows);
      }
    }
  });

  it('is small enough to compile synchronously on a browser main thread (the custom functions run there)', () => {
    // Chromium refuses new WebAssembly.Module on the main thread for modules over 4 KB (from memory:
    // its synchronous-compile limit); the kernel is compiled synchronously on every surface.
    expect(atob(LAG_PRODUCTS_WASM).length).toBeLessThan(4096);
  });

  it('is what scripts/build-wasm.mjs makes from assembly/lag-products.ts (the committed module is current)', async () => {
    const { compileKernel, moduleText, TARGET } = await import('../../scripts/build-wasm.mjs');
    const { readFileSync } = await import('node:fs');
    expect(readFileSync(TARGET, 'utf8')).toBe(moduleText(compileKernel()));
  }, 60_000);
});

describe('batched screen equals the per-pair path (tau within 1e-10, identical lags)', () => {
  it('on 3,540 directed pairs of 60 series of 500 rows (clusters and walks), AIC', () => {
    const universe = generatedUniverse(41, { clusters: 12, perCluster: 3, walks: 24, T: 500 });
    const { worst, tested } = compare(universe.series);
    expect(tested).toBeGreaterThan(3400);
    expect(worst).toBeLessThan(1e-10);
  });

  it('with the JavaScript loops in place of the SIMD kernel (hosts without WebAssembly SIMD)', () => {
    const universe = generatedUniverse(46, { clusters: 6, perCluster: 3, walks: 12, T: 600 });
    expect(compare(universe.series, {}, 'js').tested).toBeGreaterThan(800);
  });

  it('on 380 directed pairs of 20 series of 2,520 rows (27 lags), and with BIC, the t-rule and a fixed 5 lags', () => {
    const universe = generatedUniverse(42, { clusters: 4, perCluster: 3, walks: 8, T: 2520 });
    expect(compare(universe.series).tested).toBe(380);
    for (const lags of ['bic', 'tstat', 5] as const) expect(compare(universe.series.slice(0, 10), { lags }).tested).toBe(90);
  });

  it('with gaps (those pairs take the per-pair path) beside complete series', () => {
    const universe = generatedUniverse(43, { clusters: 2, perCluster: 3, walks: 4, T: 400 });
    const gapped = universe.series.map((s, j) => ({ name: s.name, values: Array.from(s.values, (v, t) => (j % 3 === 0 && (t + j) % 17 === 0 ? null : v)) }));
    expect(compare(gapped).tested).toBe(90);
  });

  it('on near-collinear pairs: below the cancellation limit the batched path holds its digits; past it the per-pair path is taken', () => {
    // Stationary parts from 3 down to 0.012 of the walk's step: 1 - R^2 from about 0.5 down to 5e-6,
    // the smallest just short of an exact fit (R^2 >= 1 - 100 sqrt(eps), not tested).
    const noises = [3, 1, 0.3, 0.1, 0.05, 0.03, 0.02, 0.015, 0.012];
    const series = collinearUniverse(44, 800, noises);
    const { worst, tested, fallbacks } = compare(series);
    expect(tested).toBeGreaterThan(80);
    expect(worst).toBeLessThan(1e-10);
    // The fallback is taken on the most collinear pairs and only there.
    expect(fallbacks).toBeGreaterThan(0);
    expect(fallbacks).toBeLessThan(tested / 2);
  });

  it('the cancellation measure follows the pair: x against a copy with noise 0.03 (1 - R^2 about 5e-6) falls back both ways, against one with noise 1 does not', () => {
    const close = collinearUniverse(45, 800, [0.03]);
    const loose = collinearUniverse(45, 800, [1]);
    const closeAnswer = compare(close);
    expect(closeAnswer.tested).toBe(2);
    expect(closeAnswer.fallbacks).toBe(2);
    expect(compare(loose).fallbacks).toBe(0);
    expect(CANCELLATION_LIMIT).toBeGreaterThan(1);
  });
});
