/**
 * The exact diffuse start against its definition: the limit of an ordinary Kalman filter started
 * at P_1 = kappa I as kappa grows (Durbin & Koopman 2012, section 5.1). An ordinary filter written
 * here from the textbook recursions (section 4.3) with kappa = 1e6 must agree with the exact one
 * to about 1/kappa after the set-up rows; the log-likelihoods differ by the known diffuse
 * constant, log kappa for each set-up row (section 7.2.2). Includes a design that repeats on the
 * first two rows (x_1 = x_2), where the set-up takes three rows, and prices near 100 whose first
 * steps are small (x_2 - x_1 = 0.05), where F_inf is tiny but not zero.
 */
import { describe, expect, it } from 'vitest';
import { diffuseFilter } from '../../addin/kalman/diffuse-filter';
import { diffuseSmoother } from '../../addin/kalman/diffuse-smoother';
import { movingHedge } from '../../addin/kalman/moving-hedge';
import { randomWalk, SeededRandom } from '../../addin/random';

/** Ordinary filter and RTS smoother with P_1 = kappa I: filtered slope, smoothed slope, log-likelihood. */
function bigKappa(y: number[], x: number[], q: number, r: number, kappa: number) {
  const n = y.length;
  let a = [0, 0];
  let P = [[kappa, 0], [0, kappa]];
  const pred: { a: number[]; P: number[][] }[] = [];
  const filt: { a: number[]; P: number[][] }[] = [];
  let ll = 0;
  for (let t = 0; t < n; t++) {
    pred.push({ a: [...a], P: P.map((row) => [...row]) });
    const z = [1, x[t]];
    const m = [P[0][0] + P[0][1] * z[1], P[1][0] + P[1][1] * z[1]];
    const F = m[0] + m[1] * z[1] + r;
    const v = y[t] - a[0] - a[1] * z[1];
    a = [a[0] + (m[0] / F) * v, a[1] + (m[1] / F) * v];
    P = [[P[0][0] - (m[0] * m[0]) / F, P[0][1] - (m[0] * m[1]) / F], [P[1][0] - (m[1] * m[0]) / F, P[1][1] - (m[1] * m[1]) / F]];
    filt.push({ a: [...a], P: P.map((row) => [...row]) });
    ll += -0.5 * (Math.log(2 * Math.PI) + Math.log(F) + (v * v) / F);
    P = [[P[0][0] + q, P[0][1]], [P[1][0], P[1][1] + q]];
  }
  // Rauch-Tung-Striebel with the identity transition: s_t = f_t + Pf_t Pp_{t+1}^{-1} (s_{t+1} - a_{t+1}).
  const smooth = new Array<number[]>(n);
  smooth[n - 1] = filt[n - 1].a;
  for (let t = n - 2; t >= 0; t--) {
    const Pp = pred[t + 1].P;
    const det = Pp[0][0] * Pp[1][1] - Pp[0][1] * Pp[1][0];
    const inv = [[Pp[1][1] / det, -Pp[0][1] / det], [-Pp[1][0] / det, Pp[0][0] / det]];
    const Pf = filt[t].P;
    const J = [[Pf[0][0] * inv[0][0] + Pf[0][1] * inv[1][0], Pf[0][0] * inv[0][1] + Pf[0][1] * inv[1][1]], [Pf[1][0] * inv[0][0] + Pf[1][1] * inv[1][0], Pf[1][0] * inv[0][1] + Pf[1][1] * inv[1][1]]];
    const d = [smooth[t + 1][0] - pred[t + 1].a[0], smooth[t + 1][1] - pred[t + 1].a[1]];
    smooth[t] = [filt[t].a[0] + J[0][0] * d[0] + J[0][1] * d[1], filt[t].a[1] + J[1][0] * d[0] + J[1][1] * d[1]];
  }
  return { filteredSlope: filt.map((f) => f.a[1]), smoothedSlope: smooth.map((s) => s[1]), logLikelihood: ll };
}

function pairOf(seed: number, n: number, start: number): { y: number[]; x: number[] } {
  const rng = new SeededRandom(seed);
  const x = Array.from(randomWalk(rng, n, { start, sigma: 0.3 }));
  const y = x.map((v, t) => 0.5 + (1 + 0.002 * t) * v + 0.2 * rng.normal());
  return { y, x };
}

describe('exact diffuse start = the limit of a large starting variance', () => {
  const kappa = 1e6;
  const cases = [
    { name: 'a seeded pair around 2 (seed 31)', ...pairOf(31, 120, 2) },
    { name: 'the same with x_1 = x_2 (the design repeats)', ...(() => { const p = pairOf(31, 120, 2); p.x[1] = p.x[0]; return p; })() },
  ];
  for (const c of cases) {
    it(c.name, () => {
      const q = 1e-4;
      const r = 0.04;
      const exact = diffuseFilter({ y: c.y, x: c.x, stateVar: q, obsVar: r });
      const smooth = diffuseSmoother(exact, c.x);
      const approx = bigKappa(c.y, c.x, q, r, kappa);
      const d = exact.diffuseRows;
      expect(d).toBe(c.x[1] === c.x[0] ? 3 : 2);
      for (let t = d; t < c.y.length; t++) {
        expect(Math.abs(exact.filteredB[t] - approx.filteredSlope[t])).toBeLessThan(1e-4);
        expect(Math.abs(smooth.slope[t] - approx.smoothedSlope[t])).toBeLessThan(1e-4);
      }
      for (let t = 0; t < d; t++) expect(Math.abs(smooth.slope[t] - approx.smoothedSlope[t])).toBeLessThan(1e-4);
      // Each set-up row's term differs by log kappa (F = kappa F_inf + O(1)): the diffuse constant.
      expect(Math.abs(approx.logLikelihood + 0.5 * exact.diffuseSteps * Math.log(kappa) - exact.logLikelihood)).toBeLessThan(1e-3);
    });
  }

  it('prices near 100 with a first step of 0.05: two set-up rows, finite paths, and Q, R estimated', () => {
    const p = pairOf(32, 300, 100);
    p.x[1] = p.x[0] + 0.05;
    const got = movingHedge(p.y, p.x, { y: 'y', x: 'x' });
    expect(got.diffuseRows).toBe(2);
    expect(got.beta.slice(1).every((v) => Number.isFinite(v))).toBe(true);
    expect(got.betaSmoothed.every((v) => Number.isFinite(v))).toBe(true);
    expect(got.spreadStandardised.slice(2).every((v) => Number.isFinite(v))).toBe(true);
  });
});
