/**
 * Residual cross products E'E of the nested VARs p = 0..M on the common sample of the lag
 * search, from one Householder QR of the largest design (the slower, sturdier path; the lag
 * search uses it when the Gram path of nested-var-residuals.ts is not safe).
 *
 * The designs are nested (order p uses the first 1 + Kp columns of order M's design), so with
 * z_a = Q'y_a, (E'E)_ab for the first m columns is the sum of z_a[i] z_b[i] over i >= m (the
 * same identity as HouseholderQr.nestedSsr, per pair of equations).
 */
import { HouseholderQr, assertFullRank } from '../linalg/householder-qr';
import { varDesign } from './var-design';

/** E'E (K x K, row-major, the data's units) of the VAR(p) on the last T - maxLags rows, for p = 0..maxLags. */
export function varLagCrossProductsByQr(series: readonly Float64Array[], maxLags: number, names: readonly string[]): Float64Array[] {
  const K = series.length;
  const design = varDesign(series, maxLags, 'const', maxLags, names);
  const qr = new HouseholderQr(design.columns, design.nobs);
  assertFullRank(qr, design.columnNames);
  const z = design.responses.map((y) => qr.qtY(y));
  const n = design.nobs;
  const out: Float64Array[] = [];
  for (let p = 0; p <= maxLags; p++) {
    const m = 1 + K * p;
    const e = new Float64Array(K * K);
    for (let a = 0; a < K; a++) {
      for (let b = a; b < K; b++) {
        const za = z[a];
        const zb = z[b];
        let s = 0;
        for (let i = m; i < n; i++) s += za[i] * zb[i];
        e[a * K + b] = e[b * K + a] = s;
      }
    }
    out.push(e);
  }
  return out;
}
