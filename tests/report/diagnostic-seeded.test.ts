import { describe, expect, it } from 'vitest';
import { SeededRandom } from '../../addin/random';
import { diagnose } from '../../addin/report/pairwise-diagnostic';
import { ar1, leaderFollower, walk } from './seeded-series';

// View-independent checks of the report on seeded data whose structure is known by
// construction (seeded-series.ts). Seeds, sizes and tolerances are stated in each test.

describe('a cointegrated pair with a known leader (seed 14, 600 rows, beta 0.8, phi 0.9, lagged pass-through 0.2)', () => {
  const data = leaderFollower(14, 600, { gamma: 0.2 });
  const report = diagnose({ series: [{ name: 'Lead', values: data.leader }, { name: 'Follow', values: data.follower }] });
  const pair = report.pairs[0];

  it('finds both series I(1) and the pair cointegrated in both Engle-Granger directions', () => {
    expect(report.series.map((s) => s.order)).toEqual([1, 1]);
    expect(pair.cointegration.bothIntegrated).toBe(true);
    expect(pair.cointegration.evidence).toBe('both-directions');
    expect(pair.cointegration.cointegrated).toBe(true);
    expect(pair.cointegration.verdict).toMatch(/^Follow and Lead share a long-run relation \(Engle-Granger p [<=] [0-9.]+, both directions agree\)\.$/);
  });

  it('names the leader, and writes the relation for the follower on it', () => {
    expect(pair.leadLag?.leader).toBe('Lead');
    expect(pair.leadLag?.pattern).toBe('one-way');
    expect(pair.relation?.dependent).toBe('Follow');
    expect(pair.relation?.regressor).toBe('Lead');
  });

  it('recovers beta = 0.8 within three dynamic-OLS standard errors, and the halves agree', () => {
    const r = pair.relation!;
    expect(Math.abs(r.dynamicOls.beta - data.beta)).toBeLessThan(3 * r.dynamicOls.standardError);
    expect(r.halves?.stable).toBe(true);
    expect(pair.warnings).toEqual([]);
  });

  it('recovers the spread AR(1) coefficient 0.9 within two standard errors, sqrt((1 - phi^2) / n) = 0.018', () => {
    const se = Math.sqrt((1 - data.phi ** 2) / 600);
    const adj = pair.adjustment!;
    expect(Math.abs(adj.spreadAr1.phi - data.phi)).toBeLessThan(2 * se);
    expect(adj.ecm.dependent.corrects).toBe(true);
    expect(adj.ecm.regressor.corrects).toBe(false);
    expect(adj.verdict).toMatch(/^The spread closes half its gap in about [0-9.]+ rows/);
  });

  it('carries the spread for its chart: one value per row, bands at the mean plus and minus two standard deviations', () => {
    const sp = pair.spread!;
    expect(sp.values).toHaveLength(600);
    expect(sp.rollingZ).toHaveLength(600);
    expect(sp.bandUpper).toBeCloseTo(sp.mean + 2 * sp.standardDeviation, 12);
    expect(sp.latest).toBe(sp.values[599]);
    expect(sp.rollingZ.slice(0, sp.rollingWindow - 1).every((v) => v === null)).toBe(true);
  });
});

describe('sixteen seeds of the same leader-follower pair (seeds 11-26, 600 rows each)', () => {
  const reports = Array.from({ length: 16 }, (_, k) => {
    const data = leaderFollower(11 + k, 600, { gamma: 0.2 });
    return diagnose({ series: [{ name: 'Lead', values: data.leader }, { name: 'Follow', values: data.follower }] });
  });

  it('finds the pair cointegrated by Engle-Granger in every seed (the spread is stationary by construction)', () => {
    expect(reports.every((r) => r.pairs[0].cointegration.evidence !== 'none')).toBe(true);
  });

  it('names the true leader in at least 14 of 16 and the follower as leader in at most 1 (a series misread as I(0) can mislead the test chooser)', () => {
    const leaders = reports.map((r) => r.pairs[0].leadLag?.leader);
    expect(leaders.filter((l) => l === 'Lead').length).toBeGreaterThanOrEqual(14);
    expect(leaders.filter((l) => l === 'Follow').length).toBeLessThanOrEqual(1);
  });

  it('flags a moved hedge ratio in at most 3 of 16, though the relation never moves', () => {
    expect(reports.filter((r) => r.pairs[0].relation?.halves?.stable === false).length).toBeLessThanOrEqual(3);
  });
});

describe('two independent random walks', () => {
  it('are called cointegrated in at most 2 of 8 seeds (size 5%: P(3 or more of 8) is about 0.006)', () => {
    let flagged = 0;
    for (let seed = 100; seed < 108; seed++) {
      const rng = new SeededRandom(seed);
      const report = diagnose({ series: [{ name: 'A', values: walk(rng, 400) }, { name: 'B', values: walk(rng, 400) }] });
      if (report.pairs[0].cointegration.cointegrated) flagged++;
    }
    expect(flagged).toBeLessThanOrEqual(2);
  });

  it('when both read as I(1) and unrelated, get the "no evidence" verdict and the F test on changes (first such seed from 100)', () => {
    let report = null;
    for (let seed = 100; seed < 120 && report === null; seed++) {
      const rng = new SeededRandom(seed);
      const r = diagnose({ series: [{ name: 'A', values: walk(rng, 400) }, { name: 'B', values: walk(rng, 400) }] });
      if (r.series.every((s) => s.order === 1 && s.agree) && !r.pairs[0].cointegration.cointegrated) report = r;
    }
    expect(report).not.toBeNull();
    const pair = report!.pairs[0];
    expect(pair.cointegration.evidence).toBe('none');
    expect(pair.cointegration.verdict).toMatch(/^No evidence that A and B share a long-run relation/);
    expect(pair.leadLag?.method).toBe('f-differences');
    expect(pair.verdicts).toHaveLength(2); // no relation, half-life or spread sentence without a relation
  });
});

describe('an I(0) series beside an I(1) series (seed 21, 400 rows)', () => {
  const rng = new SeededRandom(21);
  const calm = ar1(rng, 400, 0.5, 0.02, 3);
  const wander = walk(rng, 400, 0.01, 2);
  const report = diagnose({ series: [{ name: 'Calm', values: calm }, { name: 'Wander', values: wander }] });
  const pair = report.pairs[0];

  it('finds the orders 0 and 1', () => {
    expect(report.series.map((s) => s.orderText)).toEqual(['I(0)', 'I(1)']);
  });

  it('still reports the pair; its verdict says the residual tests assume two wandering prices and gives the bounds test instead', () => {
    expect(pair.cointegration.bothIntegrated).toBe(false);
    expect(pair.cointegration.cointegrated).toBe(false);
    expect(pair.cointegration.verdict).toContain('the residual tests and Johansen assume two wandering prices, but Calm is I(0); the bounds test, which allows a mix, answers instead.');
    const bounds = pair.cointegration.bounds!;
    expect(bounds.dependent).toBe('Calm');
    expect(pair.cointegration.verdict).toContain(bounds.verdict);
    expect(bounds.criticalSource).toMatch(/Table CI\(iii\)/);
    expect(pair.warnings.map((w) => w.kind)).toContain('inputs-not-integrated');
    expect(pair.cointegration.engleGranger.aOnB.statistic).not.toBeNull();
  });

  it('chooses Toda-Yamamoto for the mixed orders', () => {
    expect(pair.leadLag?.method).toBe('toda-yamamoto');
    expect(pair.leadLag?.why).toMatch(/different orders of integration/);
  });
});

describe('three series: Y tied to X1, X2 free (seed 31, 500 rows)', () => {
  const rng = new SeededRandom(31);
  const x1 = walk(rng, 500, 0.01, 1);
  const x2 = walk(rng, 500, 0.01, 1);
  const noise = ar1(rng, 500, 0.6, 0.01);
  const y = x1.map((v, t) => 0.5 + 1.2 * v + noise[t]);
  const report = diagnose({ series: [{ name: 'Y', values: y }, { name: 'X1', values: x1 }, { name: 'X2', values: x2 }] });

  it('diagnoses every pair once, in input order', () => {
    expect(report.pairs.map((p) => `${p.a}-${p.b}`)).toEqual(['Y-X1', 'Y-X2', 'X1-X2']);
  });

  it('finds the one tie and no other', () => {
    expect(report.pairs.map((p) => p.cointegration.cointegrated)).toEqual([true, false, false]);
  });

  it('tests the system as a whole and finds one long-run relation among the three', () => {
    expect(report.system?.johansen?.series).toEqual(['Y', 'X1', 'X2']);
    expect(report.system?.johansen?.rank.trace).toBe(1);
    expect(report.findings.at(-1)?.about).toBe('system');
  });

  it('counts the screening: 3 pairs, 6 lead-lag directions, 0.15 and 0.3 expected by chance at 5%', () => {
    expect(report.screening.pairs).toBe(3);
    expect(report.screening.expectedPassingPairs).toBeCloseTo(0.15, 12);
    expect(report.screening.expectedPassingDirections).toBeCloseTo(0.3, 12);
    expect(report.cautions.join(' ')).toMatch(/tested 3 pairs and 6 lead-lag directions/);
  });
});

describe('options and awkward data', () => {
  const data = leaderFollower(14, 600, { gamma: 0.2 });
  const series = [{ name: 'Lead', values: data.leader }, { name: 'Follow', values: data.follower }];

  it('a window cuts the data before anything is estimated', () => {
    const report = diagnose({ series }, { window: { start: 100, end: 400 } });
    expect(report.data.observations).toBe(300);
    expect(report.data.window).toEqual({ start: 100, end: 400 });
    expect(report.data.first.label).toBe('row 101');
    expect(report.pairs[0].spread?.values).toHaveLength(300);
  });

  it('BIC and a trend reach every step that takes them', () => {
    const report = diagnose({ series }, { lagRule: 'bic', deterministic: 'trend' });
    const pair = report.pairs[0];
    expect(report.settings).toMatchObject({ lagRule: 'bic', deterministic: 'trend' });
    expect(pair.cointegration.engleGranger.aOnB.deterministic).toBe('trend');
    expect(pair.cointegration.johansen?.lagsReason).toMatch(/^BIC chose/);
    expect(pair.leadLag?.aLeadsB.test.lagRule).toMatch(/^bic \(/);
  });

  it('a copied column (one series an exact multiple of the other) gives a report, with the parts it cannot support named, not a crash', () => {
    const copy = data.leader.map((v) => 0.5 + 2 * v);
    const report = diagnose({ series: [{ name: 'X', values: data.leader }, { name: 'Copy', values: copy }] });
    const pair = report.pairs[0];
    expect(pair.cointegration.engleGranger.aOnB.statistic).toBeNull();
    expect(pair.cointegration.engleGranger.aOnB.statisticNote).toMatch(/minus infinity/);
    expect(pair.spread).toBeNull();
    expect(pair.unavailable.map((u) => u.part)).toEqual(expect.arrayContaining(['long-run relation', 'spread', 'error-correction model']));
    expect(pair.warnings.filter((w) => w.kind === 'part-unavailable').map((w) => w.text).join(' ')).toMatch(/copy or a formula of the other/);
    expect(JSON.stringify(report)).not.toMatch(/series 2/);
  });
});
