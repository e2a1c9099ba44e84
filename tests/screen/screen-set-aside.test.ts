/**
 * The screen ranks only pairs that can cointegrate: both series integrated of the same order,
 * at least 1 (Engle & Granger 1987 define cointegration for series of one common order). The
 * evidence:
 * - on the demo data in logs, each series' order is the pairwise report's (seriesSection, the
 *   report's own routine at its default level and terms), TankPremium's pairs are set aside
 *   with both orders and a reason, and every ranked pair carries two equal orders of 1;
 * - the adjusted p-values are the reference library's Benjamini-Hochberg on the ranked pairs'
 *   raw p-values: statsmodels 0.13.5 multipletests(p, method="fdr_bh") in the fixture
 *   tests/reference/fixtures/fdr-bh.json (made by tests/reference/make_fixtures.py), on the
 *   demo's 20 ranked pairs (their raw p-values from statsmodels coint) and on 40 fixed values.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { screenCommand } from '../../addin/cli/commands/screen';
import { checkDiagnosticOptions } from '../../addin/report/check-input';
import { seriesSection } from '../../addin/report/series-section';
import { SeededRandom, randomWalk } from '../../addin/random';
import { benjaminiHochberg } from '../../addin/screen/benjamini-hochberg';
import { screenPairs } from '../../addin/screen/screen-pairs';
import { runWith } from '../cli/cli-harness';
import { loadFixture, type FixtureFile } from '../reference/fixtures';

interface FdrCase {
  name: string;
  series: string[];
  pairs: { y: string; x: string }[] | null;
  method: 'fdr_bh';
  alpha: number;
  pValues: number[];
  adjusted: number[];
  rejected: boolean[];
}
const fixture = loadFixture<FixtureFile<FdrCase>>('fdr-bh');
const fdrCase = (name: string) => fixture.cases.find((c) => c.name === name) as FdrCase;

const DEMO = readFileSync(new URL('../../addin/demo/data/quennel-delta.csv', import.meta.url), 'utf8');
const run = (...args: string[]) => runWith([screenCommand], ['screen', 'demo.csv', '--threads', '1', ...args], { 'demo.csv': DEMO });

interface JsonPair { y: string; x: string; orderY: number; orderX: number; pValue: number; adjustedPValue: number; discovery: boolean }
interface JsonSetAside { y: string; x: string; orderY: number | null; orderX: number | null; reason: string }
const demo = JSON.parse(run('--log', '--json').stdout) as {
  series: string[];
  orders: { name: string; order: number | null }[];
  pairs: JsonPair[];
  setAside: JsonSetAside[];
  untested: unknown[];
  family: { size: number };
  chanceSentence: string;
  discoveries: number;
};

/** The demo columns in logs, read straight from the CSV. */
function demoLogs(): { name: string; values: Float64Array }[] {
  const lines = DEMO.trim().split('\n');
  const header = lines[0].split(',');
  return header.slice(1).map((name, j) => ({ name: `ln(${name})`, values: Float64Array.from(lines.slice(1), (l) => Math.log(Number(l.split(',')[j + 1]))) }));
}

describe('mooring screen --log on the demo data: TankPremium settles, so its pairs are set aside', () => {
  it("decides each series' order as the pairwise report does (seriesSection at the report's default level and terms)", () => {
    const settings = checkDiagnosticOptions({});
    const expected = demoLogs().map((s) => seriesSection(s.name, s.values, { alpha: settings.alpha, deterministic: settings.deterministic, logged: true }).order);
    expect(demo.orders.map((o) => o.order)).toEqual(expected);
    expect(demo.orders.find((o) => o.name === 'ln(TankPremium)')?.order).toBe(0);
    expect(demo.orders.filter((o) => o.order === 1)).toHaveLength(5);
  });

  it('sets aside the 10 directed pairs with TankPremium, each with both orders and the reason in words', () => {
    expect(demo.setAside).toHaveLength(10);
    for (const p of demo.setAside) {
      expect([p.y, p.x]).toContain('ln(TankPremium)');
      expect(p.y === 'ln(TankPremium)' ? [p.orderY, p.orderX] : [p.orderX, p.orderY]).toEqual([0, 1]);
      expect(p.reason).toBe('ln(TankPremium) settles around its own mean (order 0): a pair needs two wandering series of the same order');
    }
  });

  it('ranks only the 20 directed pairs of the five wandering series, each carrying two orders of 1; the family and the sentence count only them', () => {
    expect(demo.pairs).toHaveLength(20);
    for (const p of demo.pairs) {
      expect([p.orderY, p.orderX]).toEqual([1, 1]);
      expect([p.y, p.x]).not.toContain('ln(TankPremium)');
    }
    expect(demo.untested).toEqual([]);
    expect(demo.family.size).toBe(20);
    expect(demo.chanceSentence).toMatch(/^Of 20 directed pairs tested at 5%,/);
    expect(demo.chanceSentence).toContain('Benjamini-Hochberg over all 20 directed pairs');
  });

  it('prints the ranking, then the set-aside pairs briefly: the count and the reason by series', () => {
    const out = run('--log', '--top', '5').stdout;
    expect(out).toMatch(/Set aside\s+10 directed pairs, not ranked/);
    expect(out).toMatch(/ln\(TankPremium\) settles around its own mean \(order 0\): its 10\s+directed\s+pairs set aside/);
    expect(out.indexOf('Set aside')).toBeGreaterThan(out.indexOf('   1 ln('));
    expect(out).not.toMatch(/^\s+\d+ ln\(TankPremium\) on/m);
    expect(out).toMatch(/Orders\s+ln\(GateGasoil\) I\(1\)/);
  });
});

describe('the adjustment against the reference library (statsmodels multipletests, fdr_bh)', () => {
  it.each(['demo-screen-log', 'fixed-40'])('our Benjamini-Hochberg on the fixture case %s equals multipletests to 1e-12', (name) => {
    const c = fdrCase(name);
    const ours = benjaminiHochberg(c.pValues);
    expect(ours).toHaveLength(c.adjusted.length);
    c.adjusted.forEach((a, i) => expect(Math.abs(ours[i] - a), `p-value ${i + 1}`).toBeLessThan(1e-12));
    expect(Array.from(ours, (q) => q <= c.alpha)).toEqual(c.rejected);
  });

  it('the demo screen ranks the fixture pairs, with raw p-values equal to statsmodels coint (1e-6) and adjusted ones equal to multipletests on them', () => {
    const c = fdrCase('demo-screen-log');
    const pairs = c.pairs as { y: string; x: string }[];
    expect(demo.pairs.map((p) => `${p.y} on ${p.x}`).sort()).toEqual(pairs.map((p) => `${p.y} on ${p.x}`).sort());
    const ranked = pairs.map((f) => demo.pairs.find((p) => p.y === f.y && p.x === f.x) as JsonPair);
    ranked.forEach((p, i) => expect(Math.abs(p.pValue - c.pValues[i]), `${p.y} on ${p.x}`).toBeLessThan(1e-6));
    // Our adjustment of our own raw p-values is multipletests' on the same values (1e-12) ...
    const reference = benjaminiHochberg(ranked.map((p) => p.pValue));
    ranked.forEach((p, i) => expect(Math.abs(p.adjustedPValue - reference[i])).toBeLessThan(1e-12));
    // ... and, with raw p-values 1e-6 apart, within 2e-5 of the fixture's adjusted values, with the same discoveries.
    ranked.forEach((p, i) => expect(Math.abs(p.adjustedPValue - c.adjusted[i])).toBeLessThan(2e-5));
    expect(ranked.map((p) => p.discovery)).toEqual(c.rejected);
    expect(demo.discoveries).toBe(c.rejected.filter(Boolean).length);
  });
});

describe('pairs of different orders, and series whose order cannot be decided', () => {
  // Seed 77: two random walks (order 1), the running sum of a walk (order 2), and a walk with
  // prices on only its last 21 rows (too few to decide an order: the routine needs 22).
  const rng = new SeededRandom(77);
  const T = 300;
  const a = randomWalk(rng, T, { start: 100 });
  const b = randomWalk(rng, T, { start: 100 });
  const step = randomWalk(rng, T, { start: 0 });
  let level = 1000;
  const twice = step.map((v) => (level += v));
  const late = Array.from(randomWalk(rng, T, { start: 50 }), (v, t) => (t < T - 21 ? null : v));
  const result = screenPairs([
    { name: 'A', values: a },
    { name: 'B', values: b },
    { name: 'Twice', values: twice },
    { name: 'Late', values: late },
  ]);

  it('finds the orders 1, 1, 2 and none, with the reason for the one it cannot decide', () => {
    expect(result.orders.map((o) => o.order)).toEqual([1, 1, 2, null]);
    expect(result.orders[3].note).toMatch(/Late has 21 usable observations/);
  });

  it('ranks only A with B, and gives every other pair its reason', () => {
    expect(result.pairs.map((p) => `${p.y} on ${p.x}`).sort()).toEqual(['A on B', 'B on A']);
    expect(result.family.size).toBe(2);
    expect(result.setAside).toHaveLength(10);
    const reason = (y: string, x: string) => result.setAside.find((p) => p.y === y && p.x === x)?.reason;
    expect(reason('A', 'Twice')).toBe('A wanders with order 1 and Twice with order 2: a pair needs two wandering series of the same order');
    expect(reason('Late', 'B')).toMatch(/^the order of integration of Late could not be decided \(Late has 21 usable observations.*\): a pair needs two wandering series of the same order$/);
    expect(result.setAside.find((p) => p.y === 'Twice' && p.x === 'A')).toMatchObject({ orderY: 2, orderX: 1 });
    expect(result.setAsideSummary).toEqual([
      expect.stringMatching(/^the order of integration of Late could not be decided .*: its 6 directed pairs set aside$/),
      'a series of order 1 with one of order 2: 4 directed pairs set aside',
    ]);
  });

  it('adjusts over the ranked pairs only: their adjusted p-values are Benjamini-Hochberg of their two raw ones', () => {
    const q = benjaminiHochberg(result.pairs.map((p) => p.pValue));
    result.pairs.forEach((p, i) => expect(p.adjustedPValue).toBe(q[i]));
    expect(result.matrix[0][2]).toBeNull();
    expect(result.matrix[0][1]).toBe(result.pairs.find((p) => p.y === 'A' && p.x === 'B')?.pValue);
  });
});
