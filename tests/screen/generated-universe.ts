/**
 * Seeded universes for the screen tests: clusters of series that share one random-walk trend
 * (so every pair inside a cluster is cointegrated) and independent random walks.
 * Member m of a cluster is a_m + b_m trend + u, u a stationary AR(1) with coefficient phi and
 * shocks of size `noise` (default 0.3, against trend shocks of 1). A large stationary part beside a
 * random walk gives its changes a strong negative autocorrelation, under which the ADF rejects far
 * too often (Schwert 1989); a small one keeps the unrelated pairs at the test's nominal size.
 */
import { SeededRandom, autoregressive1, randomWalk } from '../../addin/random';

export interface GeneratedUniverse {
  series: { name: string; values: Float64Array }[];
  /** Cluster of each series by name; -1 for an independent walk. */
  cluster: Map<string, number>;
}

export function generatedUniverse(
  seed: number,
  options: { clusters: number; perCluster: number; walks: number; T: number; phi?: number; noise?: number },
): GeneratedUniverse {
  const rng = new SeededRandom(seed);
  const { clusters, perCluster, walks, T } = options;
  const phi = options.phi ?? 0.7;
  const noise = options.noise ?? 0.3;
  const series: { name: string; values: Float64Array }[] = [];
  const cluster = new Map<string, number>();
  for (let c = 0; c < clusters; c++) {
    const trend = randomWalk(rng, T, { start: 100 });
    for (let m = 0; m < perCluster; m++) {
      const u = autoregressive1(rng, T, phi, noise);
      const a = 10 * rng.uniform();
      const b = 0.5 + rng.uniform();
      const name = `c${c}m${m}`;
      series.push({ name, values: trend.map((v, t) => a + b * v + u[t]) });
      cluster.set(name, c);
    }
  }
  for (let w = 0; w < walks; w++) {
    const name = `w${w}`;
    series.push({ name, values: randomWalk(rng, T, { start: 100 }) });
    cluster.set(name, -1);
  }
  return { series, cluster };
}

/** True when y and x are in the same cluster (the pair is truly cointegrated). */
export function trulyRelated(u: GeneratedUniverse, y: string, x: string): boolean {
  const a = u.cluster.get(y) as number;
  return a >= 0 && a === u.cluster.get(x);
}
