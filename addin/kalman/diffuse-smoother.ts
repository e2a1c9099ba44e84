/**
 * The state smoother for the wandering line (diffuse-filter.ts): the intercept and slope at each
 * row given every row, E(alpha_t | y_1..y_n), and their variances.
 *
 * Backward recursions of Durbin & Koopman (2012): the ordinary ones (section 4.4.4,
 * r_{t-1} = Z' v / F + L' r_t, N_{t-1} = Z' Z / F + L' N_t L) after the diffuse period, and the
 * exact diffuse ones (section 5.3, eqs. 5.21-5.30) through it, which carry r^(0), r^(1) and
 * N^(0), N^(1), N^(2):
 *   alpha_hat_t = a_t + P_star r^(0)_{t-1} + P_inf r^(1)_{t-1},
 *   V_t = P_star - P_star N^(0) P_star - (P_inf N^(1) P_star)' - P_inf N^(1) P_star - P_inf N^(2) P_inf.
 * 2 x 2 matrices are row-major [m11, m12, m21, m22].
 */
import type { FilterPath } from './diffuse-filter';

type M2 = [number, number, number, number];
type V2 = [number, number];

const mul = (a: M2, b: M2): M2 => [a[0] * b[0] + a[1] * b[2], a[0] * b[1] + a[1] * b[3], a[2] * b[0] + a[3] * b[2], a[2] * b[1] + a[3] * b[3]];
const tr = (a: M2): M2 => [a[0], a[2], a[1], a[3]];
const add = (...ms: M2[]): M2 => ms.reduce((s, m) => [s[0] + m[0], s[1] + m[1], s[2] + m[2], s[3] + m[3]], [0, 0, 0, 0] as M2);
const scale = (a: M2, k: number): M2 => [a[0] * k, a[1] * k, a[2] * k, a[3] * k];
const mulV = (a: M2, v: V2): V2 => [a[0] * v[0] + a[1] * v[1], a[2] * v[0] + a[3] * v[1]];
const trMulV = (a: M2, v: V2): V2 => [a[0] * v[0] + a[2] * v[1], a[1] * v[0] + a[3] * v[1]];
const sym = (p: Float64Array, t: number): M2 => [p[3 * t], p[3 * t + 1], p[3 * t + 1], p[3 * t + 2]];
/** L = I - K Z for a gain k and design z = [1, x]. */
const lOf = (k: V2, z: V2): M2 => [1 - k[0] * z[0], -k[0] * z[1], -k[1] * z[0], 1 - k[1] * z[1]];
const outer = (u: V2, w: V2): M2 => [u[0] * w[0], u[0] * w[1], u[1] * w[0], u[1] * w[1]];

export interface SmoothedPath {
  intercept: Float64Array;
  slope: Float64Array;
  interceptVar: Float64Array;
  slopeVar: Float64Array;
}

/** Smoothed intercept and slope, with their variances, from a stored filter pass. */
export function diffuseSmoother(path: FilterPath, x: ArrayLike<number>): SmoothedPath {
  const { n } = path;
  const out: SmoothedPath = { intercept: new Float64Array(n), slope: new Float64Array(n), interceptVar: new Float64Array(n), slopeVar: new Float64Array(n) };
  let r: V2 = [0, 0];
  let N: M2 = [0, 0, 0, 0];
  let r1: V2 = [0, 0];
  let N1: M2 = [0, 0, 0, 0];
  let N2: M2 = [0, 0, 0, 0];
  for (let t = n - 1; t >= 0; t--) {
    const z: V2 = [1, x[t]];
    const Ps = sym(path.predictedStar, t);
    const v = path.v[t];
    const F = path.F[t];
    const ms = mulV(Ps, z);
    const a: V2 = [path.predictedA[t], path.predictedB[t]];
    let mean: V2;
    let V: M2;
    if (t >= path.diffuseRows) {
      const L = lOf([ms[0] / F, ms[1] / F], z);
      const zF: V2 = [z[0] / F, z[1] / F];
      const Lr = trMulV(L, r);
      r = [zF[0] * v + Lr[0], zF[1] * v + Lr[1]];
      N = add(outer(z, zF), mul(tr(L), mul(N, L)));
      const Pr = mulV(Ps, r);
      mean = [a[0] + Pr[0], a[1] + Pr[1]];
      V = add(Ps, scale(mul(Ps, mul(N, Ps)), -1));
    } else {
      const Pi = sym(path.predictedInf, t);
      const mi = mulV(Pi, z);
      if (path.diffuse[t]) {
        const Finf = path.Finf[t];
        const F1 = 1 / Finf;
        const F2 = -F / (Finf * Finf);
        const k0: V2 = [mi[0] * F1, mi[1] * F1];
        const k1: V2 = [ms[0] * F1 + mi[0] * F2, ms[1] * F1 + mi[1] * F2];
        const L0 = lOf(k0, z);
        const L1 = scale(outer(k1, z), -1);
        const r0Next = trMulV(L0, r);
        const a1 = trMulV(L0, r1);
        const b1 = trMulV(L1, r);
        const r1Next: V2 = [z[0] * F1 * v + a1[0] + b1[0], z[1] * F1 * v + a1[1] + b1[1]];
        const zz = outer(z, z);
        const L0t = tr(L0);
        const L1t = tr(L1);
        const N0Next = mul(L0t, mul(N, L0));
        const N1Next = add(scale(zz, F1), mul(L0t, mul(N1, L0)), mul(L1t, mul(N, L0)), mul(L0t, mul(N, L1)));
        const N2Next = add(scale(zz, F2), mul(L0t, mul(N2, L0)), mul(L0t, mul(N1, L1)), mul(L1t, mul(N1, L0)), mul(L1t, mul(N, L1)));
        r = r0Next; r1 = r1Next; N = N0Next; N1 = N1Next; N2 = N2Next;
      } else {
        // A row inside the diffuse period whose F_inf is zero (its design repeats an earlier one).
        const L = lOf([ms[0] / F, ms[1] / F], z);
        const Lr = trMulV(L, r);
        r = [(z[0] / F) * v + Lr[0], (z[1] / F) * v + Lr[1]];
        N = add(scale(outer(z, z), 1 / F), mul(tr(L), mul(N, L)));
        N1 = mul(N1, L);
      }
      const p0 = mulV(Ps, r);
      const p1 = mulV(Pi, r1);
      mean = [a[0] + p0[0] + p1[0], a[1] + p0[1] + p1[1]];
      const cross = mul(Pi, mul(N1, Ps));
      V = add(Ps, scale(mul(Ps, mul(N, Ps)), -1), scale(tr(cross), -1), scale(cross, -1), scale(mul(Pi, mul(N2, Pi)), -1));
    }
    out.intercept[t] = mean[0];
    out.slope[t] = mean[1];
    out.interceptVar[t] = V[0];
    out.slopeVar[t] = V[3];
  }
  return out;
}
