/**
 * The lead-lag tests' shortcuts against the plain route they replace:
 * - the Granger F from one Householder QR (the restricted regression as the leading block of the
 *   unrestricted one) against two separate least-squares fits of the restricted and the
 *   unrestricted regression, as the test was computed before;
 * - leadLag's shared lag order (pair-work.ts) against each direction run alone.
 * Data: our own seeded series (invented, for these checks only), including near-collinear pairs.
 */
import { describe, expect, it } from 'vitest';
import { grangerF } from '../../addin/causality/granger-f';
import { grangerTest } from '../../addin/causality/granger-test';
import { leadLag } from '../../addin/causality/lead-lag';
import { SeededRandom, autoregressive1, randomWalk } from '../../addin/random';
import { leastSquares } from '../../addin/regression/least-squares';
import { laggedColumn } from '../../addin/var/var-design';

/**
 * The F statistic and both sums of squares by two separate QR fits (the former route); with
 * `constantLast` false the unrestricted design takes the one-QR route's column order, so the
 * two orders' difference measures how far the plain route itself is from exact on this pair.
 */
function twoFitF(x: Float64Array, y: Float64Array, P: number, constantLast = true): { f: number; ssrR: number; ssrU: number } {
  const n = y.length - P;
  const own = Array.from({ length: P }, (_, j) => laggedColumn(y, j + 1, P, n));
  const other = Array.from({ length: P }, (_, j) => laggedColumn(x, j + 1, P, n));
  const response = y.slice(P);
  const constant = new Float64Array(n).fill(1);
  const r = leastSquares(response, [...own, constant], { withoutCovariance: true });
  const u = leastSquares(response, constantLast ? [...own, ...other, constant] : [...own, constant, ...other], { withoutCovariance: true });
  return { f: ((r.ssr - u.ssr) / P) / (u.ssr / u.dfResid), ssrR: r.ssr, ssrU: u.ssr };
}

function detail(result: { details: { key: string; value: unknown }[] }, key: string): number {
  return result.details.find((d) => d.key === key)?.value as number;
}

/** Pairs of every kind the F test meets: stationary, a leader and follower, prices, near-collinear. */
function pairs(): { label: string; x: Float64Array; y: Float64Array }[] {
  const rng = new SeededRandom(20250612);
  const out: { label: string; x: Float64Array; y: Float64Array }[] = [];
  for (let rep = 0; rep < 4; rep++) {
    const T = 300 + 700 * rep;
    const a = autoregressive1(rng, T, 0.6);
    const b = autoregressive1(rng, T, 0.3);
    out.push({ label: `independent AR(1), T = ${T}`, x: a, y: b });
    const follow = new Float64Array(T);
    const noise = rng.normals(T);
    for (let t = 2; t < T; t++) follow[t] = 0.4 * follow[t - 1] + 0.5 * a[t - 1] - 0.2 * a[t - 2] + noise[t];
    out.push({ label: `follower of an AR(1), T = ${T}`, x: a, y: follow });
    const walk = randomWalk(rng, T, { start: 100, sigma: 1 });
    const tied = new Float64Array(T);
    for (let t = 0; t < T; t++) tied[t] = 0.8 * walk[t] + 20 + 0.4 * noise[t];
    out.push({ label: `tied prices, T = ${T}`, x: walk, y: tied });
    // Near-collinear: the cause is the effect plus a whisper of noise (lags nearly duplicated).
    const near = new Float64Array(T);
    for (let t = 0; t < T; t++) near[t] = tied[t] + 1e-6 * noise[(t * 7) % T];
    out.push({ label: `near copy, T = ${T}`, x: near, y: tied });
  }
  return out;
}

describe('Granger F from one QR equals the two separate fits', () => {
  it('F and both sums of squares agree to 1e-12 relative, or as closely as the plain route agrees with itself under a reordering of its columns (near copies), at lags 1 to 6 (seed 20250612)', () => {
    let nearCopies = 0;
    for (const { label, x, y } of pairs()) {
      for (let P = 1; P <= 6; P++) {
        const fast = grangerF(x, y, { lags: P });
        const plain = twoFitF(x, y, P);
        const reordered = twoFitF(x, y, P, false);
        const gap = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);
        // The plain route's own rounding on this pair: its two column orders' distance, times 10.
        const own = (a: number, b: number): number => Math.max(1e-12, 10 * gap(a, b));
        if (own(reordered.ssrU, plain.ssrU) > 1e-12) nearCopies++;
        expect(gap(detail(fast, 'ssrUnrestricted'), plain.ssrU), `${label}, P = ${P}, SSR_u`).toBeLessThanOrEqual(own(reordered.ssrU, plain.ssrU));
        expect(gap(detail(fast, 'ssrRestricted'), plain.ssrR), `${label}, P = ${P}, SSR_r`).toBeLessThanOrEqual(1e-12);
        expect(gap(fast.statistic, plain.f), `${label}, P = ${P}, F`).toBeLessThanOrEqual(Math.max(own(reordered.f, plain.f), 1e-10));
      }
    }
    // The near copies are ill-conditioned enough that the yardstick matters (else the test checks less than it says).
    expect(nearCopies).toBeGreaterThan(0);
  });
});

describe('leadLag shares the lag order between the two directions', () => {
  it('each direction equals the same test run alone, for every method (seed 20250613)', () => {
    const rng = new SeededRandom(20250613);
    const T = 800;
    const walk = randomWalk(rng, T, { start: 50, sigma: 1 });
    const noise = rng.normals(T);
    const tied = new Float64Array(T);
    for (let t = 1; t < T; t++) tied[t] = 0.9 * walk[t - 1] + 5 + 0.5 * noise[t];
    tied[0] = 0.9 * walk[0] + 5;
    for (const method of ['f', 'ty'] as const) {
      for (const data of method === 'f' ? (['levels', 'changes'] as const) : (['auto'] as const)) {
        const both = leadLag(walk, tied, { method, data, orders: [1, 1] }, ['Walk', 'Tied']);
        const forward = grangerTest(walk, tied, { method: both.method, extraLags: 1 }, { cause: 'Walk', effect: 'Tied' });
        const reverse = grangerTest(tied, walk, { method: both.method, extraLags: 1 }, { cause: 'Tied', effect: 'Walk' });
        for (const [shared, alone] of [[both.aLeadsB.test, forward.test], [both.bLeadsA.test, reverse.test]]) {
          expect(shared.lags).toBe(alone.lags);
          expect(shared.nobs).toBe(alone.nobs);
          expect(Math.abs(shared.statistic - alone.statistic) / Math.abs(alone.statistic), `${method} ${data}`).toBeLessThan(1e-10);
          for (const d of alone.details) {
            if (typeof d.value === 'number' && d.value !== 0) {
              expect(Math.abs((detail(shared, d.key) - d.value) / d.value), `${method} ${data} ${d.key}`).toBeLessThan(1e-10);
            }
          }
        }
      }
    }
  });
});
