/**
 * Benchmarks of the Excel functions, called exactly as Excel calls them: ranges as rows of
 * cells (2,500-row columns of prices), options as cell values or null when left out, each
 * call through the function layer (range reader, option parser, engine, renderer, error
 * mapping). Targets: 200 formulas (50 each of MOOR.ADF, MOOR.ENGLEGRANGER, MOOR.GRANGER and
 * MOOR.HALFLIFE) within 0.5 s in all; a whole-column reference (1,048,576 cells, 2,500 used)
 * at most 20 ms slower than the used range alone. Wired into `npm run bench` by
 * tests/bench/run-bench.ts; speed is never asserted in a test.
 */
import { SeededRandom, autoregressive1, randomWalk } from '../../addin/random';
import { CellError } from '../../functions/cells/cell-error';
import { timeIt, type Timing } from '../../addin/bench/timing';
import { adf, englegranger, granger, halflife } from '../../functions/functions';

const ROWS = 2_500;
const SHEET_ROWS = 1_048_576;
/** One series more than the formulas per function, so no two formulas of a kind share their inputs. */
const SERIES = 51;

function columnOf(values: ArrayLike<number>, height = values.length): unknown[][] {
  const out = new Array<unknown[]>(height);
  for (let i = 0; i < height; i++) out[i] = [i < values.length ? values[i] : null];
  return out;
}

/**
 * 51 price histories of 2,500 rows (seed 2024): one common random walk, scaled differently in
 * each series, plus stationary AR(1) noise of its own (phi 0.8), so every pair is cointegrated
 * as pairs on a real sheet would be chosen to be.
 */
function priceColumns(): unknown[][][] {
  const rng = new SeededRandom(2024);
  const common = randomWalk(rng, ROWS, { start: 100 });
  return Array.from({ length: SERIES }, (_, k) => {
    const own = autoregressive1(rng, ROWS, 0.8, 0.5);
    return columnOf(Array.from(common, (c, i) => (1 + 0.02 * k) * c + own[i]));
  });
}

/** Runs one formula as Excel would: an error result (a cell error) is an answer too. */
function formula(call: () => unknown): void {
  try {
    call();
  } catch (e) {
    if (!(e instanceof CellError)) throw e;
  }
}

/** The 200 formulas of a sheet of pair statistics, as one recalculation. */
function twoHundredFormulas(columns: unknown[][][]): () => void {
  return () => {
    for (let k = 0; k < 50; k++) {
      const a = columns[k];
      const b = columns[k + 1];
      formula(() => adf(a, null, null, null));
      formula(() => englegranger(a, b, null, null, null));
      formula(() => granger(b, a, null, null, null));
      formula(() => halflife(a, b));
    }
  };
}

/** 50 formulas of one kind, for seeing where the 200 spend their time. */
function fiftyOf(columns: unknown[][][], one: (a: unknown[][], b: unknown[][]) => unknown): () => void {
  return () => {
    for (let k = 0; k < 50; k++) formula(() => one(columns[k], columns[k + 1]));
  };
}

export function benchFunctions(): Timing[] {
  const columns = priceColumns();
  const values = columns[0].map((row) => row[0] as number);
  const whole = columnOf(values, SHEET_ROWS);
  const used = columns[0];
  const formulas = timeIt('functions: 200 formulas (50 each ADF, ENGLEGRANGER, GRANGER, HALFLIFE) over 2,500-row columns', twoHundredFormulas(columns), { runs: 5, warmup: 1, targetMs: 500 });
  const usedRange = timeIt('functions: MOOR.ADF on the used range (2,500 cells)', () => adf(used), { runs: 30 });
  const wholeColumn = timeIt('functions: MOOR.ADF on a whole column (1,048,576 cells, 2,500 used)', () => adf(whole), { runs: 30 });
  const extra = Math.round((wholeColumn.medianMs - usedRange.medianMs) * 1000) / 1000;
  const difference: Timing = {
    name: 'functions: whole column minus used range (median difference)',
    medianMs: extra,
    minMs: Math.round((wholeColumn.minMs - usedRange.minMs) * 1000) / 1000,
    runs: wholeColumn.runs,
    targetMs: 20,
    withinTarget: extra <= 20,
  };
  const parts = [
    timeIt('functions: 50 x MOOR.ADF (default lags: AIC search)', fiftyOf(columns, (a) => adf(a)), { runs: 5, warmup: 1 }),
    timeIt('functions: 50 x MOOR.ENGLEGRANGER (default lags: AIC search)', fiftyOf(columns, (a, b) => englegranger(a, b)), { runs: 5, warmup: 1 }),
    timeIt('functions: 50 x MOOR.GRANGER (method auto, lags by AIC)', fiftyOf(columns, (a, b) => granger(b, a)), { runs: 3, warmup: 1 }),
    timeIt('functions: 50 x MOOR.HALFLIFE (Engle-Granger spread)', fiftyOf(columns, (a, b) => halflife(a, b)), { runs: 5, warmup: 1 }),
  ];
  return [formulas, ...parts, usedRange, wholeColumn, difference];
}
