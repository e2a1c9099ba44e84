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
