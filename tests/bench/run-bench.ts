/**
 * `npm run bench`: times the engine and prints one JSON object. Where Debian's
 * python3-statsmodels is installed, the same series are timed with the reference library
 * (tests/bench/reference_timing.py) and the ratio ours / theirs is printed beside each.
 * Speed targets live here, never in the tests.
 */
import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, writeFileSync } from 'node:fs';
import { cpus, tmpdir } from 'node:os';
import { join } from 'node:path';
import { SeededRandom, randomWalk } from '../../addin/random';
import { benchUnitRoot } from '../../addin/bench/unitroot-bench';
import { benchCleaner } from '../../addin/bench/cleaner-bench';
import { benchEngleGranger, benchPair } from '../../addin/bench/cointegration-bench';
import { benchBlock, benchJohansen, benchJohansenRestrictions } from '../../addin/bench/johansen-bench';
import { benchArdl } from '../../addin/bench/ardl-bench';
import { benchCausality, causalityBenchPair } from '../../addin/bench/causality-bench';
import { benchBreaks, breaksBenchWalk } from '../../addin/bench/breaks-bench';
import { benchLargeSeries } from './large-series-bench';
import { benchScreen } from '../../addin/bench/screen-bench';
import { benchScreenScale } from '../../addin/bench/screen-scale-bench';
import { benchForecast, benchKalman, forecastBenchBlock, kalmanBenchPair } from '../../addin/bench/path-bench';
import { benchFunctions } from './functions-bench';
import type { Timing } from '../../addin/bench/timing';

interface ReferenceTimes {
  adfullerAicMs?: number;
  cointAicMs?: number;
  cointJohansenMs?: number;
  kalmanMlMs?: number;
  vecmForecastMs?: number;
  kpssAutoMs?: number;
  grangerLags1to4Ms?: number;
  varOrderMs?: number;
  zivotAndrewsMs?: number;
  uecmBoundsMs?: number;
}

function referenceTimes(spec: object): ReferenceTimes | string {
  const python = '/usr/bin/python3';
  const script = join(process.cwd(), 'tests', 'bench', 'reference_timing.py');
  if (!existsSync(python) || !existsSync(script)) return 'python3 or the timing script is missing';
  try {
    const dir = mkdtempSync(join(tmpdir(), 'mooring-bench-'));
    const file = join(dir, 'spec.json');
    writeFileSync(file, JSON.stringify(spec));
    const out = execFileSync(python, [script, file], { encoding: 'utf8', stdio: ['ignore', 'pipe', 'ignore'] });
    return JSON.parse(out) as ReferenceTimes;
  } catch {
    return 'python3-statsmodels is not installed (apt-get install -y python3-statsmodels to compare)';
  }
}

async function main(): Promise<void> {
  const unitRoot = benchUnitRoot();
  const cleaner = benchCleaner();
  const cointegration = benchEngleGranger();
  const johansen = benchJohansen();
  const johansenRestrictions = benchJohansenRestrictions();
  const ardl = benchArdl();
  const causality = benchCausality();
  const breaks = benchBreaks();
  const functions = benchFunctions();
  const screen = benchScreen();
  const screenScale = benchScreenScale();
  const kalman = benchKalman();
  const kalmanPair = kalmanBenchPair();
  const forecast = benchForecast();
  const walk = Array.from(randomWalk(new SeededRandom(11), 10_000, { start: 100 }));
  const pair = benchPair();
  const reference = referenceTimes({
    adf: [walk],
    coint: [[Array.from(pair.y), Array.from(pair.x)]],
    johansen: [benchBlock().map((s) => Array.from(s))],
    kalman: [[Array.from(kalmanPair.y), Array.from(kalmanPair.x)]],
    vecm: [forecastBenchBlock().map((s) => Array.from(s))],
    kpss: [walk],
    granger: [[Array.from(causalityBenchPair().leader), Array.from(causalityBenchPair().follower)]],
    zivotAndrews: [Array.from(breaksBenchWalk())],
    ardl: [[Array.from(pair.y), Array.from(pair.x)]],
  });
  const comparisons: Record<string, unknown> = {};
  if (typeof reference === 'object' && reference.adfullerAicMs) {
    const ours = unitRoot[0].medianMs;
    comparisons.adfAic10000 = { oursMs: ours, referenceMs: round(reference.adfullerAicMs), ratio: round(ours / reference.adfullerAicMs), goal: 0.05 };
  }
  if (typeof reference === 'object' && reference.cointAicMs) {
    const ours = cointegration[0].medianMs;
    comparisons.engleGrangerAic2500 = { oursMs: ours, referenceMs: round(reference.cointAicMs), ratio: round(ours / reference.cointAicMs), goal: 0.02 };
  }
  if (typeof reference === 'object' && reference.cointJohansenMs) {
    const ours = johansen[0].medianMs;
    comparisons.johansen6x2500 = { oursMs: ours, referenceMs: round(reference.cointJohansenMs), ratio: round(ours / reference.cointJohansenMs) };
  }
  if (typeof reference === 'object' && reference.kalmanMlMs) {
    const ours = kalman[0].medianMs;
    comparisons.kalmanMl2500 = { oursMs: ours, referenceMs: round(reference.kalmanMlMs), ratio: round(ours / reference.kalmanMlMs) };
  }
  if (typeof reference === 'object' && reference.vecmForecastMs) {
    const ours = forecast[0].medianMs;
    comparisons.vecmForecast3x1000 = { oursMs: ours, referenceMs: round(reference.vecmForecastMs), ratio: round(ours / reference.vecmForecastMs) };
  }
  if (typeof reference === 'object' && reference.uecmBoundsMs) {
    // The same call on both sides: ARDL(2, 2) given, case 3, fit and bounds test (issue 15 sets no ratio goal; the target is 5 ms).
    const ours = ardl[0].medianMs;
    comparisons.ardlBounds2500 = { oursMs: ours, referenceMs: round(reference.uecmBoundsMs), ratio: round(ours / reference.uecmBoundsMs) };
  }
  // Issue 16's goals: at most the reference library's time (KPSS, Johansen), a quarter of it
  // (Granger F at lags 1-4), and no slower than today for the others.
  const ratio = (name: string, ours: Timing | undefined, referenceMs: number | undefined, goal: number): void => {
    if (typeof reference !== 'object' || !referenceMs || !ours) return;
    const r = ours.medianMs / referenceMs;
    comparisons[name] = { oursMs: ours.medianMs, referenceMs: round(referenceMs), ratio: round(r), goal, withinGoal: r <= goal };
  };
  if (typeof reference === 'object') {
    ratio('kpssAuto10000', unitRoot.find((t) => t.name.startsWith('KPSS')), reference.kpssAutoMs, 1);
    ratio('grangerFLags1to4x2500', causality.find((t) => t.name.startsWith('Granger F at lags 1')), reference.grangerLags1to4Ms, 0.25);
    ratio('varOrder2x2500', causality.find((t) => t.name.startsWith('VAR lag order, 2 series')), reference.varOrderMs, 0.05);
    ratio('zivotAndrewsLevel2500', breaks.find((t) => t.name.startsWith('Zivot-Andrews (level), AIC lags, n = 2,500')), reference.zivotAndrewsMs, 0.05);
    const j = comparisons.johansen6x2500 as { ratio: number } | undefined;
    if (j) Object.assign(j, { goal: 1, withinGoal: j.ratio <= 1 });
  }
  const large = await benchLargeSeries();
  const all: Timing[] = [...unitRoot, ...cleaner, ...cointegration, ...johansen, ...johansenRestrictions, ...ardl, ...causality, ...breaks, ...functions, ...screen, ...screenScale, ...kalman, ...forecast, ...large];
  const report = {
    machine: { node: process.version, cpus: cpus().length },
    benchmarks: all,
    reference: typeof reference === 'string' ? { skipped: reference } : comparisons,
    allWithinTarget: all.every((t) => t.withinTarget !== false),
  };
  process.stdout.write(`${JSON.stringify(report, null, 2)}\n`);
}

function round(v: number): number {
  return Math.round(v * 10000) / 10000;
}

void main();
