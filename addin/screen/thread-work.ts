/**
 * How much work earns a screen each thread beyond the first: one rule for the Node worker
 * threads (parallel-node.ts) and the Web Workers of MOOR.SCREEN (screen-in-workers.ts). Pure
 * numbers, no thread API, so both bundles import it.
 */

/**
 * Pairs times rows that earn each thread beyond the first: 2,000,000, about 800 pairs of
 * 2,500 rows or a tenth of a second of one thread's work, well above what starting a worker
 * and warming its compiler cost. Below it the main thread finishes sooner alone.
 */
export const WORK_PER_THREAD = 2_000_000;

/**
 * Series times rows of orders of integration that earn each thread beyond the first: 100,000,
 * about 40 series of 2,500 rows or a fifth of a second of one thread's work (three ADF and three
 * KPSS tests a series).
 */
export const ORDER_WORK_PER_THREAD = 100_000;

/** Threads worth using, at most `available`, for `pairs` pairs of `rows` rows (at least 1). */
export function threadsWorth(pairs: number, rows: number, available: number, perThread = WORK_PER_THREAD): number {
  return Math.max(1, Math.min(available, pairs, Math.floor((pairs * rows) / Math.max(perThread, 1)) + 1));
}
