/**
 * The grid of Mooring's simulated bounds table (addin/tables/ardl-bounds-simulated.json):
 * the probabilities at which quantiles are kept, the regression sizes n, the largest k.
 * Shared by the generator (tests/tables/simulate-ardl-bounds.ts) and the reader.
 */

/** Probabilities of the tabulated quantiles (the CDF of each statistic). */
export const BOUNDS_PROBABILITIES: readonly number[] = [
  0.001, 0.005, 0.01, 0.025, 0.05, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9, 0.95, 0.975, 0.99, 0.995, 0.999,
];

/** Regression sizes simulated; the largest stands in for the limit in the p-values. */
export const BOUNDS_SIZES: readonly number[] = [20, 30, 40, 50, 60, 80, 100, 150, 250];

/** Regressors covered by the simulation (the paper's asymptotic tables cover 0..10). */
export const BOUNDS_MAX_SIMULATED_K = 4;
