/**
 * Whether a pair's relation held through time, for the pane's "Through time" section: the
 * engine's rolling Engle-Granger p-value, hedge ratio and half-life (addin/stability), the
 * Gregory-Hansen (1996) test that lets the relation shift once (a shift in level, and a shift
 * in level and hedge ratio), and the Zivot-Andrews (1992) test of each price with one level
 * shift (addin/breaks). It runs in the diagnosis worker on the rows the report used (the same
 * input, cut to the same window), so every number is the engine's on the report's sample.
 */
import { gregoryHansenTest } from '../../addin/breaks/gregory-hansen';
import { zivotAndrewsTest, type BreakTestResult } from '../../addin/breaks/zivot-andrews';
import { checkDiagnosticInput, type DiagnosticOptions } from '../../addin/report/check-input';
import type { DiagnosticInput } from '../../addin/report/prepare-input';
import { summariseTest, type TestSummary } from '../../addin/report/test-summary';
import { rollingRelation } from '../../addin/stability/rolling-relation';
import { SMALLEST_WINDOW } from '../../addin/stability/window-plan';

/** The pair, dependent first (the report's normalisation). */
export interface StabilityPair {
  y: string;
  x: string;
}

/** A one-break test as the pane shows it. */
export interface BreakReading {
  /** What may break, in words. */
  what: string;
  test: TestSummary;
  /** The first row the break affects, as people see it (its date when there is one). */
  breakAt: string;
  verdict: string;
}

/** The rolling relation, one entry per window (oldest first). */
export interface RollingReading {
  window: number;
  step: number;
  /** Label (date, else row) of each window's last row. */
  endLabel: string[];
  /** Date of each window's last row (ISO text), or null where the data have none. */
  endDate: (string | null)[];
  pValue: (number | null)[];
  beta: (number | null)[];
  halfLife: (number | null)[];
  summary: string[];
}

/** Everything the section shows; a part the engine refused carries its reason instead. */
export interface PairStability {
  pair: StabilityPair;
  rows: number;
  rolling: RollingReading | null;
  rollingProblem: string | null;
  shifts: BreakReading[];
  shiftProblem: string | null;
  seriesBreaks: { name: string; reading: BreakReading | null; problem: string | null }[];
}

/** Most windows drawn: the step thins longer histories to about this many. */
export const MOST_WINDOWS = 150;

/**
 * Rows in each rolling window: 250 (about a year of trading days; common practice) when the
 * sample holds at least twice that, else half the sample, never below the engine's smallest.
 */
export function stabilityWindow(rows: number): number {
  return rows >= 500 ? 250 : Math.max(SMALLEST_WINDOW, Math.floor(rows / 2));
}

/** Rows between window ends, so that about MOST_WINDOWS windows are drawn. */
export function stabilityStep(rows: number, window: number): number {
  return Math.max(1, Math.ceil((rows - window + 1) / MOST_WINDOWS));
}

function message(e: unknown): string {
  return e instanceof Error ? e.message : String(e);
}

function reading(what: string, result: BreakTestResult, alpha: number): BreakReading {
  return { what, test: summariseTest(result, alpha), breakAt: result.breakAt.label, verdict: result.verdict };
}

/** The pair's stability on the rows the report used (see the file comment). */
export function pairStability(input: DiagnosticInput, options: DiagnosticOptions, pair: StabilityPair): PairStability {
  const checked = checkDiagnosticInput(input, options);
  const alpha = options.alpha ?? 0.05;
  const lags = options.lagRule ?? 'aic';
  const at = (name: string): Float64Array => {
    const j = checked.names.indexOf(name);
    if (j < 0) throw new Error(`${name} is not among the series of the run`);
    return checked.values[j];
  };
  const y = at(pair.y);
  const x = at(pair.x);
  const T = y.length;
  const label = (i: number): string => (checked.dates?.[i] ? checked.dates[i] : checked.rowLabels[i]);
  const out: PairStability = { pair, rows: T, rolling: null, rollingProblem: null, shifts: [], shiftProblem: null, seriesBreaks: [] };

  try {
    const window = stabilityWindow(T);
    const step = stabilityStep(T, window);
    const r = rollingRelation(y, x, { window, step }, pair);
    out.rolling = {
      window,
      step,
      endLabel: r.endRow.map(label),
      endDate: r.endRow.map((i) => checked.dates?.[i] || null),
      pValue: r.pValue,
      beta: r.beta,
      halfLife: r.halfLife,
      summary: r.summary,
    };
  } catch (e) {
    out.rollingProblem = message(e);
  }

  try {
    const names = { y: pair.y, xs: [pair.x] };
    out.shifts = [
      reading('A shift in the level of the relation', gregoryHansenTest(y, [x], { model: 'level', lags, rowLabel: label }, names), alpha),
      reading('A shift in the level and the hedge ratio', gregoryHansenTest(y, [x], { model: 'regime', lags, rowLabel: label }, names), alpha),
    ];
  } catch (e) {
    out.shiftProblem = message(e);
  }

  for (const name of [pair.y, pair.x]) {
    try {
      out.seriesBreaks.push({ name, reading: reading(`${name}: a unit root, allowing one shift in level`, zivotAndrewsTest(at(name), { model: 'level', lags, rowLabel: label }, name), alpha), problem: null });
    } catch (e) {
      out.seriesBreaks.push({ name, reading: null, problem: message(e) });
    }
  }
  return out;
}
