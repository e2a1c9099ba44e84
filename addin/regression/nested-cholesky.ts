/**
 * Residual sums of squares of the nested regressions on the first j columns of a design,
 * j = 0..k, from its cross-product matrix: with X'X = L L' (Cholesky) and z = L^{-1} X'y,
 * SSR_j = y'y - (z_1^2 + ... + z_j^2), and the t-ratio of the last column of model j is
 * z_j / sqrt(SSR_j / (n - j)) (up to sign).
 *
 * Used only to choose a lag order; the chosen model is refitted by QR for reporting.
 */
export interface NestedFits {
  /** ssr[j]: residual sum of squares using the first j columns. NaN where column j breaks the factorisation. */
  ssr: Float64Array;
  /** lastT[j]: |t| of column j-1 in the model with the first j columns (lastT[0] unused). */
  lastT: Float64Array;
  /** Columns that could be used before the factorisation broke down (k when all). */
  usable: number;
}

/** Work buffers for nestedFitsInto, sized for k columns: factor k*k, z k, ssr and lastT k + 1. */
export interface NestedFitBuffers {
  factor: Float64Array;
  z: Float64Array;
  ssr: Float64Array;
  lastT: Float64Array;
}

/**
 * The nested fits written into caller-owned buffers (no allocation, for loops over many
 * designs); returns how many columns could be used before the factorisation broke down.
 */
export function nestedFitsInto(xtx: Float64Array, xty: Float64Array, yty: number, k: number, n: number, buffers: NestedFitBuffers): number {
  const { factor: L, z, ssr, lastT } = buffers;
  ssr[0] = yty;
  let explained = 0;
  for (let j = 0; j < k; j++) {
    let d = xtx[j * k + j];
    for (let m = 0; m < j; m++) d -= L[j * k + m] * L[j * k + m];
    if (!(d > 1e-13 * Math.max(xtx[j * k + j], 1e-300))) return j;
    const ljj = Math.sqrt(d);
    L[j * k + j] = ljj;
    for (let i = j + 1; i < k; i++) {
      let s = xtx[i * k + j];
      for (let m = 0; m < j; m++) s -= L[i * k + m] * L[j * k + m];
      L[i * k + j] = s / ljj;
    }
    let s = xty[j];
    for (let m = 0; m < j; m++) s -= L[j * k + m] * z[m];
    z[j] = s / ljj;
    explained += z[j] * z[j];
    const rss = Math.max(yty - explained, 0);
    ssr[j + 1] = rss;
    const dof = n - (j + 1);
    lastT[j + 1] = dof > 0 && rss > 0 ? Math.abs(z[j]) / Math.sqrt(rss / dof) : Number.POSITIVE_INFINITY;
  }
  return k;
}

export function nestedFitsFromGram(xtx: Float64Array, xty: Float64Array, yty: number, k: number, n: number): NestedFits {
  const buffers: NestedFitBuffers = {
    factor: new Float64Array(k * k),
    z: new Float64Array(k),
    ssr: new Float64Array(k + 1).fill(Number.NaN),
    lastT: new Float64Array(k + 1).fill(Number.NaN),
  };
  const usable = nestedFitsInto(xtx, xty, yty, k, n, buffers);
  return { ssr: buffers.ssr, lastT: buffers.lastT, usable };
}
