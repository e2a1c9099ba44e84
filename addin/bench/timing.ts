/**
 * Timing helper for the benchmarks: runs a task repeatedly after a warm-up and reports the
 * median and the fastest run in milliseconds. Benchmarks measure speed; tests never do.
 */
export interface Timing {
  name: string;
  medianMs: number;
  minMs: number;
  runs: number;
  targetMs?: number;
  withinTarget?: boolean;
}

export function timeIt(name: string, task: () => unknown, options: { runs?: number; warmup?: number; targetMs?: number } = {}): Timing {
  const runs = options.runs ?? 30;
  const warmup = options.warmup ?? 5;
  for (let i = 0; i < warmup; i++) task();
  // A task of well under a millisecond has not reached the engine's optimised code after five
  // calls, and on two busy cores its background compilation can come late: the median then
  // mixed the two (KPSS read 0.10 ms in some runs, 0.27 ms in others). Keep warming such a task
  // for 100 ms (at most 2,000 calls), so every run times the steady state a repeated use sees.
  const warmStart = performance.now();
  for (let i = 0; i < 2000 && performance.now() - warmStart < 100; i++) task();
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const start = performance.now();
    task();
    times.push(performance.now() - start);
  }
  times.sort((a, b) => a - b);
  const medianMs = times[Math.floor(runs / 2)];
  const out: Timing = { name, medianMs: round(medianMs), minMs: round(times[0]), runs };
  if (options.targetMs !== undefined) {
    out.targetMs = options.targetMs;
    out.withinTarget = medianMs <= options.targetMs;
  }
  return out;
}

function round(ms: number): number {
  return Math.round(ms * 1000) / 1000;
}
